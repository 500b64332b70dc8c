import { describe, expect, it } from 'vitest';
import { featureCount, layoutFingers } from './finger-layout';

describe('layoutFingers', () => {
  it('alternates pins and slots from board A’s starting pin', () => {
    const layout = layoutFingers({ width: 100, pin: 10, slot: 10, start: 'pin' });
    expect(layout.A.pins).toEqual([
      [0, 10],
      [20, 30],
      [40, 50],
      [60, 70],
      [80, 90],
    ]);
    expect(layout.A.slots).toEqual([
      [10, 20],
      [30, 40],
      [50, 60],
      [70, 80],
      [90, 100],
    ]);
  });

  it('gives board B a slot wherever board A has a pin, and the other starting feature', () => {
    const layout = layoutFingers({ width: 47, pin: 6, slot: 9, start: 'slot' });
    expect(layout.A.startsWith).toBe('slot');
    expect(layout.B.startsWith).toBe('pin');
    expect(layout.B.slots).toEqual(layout.A.pins);
    expect(layout.B.pins).toEqual(layout.A.slots);
    expect(layout.A.slots[0]).toEqual([0, 9]);
    expect(layout.A.pins[0]).toEqual([9, 15]);
  });

  it('cuts the last feature short at the right edge', () => {
    const layout = layoutFingers({ width: 95, pin: 10, slot: 10, start: 'pin' });
    expect(layout.A.slots.at(-1)).toEqual([90, 95]);
    expect(layout.A.pins.at(-1)).toEqual([80, 90]);
  });

  it('does not leave a sliver of floating-point noise as a feature', () => {
    // 0.1 + 0.2 is 0.30000000000000004 in binary floating point.
    const width = 0.1 + 0.2;
    const layout = layoutFingers({ width: width * 10, pin: 0.3, slot: 0.3, start: 'pin' });
    expect(layout.A.pins.length + layout.A.slots.length).toBe(10);
  });

  it('places edges from whole counts, so that the 1000th edge has not drifted', () => {
    const pin = 0.1;
    const layout = layoutFingers({ width: 1000 * pin + 0.05, pin, slot: pin, start: 'pin' });
    const edge = layout.A.pins[500]?.[0] ?? Number.NaN;
    expect(Math.abs(edge - 100)).toBeLessThan(1e-12);
  });
});

describe('featureCount', () => {
  it('counts whole features and a last one cut short', () => {
    expect(featureCount({ width: 100, pin: 10, slot: 10, start: 'pin' })).toBe(10);
    expect(featureCount({ width: 95, pin: 10, slot: 10, start: 'pin' })).toBe(10);
    expect(featureCount({ width: 90, pin: 10, slot: 10, start: 'pin' })).toBe(9);
    expect(featureCount({ width: 15, pin: 10, slot: 5, start: 'slot' })).toBe(2);
  });
});
