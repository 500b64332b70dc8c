import { describe, expect, it } from 'vitest';
import { planOf } from './test-plans';
import { boardPicture, niceStep } from './picture-geometry';

describe('boardPicture', () => {
  // 95 mm leaves a 5 mm slot at board A's right edge, narrower than the cutter: its pass runs past the edge.
  const plan = planOf({ width: 95, pin: 10, kerf: 6 });

  it.each(['A', 'B'] as const)('draws every pin and every pass of board %s at its true width', (board) => {
    const picture = boardPicture(plan, board);
    expect(picture.pins.map((pin) => [pin.x, pin.x + pin.width])).toEqual(plan.boards[board].pins);
    expect(picture.passes.map((pass) => pass.x)).toEqual(plan.boards[board].passes.map((pass) => pass.position));
    expect(new Set(picture.passes.map((pass) => pass.width))).toEqual(new Set([plan.kerf]));
    expect(picture.body.width).toBe(plan.width);
  });

  it('keeps a pass that runs past the board edge inside the picture', () => {
    const { viewBox, passes } = boardPicture(plan, 'A');
    const right = Math.max(...passes.map((pass) => pass.x + pass.width));
    expect(right).toBeGreaterThan(plan.width);
    expect(viewBox.x + viewBox.width).toBeGreaterThan(right);
    expect(viewBox.x).toBeLessThan(0);
  });
});

describe('niceStep', () => {
  it.each([
    [10, 10],
    [7, 5],
    [0.3, 0.2],
    [160, 200],
  ])('puts the grid near %f at %f', (target, step) => {
    expect(niceStep(target)).toBeCloseTo(step, 12);
  });
});
