import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Edge } from './edge';
import { EdgeStore } from './edge-store';

const edge = fc.record({
  a: fc.record({ x: fc.double({ noNaN: true }), y: fc.double({ noNaN: true }) }),
  b: fc.record({ x: fc.double({ noNaN: true }), y: fc.double({ noNaN: true }) }),
  bulge: fc.double({ min: -4, max: 4, noNaN: true }),
});

describe('edge store', () => {
  it('gives back every edge as written, bit for bit, past several growths', () => {
    fc.assert(
      fc.property(fc.array(edge, { maxLength: 300 }), (edges) => {
        const store = new EdgeStore(1);
        edges.forEach((e, i) => expect(store.push(e.a.x, e.a.y, e.b.x, e.b.y, e.bulge)).toBe(i));
        expect(store.count).toBe(edges.length);
        expect(store.edges({ start: 0, end: store.count })).toEqual(edges);
      }),
      { numRuns: 50 },
    );
  });

  it('appends a range reversed: last edge first, ends swapped, bulges negated', () => {
    const edges: Edge[] = [
      { a: { x: 0, y: 0 }, b: { x: 10, y: 0 }, bulge: 0 },
      { a: { x: 10, y: 0 }, b: { x: 10, y: 5 }, bulge: 0.5 },
    ];
    const store = EdgeStore.of(edges);
    const reversed = store.pushReversed({ start: 0, end: 2 });
    expect(reversed).toEqual({ start: 2, end: 4 });
    expect(store.edges(reversed)).toEqual([
      { a: { x: 10, y: 5 }, b: { x: 10, y: 0 }, bulge: -0.5 },
      { a: { x: 10, y: 0 }, b: { x: 0, y: 0 }, bulge: -0 },
    ]);
  });

  it('appends a copy of a range and leaves the range itself as it was', () => {
    const edges: Edge[] = [
      { a: { x: 1, y: 2 }, b: { x: 3, y: 4 }, bulge: -1 },
      { a: { x: 3, y: 4 }, b: { x: 1, y: 2 }, bulge: 0 },
    ];
    const store = EdgeStore.of(edges);
    const copy = store.pushCopy({ start: 0, end: 2 });
    expect(copy).toEqual({ start: 2, end: 4 });
    expect(store.edges(copy)).toEqual(edges);
    expect(store.edges({ start: 0, end: 2 })).toEqual(edges);
  });
});
