import { Box, Button, Flex, HStack, Text } from '@chakra-ui/react';
import type { DrawingAnalysis } from '@jigwright/core';
import { useId, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent, type WheelEvent } from 'react';
import { drawingPicture, panViewBox, zoomViewBox, type ViewBox } from '../drawing-geometry';
import { formatLength, formatSize, type Units } from '../units';

const color = (token: string) => `var(--chakra-colors-${token.replace('.', '-')})`;
const HAIRLINE = { vectorEffect: 'non-scaling-stroke', strokeWidth: 1 } as const;
const ZOOM_STEP = 1.25;

type DrawingGeometry = Pick<DrawingAnalysis, 'parts' | 'dimensions' | 'extents'>;

function partLabel(part: DrawingGeometry['parts'][number], units: Units): string {
  return `${part.name}: ${formatSize([part.length, part.width], units)}${part.quantity > 1 ? `, ${part.quantity} off` : ''}`;
}

/**
 * A revision's drawing as line art on a faint grid: drag to pan, wheel or buttons to zoom, arrow
 * keys and + / − when focused; every part names itself and its size on hover or focus.
 */
export function DrawingView({
  analysis,
  units,
  label,
  selectedPart,
  onSelectPart,
}: {
  analysis: DrawingGeometry;
  units: Units;
  label: string;
  selectedPart?: string | null;
  onSelectPart?: (name: string) => void;
}) {
  const picture = useMemo(() => drawingPicture(analysis), [analysis]);
  const [box, setBox] = useState<ViewBox>(picture.viewBox);
  const [hovered, setHovered] = useState<string | null>(null);
  const [shownFor, setShownFor] = useState(picture);
  const svgRef = useRef<SVGSVGElement>(null);
  const drag = useRef<{ x: number; y: number; box: ViewBox } | null>(null);
  const gridId = useId();
  if (shownFor !== picture) {
    setShownFor(picture);
    setBox(picture.viewBox);
  }

  const mmPerPixel = () => box.width / (svgRef.current?.clientWidth || box.width);
  const zoom = (factor: number) => setBox((current) => zoomViewBox(current, factor));
  const onWheel = (event: WheelEvent<SVGSVGElement>) => {
    const rect = event.currentTarget.getBoundingClientRect();
    const scale = mmPerPixel();
    const focus: [number, number] = [
      box.x + (event.clientX - rect.left) * scale,
      box.y + (event.clientY - rect.top) * scale,
    ];
    setBox(zoomViewBox(box, event.deltaY > 0 ? ZOOM_STEP : 1 / ZOOM_STEP, focus));
  };
  const onPointerDown = (event: PointerEvent<SVGSVGElement>) => {
    drag.current = { x: event.clientX, y: event.clientY, box };
    event.currentTarget.setPointerCapture?.(event.pointerId);
  };
  const onPointerMove = (event: PointerEvent<SVGSVGElement>) => {
    const start = drag.current;
    if (!start) return;
    const scale = mmPerPixel();
    setBox(panViewBox(start.box, (start.x - event.clientX) * scale, (start.y - event.clientY) * scale));
  };
  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const step = box.width / 10;
    const moves: Record<string, [number, number]> = {
      ArrowLeft: [-step, 0],
      ArrowRight: [step, 0],
      ArrowUp: [0, -step],
      ArrowDown: [0, step],
    };
    const move = moves[event.key];
    if (move) setBox(panViewBox(box, move[0], move[1]));
    else if (event.key === '+' || event.key === '=') zoom(1 / ZOOM_STEP);
    else if (event.key === '-') zoom(ZOOM_STEP);
    else if (event.key === '0') setBox(picture.viewBox);
    else return;
    event.preventDefault();
  };

  const partsByName = new Map(analysis.parts.map((part) => [part.name, part]));
  const emphasised = hovered ?? selectedPart ?? null;
  const emphasisedPart = emphasised ? partsByName.get(emphasised) : undefined;
  const { textSize } = picture;

  return (
    <Box borderWidth="1px" borderColor="border" borderRadius="md" bg="white" overflow="hidden">
      <Flex justify="space-between" align="center" gap="3" px="3" py="2" borderBottomWidth="1px" flexWrap="wrap">
        <Text fontSize="sm" color="fg.muted" aria-live="polite" data-testid="drawing-caption">
          {emphasisedPart ? partLabel(emphasisedPart, units) : 'Point at a part to see its name and measured size.'}
        </Text>
        <HStack gap="1" role="group" aria-label="Zoom">
          <Button size="xs" variant="outline" onClick={() => zoom(1 / ZOOM_STEP)} aria-label="Zoom in">
            +
          </Button>
          <Button size="xs" variant="outline" onClick={() => zoom(ZOOM_STEP)} aria-label="Zoom out">
            −
          </Button>
          <Button size="xs" variant="outline" onClick={() => setBox(picture.viewBox)}>
            Fit
          </Button>
        </HStack>
      </Flex>
      <Box
        tabIndex={0}
        role="group"
        aria-label={`${label}. Arrow keys pan, plus and minus zoom, 0 fits the drawing.`}
        onKeyDown={onKeyDown}
        _focusVisible={{ outline: '2px solid', outlineColor: 'steel.500', outlineOffset: '-2px' }}
      >
        <svg
          ref={svgRef}
          role="img"
          aria-label={label}
          data-testid="drawing"
          data-viewbox={`${box.x} ${box.y} ${box.width} ${box.height}`}
          viewBox={`${box.x} ${box.y} ${box.width} ${box.height}`}
          style={{
            width: '100%',
            height: 'auto',
            maxHeight: '32rem',
            display: 'block',
            touchAction: 'none',
            cursor: 'grab',
          }}
          onWheel={onWheel}
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={() => (drag.current = null)}
          onPointerLeave={() => (drag.current = null)}
        >
          <defs>
            <pattern id={gridId} width={picture.gridStep} height={picture.gridStep} patternUnits="userSpaceOnUse">
              <path
                d={`M ${picture.gridStep} 0 L 0 0 0 ${picture.gridStep}`}
                fill="none"
                stroke={color('steel.100')}
                {...HAIRLINE}
              />
            </pattern>
          </defs>
          {/* Reaches well past the view box so the grid also fills the space either side of a narrow drawing. */}
          <rect
            x={box.x - box.width * 4}
            y={box.y - box.height * 4}
            width={box.width * 9}
            height={box.height * 9}
            fill={`url(#${gridId})`}
          />
          {picture.parts.map((part) => {
            const on = part.name === emphasised;
            const analysed = partsByName.get(part.name);
            return (
              <path
                key={part.key}
                d={part.path}
                data-part={part.name}
                data-emphasised={on || undefined}
                fillRule="evenodd"
                fill={on ? color('steel.100') : color('walnut.50')}
                stroke={on ? color('steel.700') : color('graphite')}
                {...HAIRLINE}
                strokeWidth={on ? 2 : 1}
                tabIndex={part.copy === 0 ? 0 : undefined}
                role={part.copy === 0 ? 'button' : undefined}
                aria-label={part.copy === 0 && analysed ? partLabel(analysed, units) : undefined}
                onPointerEnter={() => setHovered(part.name)}
                onPointerLeave={() => setHovered(null)}
                onFocus={() => setHovered(part.name)}
                onBlur={() => setHovered(null)}
                onClick={() => onSelectPart?.(part.name)}
                onKeyDown={(event) => {
                  if (event.key === 'Enter' || event.key === ' ') {
                    event.preventDefault();
                    onSelectPart?.(part.name);
                  }
                }}
                style={{ cursor: onSelectPart ? 'pointer' : undefined }}
              />
            );
          })}
          {picture.dimensions.map((dimension) => {
            const text =
              dimension.unit === 'deg' ? `${Math.round(dimension.mm * 10) / 10}°` : formatLength(dimension.mm, units);
            // A part's own length and width show while it is pointed at or selected: drawn for every
            // part at once they run over the neighbouring parts.
            if (dimension.partName !== null && dimension.partName !== emphasised) return null;
            return (
              <g key={dimension.key} data-dimension={dimension.key} pointerEvents="none">
                {dimension.partName !== null && (
                  <line
                    x1={dimension.from[0]}
                    y1={dimension.from[1]}
                    x2={dimension.to[0]}
                    y2={dimension.to[1]}
                    stroke={color('steel.700')}
                    {...HAIRLINE}
                  />
                )}
                <text
                  x={dimension.at[0]}
                  y={dimension.at[1]}
                  fontSize={textSize}
                  textAnchor="middle"
                  dominantBaseline="middle"
                  fill={color('graphite')}
                  transform={`rotate(${dimension.angle} ${dimension.at[0]} ${dimension.at[1]})`}
                  style={{ fontVariantNumeric: 'tabular-nums' }}
                >
                  {text}
                </text>
              </g>
            );
          })}
        </svg>
      </Box>
    </Box>
  );
}
