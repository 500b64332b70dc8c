import type { Edge } from './edge';

/**
 * Even-odd test against a closed loop of straight and bulge edges, arcs exact: the loop's region
 * is its chord polygon with each circular segment (between a chord and its arc) toggled, so the
 * test is the ray crossings of the chords plus one flip per segment holding the point. Points on
 * the boundary may fall either way.
 */
export function pointInLoop(x: number, y: number, edges: readonly Edge[]): boolean {
  let inside = false;
  for (const edge of edges) {
    const ax = edge.a.x;
    const ay = edge.a.y;
    const bx = edge.b.x;
    const by = edge.b.y;
    if (ay > y !== by > y && x < ((bx - ax) * (y - ay)) / (by - ay) + ax) inside = !inside;
    if (edge.bulge !== 0 && inCircularSegment(x, y, edge)) inside = !inside;
  }
  return inside;
}

// A positive bulge runs counter-clockwise, so its arc lies right of the chord a→b (DXF VERTEX
// group 42 [read]); the segment is the part of the arc's disc on that side.
function inCircularSegment(x: number, y: number, edge: Edge): boolean {
  const { a, b, bulge } = edge;
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const side = dx * (y - a.y) - dy * (x - a.x);
  if (bulge > 0 ? side >= 0 : side <= 0) return false;
  const offset = (1 - bulge * bulge) / (4 * bulge);
  const cx = (a.x + b.x) / 2 - dy * offset;
  const cy = (a.y + b.y) / 2 + dx * offset;
  const radius = (Math.hypot(dx, dy) * (1 + bulge * bulge)) / (4 * Math.abs(bulge));
  return Math.hypot(x - cx, y - cy) < radius;
}
