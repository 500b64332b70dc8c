import { describe, expect, it } from 'vitest';
import { inchesToMm, mmToInches } from './length';

describe('length', () => {
  // NBS 1959 refinement: "1 inch equals 25.4 millimeters" (REFERENCES.md, Units).
  it('converts inches to millimetres with 25.4 mm per inch exactly', () => {
    expect(inchesToMm(1)).toBe(25.4);
    expect(inchesToMm(0.75)).toBeCloseTo(19.05, 12);
  });
  it('round-trips millimetres through inches', () => {
    expect(mmToInches(inchesToMm(3.5))).toBeCloseTo(3.5, 12);
  });
});
