import type { Vec } from './vec';

/** The circular arc a polyline bulge describes between two vertices. */
export interface BulgeArc {
  centre: Vec;
  radius: number;
  /** Angle of the start vertex seen from the centre, radians. */
  startAngle: number;
  /** Included angle, radians: positive counter-clockwise, θ = 4·atan(bulge). */
  sweep: number;
}

/** Numbers per arc in an arc table: centre x, centre y, radius, start angle, sweep. */
export const ARC_STRIDE = 5;

/**
 * Arc of a bulge segment. AutoCAD DXF Reference, VERTEX group 42: "the tangent of one fourth the
 * included angle … negative if the arc goes clockwise"; centre offset from the chord midpoint is
 * (c/2)·(1 − b²)/(2b) along the chord's left normal, radius c·(1 + b²)/(4|b|) [derived].
 */
export function bulgeArc(a: Vec, b: Vec, bulge: number): BulgeArc {
  const arc = new Float64Array(ARC_STRIDE);
  writeBulgeArc(a.x, a.y, b.x, b.y, bulge, arc, 0);
  return {
    centre: { x: arc[0] as number, y: arc[1] as number },
    radius: arc[2] as number,
    startAngle: arc[3] as number,
    sweep: arc[4] as number,
  };
}

/**
 * `bulgeArc` written into a table at `at` (centre x, centre y, radius, start angle, sweep), for
 * callers that work out the arcs of many edges without an object for each.
 */
export function writeBulgeArc(
  ax: number,
  ay: number,
  bx: number,
  by: number,
  bulge: number,
  table: Float64Array,
  at: number,
): void {
  const dx = bx - ax;
  const dy = by - ay;
  const offset = (1 - bulge * bulge) / (4 * bulge);
  const cx = (ax + bx) / 2 - dy * offset;
  const cy = (ay + by) / 2 + dx * offset;
  const chord = Math.hypot(dx, dy);
  table[at] = cx;
  table[at + 1] = cy;
  table[at + 2] = (chord * (1 + bulge * bulge)) / (4 * Math.abs(bulge));
  table[at + 3] = Math.atan2(ay - cy, ax - cx);
  table[at + 4] = 4 * Math.atan(bulge);
}

/** Bulge of an arc with the given included angle (radians, positive counter-clockwise). */
export function bulgeFromSweep(sweep: number): number {
  return Math.tan(sweep / 4);
}

/** Height of the arc above its chord: |b|·c/2. */
export function bulgeSagitta(a: Vec, b: Vec, bulge: number): number {
  return (Math.abs(bulge) * Math.hypot(b.x - a.x, b.y - a.y)) / 2;
}
