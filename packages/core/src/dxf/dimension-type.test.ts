import { describe, expect, it } from 'vitest';
import { dimensionTypeOf, isOrdinateX } from './dimension-type';

describe('DIMENSION group 70', () => {
  // AutoCAD DXF Reference, DIMENSION group 70 [read] (REFERENCES.md).
  it.each([
    [0, 'rotated'],
    [1, 'aligned'],
    [2, 'angular'],
    [3, 'diameter'],
    [4, 'radius'],
    [5, 'angular-3-point'],
    [6, 'ordinate'],
    // Bit 32 (block used by this dimension only) and 128 (text moved) do not change the type.
    [32 + 1, 'aligned'],
    [128 + 32 + 4, 'radius'],
  ])('%i is %s', (code, type) => {
    expect(dimensionTypeOf(code)).toBe(type);
  });

  it('bit 64 marks an X-type ordinate', () => {
    expect(isOrdinateX(6 + 64)).toBe(true);
    expect(isOrdinateX(6)).toBe(false);
  });

  it('codes past 6 are not dimension types', () => {
    expect(dimensionTypeOf(9)).toBeUndefined();
  });
});
