import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LENGTH_TOLERANCE_MM, layoutFingers, type BoardLayout } from './finger-layout';
import { suggestSymmetricLayouts } from './symmetry';

function edgeFeatures(board: BoardLayout, width: number): Array<{ kind: string; size: number }> {
  const features = [
    ...board.pins.map(([from, to]) => ({ kind: 'pin', from, to })),
    ...board.slots.map(([from, to]) => ({ kind: 'slot', from, to })),
  ].sort((a, b) => a.from - b.from);
  const first = features[0];
  const last = features.at(-1);
  return [first, last].map((feature) => ({
    kind: feature?.kind ?? 'none',
    size: feature === undefined ? 0 : Math.min(feature.to, width) - feature.from,
  }));
}

describe('suggestSymmetricLayouts', () => {
  it('suggests the nearest widths below and above, keeping pin and slot', () => {
    const suggestions = suggestSymmetricLayouts(
      { width: 95, pin: 10, slot: 10, kerf: 3, start: 'pin' },
      { slotFollowsPin: true },
    );
    expect(suggestions.filter((s) => s.change === 'width').map((s) => s.width)).toEqual([90, 110]);
  });

  it('suggests nothing when the layout is already symmetric', () => {
    expect(
      suggestSymmetricLayouts({ width: 90, pin: 10, slot: 10, kerf: 3, start: 'pin' }, { slotFollowsPin: true }),
    ).toEqual([]);
  });

  it('never suggests a pin narrower than the cutter', () => {
    const suggestions = suggestSymmetricLayouts(
      { width: 35, pin: 5, slot: 5, kerf: 5, start: 'pin' },
      { slotFollowsPin: true },
    );
    expect(suggestions.every((s) => s.pin >= 5 - LENGTH_TOLERANCE_MM)).toBe(true);
  });

  it('gives layouts with the same whole feature at both edges of board A', () => {
    const input = fc.record({
      width: fc.double({ min: 30, max: 600, noNaN: true }),
      pin: fc.double({ min: 3, max: 25, noNaN: true }),
      slot: fc.double({ min: 3, max: 25, noNaN: true }),
      start: fc.constantFrom('pin' as const, 'slot' as const),
      slotFollowsPin: fc.boolean(),
    });
    fc.assert(
      fc.property(input, ({ width, pin, slot, start, slotFollowsPin }) => {
        const given = { width, pin, slot: slotFollowsPin ? pin : slot, kerf: 1, start };
        for (const suggestion of suggestSymmetricLayouts(given, { slotFollowsPin })) {
          const layout = layoutFingers({ ...suggestion, start });
          const full = start === 'pin' ? suggestion.pin : suggestion.slot;
          const [first, last] = edgeFeatures(layout.A, suggestion.width);
          expect(first?.kind).toBe(start);
          expect(last?.kind).toBe(start);
          expect(last?.size).toBeCloseTo(full, 6);
          expect(layout.A.pins).toHaveLength(suggestion.pins);
          expect(layout.A.slots).toHaveLength(suggestion.slots);
          // Near: within one pin and slot of what was given.
          expect(Math.abs(suggestion.width - width)).toBeLessThanOrEqual(given.pin + given.slot);
        }
      }),
    );
  });
});
