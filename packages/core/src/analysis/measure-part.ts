import { ARC_STRIDE } from '../geometry/bulge';
import { convexHullOfPairs } from '../geometry/convex-hull';
import { rangeArcs, widenByProjection } from '../geometry/edge';
import type { EdgeRange, EdgeStore } from '../geometry/edge-store';
import { minAreaRectangleOfPairs, normaliseHalfTurn } from '../geometry/min-area-rectangle';
import type { Vec } from '../geometry/vec';
import { loopPolygon, type MeasuredLoop } from './loop-geometry';
import type { OutlineDirections } from './outline-directions';

export interface PartMeasure {
  length: number;
  width: number;
  /** Radians in [0, π). */
  angle: number;
  centre: Vec;
  area: number;
  perimeter: number;
}

/**
 * Length × width of the minimum-area rectangle (direction from rotating calipers on the hull of
 * the outline's polygon, or from `directions` for a copy of an outline already measured; then
 * the sides re-measured exactly on the edges, so arcs do not come out a chord short), area as
 * outline minus holes and perimeter of the outline, arcs exact.
 */
export function measurePart(
  store: EdgeStore,
  outline: MeasuredLoop,
  holes: readonly MeasuredLoop[],
  options: { chordTolerance: number; directions?: OutlineDirections },
): PartMeasure {
  const range = outline.loop.range;
  const arcs = rangeArcs(store, range);
  let angle = options.directions?.find(outline);
  if (angle === undefined) {
    // An outline kept the way it was chained samples its polygon from the same edges and arcs.
    const polygonArcs = outline.chained === range ? arcs : undefined;
    const polygon = loopPolygon(store, outline, options.chordTolerance, polygonArcs);
    angle = minAreaRectangleOfPairs(convexHullOfPairs(polygon)).angle;
    options.directions?.add(outline, angle);
  }
  const ux = Math.cos(angle);
  const uy = Math.sin(angle);
  const u = projection(store, range, arcs, ux, uy);
  const v = projection(store, range, arcs, -uy, ux);
  const u0 = u[0] as number;
  const u1 = u[1] as number;
  const v0 = v[0] as number;
  const v1 = v[1] as number;
  const cu = (u0 + u1) / 2;
  const cv = (v0 + v1) / 2;
  const holeArea = holes.reduce((sum, hole) => sum + Math.abs(hole.signedArea), 0);
  const alongU = u1 - u0 >= v1 - v0;
  return {
    length: Math.max(u1 - u0, v1 - v0),
    width: Math.min(u1 - u0, v1 - v0),
    angle: alongU ? angle : normaliseHalfTurn(angle + Math.PI / 2),
    centre: { x: cu * ux - cv * uy, y: cu * uy + cv * ux },
    area: Math.abs(outline.signedArea) - holeArea,
    perimeter: outline.length,
  };
}

function projection(store: EdgeStore, range: EdgeRange, arcs: Float64Array, ux: number, uy: number): Float64Array {
  const extent = Float64Array.of(Infinity, -Infinity);
  const direction = Math.atan2(uy, ux);
  for (let i = range.start; i < range.end; i += 1) {
    widenByProjection(store, i, ux, uy, direction, arcs, (i - range.start) * ARC_STRIDE, extent);
  }
  return extent;
}
