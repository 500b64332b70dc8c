import { describe, expect, it } from 'vitest';
import { inchesToMm } from '../units/length';
import { boardFeet } from './board-feet';

describe('board feet', () => {
  // US Navy, Engineering Aid Basic, lumber chapter [read]: a 14 ft 2×4 = 9⅓ board feet (nominal sizes).
  it('a 14 ft 2 × 4 is 9 1/3 board feet', () => {
    expect(boardFeet(inchesToMm(2), inchesToMm(4), inchesToMm(14 * 12))).toBeCloseTo(28 / 3, 9);
  });

  // Same source: stock under 1 in thick counts as 1 in; a 1×6 board 96 in long = 4 BF [derived].
  it('a 1 × 6 board 96 in long is 4 board feet', () => {
    expect(boardFeet(inchesToMm(1), inchesToMm(6), inchesToMm(96))).toBeCloseTo(4, 9);
  });

  it('3/4 in stock counts as 1 in thick', () => {
    expect(boardFeet(inchesToMm(0.75), inchesToMm(6), inchesToMm(96))).toBeCloseTo(4, 9);
  });

  it('one board foot is 144 in³: 12 × 12 × 1 in', () => {
    expect(boardFeet(inchesToMm(1), inchesToMm(12), inchesToMm(12))).toBeCloseTo(1, 12);
  });
});
