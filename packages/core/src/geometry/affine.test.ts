import { describe, expect, it } from 'vitest';
import { apply, compose, determinant, rotation, scaling, translation, uniformScale } from './affine';

describe('affine transforms', () => {
  it('applies the inner transform first', () => {
    const t = compose(translation(10, 0), rotation(Math.PI / 2));
    const p = apply(t, { x: 1, y: 0 });
    expect(p.x).toBeCloseTo(10, 12);
    expect(p.y).toBeCloseTo(1, 12);
  });

  it('a mirror has a negative determinant and keeps a uniform scale', () => {
    const mirror = scaling(-2, 2);
    expect(determinant(mirror)).toBe(-4);
    expect(uniformScale(compose(rotation(0.3), mirror))).toBeCloseTo(2, 12);
  });

  it('a stretch is not a uniform scale', () => {
    expect(uniformScale(scaling(1, 2))).toBeUndefined();
    expect(uniformScale(scaling(0, 0))).toBeUndefined();
  });
});
