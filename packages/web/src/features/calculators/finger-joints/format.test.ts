import { describe, expect, it } from 'vitest';
import { formatFixed, formatInDecimal, formatInFraction, formatLengthBoth, formatSpeed } from './format';

describe('formatting', () => {
  it('writes fixed decimals with grouped thousands and no negative zero', () => {
    expect(formatFixed(12345.6789, 2)).toBe('12,345.68');
    expect(formatFixed(-0.0001, 3)).toBe('0.000');
  });

  // 1 in = 25.4 mm exactly; ¾ in = 19.05 mm [derived] (REFERENCES.md, Units).
  it('writes inches as decimals and as fractions to 1/32 in', () => {
    expect(formatInDecimal(19.05)).toBe('0.7500 in');
    expect(formatInFraction(19.05)).toBe('3/4 in');
    expect(formatInFraction(18)).toBe('23/32 in');
  });

  it('puts the builder’s units first', () => {
    expect(formatLengthBoth(25.4, 'mm')).toBe('25.4 mm (1 in)');
    expect(formatLengthBoth(25.4, 'in')).toBe('1 in (25.4 mm)');
  });

  it('gives speeds in in/min only to a builder working in inches', () => {
    expect(formatSpeed(2540, 'mm')).toBe('2,540 mm/min');
    expect(formatSpeed(2540, 'in')).toBe('100.0 in/min (2,540 mm/min)');
  });
});
