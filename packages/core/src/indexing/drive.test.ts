import { describe, expect, it } from 'vitest';
import { inchesToMm } from '../units/length';
import { indexPosition, leadFromThreadsPerInch, stepsPerMm, stepsPerRevFromStepAngle } from './drive';

describe('stepsPerMm', () => {
  // REFERENCES.md, Motion [derived]: steps per mm = steps/rev × microsteps / lead.
  it('gives 640 steps/mm, 0.0015625 mm/step, for 200 steps/rev, 16 microsteps and a 5 mm lead [derived]', () => {
    const rate = stepsPerMm({ lead: 5, stepsPerRev: 200, microsteps: 16 });
    expect(rate).toBe(640);
    expect(1 / rate).toBe(0.0015625);
  });

  it('gives 400 steps/mm for 200 steps/rev, 16 microsteps and an 8 mm lead [derived]', () => {
    expect(stepsPerMm({ lead: 8, stepsPerRev: 200, microsteps: 16 })).toBe(400);
  });

  // REFERENCES.md, Motion [derived]: on a 0.1 in lead, 3/4 in is exactly 1500 full steps.
  it('moves 3/4 in in exactly 1500 full steps on a 10 threads-per-inch screw [derived]', () => {
    const rate = stepsPerMm({ lead: leadFromThreadsPerInch(10), stepsPerRev: 200, microsteps: 1 });
    expect(indexPosition(inchesToMm(0.75), rate).steps).toBe(1500);
    expect(indexPosition(inchesToMm(0.75), rate).roundingError).toBeCloseTo(0, 12);
  });
});

describe('leadFromThreadsPerInch', () => {
  // REFERENCES.md, Units [read]: 1 in = 25.4 mm exactly, so 10 threads per inch is a 2.54 mm lead.
  it('uses 25.4 mm per inch', () => {
    expect(leadFromThreadsPerInch(10)).toBeCloseTo(2.54, 12);
    expect(leadFromThreadsPerInch(1)).toBe(25.4);
  });
});

describe('stepsPerRevFromStepAngle', () => {
  // REFERENCES.md, Motion [read, motor glossaries]: a 1.8° hybrid stepper has 200 steps/rev.
  it('turns 1.8° into 200 steps and 0.9° into 400', () => {
    expect(stepsPerRevFromStepAngle(1.8)).toBe(200);
    expect(stepsPerRevFromStepAngle(0.9)).toBe(400);
  });
});

describe('indexPosition', () => {
  // REFERENCES.md, Motion [derived]: at 25 steps/mm, 1/4 in = 6.35 mm = 158.75 steps → 159, error 0.01 mm.
  it('rounds 1/4 in at 25 steps/mm to 159 steps with 0.01 mm error [derived]', () => {
    const rate = stepsPerMm({ lead: 8, stepsPerRev: 200, microsteps: 1 });
    expect(rate).toBe(25);
    const indexed = indexPosition(inchesToMm(0.25), rate);
    expect(indexed.steps).toBe(159);
    expect(indexed.roundingError).toBeCloseTo(0.01, 10);
  });

  it('counts every position from home, so that an error does not carry into the next move', () => {
    const rate = 25;
    const positions = Array.from({ length: 40 }, (_, index) => index * inchesToMm(0.25));
    const last = positions.at(-1) ?? 0;
    const sumOfRoundedMoves = positions
      .slice(1)
      .reduce((sum, position, index) => sum + Math.round((position - (positions[index] ?? 0)) * rate), 0);
    expect(Math.abs(indexPosition(last, rate).roundingError)).toBeLessThanOrEqual(0.5 / rate);
    // Rounding each ¼ in move on its own would have drifted by 39 × 0.25 steps.
    expect(Math.abs(sumOfRoundedMoves / rate - last)).toBeGreaterThan(0.3);
  });
});
