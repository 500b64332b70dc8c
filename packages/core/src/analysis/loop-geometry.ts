import { EMPTY_BOUNDS, unionBounds, type Bounds } from '../geometry/bounds';
import { edgeAreaTerm, edgeBounds, edgeLength, reverseEdge, sampleEdge } from '../geometry/edge';
import type { Vec } from '../geometry/vec';
import type { Loop } from './chain-loops';

/** A loop with its measures: exact signed area and length, polygon and bounds for lookups. */
export interface MeasuredLoop {
  loop: Loop;
  signedArea: number;
  length: number;
  polygon: Vec[];
  bounds: Bounds;
}

export function measureLoop(loop: Loop, chordTolerance: number): MeasuredLoop {
  let signedArea = 0;
  let length = 0;
  let bounds = EMPTY_BOUNDS;
  const polygon: Vec[] = [];
  for (const edge of loop.edges) {
    signedArea += edgeAreaTerm(edge);
    length += edgeLength(edge);
    bounds = unionBounds(bounds, edgeBounds(edge));
    for (const p of sampleEdge(edge, chordTolerance)) polygon.push(p);
  }
  return { loop, signedArea, length, polygon, bounds };
}

/** The same loop running the other way round. */
export function reverseLoop(measured: MeasuredLoop): MeasuredLoop {
  const edges = [...measured.loop.edges].reverse().map(reverseEdge);
  const polygon = [...measured.polygon.slice(1)].reverse();
  const first = measured.polygon[0];
  return {
    loop: { edges, sources: measured.loop.sources },
    signedArea: -measured.signedArea,
    length: measured.length,
    polygon: first ? [first, ...polygon] : polygon,
    bounds: measured.bounds,
  };
}
