import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Span } from './finger-layout';
import type { JointInput } from './joint-input';
import { planJoint, type BoardPlan, type JointPlan } from './plan-joint';

// Far below a step (≥ 0.00002 mm here) and far above floating-point noise.
const TOLERANCE = 1e-7;

/** Any valid joint: the cutter fits every interior slot, the board holds more than its first feature. */
const validJoint: fc.Arbitrary<JointInput> = fc
  .record({
    units: fc.constantFrom('mm' as const, 'in' as const),
    pin: fc.double({ min: 1, max: 40, noNaN: true }),
    slot: fc.option(fc.double({ min: 1, max: 40, noNaN: true }), { nil: undefined }),
    kerfShare: fc.double({ min: 0.2, max: 1, noNaN: true }),
    extraWidth: fc.double({ min: 0.01, max: 500, noNaN: true }),
    start: fc.constantFrom('pin' as const, 'slot' as const),
    lead: fc.double({ min: 1, max: 25, noNaN: true }),
    stepsPerRev: fc.constantFrom(200, 400, 48),
    microsteps: fc.constantFrom(1, 2, 4, 8, 16, 32, 256),
  })
  .map(({ units, pin, slot, kerfShare, extraWidth, start, lead, stepsPerRev, microsteps }) => {
    const scale = units === 'in' ? 1 / 25.4 : 1;
    const slotWidth = slot ?? pin;
    const first = start === 'pin' ? pin : slotWidth;
    return {
      units,
      width: (first + extraWidth) * scale,
      pin: pin * scale,
      slot: slot === undefined ? undefined : slot * scale,
      kerf: kerfShare * Math.min(pin, slotWidth) * scale,
      start,
      lead,
      stepsPerRev,
      microsteps,
    };
  });

function planned(input: JointInput): JointPlan {
  const outcome = planJoint(input);
  if (!outcome.ok) throw new Error(`a valid joint was refused: ${JSON.stringify(outcome.errors)}`);
  return outcome.plan;
}

const overlaps = ([a, b]: Span, [c, d]: Span): boolean => Math.min(b, d) - Math.max(a, c) > TOLERANCE;

function passesOfSlot(board: BoardPlan, slotNumber: number): Span[] {
  return board.passes.filter((pass) => pass.slot === slotNumber).map((pass): Span => [pass.position, pass.position]);
}

describe('planJoint over any valid joint', () => {
  it('tiles the width with the slots of A and B, without gaps or overlaps', () => {
    fc.assert(
      fc.property(validJoint, (input) => {
        const plan = planned(input);
        const slots = [...plan.boards.A.slots, ...plan.boards.B.slots].sort((x, y) => x[0] - y[0]);
        expect(slots[0]?.[0]).toBe(0);
        expect(Math.abs((slots.at(-1)?.[1] ?? 0) - plan.width)).toBeLessThan(TOLERANCE);
        slots.slice(1).forEach(([from], index) => {
          expect(Math.abs(from - (slots[index]?.[1] ?? Number.NaN))).toBeLessThan(TOLERANCE);
        });
        expect(plan.boards.B.slots).toEqual(plan.boards.A.pins);
      }),
    );
  });

  it('covers each slot exactly with its passes and never cuts a pin', () => {
    fc.assert(
      fc.property(validJoint, (input) => {
        const plan = planned(input);
        const problems = [plan.boards.A, plan.boards.B].flatMap((board) =>
          board.slots.flatMap(([from, to], index) => {
            const cuts = passesOfSlot(board, index + 1).map(([position]): Span => [position, position + plan.kerf]);
            const first = cuts[0];
            const last = cuts.at(-1);
            if (first === undefined || last === undefined) return [`slot ${index + 1} has no pass`];
            const gaps = cuts.slice(1).filter(([start], pass) => start > (cuts[pass]?.[1] ?? Number.NaN) + TOLERANCE);
            return [
              first[0] > from + TOLERANCE && 'left side of the slot not cut',
              last[1] < to - TOLERANCE && 'right side of the slot not cut',
              gaps.length > 0 && 'a gap between passes',
              // Nothing outside the slot, except past a board edge.
              from > 0 && first[0] < from - TOLERANCE && 'cut left of the slot',
              to < plan.width - TOLERANCE && last[1] > to + TOLERANCE && 'cut right of the slot',
              cuts.some((cut) => board.pins.some((pin) => overlaps(cut, pin))) && 'cut into a pin',
            ]
              .filter((problem): problem is string => typeof problem === 'string')
              .map((problem) => `${board.startsWith}-first board, slot ${index + 1}: ${problem}`);
          }),
        );
        expect(problems).toEqual([]);
      }),
    );
  });

  it('uses the fewest passes: ceil(slot / kerf)', () => {
    fc.assert(
      fc.property(validJoint, (input) => {
        const plan = planned(input);
        const wrong = [plan.boards.A, plan.boards.B].flatMap((board) =>
          board.slots.filter(([from, to], index) => {
            const count = passesOfSlot(board, index + 1).length;
            // Enough passes to span the slot, and one fewer would not.
            const enough = count * plan.kerf >= to - from - TOLERANCE;
            const fewest = count === 1 || (count - 1) * plan.kerf < to - from;
            return !(enough && fewest);
          }),
        );
        expect(wrong).toEqual([]);
      }),
    );
  });

  it('puts each pass on round(position × steps per mm), within half a step, in ascending order', () => {
    fc.assert(
      fc.property(validJoint, (input) => {
        const plan = planned(input);
        const rate = plan.stepsPerMm ?? Number.NaN;
        const resolution = plan.resolution ?? Number.NaN;
        const passes = [plan.boards.A.passes, plan.boards.B.passes];
        const misplaced = passes
          .flat()
          .filter(
            (pass) =>
              pass.steps !== Math.round(pass.position * rate) ||
              !(Math.abs((pass.steps ?? Number.NaN) / rate - pass.position) <= resolution / 2 + 1e-9),
          );
        const outOfOrder = passes.flatMap((board) =>
          board.filter((pass, index) => index > 0 && !(pass.position > (board[index - 1]?.position ?? Number.NaN))),
        );
        expect(misplaced).toEqual([]);
        expect(outOfOrder).toEqual([]);
        const errors = passes.flat().map((pass) => Math.abs(pass.roundingError ?? Number.NaN));
        expect(plan.maxRoundingError).toBe(Math.max(...errors));
        expect(plan.stepsPerMm).toBeCloseTo(
          ((input.stepsPerRev ?? 200) * (input.microsteps ?? 1)) / (input.lead ?? 1),
          9,
        );
      }),
    );
  });
});
