import { applyX, applyY, determinant, uniformScale, type Affine } from './affine';
import { ARC_STRIDE, writeBulgeArc } from './bulge';
import type { EdgeRange, EdgeStore } from './edge-store';
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

/** Arc of edge `i` of the store written into `table` at `at`, as `writeBulgeArc` lays it out. */
export function writeEdgeArc(store: EdgeStore, i: number, table: Float64Array, at: number): void {
  writeBulgeArc(store.ax(i), store.ay(i), store.bx(i), store.by(i), store.bulge(i), table, at);
}

/**
 * The arcs of the edges of a range, worked out once for callers that take several measures of
 * them: edge `range.start + k` at `k · ARC_STRIDE`; straight edges are left as zeros.
 */
export function rangeArcs(store: EdgeStore, range: EdgeRange): Float64Array {
  const table = new Float64Array((range.end - range.start) * ARC_STRIDE);
  for (let i = range.start; i < range.end; i += 1) {
    if (store.bulge(i) !== 0) writeEdgeArc(store, i, table, (i - range.start) * ARC_STRIDE);
  }
  return table;
}

/** Length of edge `i`, arcs exact (r·|θ|); `arcs` at `at` holds its arc when it is one. */
export function edgeLength(store: EdgeStore, i: number, arcs: Float64Array, at: number): number {
  const dx = store.bx(i) - store.ax(i);
  const dy = store.by(i) - store.ay(i);
  if (store.bulge(i) === 0) return Math.hypot(dx, dy);
  // An arc whose ends meet has no length; the chord's own length is not needed otherwise.
  if (dx === 0 && dy === 0) return 0;
  return (arcs[at + 2] as number) * Math.abs(arcs[at + 4] as number);
}

/**
 * Edge `i`'s share of a loop's signed area (shoelace term plus the circular segment between
 * chord and arc, r²/2·(θ − sin θ)); summed over a closed loop it gives the exact area,
 * positive counter-clockwise.
 */
export function edgeAreaTerm(store: EdgeStore, i: number, arcs: Float64Array, at: number): number {
  const shoelace = (store.ax(i) * store.by(i) - store.bx(i) * store.ay(i)) / 2;
  const bulge = store.bulge(i);
  if (bulge === 0) return shoelace;
  const radius = arcs[at + 2] as number;
  const theta = Math.abs(arcs[at + 4] as number);
  return shoelace + Math.sign(bulge) * ((radius * radius) / 2) * (theta - Math.sin(theta));
}

/**
 * Widens `range` ([min, max]) to the exact projection of edge `i` on the unit direction
 * (ux, uy), whose angle `direction` is atan2(uy, ux).
 */
export function widenByProjection(
  store: EdgeStore,
  i: number,
  ux: number,
  uy: number,
  direction: number,
  arcs: Float64Array,
  at: number,
  range: Float64Array,
): void {
  const pa = store.ax(i) * ux + store.ay(i) * uy;
  const pb = store.bx(i) * ux + store.by(i) * uy;
  let min = Math.min(pa, pb);
  let max = Math.max(pa, pb);
  if (store.bulge(i) !== 0) {
    const along = (arcs[at] as number) * ux + (arcs[at + 1] as number) * uy;
    const radius = arcs[at + 2] as number;
    const startAngle = arcs[at + 3] as number;
    const sweep = arcs[at + 4] as number;
    if (sweepContains(startAngle, sweep, direction)) max = Math.max(max, along + radius);
    if (sweepContains(startAngle, sweep, direction + Math.PI)) min = Math.min(min, along - radius);
  }
  range[0] = Math.min(range[0] as number, min);
  range[1] = Math.max(range[1] as number, max);
}

/** Widens `box` ([minX, minY, maxX, maxY]) to the exact bounding box of edge `i`. */
export function widenByEdgeBounds(
  store: EdgeStore,
  i: number,
  arcs: Float64Array,
  at: number,
  box: Float64Array,
): void {
  const ax = store.ax(i);
  const ay = store.ay(i);
  const bx = store.bx(i);
  const by = store.by(i);
  let minX = Math.min(ax, bx);
  let maxX = Math.max(ax, bx);
  let minY = Math.min(ay, by);
  let maxY = Math.max(ay, by);
  if (store.bulge(i) !== 0) {
    const cx = arcs[at] as number;
    const cy = arcs[at + 1] as number;
    const radius = arcs[at + 2] as number;
    const startAngle = arcs[at + 3] as number;
    const sweep = arcs[at + 4] as number;
    if (sweepContains(startAngle, sweep, 0)) maxX = Math.max(maxX, cx + radius);
    if (sweepContains(startAngle, sweep, Math.PI)) minX = Math.min(minX, cx - radius);
    if (sweepContains(startAngle, sweep, Math.PI / 2)) maxY = Math.max(maxY, cy + radius);
    if (sweepContains(startAngle, sweep, Math.PI / 2 + Math.PI)) minY = Math.min(minY, cy - radius);
  }
  box[0] = Math.min(box[0] as number, minX);
  box[1] = Math.min(box[1] as number, minY);
  box[2] = Math.max(box[2] as number, maxX);
  box[3] = Math.max(box[3] as number, maxY);
}

