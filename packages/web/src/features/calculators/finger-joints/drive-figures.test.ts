import type { JointInput, JointPlan } from '@jigwright/core';
import { describe, expect, it } from 'vitest';
import { planOf } from './test-plans';
import { driveFigures } from './drive-figures';

const figure = (plan: JointPlan, label: string) => driveFigures(plan).find((row) => row.label === label)?.value;

const base: JointInput = { width: 100, pin: 10, kerf: 3.2 };

describe('driveFigures', () => {
  it('has nothing to show without a lead', () => {
    expect(driveFigures(planOf(base))).toEqual([]);
  });

  // REFERENCES.md, Motion [derived]: 200 × 16 / 5 = 640 steps per mm, 0.0015625 mm per step.
  it('shows 640 steps per mm for a 5 mm lead at 16 microsteps [derived]', () => {
    const plan = planOf({ ...base, lead: 5, microsteps: 16 });
    expect(figure(plan, 'Steps per mm')).toBe('640');
    expect(figure(plan, 'Resolution')).toMatch(/^0\.00156\d mm per step$/);
    expect(figure(plan, 'Approach')).toBeUndefined();
    expect(figure(plan, 'Whirling speed')).toBeUndefined();
  });

  it('gives the approach rule with backlash, in steps', () => {
    const plan = planOf({ ...base, lead: 5, microsteps: 16, backlash: 0.1 });
    // 0.1 mm × 640 steps/mm = 64 steps [derived].
    expect(figure(plan, 'Approach')).toContain('64 steps');
  });

  // REFERENCES.md, Motion [derived]: d = 12.5 mm, L = 500 mm, fixed–pinned ≈ 9,430 rpm.
  it('shows the whirling speed cross-check and the lower of the two speed limits', () => {
    const plan = planOf({
      ...base,
      lead: 5,
      microsteps: 16,
      rootDiameter: 12.5,
      screwLength: 500,
      fixity: 'fixed-pinned',
      maxStepRate: 20_000,
    });
    expect(Number(figure(plan, 'Whirling speed')?.replace(/[^\d]/g, ''))).toBeGreaterThan(9400);
    expect(Number(figure(plan, 'Whirling speed')?.replace(/[^\d]/g, ''))).toBeLessThan(9460);
    // 20,000 steps/s ÷ 640 steps/mm × 60 = 1,875 mm/min [derived].
    expect(figure(plan, 'Top speed, step rate')).toBe('1,875 mm/min');
    expect(figure(plan, 'Top carriage speed')).toBe('1,875 mm/min');
  });
});
