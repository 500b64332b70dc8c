import { describe, expect, it } from 'vitest';
import { scaling } from './affine';
import { ARC_STRIDE } from './bulge';
import {
  appendEdgeSamples,
  appendTransformedEdge,
  edgeAreaTerm,
  edgeLength,
  rangeArcs,
  widenByEdgeBounds,
  widenByProjection,
  type Edge,
} from './edge';
import { EdgeStore } from './edge-store';

const semicircleTop: Edge = { a: { x: 1, y: 0 }, b: { x: -1, y: 0 }, bulge: 1 };
const semicircleBottom: Edge = { a: { x: -1, y: 0 }, b: { x: 1, y: 0 }, bulge: 1 };

/** Area and length of a whole store taken as one loop. */
function loopMeasures(store: EdgeStore): { area: number; length: number } {
  const arcs = rangeArcs(store, { start: 0, end: store.count });
  let area = 0;
  let length = 0;
  for (let i = 0; i < store.count; i += 1) {
    area += edgeAreaTerm(store, i, arcs, i * ARC_STRIDE);
    length += edgeLength(store, i, arcs, i * ARC_STRIDE);
  }
  return { area, length };
}

describe('edges', () => {
  // A unit circle as two bulge-1 semicircles: area π r², circumference 2π r (Euclid; exact).
  it('two semicircles make a unit circle with exact area and length', () => {
    const { area, length } = loopMeasures(EdgeStore.of([semicircleTop, semicircleBottom]));
    expect(area).toBeCloseTo(Math.PI, 12);
    expect(length).toBeCloseTo(2 * Math.PI, 12);
  });

  it('reversing a loop negates its area', () => {
    const store = EdgeStore.of([semicircleTop, semicircleBottom]);
    const reversed = new EdgeStore();
    const copy = reversed.pushReversed({ start: 0, end: 0 });
    expect(copy).toEqual({ start: 0, end: 0 });
    const back = EdgeStore.of(store.edges(store.pushReversed({ start: 0, end: 2 })));
    expect(loopMeasures(back).area).toBeCloseTo(-Math.PI, 12);
  });

  it('the bounds of an arc include its quadrant points', () => {
    const store = EdgeStore.of([semicircleTop]);
    const box = Float64Array.of(Infinity, Infinity, -Infinity, -Infinity);
    widenByEdgeBounds(store, 0, rangeArcs(store, { start: 0, end: 1 }), 0, box);
    expect(box[0]).toBeCloseTo(-1, 12);
    expect(box[1]).toBeCloseTo(0, 12);
    expect(box[2]).toBeCloseTo(1, 12);
    expect(box[3]).toBeCloseTo(1, 12);
  });

  it('projects an arc onto a direction through its extreme point', () => {
    const store = EdgeStore.of([semicircleTop]);
    const range = Float64Array.of(Infinity, -Infinity);
    // On the diagonal (1, 1)/√2 the upper semicircle reaches 1 at 45° and −1/√2 at (−1, 0).
    const u = Math.SQRT1_2;
    widenByProjection(store, 0, u, u, Math.PI / 4, rangeArcs(store, { start: 0, end: 1 }), 0, range);
    expect(range[1]).toBeCloseTo(1, 12);
    expect(range[0]).toBeCloseTo(-Math.SQRT1_2, 12);
  });

  it('sampled arc points lie on the circle and the chords stay within the tolerance', () => {
    const flat: number[] = [];
    appendEdgeSamples(EdgeStore.of([{ a: { x: 100, y: 0 }, b: { x: -100, y: 0 }, bulge: 1 }]), 0, flat, 0.02);
    for (let i = 0; i < flat.length; i += 2)
      expect(Math.hypot(flat[i] as number, flat[i + 1] as number)).toBeCloseTo(100, 9);
    const step = Math.PI / (flat.length / 2);
    expect(100 * (1 - Math.cos(step / 2))).toBeLessThanOrEqual(0.02 + 1e-9);
  });

  it('a mirror reverses the bulge and a stretch turns the arc into chords', () => {
    const store = EdgeStore.of([semicircleTop]);
    const mirrored = new EdgeStore();
    appendTransformedEdge(store, 0, scaling(-1, 1), mirrored);
    expect(mirrored.count).toBe(1);
    expect(mirrored.edge(0)).toEqual({ a: { x: -1, y: 0 }, b: { x: 1, y: 0 }, bulge: -1 });
    const stretched = new EdgeStore();
    appendTransformedEdge(store, 0, scaling(2, 1), stretched);
    expect(stretched.count).toBeGreaterThan(4);
    const edges = stretched.edges({ start: 0, end: stretched.count });
    expect(edges.every((edge) => edge.bulge === 0)).toBe(true);
    expect(edges[0]?.a).toEqual({ x: 2, y: 0 });
    expect(edges[edges.length - 1]?.b).toEqual({ x: -2, y: 0 });
  });

  it('does not change the edge it transforms', () => {
    const edge: Edge = { a: { x: 1, y: 2 }, b: { x: 3, y: 4 }, bulge: 0.5 };
    const store = EdgeStore.of([edge]);
    appendTransformedEdge(store, 0, scaling(2, 3), store);
    store.pushReversed({ start: 0, end: 1 });
    expect(store.edge(0)).toEqual(edge);
  });
});
