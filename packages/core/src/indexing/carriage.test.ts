import { describe, expect, it } from 'vitest';
import { approachRule, carriageSpeedAt, carriageTravel, stepRateTopSpeed } from './carriage';

describe('carriageTravel', () => {
  it('spans home, the take-up below the first pass and the last pass', () => {
    expect(carriageTravel([10, 20, 90], { takeUp: 0.5 })).toEqual({ from: 0, to: 90, length: 90 });
    expect(carriageTravel([-1, 20], { takeUp: 0.5 })).toEqual({ from: -1.5, to: 20, length: 21.5 });
  });
});

describe('approachRule', () => {
  it('backs off by the backlash rounded up to whole steps and always approaches moving up', () => {
    const rule = approachRule(0.1, 640);
    expect(rule.direction).toBe('positive');
    expect(rule.takeUpSteps).toBe(64);
    const rounded = approachRule(0.1001, 640);
    expect(rounded.takeUpSteps).toBe(65);
    expect(rounded.takeUp).toBeGreaterThanOrEqual(0.1001);
  });
});

describe('speed limits', () => {
  // [derived]: 20,000 steps/s at 640 steps/mm is 31.25 mm/s.
  it('turns a step rate into a carriage speed in mm/min', () => {
    expect(stepRateTopSpeed(20_000, 640)).toBe(1875);
  });
  it('turns screw rpm into carriage speed through the lead', () => {
    expect(carriageSpeedAt(600, 5)).toBe(3000);
  });
});
