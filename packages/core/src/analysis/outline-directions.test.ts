import { describe, expect, it } from 'vitest';
import type { Edge } from '../geometry/edge';
import { EdgeStore } from '../geometry/edge-store';
import { measureLoop } from './loop-geometry';
import { OutlineDirections } from './outline-directions';

function square(store: EdgeStore, x: number, y: number, size: number, bulge = 0): ReturnType<typeof measureLoop> {
  const corners = [
    [x, y],
    [x + size, y],
    [x + size, y + size],
    [x, y + size],
  ] as const;
  const edges: Edge[] = corners.map(([ax, ay], i) => {
    const [bx, by] = corners[(i + 1) % 4] as readonly [number, number];
    return { a: { x: ax, y: ay }, b: { x: bx, y: by }, bulge: i === 0 ? bulge : 0 };
  });
  const start = store.count;
  for (const e of edges) store.push(e.a.x, e.a.y, e.b.x, e.b.y, e.bulge);
  return measureLoop(store, { range: { start, end: store.count }, sources: [] });
}

describe('outline directions', () => {
  it('measures a shape once and finds it again for a copy moved elsewhere', () => {
    const store = new EdgeStore();
    const directions = new OutlineDirections(store);
    const first = square(store, 0, 0, 10);
    expect(directions.find(first)).toBeUndefined();
    directions.add(first, 0.25);
    expect(directions.find(square(store, 500, -40, 10))).toBe(0.25);
    expect(directions.find(first)).toBe(0.25);
  });

  it('tells apart shapes that differ in size, in a bulge, or in direction of travel', () => {
    const store = new EdgeStore();
    const directions = new OutlineDirections(store);
    directions.add(square(store, 0, 0, 10), 1);
    expect(directions.find(square(store, 0, 0, 10.000000001))).toBeUndefined();
    expect(directions.find(square(store, 0, 0, 10, 0.5))).toBeUndefined();
    expect(directions.find({ ...square(store, 50, 0, 10), reversed: true })).toBeUndefined();
    expect(directions.find(square(store, 50, 0, 10))).toBe(1);
  });
});
