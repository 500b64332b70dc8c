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

/**
 * Arc of a bulge segment. AutoCAD DXF Reference, VERTEX group 42: "the tangent of one fourth the
 * included angle … negative if the arc goes clockwise"; centre offset from the chord midpoint is
 * (c/2)·(1 − b²)/(2b) along the chord's left normal, radius c·(1 + b²)/(4|b|) [derived].
 */
export function bulgeArc(a: Vec, b: Vec, bulge: number): BulgeArc {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const offset = (1 - bulge * bulge) / (4 * bulge);
  const centre = { x: (a.x + b.x) / 2 - dy * offset, y: (a.y + b.y) / 2 + dx * offset };
  const chord = Math.hypot(dx, dy);
  return {
    centre,
    radius: (chord * (1 + bulge * bulge)) / (4 * Math.abs(bulge)),
    startAngle: Math.atan2(a.y - centre.y, a.x - centre.x),
    sweep: 4 * Math.atan(bulge),
  };
}

/** Bulge of an arc with the given included angle (radians, positive counter-clockwise). */
export function bulgeFromSweep(sweep: number): number {
  return Math.tan(sweep / 4);
}

/** Height of the arc above its chord: |b|·c/2. */
export function bulgeSagitta(a: Vec, b: Vec, bulge: number): number {
  return (Math.abs(bulge) * Math.hypot(b.x - a.x, b.y - a.y)) / 2;
}
