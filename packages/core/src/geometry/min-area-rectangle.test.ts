import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { convexHull } from './convex-hull';
import { minAreaRectangle } from './min-area-rectangle';
import type { Vec } from './vec';

function rotatedRectangle(length: number, width: number, angle: number, at: Vec): Vec[] {
  const corners = [
    [0, 0],
    [length, 0],
    [length, width],
    [0, width],
  ] as const;
  return corners.map(([x, y]) => ({
    x: at.x + x * Math.cos(angle) - y * Math.sin(angle),
    y: at.y + x * Math.sin(angle) + y * Math.cos(angle),
  }));
}

function bruteForceArea(points: Vec[]): number {
  let best = Infinity;
  for (let i = 0; i < 1800; i += 1) {
    const angle = (i / 1800) * Math.PI;
    const u = points.map((p) => p.x * Math.cos(angle) + p.y * Math.sin(angle));
    const v = points.map((p) => -p.x * Math.sin(angle) + p.y * Math.cos(angle));
    best = Math.min(best, (Math.max(...u) - Math.min(...u)) * (Math.max(...v) - Math.min(...v)));
  }
  return best;
}

describe('minimum-area rectangle', () => {
  it('finds a rotated 300 × 80 board exactly, with its angle', () => {
    const rect = minAreaRectangle(convexHull(rotatedRectangle(300, 80, 0.5, { x: 20, y: -7 })));
    expect(rect.length).toBeCloseTo(300, 9);
    expect(rect.width).toBeCloseTo(80, 9);
    expect(rect.angle).toBeCloseTo(0.5, 9);
  });

  it('a right triangle 3-4-5 fits a 4 × 3 rectangle (area 12, Freeman & Shapira: a side on a hull edge)', () => {
    const rect = minAreaRectangle(
      convexHull([
        { x: 0, y: 0 },
        { x: 4, y: 0 },
        { x: 0, y: 3 },
      ]),
    );
    expect(rect.length * rect.width).toBeCloseTo(12, 9);
  });

  it('a right triangle ties on a leg and on its hypotenuse; the shorter perimeter wins at any rotation', () => {
    // 3-4-5: on a leg 4 × 3 (perimeter 14), on the hypotenuse 5 × 2.4 (perimeter 14.8), both area 12.
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.integer({ min: 0, max: 2 }),
        (angle, start) => {
          const corners = [
            { x: 0, y: 0 },
            { x: 4, y: 0 },
            { x: 0, y: 3 },
          ].map((p) => ({
            x: p.x * Math.cos(angle) - p.y * Math.sin(angle),
            y: p.x * Math.sin(angle) + p.y * Math.cos(angle),
          }));
          const hull = convexHull(corners);
          const rect = minAreaRectangle([...hull.slice(start), ...hull.slice(0, start)]);
          expect(rect.length).toBeCloseTo(4, 9);
          expect(rect.width).toBeCloseTo(3, 9);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('measures a sliver a micron long without stalling its calipers (found by the property below)', () => {
    const points = [
      { x: 0, y: -1.0000000000000005e-15 },
      { x: -0.0000010000000000000002, y: 0 },
      { x: 0, y: 0 },
    ];
    const rect = minAreaRectangle(convexHull(points));
    expect(rect.length).toBeCloseTo(1e-6, 12);
    expect(rect.centre.x).toBeCloseTo(-5e-7, 12);
  });

  it('is never larger than a brute-force search over angles, and holds every point', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            x: fc.double({ min: -100, max: 100, noNaN: true }),
            y: fc.double({ min: -100, max: 100, noNaN: true }),
          }),
          {
            minLength: 3,
            maxLength: 30,
          },
        ),
        (points) => {
          const rect = minAreaRectangle(convexHull(points));
          const brute = bruteForceArea(points);
          expect(rect.length * rect.width).toBeLessThanOrEqual(brute + 1e-4);
          const cos = Math.cos(rect.angle);
          const sin = Math.sin(rect.angle);
          for (const p of points) {
            const u = (p.x - rect.centre.x) * cos + (p.y - rect.centre.y) * sin;
            const v = -(p.x - rect.centre.x) * sin + (p.y - rect.centre.y) * cos;
            expect(Math.abs(u)).toBeLessThanOrEqual(rect.length / 2 + 1e-6);
            expect(Math.abs(v)).toBeLessThanOrEqual(rect.width / 2 + 1e-6);
          }
          expect(rect.length).toBeGreaterThanOrEqual(rect.width);
        },
      ),
      { numRuns: 40 },
    );
  });

  it('does not mutate its input', () => {
    const points = rotatedRectangle(10, 5, 1, { x: 0, y: 0 });
    const copy = structuredClone(points);
    minAreaRectangle(convexHull(points));
    expect(points).toEqual(copy);
  });
});
