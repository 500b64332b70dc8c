import type { AnalysedPart, PointMm } from '@jigwright/core';
import type { PlanThumbnail } from './entities/plan.entity';

/** A drawing's part outlines, as placed on that drawing (mm). */
export type OutlineSet = ReadonlyArray<readonly PointMm[]>;

/** Room between drawings laid side by side, as a share of the thumbnail's height. */
const GAP_SHARE = 0.05;
/** Vertices closer than this share of the thumbnail's larger side to the simplified line are dropped. */
const TOLERANCE_SHARE = 0.004;

function boundsOf(outlines: OutlineSet): { minX: number; minY: number; maxX: number; maxY: number } {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const outline of outlines) {
    for (const [x, y] of outline) {
      minX = Math.min(minX, x);
      minY = Math.min(minY, y);
      maxX = Math.max(maxX, x);
      maxY = Math.max(maxY, y);
    }
  }
  return { minX, minY, maxX, maxY };
}

function distanceToSegment([px, py]: PointMm, [ax, ay]: PointMm, [bx, by]: PointMm): number {
  const dx = bx - ax;
  const dy = by - ay;
  const lengthSquared = dx * dx + dy * dy;
  const t = lengthSquared === 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / lengthSquared));
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}

/** Ramer–Douglas–Peucker on an open run of points; keeps both ends. */
function simplifyRun(points: readonly PointMm[], tolerance: number): PointMm[] {
  if (points.length < 3) return [...points];
  const first = points[0]!;
  const last = points[points.length - 1]!;
  let farthest = 0;
  let index = 0;
  for (let i = 1; i < points.length - 1; i++) {
    const distance = distanceToSegment(points[i]!, first, last);
    if (distance > farthest) {
      farthest = distance;
      index = i;
    }
  }
  if (farthest <= tolerance) return [first, last];
  return [
    ...simplifyRun(points.slice(0, index + 1), tolerance).slice(0, -1),
    ...simplifyRun(points.slice(index), tolerance),
  ];
}

/** A closed polygon simplified, split at its vertex farthest from the first so that both halves are open runs. */
export function simplifyPolygon(points: readonly PointMm[], tolerance: number): PointMm[] {
  if (points.length <= 4) return [...points];
  const start = points[0]!;
  let split = 1;
  let farthest = -1;
  points.forEach(([x, y], i) => {
    const distance = Math.hypot(x - start[0], y - start[1]);
    if (distance > farthest) {
      farthest = distance;
      split = i;
    }
  });
  const firstHalf = simplifyRun(points.slice(0, split + 1), tolerance);
  const secondHalf = simplifyRun([...points.slice(split), start], tolerance);
  return [...firstHalf.slice(0, -1), ...secondHalf.slice(0, -1)];
}

const round = (value: number) => Math.round(value * 10) / 10;

/**
 * The library card's picture of a revision: each drawing's part outlines where the drawing puts
 * them, drawings side by side left to right, shifted to start at the origin, simplified and
 * rounded to 0.1 mm. Null when no drawing has a part.
 */
export function buildThumbnail(drawings: readonly OutlineSet[]): PlanThumbnail | null {
  const withParts = drawings.filter((outlines) => outlines.some((outline) => outline.length > 0));
  if (withParts.length === 0) return null;
  const height = Math.max(...withParts.map((outlines) => boundsOf(outlines)).map((b) => b.maxY - b.minY));
  const placed: PointMm[][] = [];
  let offsetX = 0;
  for (const outlines of withParts) {
    const bounds = boundsOf(outlines);
    for (const outline of outlines) {
      placed.push(outline.map(([x, y]) => [x - bounds.minX + offsetX, y - bounds.minY]));
    }
    offsetX += bounds.maxX - bounds.minX + height * GAP_SHARE;
  }
  const all = boundsOf(placed);
  const tolerance = Math.max(all.maxX - all.minX, all.maxY - all.minY) * TOLERANCE_SHARE;
  return {
    extents: { min: [round(all.minX), round(all.minY)], max: [round(all.maxX), round(all.maxY)] },
    outlines: placed.map((outline) =>
      simplifyPolygon(outline, tolerance).map(([x, y]): [number, number] => [round(x), round(y)]),
    ),
  };
}

/**
 * Every copy of every part of a drawing: the analysis keeps the first copy's outline and, for each
 * copy, the centre and direction of its bounding rectangle, so the other copies are the first one
 * turned and moved onto theirs.
 */
export function outlinesOfAnalysis(analysis: {
  parts: ReadonlyArray<Pick<AnalysedPart, 'outline' | 'instances'>>;
}): PointMm[][] {
  return analysis.parts.flatMap((part) => {
    const first = part.instances[0];
    if (!first) return [part.outline.points];
    return part.instances.map((instance) => {
      const turn = ((instance.angle - first.angle) * Math.PI) / 180;
      const cos = Math.cos(turn);
      const sin = Math.sin(turn);
      const [cx, cy] = first.centre;
      const [tx, ty] = instance.centre;
      return part.outline.points.map(([x, y]): PointMm => {
        const dx = x - cx;
        const dy = y - cy;
        return [tx + dx * cos - dy * sin, ty + dx * sin + dy * cos];
      });
    });
  });
}
