import type { AnalysedPart, DrawingAnalysis, PointMm } from '@jigwright/core';

/** An SVG view box in drawing millimetres with y flipped (SVG y runs down, drawings run up). */
export interface ViewBox {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** One copy of a part as drawn: outline and holes as one even-odd SVG path. */
export interface DrawnPart {
  key: string;
  name: string;
  /** The copy's number among the part's instances, 0 for the first. */
  copy: number;
  path: string;
}

/** A measured size drawn as a dimension line: ends, text position and text angle in SVG space. */
export interface DimensionLine {
  key: string;
  partName: string | null;
  from: PointMm;
  to: PointMm;
  at: PointMm;
  /** Text rotation in SVG degrees, so that it reads along the line. */
  angle: number;
  mm: number;
  unit: 'mm' | 'deg';
}

export interface DrawingPicture {
  viewBox: ViewBox;
  gridStep: number;
  /** Size of text on the drawing, mm, so labels keep their proportion to the parts. */
  textSize: number;
  parts: DrawnPart[];
  dimensions: DimensionLine[];
}

type DrawingGeometry = Pick<DrawingAnalysis, 'parts' | 'dimensions' | 'extents'>;

const toSvg = ([x, y]: PointMm): PointMm => [x, -y];

function rotateAbout([x, y]: PointMm, [cx, cy]: PointMm, degrees: number): PointMm {
  const r = (degrees * Math.PI) / 180;
  const dx = x - cx;
  const dy = y - cy;
  return [cx + dx * Math.cos(r) - dy * Math.sin(r), cy + dx * Math.sin(r) + dy * Math.cos(r)];
}

function ringPath(points: readonly PointMm[]): string {
  const svg = points.map(toSvg).map(([x, y]) => `${round(x)} ${round(y)}`);
  return svg.length ? `M ${svg.join(' L ')} Z` : '';
}

const round = (n: number) => Math.round(n * 100) / 100;

/** Places the first copy's rings at another copy's centre and angle. */
function copyRings(part: AnalysedPart, copy: number): PointMm[][] {
  const rings = [part.outline.points, ...part.holeOutlines.map((hole) => hole.points)];
  const first = part.instances[0];
  const instance = part.instances[copy];
  if (!first || !instance || copy === 0) return rings;
  const turn = instance.angle - first.angle;
  const [dx, dy] = [instance.centre[0] - first.centre[0], instance.centre[1] - first.centre[1]];
  return rings.map((ring) =>
    ring.map((point) => {
      const [x, y] = rotateAbout(point, first.centre, turn);
      return [x + dx, y + dy];
    }),
  );
}

/** A grid step of 1, 2.5 or 5 × a power of ten, about a twentieth of the drawing's larger side. */
export function gridStepFor(size: number): number {
  const rough = Math.max(size, 1) / 20;
  const power = 10 ** Math.floor(Math.log10(rough));
  return [1, 2.5, 5, 10].map((m) => m * power).find((step) => step >= rough) ?? 10 * power;
}

/** Length and width lines of a part's first copy, drawn along its minimum-area rectangle. */
function partDimensions(part: AnalysedPart, gap: number): DimensionLine[] {
  const first = part.instances[0];
  if (!first) return [];
  const { centre, angle } = first;
  const along = (u: number, v: number): PointMm => rotateAbout([centre[0] + u, centre[1] + v], centre, angle);
  const textAngle = -(angle > 90 ? angle - 180 : angle);
  const below = -(part.width / 2 + gap);
  const beside = part.length / 2 + gap;
  return [
    {
      key: `${part.name}-length`,
      partName: part.name,
      from: toSvg(along(-part.length / 2, below)),
      to: toSvg(along(part.length / 2, below)),
      at: toSvg(along(0, below - gap * 0.6)),
      angle: textAngle,
      mm: part.length,
      unit: 'mm',
    },
    {
      key: `${part.name}-width`,
      partName: part.name,
      from: toSvg(along(beside, -part.width / 2)),
      to: toSvg(along(beside, part.width / 2)),
      at: toSvg(along(beside + gap * 0.6, 0)),
      angle: textAngle - 90,
      mm: part.width,
      unit: 'mm',
    },
  ];
}

/** Everything the drawing view draws, in SVG coordinates (mm, y down). */
export function drawingPicture(analysis: DrawingGeometry): DrawingPicture {
  const extents = analysis.extents ?? { min: [0, 0], max: [100, 100] };
  const size = Math.max(extents.max[0] - extents.min[0], extents.max[1] - extents.min[1], 1);
  const textSize = size / 45;
  const gap = textSize * 1.6;
  const margin = gap * 4;
  const viewBox = {
    x: round(extents.min[0] - margin),
    y: round(-extents.max[1] - margin),
    width: round(extents.max[0] - extents.min[0] + 2 * margin),
    height: round(extents.max[1] - extents.min[1] + 2 * margin),
  };
  const parts = analysis.parts.flatMap((part) =>
    part.instances.map((_, copy) => ({
      key: `${part.name}-${copy}`,
      name: part.name,
      copy,
      path: copyRings(part, copy).map(ringPath).join(' '),
    })),
  );
  const drawingDimensions = analysis.dimensions.flatMap((dimension, i): DimensionLine[] =>
    dimension.at
      ? [
          {
            key: `dimension-${i}`,
            partName: null,
            from: toSvg(dimension.at),
            to: toSvg(dimension.at),
            at: toSvg(dimension.at),
            angle: 0,
            mm: dimension.measured,
            unit: dimension.unit,
          },
        ]
      : [],
  );
  return {
    viewBox,
    gridStep: gridStepFor(size),
    textSize: round(textSize),
    parts,
    dimensions: [...analysis.parts.flatMap((part) => partDimensions(part, gap)), ...drawingDimensions],
  };
}

/** The view box zoomed by `factor` (below 1 zooms in) keeping `focus` where it is on screen. */
export function zoomViewBox(box: ViewBox, factor: number, focus: PointMm = centreOf(box)): ViewBox {
  return {
    x: focus[0] - (focus[0] - box.x) * factor,
    y: focus[1] - (focus[1] - box.y) * factor,
    width: box.width * factor,
    height: box.height * factor,
  };
}

/** The view box moved by a distance in drawing millimetres. */
export function panViewBox(box: ViewBox, dx: number, dy: number): ViewBox {
  return { ...box, x: box.x + dx, y: box.y + dy };
}

export function centreOf(box: ViewBox): PointMm {
  return [box.x + box.width / 2, box.y + box.height / 2];
}