function sweepContains(start: number, sweep: number, angle: number): boolean {
  const turn = 2 * Math.PI;
  const from = sweep >= 0 ? start : start + sweep;
  // ((x % turn) + turn) % turn with the second remainder as a subtraction: s lies in
  // [0, 2·turn], where s − turn and s − 2·turn are exact (Sterbenz), so the bits are the same.
  const s = ((angle - from) % turn) + turn;
  const offset = s >= 2 * turn ? s - 2 * turn : s >= turn ? s - turn : s;
  return offset <= Math.abs(sweep) + 1e-12;
}

/** Number of chords that keep an arc of this radius and sweep within the chord tolerance. */
export function arcSegmentCount(radius: number, sweep: number, chordTolerance = DEFAULT_CHORD_TOLERANCE): number {
  const ratio = Math.min(1, chordTolerance / Math.max(radius, 1e-12));
  const step = 2 * Math.acos(1 - ratio);
  const perTurn = Math.min(MAX_SEGMENTS_PER_TURN, Math.max(MIN_SEGMENTS_PER_TURN, Math.ceil((2 * Math.PI) / step)));
  return Math.max(1, Math.ceil((perTurn * Math.abs(sweep)) / (2 * Math.PI)));
}

/**
 * Points along edge `i` from its start, excluding its end point (so loops concatenate cleanly),
 * appended as x, y pairs to a flat list the caller owns: large drawings hold millions of polygon
 * points, and plain numbers spare the collector an object for each. `arcs` at `at` holds the
 * edge's arc when the caller has worked it out already.
 */
export function appendEdgeSamples(
  store: EdgeStore,
  i: number,
  flat: number[],
  chordTolerance: number,
  arcs?: Float64Array,
  at = 0,
): void {
  flat.push(store.ax(i), store.ay(i));
  if (store.bulge(i) === 0) return;
  let table = arcs;
  if (!table) {
    table = new Float64Array(ARC_STRIDE);
    writeEdgeArc(store, i, table, 0);
    at = 0;
  }
  const cx = table[at] as number;
  const cy = table[at + 1] as number;
  const radius = table[at + 2] as number;
  const startAngle = table[at + 3] as number;
  const sweep = table[at + 4] as number;
  const count = arcSegmentCount(radius, sweep, chordTolerance);
  for (let k = 1; k < count; k += 1) {
    const angle = startAngle + (sweep * k) / count;
    flat.push(cx + radius * Math.cos(angle), cy + radius * Math.sin(angle));
  }
}

/**
 * Appends edge `i` of `from` under a transform to `to`. Similarity transforms keep arcs as arcs
 * (a mirror reverses the bulge's sense); a stretch turns an arc into an elliptical one, which
 * becomes straight chords through its points at the default chord tolerance.
 */
export function appendTransformedEdge(from: EdgeStore, i: number, t: Affine, to: EdgeStore): void {
  const bulge = from.bulge(i);
  if (bulge === 0 || uniformScale(t) !== undefined) {
    const ax = from.ax(i);
    const ay = from.ay(i);
    const bx = from.bx(i);
    const by = from.by(i);
    to.push(
      applyX(t, ax, ay),
      applyY(t, ax, ay),
      applyX(t, bx, by),
      applyY(t, bx, by),
      determinant(t) < 0 ? -bulge : bulge,
    );
    return;
  }
  const flat: number[] = [];
  appendEdgeSamples(from, i, flat, DEFAULT_CHORD_TOLERANCE);
  flat.push(from.bx(i), from.by(i));
  let px = applyX(t, flat[0] as number, flat[1] as number);
  let py = applyY(t, flat[0] as number, flat[1] as number);
  for (let k = 2; k < flat.length; k += 2) {
    const qx = applyX(t, flat[k] as number, flat[k + 1] as number);
    const qy = applyY(t, flat[k] as number, flat[k + 1] as number);
    to.push(px, py, qx, qy, 0);
    px = qx;
    py = qy;
  }
}

/** Appends straight edges joining consecutive points; returns their range. */
export function pushChordsThrough(points: readonly Vec[], to: EdgeStore): EdgeRange {
  const start = to.count;
  for (let k = 1; k < points.length; k += 1) {
    const a = points[k - 1];
    const b = points[k];
    if (a && b) to.push(a.x, a.y, b.x, b.y, 0);
  }
  return { start, end: to.count };
}
