import { describe, expect, it } from 'vitest';
import { formatDifferenceMm, formatLength, formatSize, parseUnits } from './units';

describe('lengths in the member’s units', () => {
  // 1 in = 25.4 mm exactly (NBS 1959).
  it('writes inches with fractions to 1/32 in', () => {
    expect(formatLength(19.05, 'in')).toBe('3/4 in');
    expect(formatLength(304.8 + 25.4 / 32, 'in')).toBe('12-1/32 in');
    expect(formatSize([609.6, 304.8, 19.05], 'in')).toBe('24 × 12 × 3/4 in');
  });

  it('writes millimetres to a tenth', () => {
    expect(formatLength(305.46, 'mm')).toBe('305.5 mm');
    expect(formatSize([600, 300, 18], 'mm')).toBe('600 × 300 × 18 mm');
  });

  it('signs differences and reads unknown units as mm', () => {
    expect(formatDifferenceMm(12)).toBe('+12 mm');
    expect(formatDifferenceMm(-3.24)).toBe('−3.2 mm');
    expect(formatDifferenceMm(0.01)).toBe('0 mm');
    expect(parseUnits('in')).toBe('in');
    expect(parseUnits('furlongs')).toBe('mm');
  });
});
