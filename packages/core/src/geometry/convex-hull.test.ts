import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { convexHullOfPairs } from './convex-hull';

/** Points on an ellipse at the given angles, in the order of the angles. */
function onEllipse(angles: readonly number[], at: { x: number; y: number }): number[] {
  const flat: number[] = [];
  for (const angle of angles) flat.push(at.x + 40 * Math.cos(angle), at.y + 15 * Math.sin(angle));
  return flat;
}

/** The same pairs in another order: reversed and then every other pair first. */
function reordered(flat: readonly number[]): number[] {
  const pairs: number[][] = [];
  for (let i = flat.length - 2; i >= 0; i -= 2) pairs.push([flat[i] as number, flat[i + 1] as number]);
  const even = pairs.filter((_, i) => i % 2 === 0);
  const odd = pairs.filter((_, i) => i % 2 === 1);
  return [...even, ...odd].flat();
}

describe('convexHullOfPairs', () => {
  it('drops inner and collinear points and starts at the lowest x, then y, counter-clockwise', () => {
    const square = [0, 0, 2, 0, 4, 0, 4, 4, 0, 4, 1, 1];
    expect(convexHullOfPairs(square)).toEqual([0, 0, 4, 0, 4, 4, 0, 4]);
  });

  it('gives a convex polygon run counter-clockwise the same hull as its points in any order', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 0.5, noNaN: true }), { minLength: 3, maxLength: 60 }),
        fc.integer({ min: 0, max: 59 }),
        fc.double({ min: -1e4, max: 1e4, noNaN: true }),
        (jitters, shift, offset) => {
          // Angles at least half a step apart, so that every turn is clear of the rounding.
          const sorted = jitters.map((jitter, k) => ((k + jitter) * 2 * Math.PI) / jitters.length);
          const start = shift % sorted.length;
          const ring = [...sorted.slice(start), ...sorted.slice(0, start)];
          const flat = onEllipse(ring, { x: offset, y: -offset / 3 });
          expect(convexHullOfPairs(flat)).toEqual(convexHullOfPairs(reordered(flat)));
        },
      ),
    );
  });

  it('is the hull of a polygon that winds round twice or turns clockwise', () => {
    const star = onEllipse(
      [0, 1, 2, 3, 4].map((k) => (k * 4 * Math.PI) / 5),
      { x: 0, y: 0 },
    );
    const counterClockwise = onEllipse([0, 1, 2, 3], { x: 0, y: 0 });
    const clockwise = onEllipse([3, 2, 1, 0], { x: 0, y: 0 });
    expect(convexHullOfPairs(star)).toEqual(convexHullOfPairs(reordered(star)));
    expect(convexHullOfPairs(clockwise)).toEqual(convexHullOfPairs(counterClockwise));
  });
});
