import type { Vec } from './vec';

/** Even-odd ray test; points on the boundary may fall either way. */
export function pointInPolygon(p: Vec, polygon: readonly Vec[]): boolean {
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i, i += 1) {
    const a = polygon[i] as Vec;
    const b = polygon[j] as Vec;
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/** Shoelace area, positive counter-clockwise. */
export function polygonSignedArea(polygon: readonly Vec[]): number {
  let sum = 0;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i, i += 1) {
    const a = polygon[j] as Vec;
    const b = polygon[i] as Vec;
    sum += a.x * b.y - b.x * a.y;
  }
  return sum / 2;
}
