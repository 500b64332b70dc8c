import { describe, expect, it } from 'vitest';
import { bulgeArc, bulgeFromSweep, bulgeSagitta } from './bulge';

describe('bulge arcs', () => {
  // REFERENCES.md, DXF VERTEX bulge [read] with formulas [derived]:
  // (10,0)→(0,10) with b = 0.41421356 gives r = 10.000, sagitta 2.9289.
  it('a quarter circle from (10,0) to (0,10)', () => {
    const a = { x: 10, y: 0 };
    const b = { x: 0, y: 10 };
    const arc = bulgeArc(a, b, 0.41421356);
    expect(arc.radius).toBeCloseTo(10, 3);
    expect(arc.centre.x).toBeCloseTo(0, 6);
    expect(arc.centre.y).toBeCloseTo(0, 6);
    expect(arc.sweep).toBeCloseTo(Math.PI / 2, 6);
    expect(bulgeSagitta(a, b, 0.41421356)).toBeCloseTo(2.9289, 4);
  });

  // Same source: (0,0)→(1,0) with b = 1 gives r = 0.5, centre (0.5, 0): a semicircle.
  it('a semicircle from (0,0) to (1,0)', () => {
    const arc = bulgeArc({ x: 0, y: 0 }, { x: 1, y: 0 }, 1);
    expect(arc.radius).toBeCloseTo(0.5, 12);
    expect(arc.centre.x).toBeCloseTo(0.5, 12);
    expect(arc.centre.y).toBeCloseTo(0, 12);
    expect(arc.sweep).toBeCloseTo(Math.PI, 12);
  });

  it('a negative bulge runs clockwise with its centre on the other side', () => {
    const arc = bulgeArc({ x: 10, y: 0 }, { x: 0, y: 10 }, -0.41421356);
    expect(arc.sweep).toBeCloseTo(-Math.PI / 2, 6);
    expect(arc.centre.x).toBeCloseTo(10, 5);
    expect(arc.centre.y).toBeCloseTo(10, 5);
  });

  it('bulge of a 90° arc is tan(22.5°)', () => {
    expect(bulgeFromSweep(Math.PI / 2)).toBeCloseTo(0.41421356, 8);
  });
});
