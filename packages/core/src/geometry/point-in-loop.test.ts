import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { appendEdgeSamples, type Edge } from './edge';
import { EdgeStore } from './edge-store';
import { pointInLoop } from './point-in-loop';
import { pointInPolygon } from './polygon';

// A 100 × 40 stadium: straight sides from x = 20 to 80, bulge-1 semicircles of radius 20 at the ends.
const stadium = EdgeStore.of([
  { a: { x: 20, y: 0 }, b: { x: 80, y: 0 }, bulge: 0 },
  { a: { x: 80, y: 0 }, b: { x: 80, y: 40 }, bulge: 1 },
  { a: { x: 80, y: 40 }, b: { x: 20, y: 40 }, bulge: 0 },
  { a: { x: 20, y: 40 }, b: { x: 20, y: 0 }, bulge: 1 },
] satisfies Edge[]);
// A 40 × 40 square with a bite out of its right side: an arc bulging inwards (clockwise).
const bitten = EdgeStore.of([
  { a: { x: 0, y: 0 }, b: { x: 40, y: 0 }, bulge: 0 },
  { a: { x: 40, y: 0 }, b: { x: 40, y: 40 }, bulge: -0.5 },
  { a: { x: 40, y: 40 }, b: { x: 0, y: 40 }, bulge: 0 },
  { a: { x: 0, y: 40 }, b: { x: 0, y: 0 }, bulge: 0 },
] satisfies Edge[]);
const all = { start: 0, end: 4 };

describe('point in a loop with arcs', () => {
  it('counts the round ends of a stadium as inside, beyond them as outside', () => {
    expect(pointInLoop(50, 20, stadium, all)).toBe(true);
    expect(pointInLoop(99, 20, stadium, all)).toBe(true);
    expect(pointInLoop(1, 20, stadium, all)).toBe(true);
    expect(pointInLoop(101, 20, stadium, all)).toBe(false);
    expect(pointInLoop(97, 3, stadium, all)).toBe(false);
  });

  it('leaves out the bite of an inward arc', () => {
    expect(pointInLoop(38, 20, bitten, all)).toBe(false);
    expect(pointInLoop(20, 20, bitten, all)).toBe(true);
    expect(pointInLoop(35, 1, bitten, all)).toBe(true);
  });

  it('agrees with a polygon within 1e-6 of the loop, away from the boundary', () => {
    for (const loop of [stadium, bitten]) {
      const polygon: number[] = [];
      for (let i = 0; i < loop.count; i += 1) appendEdgeSamples(loop, i, polygon, 1e-6);
      fc.assert(
        fc.property(
          fc.double({ min: -10, max: 110, noNaN: true }),
          fc.double({ min: -10, max: 50, noNaN: true }),
          (x, y) => {
            expect(pointInLoop(x, y, loop, all)).toBe(pointInPolygon(x, y, polygon));
          },
        ),
        { numRuns: 300 },
      );
    }
  });
});
