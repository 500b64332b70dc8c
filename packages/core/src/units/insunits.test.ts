import { describe, expect, it } from 'vitest';
import { mmPerDrawingUnit, parseDrawingUnits, unitsFromInsunits } from './insunits';

describe('$INSUNITS', () => {
  // AutoCAD DXF Reference, HEADER $INSUNITS table [read]; factors to mm [derived] (REFERENCES.md).
  it.each([
    [1, 'in', 25.4],
    [2, 'ft', 304.8],
    [4, 'mm', 1],
    [5, 'cm', 10],
    [6, 'm', 1000],
    [9, 'mil', 0.0254],
    [10, 'yd', 914.4],
  ])('code %i is %s, %f mm per unit', (code, units, factor) => {
    const name = unitsFromInsunits(code);
    expect(name).toBe(units);
    expect(mmPerDrawingUnit(name)).toBeCloseTo(factor, 9);
  });

  it('names every code from 1 to 24 of the reference table', () => {
    for (let code = 1; code <= 24; code += 1) {
      const units = unitsFromInsunits(code);
      expect(units).not.toBe('unknown');
      expect(mmPerDrawingUnit(units)).toBeGreaterThan(0);
    }
  });

  // Reference: code 0 is unitless, so the units are unknown and must not be guessed.
  it.each([0, undefined, 25, -1])('code %s is unknown with no factor', (code) => {
    expect(unitsFromInsunits(code)).toBe('unknown');
    expect(mmPerDrawingUnit('unknown')).toBeUndefined();
  });

  // 1 mile = 5280 ft = 1 609 344 mm [derived from 1 in = 25.4 mm].
  it('a mile is 1 609 344 mm', () => {
    expect(mmPerDrawingUnit('mi')).toBeCloseTo(1_609_344, 6);
  });

  it('reads typed unit names', () => {
    expect(parseDrawingUnits('MM')).toBe('mm');
    expect(parseDrawingUnits('inch')).toBe('in');
    expect(parseDrawingUnits('furlong')).toBeUndefined();
  });
});
