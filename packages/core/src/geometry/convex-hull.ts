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
