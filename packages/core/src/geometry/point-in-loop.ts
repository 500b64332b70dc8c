import type { EdgeRange, EdgeStore } from './edge-store';

/**
 * Even-odd test against a closed loop of straight and bulge edges, arcs exact: the loop's region
 * is its chord polygon with each circular segment (between a chord and its arc) toggled, so the
 * test is the ray crossings of the chords plus one flip per segment holding the point. Points on
 * the boundary may fall either way.
 */
export function pointInLoop(x: number, y: number, store: EdgeStore, loop: EdgeRange): boolean {
  let inside = false;
  for (let i = loop.start; i < loop.end; i += 1) {
    const ax = store.ax(i);
    const ay = store.ay(i);
    const bx = store.bx(i);
    const by = store.by(i);
    if (ay > y !== by > y && x < ((bx - ax) * (y - ay)) / (by - ay) + ax) inside = !inside;
    const bulge = store.bulge(i);
    if (bulge !== 0 && inCircularSegment(x, y, ax, ay, bx, by, bulge)) inside = !inside;
  }
  return inside;
}

// A positive bulge runs counter-clockwise, so its arc lies right of the chord a→b (DXF VERTEX
// group 42 [read]); the segment is the part of the arc's disc on that side.
function inCircularSegment(
  x: number,
  y: number,
  ax: number,
  ay: number,
  bx: number,
  by: number,
  bulge: number,
): boolean {
  const dx = bx - ax;
  const dy = by - ay;
  const side = dx * (y - ay) - dy * (x - ax);
  if (bulge > 0 ? side >= 0 : side <= 0) return false;
  const offset = (1 - bulge * bulge) / (4 * bulge);
  const cx = (ax + bx) / 2 - dy * offset;
  const cy = (ay + by) / 2 + dx * offset;
  const radius = (Math.hypot(dx, dy) * (1 + bulge * bulge)) / (4 * Math.abs(bulge));
  return Math.hypot(x - cx, y - cy) < radius;
}
