import type { Vec } from './vec';

/** Convex hull, counter-clockwise, without collinear points (Andrew's monotone chain). */
export function convexHull(points: readonly Vec[]): Vec[] {
  const flat: number[] = [];
  for (const p of points) flat.push(p.x, p.y);
  const hull = convexHullOfPairs(flat);
  const out: Vec[] = [];
  for (let i = 0; i < hull.length; i += 2) out.push({ x: hull[i] as number, y: hull[i + 1] as number });
  return out;
}

/** `convexHull` of flat x, y pairs, as flat pairs: outlines of many points need no object per point. */
export function convexHullOfPairs(flat: readonly number[]): number[] {
  const n = flat.length >> 1;
  if (n >= 3 && runsRoundConvexly(flat)) return fromLowest(flat);
  const order: number[] = [];
  for (let i = 0; i < n; i += 1) order.push(i);
  order.sort(
    (i, j) =>
      (flat[2 * i] as number) - (flat[2 * j] as number) || (flat[2 * i + 1] as number) - (flat[2 * j + 1] as number),
  );
  if (n < 3) return pairsOf(flat, order);
  const lower: number[] = [];
  for (const p of order) {
    while (
      lower.length >= 2 &&
      turn(flat, lower[lower.length - 2] as number, lower[lower.length - 1] as number, p) <= 0
    )
      lower.pop();
    lower.push(p);
  }
  const upper: number[] = [];
  for (let k = n - 1; k >= 0; k -= 1) {
    const p = order[k] as number;
    while (
      upper.length >= 2 &&
      turn(flat, upper[upper.length - 2] as number, upper[upper.length - 1] as number, p) <= 0
    )
      upper.pop();
    upper.push(p);
  }
  lower.pop();
  upper.pop();
  return pairsOf(flat, lower.concat(upper));
}

/**
 * Whether the points, in the order given, run counter-clockwise once round a strictly convex
 * polygon: then they are their own hull, found in one pass instead of a sort (most part
 * outlines are convex). Every turn must clear a margin far above the rounding of `turn`, so that
 * the monotone chain could not have decided any of its tests differently: the smallest triangle
 * on a convex polygon's vertices has three consecutive ones. Once round: the X direction of the
 * edges changes sign exactly twice.
 */
function runsRoundConvexly(flat: readonly number[]): boolean {
  const n = flat.length >> 1;
  let size = 0;
  for (const v of flat) size = Math.max(size, Math.abs(v));
  const margin = 1e-12 * size * size;
  let changes = 0;
  let sign = 0;
  for (let i = 0; i < n; i += 1) {
    const j = (i + 1) % n;
    if (!(turn(flat, i, j, (i + 2) % n) > margin)) return false;
    const dx = (flat[2 * j] as number) - (flat[2 * i] as number);
    const s = Math.sign(dx);
    if (s !== 0 && s !== sign) {
      if (sign !== 0) changes += 1;
      sign = s;
    }
  }
  // The loop counted the changes between the first and the last non-zero sign, not round the end.
  let first = 0;
  for (let i = 0; i < n && first === 0; i += 1)
    first = Math.sign((flat[2 * ((i + 1) % n)] as number) - (flat[2 * i] as number));
  if (first !== sign) changes += 1;
  return changes === 2;
}

/** The pairs rotated to start at the lowest x (then lowest y), where the monotone chain starts. */
function fromLowest(flat: readonly number[]): number[] {
  const n = flat.length >> 1;
  let start = 0;
  for (let i = 1; i < n; i += 1) {
    const x = flat[2 * i] as number;
    const y = flat[2 * i + 1] as number;
    const sx = flat[2 * start] as number;
    if (x < sx || (x === sx && y < (flat[2 * start + 1] as number))) start = i;
  }
  return flat.slice(2 * start).concat(flat.slice(0, 2 * start));
}

/** Cross product of (a − o) × (b − o) for points given by their index among the pairs. */
function turn(flat: readonly number[], o: number, a: number, b: number): number {
  const ox = flat[2 * o] as number;
  const oy = flat[2 * o + 1] as number;
  return (
    ((flat[2 * a] as number) - ox) * ((flat[2 * b + 1] as number) - oy) -
    ((flat[2 * a + 1] as number) - oy) * ((flat[2 * b] as number) - ox)
  );
}

function pairsOf(flat: readonly number[], indices: readonly number[]): number[] {
  const out: number[] = [];
  for (const i of indices) out.push(flat[2 * i] as number, flat[2 * i + 1] as number);
  return out;
}
