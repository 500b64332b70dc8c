import { describe, expect, it } from 'vitest';
import { layoutFingers } from './finger-layout';
import { boardPassCount, boardPasses, passCount, slotPassPositions } from './passes';

describe('passCount', () => {
  it('is ceil(slot / kerf)', () => {
    expect(passCount(10, 3.2)).toBe(4);
    expect(passCount(6.4, 3.2)).toBe(2);
    expect(passCount(3, 3.2)).toBe(1);
  });
  it('does not add a pass for floating-point noise', () => {
    expect(passCount(0.1 * 3, 0.1)).toBe(3);
  });
});

describe('slotPassPositions', () => {
  const options = { width: 100 };

  it('puts the first pass flush left, the last flush right, the rest evenly between', () => {
    const positions = slotPassPositions([10, 20], 3.2, options);
    expect(positions).toHaveLength(4);
    expect(positions[0]).toBe(10);
    expect(positions[3]).toBe(16.8);
    expect((positions[2] ?? 0) - (positions[1] ?? 0)).toBeCloseTo((positions[1] ?? 0) - (positions[0] ?? 0), 12);
  });

  it('cuts a slot exactly as wide as the cutter in one pass', () => {
    expect(slotPassPositions([30, 35], 5, options)).toEqual([30]);
  });

  it('runs a narrow right-edge slot’s single pass past the board edge, never into the pin on its left', () => {
    expect(slotPassPositions([98, 100], 3.2, options)).toEqual([98]);
  });

  it('runs a narrow left-edge slot’s single pass past the left edge, against the pin on its right', () => {
    const [position] = slotPassPositions([0, 2], 3.2, options);
    expect(position).toBeCloseTo(-1.2, 12);
  });
});

describe('boardPasses', () => {
  it('numbers slots and passes from 1, left to right', () => {
    const layout = layoutFingers({ width: 40, pin: 10, slot: 10, start: 'pin' });
    const passes = boardPasses(layout.A, 6, { width: 40 });
    expect(passes.map(({ slot, pass }) => [slot, pass])).toEqual([
      [1, 1],
      [1, 2],
      [2, 1],
      [2, 2],
    ]);
    expect(boardPassCount(layout.A, 6)).toBe(passes.length);
  });
});
