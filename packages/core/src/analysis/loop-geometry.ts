import type { Bounds } from '../geometry/bounds';
import {
  appendEdgeSamples,
  edgeArc,
  edgeAreaTerm,
  edgeBounds,
  edgeLength,
  reverseEdge,
  type Edge,
} from '../geometry/edge';
import type { Loop } from './chain-loops';

/** A loop with its exact measures: signed area, length and bounds, arcs exact. */
export interface MeasuredLoop {
  loop: Loop;
  signedArea: number;
  length: number;
  bounds: Bounds;
  /** The edges as chained, before any reversal, which the drawn polygon is sampled from. */
  chained: readonly Edge[];
  reversed: boolean;
}

export function measureLoop(loop: Loop): MeasuredLoop {
  let signedArea = 0;
  let length = 0;
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const edge of loop.edges) {
    if (edge.bulge === 0) {
      signedArea += edgeAreaTerm(edge);
      length += edgeLength(edge);
      // Straight edges: the box of the end points, without the general projection.
      minX = Math.min(minX, edge.a.x, edge.b.x);
      minY = Math.min(minY, edge.a.y, edge.b.y);
      maxX = Math.max(maxX, edge.a.x, edge.b.x);
      maxY = Math.max(maxY, edge.a.y, edge.b.y);
    } else {
      // The arc's centre and angles take a square root and two arc tangents: once for all three.
      const arc = edgeArc(edge);
      signedArea += edgeAreaTerm(edge, arc);
      length += edgeLength(edge, arc);
      const box = edgeBounds(edge, arc);
      minX = Math.min(minX, box.minX);
      minY = Math.min(minY, box.minY);
      maxX = Math.max(maxX, box.maxX);
      maxY = Math.max(maxY, box.maxY);
    }
  }
  return { loop, signedArea, length, bounds: { minX, minY, maxX, maxY }, chained: loop.edges, reversed: false };
}

/** The same loop running the other way round. */
export function reverseLoop(measured: MeasuredLoop): MeasuredLoop {
  const edges = [...measured.loop.edges].reverse().map(reverseEdge);
  return {
    loop: { edges, sources: measured.loop.sources },
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
 * outline gives the same points whichever way it was found.
 */
export function loopPolygon(measured: MeasuredLoop, chordTolerance: number): number[] {
  const chained: number[] = [];
  for (const edge of measured.chained) appendEdgeSamples(edge, chained, chordTolerance);
  if (!measured.reversed || chained.length < 2) return chained;
  const polygon = [chained[0] as number, chained[1] as number];
  for (let i = chained.length - 2; i >= 2; i -= 2) polygon.push(chained[i] as number, chained[i + 1] as number);
  return polygon;
}
