import type { PlanThumbnail } from '../api/types';

const color = (token: string) => `var(--chakra-colors-${token.replace('.', '-')})`;

/** The SVG path of the thumbnail's outlines, y flipped so that the drawing reads y up. */
export function thumbnailPath({ extents, outlines }: PlanThumbnail): string {
  const top = extents.max[1];
  return outlines
    .filter((ring) => ring.length > 1)
    .map((ring) => `M ${ring.map(([x, y]) => `${x - extents.min[0]} ${top - y}`).join(' L ')} Z`)
    .join(' ');
}

/** A small line drawing of a plan's parts, for its card. */
export function PartsThumbnail({ thumbnail, title }: { thumbnail: PlanThumbnail | null; title: string }) {
  if (!thumbnail) {
    return (
      <svg
        role="img"
        aria-label={`${title}: no drawing yet`}
        viewBox="0 0 160 90"
        style={{ width: '100%', display: 'block' }}
      >
        <rect width="160" height="90" fill={color('walnut.50')} />
      </svg>
    );
  }
  const width = Math.max(thumbnail.extents.max[0] - thumbnail.extents.min[0], 1);
  const height = Math.max(thumbnail.extents.max[1] - thumbnail.extents.min[1], 1);
  const margin = Math.max(width, height) * 0.06;
  return (
    <svg
      role="img"
      aria-label={`${title}: drawing of ${thumbnail.outlines.length} parts`}
      viewBox={`${-margin} ${-margin} ${width + 2 * margin} ${height + 2 * margin}`}
      preserveAspectRatio="xMidYMid meet"
      style={{ width: '100%', aspectRatio: '16 / 9', display: 'block', background: 'white' }}
    >
      <path
        d={thumbnailPath(thumbnail)}
        fill={color('walnut.50')}
        fillRule="evenodd"
        stroke={color('walnut.700')}
        strokeWidth={1}
        vectorEffect="non-scaling-stroke"
      />
    </svg>
  );
}
