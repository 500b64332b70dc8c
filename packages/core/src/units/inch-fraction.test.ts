import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatInchFraction, parseInchFraction } from './inch-fraction';

describe('inch fractions', () => {
  // PS 20 dressed sizes [memory]: 1x → 3/4 in, 2x → 1-1/2 in; 2x4 → 1-1/2 × 3-1/2 in (REFERENCES.md).
  it.each([
    [19.05, '3/4'],
    [38.1, '1-1/2'],
    [88.9, '3-1/2'],
    [25.4, '1'],
    [0, '0'],
    [0.79375, '1/32'],
    [-12.7, '-1/2'],
  ])('%f mm is %s in', (mm, text) => {
    expect(formatInchFraction(mm)).toBe(text);
  });

  // Hardwood 4/4 surfaces to 13/16 in [memory, hardwood grading practice].
  it('13/16 in is 20.6375 mm', () => {
    expect(parseInchFraction('13/16')).toBeCloseTo(20.6375, 9);
    expect(formatInchFraction(20.6375)).toBe('13/16');
  });

  it('rounds to the nearest 1/32 in', () => {
    // 18 mm = 0.70866 in = 22.68/32 → 23/32.
    expect(formatInchFraction(18)).toBe('23/32');
    expect(formatInchFraction(18, { denominator: 16 })).toBe('11/16');
  });

  it('reads mixed numbers and decimals', () => {
    expect(parseInchFraction('1-1/16')).toBeCloseTo(26.9875, 9);
    expect(parseInchFraction('1 3/4')).toBeCloseTo(44.45, 9);
    expect(parseInchFraction('2.5')).toBeCloseTo(63.5, 9);
    expect(parseInchFraction('1/0')).toBeUndefined();
    expect(parseInchFraction('oak')).toBeUndefined();
  });

  it('formatting then parsing lands within 1/64 in of the input', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 5000, noNaN: true }), (mm) => {
        const back = parseInchFraction(formatInchFraction(mm));
        expect(back).toBeDefined();
        expect(Math.abs((back ?? 0) - mm)).toBeLessThanOrEqual(25.4 / 64 + 1e-9);
      }),
    );
  });
});
