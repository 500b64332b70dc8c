import { convexHullOfPairs } from '../geometry/convex-hull';
import type { BulgeArc } from '../geometry/bulge';
import { edgeArc, edgeProjection, type Edge } from '../geometry/edge';
import { minAreaRectangleOfPairs, normaliseHalfTurn } from '../geometry/min-area-rectangle';
import type { Vec } from '../geometry/vec';
import { loopPolygon, type MeasuredLoop } from './loop-geometry';

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
 * the outline's polygon, then the sides re-measured exactly on the edges, so arcs do not come
 * out a chord short), area as outline minus holes and perimeter of the outline, arcs exact.
 */
export function measurePart(
  outline: MeasuredLoop,
  holes: readonly MeasuredLoop[],
  options: { chordTolerance: number },
): PartMeasure {
  const rect = minAreaRectangleOfPairs(convexHullOfPairs(loopPolygon(outline, options.chordTolerance)));
  const ux = Math.cos(rect.angle);
  const uy = Math.sin(rect.angle);
  const edges = outline.loop.edges;
  const arcs = edges.map((edge) => (edge.bulge === 0 ? undefined : edgeArc(edge)));
  const [u0, u1] = projection(edges, arcs, ux, uy);
  const [v0, v1] = projection(edges, arcs, -uy, ux);
  const cu = (u0 + u1) / 2;
  const cv = (v0 + v1) / 2;
  const holeArea = holes.reduce((sum, hole) => sum + Math.abs(hole.signedArea), 0);
  const alongU = u1 - u0 >= v1 - v0;
  return {
    length: Math.max(u1 - u0, v1 - v0),
    width: Math.min(u1 - u0, v1 - v0),
    angle: alongU ? rect.angle : normaliseHalfTurn(rect.angle + Math.PI / 2),
    centre: { x: cu * ux - cv * uy, y: cu * uy + cv * ux },
    area: Math.abs(outline.signedArea) - holeArea,
    perimeter: outline.length,
  };
}

function projection(
  edges: readonly Edge[],
  arcs: readonly (BulgeArc | undefined)[],
  ux: number,
  uy: number,
): [number, number] {
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < edges.length; i += 1) {
    const [lo, hi] = edgeProjection(edges[i] as Edge, ux, uy, arcs[i]);
    min = Math.min(min, lo);
    max = Math.max(max, hi);
  }
  return [min, max];
}
