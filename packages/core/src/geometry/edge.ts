import { apply, determinant, uniformScale, type Affine } from './affine';
import type { Bounds } from './bounds';
import { bulgeArc, type BulgeArc } from './bulge';
import type { Vec } from './vec';

/** A straight (bulge 0) or circular (bulge ≠ 0, DXF bulge convention) piece of an outline. */
export interface Edge {
  a: Vec;
  b: Vec;
  bulge: number;
}

/** Largest distance between a drawn chord and its true arc when curves are turned into points. */
export const DEFAULT_CHORD_TOLERANCE = 0.02;
const MAX_SEGMENTS_PER_TURN = 256;
const MIN_SEGMENTS_PER_TURN = 16;

export function reverseEdge(edge: Edge): Edge {
  return { a: edge.b, b: edge.a, bulge: -edge.bulge };
}

/** The circle of a bulge edge, worked out once by callers that take several measures of it. */
export function edgeArc(edge: Edge): BulgeArc {
  return bulgeArc(edge.a, edge.b, edge.bulge);
}

/** Length of the edge, arcs exact (r·|θ|); `arc` is the edge's `edgeArc` when already known. */
export function edgeLength(edge: Edge, arc?: BulgeArc): number {
  const chord = Math.hypot(edge.b.x - edge.a.x, edge.b.y - edge.a.y);
  if (edge.bulge === 0 || chord === 0) return chord;
  const { radius, sweep } = arc ?? edgeArc(edge);
  return radius * Math.abs(sweep);
}

/**
 * The edge's share of a loop's signed area (shoelace term plus the circular segment between
 * chord and arc, r²/2·(θ − sin θ)); summed over a closed loop it gives the exact area,
 * positive counter-clockwise.
 */
export function edgeAreaTerm(edge: Edge, arc?: BulgeArc): number {
  const shoelace = (edge.a.x * edge.b.y - edge.b.x * edge.a.y) / 2;
  if (edge.bulge === 0) return shoelace;
  const { radius, sweep } = arc ?? edgeArc(edge);
  const theta = Math.abs(sweep);
  return shoelace + Math.sign(edge.bulge) * ((radius * radius) / 2) * (theta - Math.sin(theta));
}

/** Exact range of the edge's projection on the unit direction (ux, uy). */
export function edgeProjection(edge: Edge, ux: number, uy: number, arc?: BulgeArc): [number, number] {
  const pa = edge.a.x * ux + edge.a.y * uy;
  const pb = edge.b.x * ux + edge.b.y * uy;
  let min = Math.min(pa, pb);
  let max = Math.max(pa, pb);
  if (edge.bulge !== 0) {
    const { centre, radius, startAngle, sweep } = arc ?? edgeArc(edge);
    const along = centre.x * ux + centre.y * uy;
    const direction = Math.atan2(uy, ux);
    if (sweepContains(startAngle, sweep, direction)) max = Math.max(max, along + radius);
    if (sweepContains(startAngle, sweep, direction + Math.PI)) min = Math.min(min, along - radius);
  }
  return [min, max];
}

/** Exact bounding box of the edge: `edgeProjection` on the axes, with the arc worked out once. */
export function edgeBounds(edge: Edge, arc?: BulgeArc): Bounds {
  const { a, b } = edge;
  let minX = Math.min(a.x, b.x);
  let maxX = Math.max(a.x, b.x);
  let minY = Math.min(a.y, b.y);
  let maxY = Math.max(a.y, b.y);
  if (edge.bulge !== 0) {
    const { centre, radius, startAngle, sweep } = arc ?? edgeArc(edge);
    if (sweepContains(startAngle, sweep, 0)) maxX = Math.max(maxX, centre.x + radius);
    if (sweepContains(startAngle, sweep, Math.PI)) minX = Math.min(minX, centre.x - radius);
    if (sweepContains(startAngle, sweep, Math.PI / 2)) maxY = Math.max(maxY, centre.y + radius);
    if (sweepContains(startAngle, sweep, Math.PI / 2 + Math.PI)) minY = Math.min(minY, centre.y - radius);
  }
  return { minX, minY, maxX, maxY };
}

function sweepContains(start: number, sweep: number, angle: number): boolean {
  const turn = 2 * Math.PI;
  const from = sweep >= 0 ? start : start + sweep;
  const offset = (((angle - from) % turn) + turn) % turn;
  return offset <= Math.abs(sweep) + 1e-12;
}

/** Number of chords that keep an arc of this radius and sweep within the chord tolerance. */
export function arcSegmentCount(radius: number, sweep: number, chordTolerance = DEFAULT_CHORD_TOLERANCE): number {
  const ratio = Math.min(1, chordTolerance / Math.max(radius, 1e-12));
  const step = 2 * Math.acos(1 - ratio);
  const perTurn = Math.min(MAX_SEGMENTS_PER_TURN, Math.max(MIN_SEGMENTS_PER_TURN, Math.ceil((2 * Math.PI) / step)));
  return Math.max(1, Math.ceil((perTurn * Math.abs(sweep)) / (2 * Math.PI)));
}

/** Points along the edge from its start, excluding its end point (so loops concatenate cleanly). */
export function sampleEdge(edge: Edge, chordTolerance = DEFAULT_CHORD_TOLERANCE): Vec[] {
  const flat: number[] = [];
  appendEdgeSamples(edge, flat, chordTolerance);
  const points: Vec[] = [];
  for (let i = 0; i < flat.length; i += 2) points.push({ x: flat[i] as number, y: flat[i + 1] as number });
  return points;
}

/**
 * `sampleEdge` appending x, y pairs to a flat list the caller owns: large drawings hold millions
 * of polygon points, and plain numbers spare the collector an object for each.
 */
export function appendEdgeSamples(edge: Edge, flat: number[], chordTolerance: number): void {
  flat.push(edge.a.x, edge.a.y);
  if (edge.bulge === 0) return;
  const { centre, radius, startAngle, sweep } = bulgeArc(edge.a, edge.b, edge.bulge);
  const count = arcSegmentCount(radius, sweep, chordTolerance);
  for (let i = 1; i < count; i += 1) {
    const angle = startAngle + (sweep * i) / count;
    flat.push(centre.x + radius * Math.cos(angle), centre.y + radius * Math.sin(angle));
  }
}

/**
 * The edge under a transform. Similarity transforms keep arcs as arcs (a mirror reverses the
 * bulge's sense); a stretch turns an arc into an elliptical one, which becomes straight chords.
 */
export function transformEdge(edge: Edge, t: Affine): Edge[] {
  if (edge.bulge === 0 || uniformScale(t) !== undefined) {
    return [{ a: apply(t, edge.a), b: apply(t, edge.b), bulge: determinant(t) < 0 ? -edge.bulge : edge.bulge }];
  }
  const points = sampleEdge(edge).map((p) => apply(t, p));
  points.push(apply(t, edge.b));
  return chordsThrough(points);
}

/** Straight edges joining consecutive points. */
export function chordsThrough(points: readonly Vec[]): Edge[] {
  const edges: Edge[] = [];
  for (let i = 1; i < points.length; i += 1) {
    const a = points[i - 1];
    const b = points[i];
    if (a && b) edges.push({ a, b, bulge: 0 });
  }
  return edges;
}
