import type { Bounds } from '../geometry/bounds';
import { appendEdgeSamples, edgeAreaTerm, edgeBounds, edgeLength, reverseEdge } from '../geometry/edge';
import type { Loop } from './chain-loops';

/** A loop with its measures: exact signed area and length, polygon and bounds for lookups. */
export interface MeasuredLoop {
  loop: Loop;
  signedArea: number;
  length: number;
  /** Flat x, y pairs within the chord tolerance of the loop. */
  polygon: number[];
  bounds: Bounds;
}

export function measureLoop(loop: Loop, chordTolerance: number): MeasuredLoop {
  let signedArea = 0;
  let length = 0;
  const polygon: number[] = [];
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const edge of loop.edges) {
    signedArea += edgeAreaTerm(edge);
    length += edgeLength(edge);
    if (edge.bulge === 0) {
      // Straight edges: the box of the end points, without the general projection.
      minX = Math.min(minX, edge.a.x, edge.b.x);
      minY = Math.min(minY, edge.a.y, edge.b.y);
      maxX = Math.max(maxX, edge.a.x, edge.b.x);
      maxY = Math.max(maxY, edge.a.y, edge.b.y);
    } else {
      const box = edgeBounds(edge);
      minX = Math.min(minX, box.minX);
      minY = Math.min(minY, box.minY);
      maxX = Math.max(maxX, box.maxX);
      maxY = Math.max(maxY, box.maxY);
    }
    appendEdgeSamples(edge, polygon, chordTolerance);
  }
  return { loop, signedArea, length, polygon, bounds: { minX, minY, maxX, maxY } };
}

/** The same loop running the other way round. */
export function reverseLoop(measured: MeasuredLoop): MeasuredLoop {
  const edges = [...measured.loop.edges].reverse().map(reverseEdge);
  const source = measured.polygon;
  const polygon: number[] = source.length >= 2 ? [source[0] as number, source[1] as number] : [];
  for (let i = source.length - 2; i >= 2; i -= 2) polygon.push(source[i] as number, source[i + 1] as number);
  return {
    loop: { edges, sources: measured.loop.sources },
    signedArea: -measured.signedArea,
    length: measured.length,
    polygon,
    bounds: measured.bounds,
  };
}
