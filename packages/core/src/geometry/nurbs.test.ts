import { describe, expect, it } from 'vitest';
import { isValidNurbs, nurbsPoint, sampleNurbs, type Nurbs } from './nurbs';

// A quarter circle as a rational quadratic Bézier: control points (1,0), (1,1), (0,1) with weights
// 1, √2/2, 1 (Piegl & Tiller, The NURBS Book, §7.3 [memory]). Every point lies on the unit circle.
const quarterCircle: Nurbs = {
  degree: 2,
  controlPoints: [
    { x: 1, y: 0 },
    { x: 1, y: 1 },
    { x: 0, y: 1 },
  ],
  knots: [0, 0, 0, 1, 1, 1],
  weights: [1, Math.SQRT1_2, 1],
};

describe('NURBS evaluation', () => {
  it('a rational quadratic with weight √2/2 is an exact quarter circle', () => {
    for (const p of sampleNurbs(quarterCircle, 20)) expect(Math.hypot(p.x, p.y)).toBeCloseTo(1, 12);
  });

  it('without weights the same control points are a parabola, off the circle', () => {
    const mid = nurbsPoint({ ...quarterCircle, weights: [] }, 0.5);
    // Bézier midpoint (P0 + 2P1 + P2)/4 = (0.75, 0.75).
    expect(mid.x).toBeCloseTo(0.75, 12);
    expect(mid.y).toBeCloseTo(0.75, 12);
  });

  it('interpolates the end points of a clamped curve', () => {
    const [first] = sampleNurbs(quarterCircle, 4);
    expect(first).toEqual({ x: 1, y: 0 });
    expect(nurbsPoint(quarterCircle, 1).x).toBeCloseTo(0, 12);
  });

  it('rejects a knot vector of the wrong length', () => {
    expect(isValidNurbs(quarterCircle)).toBe(true);
    expect(isValidNurbs({ ...quarterCircle, knots: [0, 0, 1, 1] })).toBe(false);
  });
});
