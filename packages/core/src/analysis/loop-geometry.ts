import type { Bounds } from '../geometry/bounds';
import { ARC_STRIDE } from '../geometry/bulge';
import { appendEdgeSamples, edgeAreaTerm, edgeLength, widenByEdgeBounds, writeEdgeArc } from '../geometry/edge';
import type { EdgeRange, EdgeStore } from '../geometry/edge-store';
import type { Loop } from './chain-loops';

/** A loop with its exact measures: signed area, length and bounds, arcs exact. */
export interface MeasuredLoop {
  loop: Loop;
  signedArea: number;
  length: number;
  bounds: Bounds;
  /** The edges as chained, before any reversal, which the drawn polygon is sampled from. */
  chained: EdgeRange;
  reversed: boolean;
}

/** `measureLoop` of every loop, in order. */
export function measureLoops(store: EdgeStore, loops: readonly Loop[]): MeasuredLoop[] {
  // One arc and one box at a time: the measures keep nothing of them.
  const arc = new Float64Array(ARC_STRIDE);
  const box = new Float64Array(4);
  return loops.map((loop) => measureWith(store, loop, arc, box));
}

export function measureLoop(store: EdgeStore, loop: Loop): MeasuredLoop {
  return measureWith(store, loop, new Float64Array(ARC_STRIDE), new Float64Array(4));
}

function measureWith(store: EdgeStore, loop: Loop, arc: Float64Array, box: Float64Array): MeasuredLoop {
  let signedArea = 0;
  let length = 0;
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let i = loop.range.start; i < loop.range.end; i += 1) {
    if (store.bulge(i) === 0) {
      signedArea += edgeAreaTerm(store, i, arc, 0);
      length += edgeLength(store, i, arc, 0);
      // Straight edges: the box of the end points, without the general projection.
      minX = Math.min(minX, store.ax(i), store.bx(i));
      minY = Math.min(minY, store.ay(i), store.by(i));
      maxX = Math.max(maxX, store.ax(i), store.bx(i));
      maxY = Math.max(maxY, store.ay(i), store.by(i));
    } else {
      // The arc's centre and angles take a square root and two arc tangents: once for all three.
      writeEdgeArc(store, i, arc, 0);
      signedArea += edgeAreaTerm(store, i, arc, 0);
      length += edgeLength(store, i, arc, 0);
      box[0] = minX;
      box[1] = minY;
      box[2] = maxX;
      box[3] = maxY;
      widenByEdgeBounds(store, i, arc, 0, box);
      minX = box[0] as number;
      minY = box[1] as number;
      maxX = box[2] as number;
      maxY = box[3] as number;
    }
  }
  return {
    loop,
    signedArea,
    length,
    bounds: { minX, minY, maxX, maxY },
    chained: loop.range,
    reversed: false,
  };
}

/** The same loop running the other way round, its reversed edges appended to the store. */
export function reverseLoop(store: EdgeStore, measured: MeasuredLoop): MeasuredLoop {
  return {
    loop: { range: store.pushReversed(measured.loop.range), sources: measured.loop.sources },
    signedArea: -measured.signedArea,
    length: measured.length,
    bounds: measured.bounds,
    chained: measured.chained,
    reversed: !measured.reversed,
  };
}

/**
 * Flat x, y pairs within the chord tolerance of the loop, in the loop's direction. A reversed
 * loop keeps the first point and runs the chained polygon backwards from there, so that the same
 * outline gives the same points whichever way it was found. `arcs` are the chained edges' arcs
 * (`rangeArcs`) when the caller has them.
 */
export function loopPolygon(
  store: EdgeStore,
  measured: MeasuredLoop,
  chordTolerance: number,
  arcs?: Float64Array,
): number[] {
  const chained: number[] = [];
  const { start, end } = measured.chained;
  for (let i = start; i < end; i += 1)
    appendEdgeSamples(store, i, chained, chordTolerance, arcs, (i - start) * ARC_STRIDE);
  if (!measured.reversed || chained.length < 2) return chained;
  const polygon = [chained[0] as number, chained[1] as number];
  for (let i = chained.length - 2; i >= 2; i -= 2) polygon.push(chained[i] as number, chained[i + 1] as number);
  return polygon;
}
