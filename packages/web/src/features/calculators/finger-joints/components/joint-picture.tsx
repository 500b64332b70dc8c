import { Box, Stack, Text } from '@chakra-ui/react';
import type { BoardName, JointPlan } from '@jigwright/core';
import { useId } from 'react';
import { formatLengthBoth, formatMm } from '../format';
import { boardPicture } from '../picture-geometry';

const color = (token: string) => `var(--chakra-colors-${token.replace('.', '-')})`;

/** A hairline whatever the scale: the picture is in mm and is stretched to the page width. */
const HAIRLINE = { vectorEffect: 'non-scaling-stroke', strokeWidth: 1 } as const;

function BoardDrawing({ plan, board }: { plan: JointPlan; board: BoardName }) {
  const picture = boardPicture(plan, board);
  const gridId = useId();
  const { viewBox, body, gridStep } = picture;
  const passes = plan.boards[board].passes.length;
  const label = `Board ${board}: ${plan.boards[board].pins.length} pins, ${plan.boards[board].slots.length} slots, ${passes} passes`;
  return (
    <Stack gap="1">
      <Text fontSize="sm" fontWeight="600" color="walnut.700">
        Board {board}{' '}
        <Text as="span" fontWeight="400" color="fg.muted">
          · starts with a {plan.boards[board].startsWith} · {passes} passes
        </Text>
      </Text>
      <svg
        role="img"
        aria-label={label}
        data-board={board}
        viewBox={`${viewBox.x} ${viewBox.y} ${viewBox.width} ${viewBox.height}`}
        style={{ width: '100%', height: 'auto', display: 'block' }}
      >
        <defs>
          <pattern id={gridId} width={gridStep} height={gridStep} x={0} y={0} patternUnits="userSpaceOnUse">
            <path d={`M ${gridStep} 0 L 0 0 0 ${gridStep}`} fill="none" stroke={color('steel.100')} {...HAIRLINE} />
          </pattern>
        </defs>
        <rect {...viewBox} fill="white" />
        <rect {...viewBox} fill={`url(#${gridId})`} />
        <rect {...body} fill={color('walnut.100')} stroke={color('walnut.700')} {...HAIRLINE} />
        {picture.pins.map((pin) => (
          <rect key={pin.x} {...pin} fill={color('walnut.100')} stroke={color('walnut.700')} {...HAIRLINE} />
        ))}
        {picture.passes.map(({ slot, pass, ...rect }) => (
          <rect
            key={`${slot}-${pass}`}
            {...rect}
            data-pass={`${slot}-${pass}`}
            fill={color('steel.500')}
            fillOpacity={0.18}
            stroke={color('steel.700')}
            {...HAIRLINE}
          >
            <title>{`Board ${board}, slot ${slot}, pass ${pass}: ${formatMm(rect.x)}`}</title>
          </rect>
        ))}
      </svg>
    </Stack>
  );
}

/** Both boards to scale across the width, each pass of the cutter drawn where it cuts. */
export function JointPicture({ plan }: { plan: JointPlan }) {
  return (
    <Box as="figure" m="0">
      <Stack gap="4">
        <BoardDrawing plan={plan} board="A" />
        <BoardDrawing plan={plan} board="B" />
      </Stack>
      <Text as="figcaption" mt="2" fontSize="sm" color="fg.muted">
        Ends of the two boards, to scale across the {formatLengthBoth(plan.width, plan.units)} width; blue outlines are
        the cutter's passes ({formatLengthBoth(plan.kerf, plan.units)} wide). The finger depth is only for the picture.
      </Text>
    </Box>
  );
}
