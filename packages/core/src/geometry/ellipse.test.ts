import { describe, expect, it } from 'vitest';
import { ellipsePoint, ellipseSweep, isFullEllipse, sampleEllipse, type EllipseArc } from './ellipse';

const full: EllipseArc = {
  centre: { x: 5, y: 5 },
  majorAxis: { x: 10, y: 0 },
  ratio: 0.5,
  startParameter: 0,
  endParameter: 2 * Math.PI,
};

describe('ellipses', () => {
  it('points satisfy (x/a)² + (y/b)² = 1', () => {
    for (const p of sampleEllipse(full, 0.01)) expect(((p.x - 5) / 10) ** 2 + ((p.y - 5) / 5) ** 2).toBeCloseTo(1, 12);
  });

  it('parameter π/2 lies on the minor axis', () => {
    const p = ellipsePoint(full, Math.PI / 2);
    expect(p.x).toBeCloseTo(5, 12);
    expect(p.y).toBeCloseTo(10, 12);
  });

  it('knows a full ellipse from an arc that wraps past 0', () => {
    expect(isFullEllipse(full)).toBe(true);
    const arc = { ...full, startParameter: 1.5 * Math.PI, endParameter: 0.5 * Math.PI };
    expect(ellipseSweep(arc)).toBeCloseTo(Math.PI, 12);
    expect(isFullEllipse(arc)).toBe(false);
  });
});
