import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inchesToMm } from '../units/length';
import type { JointInput } from './joint-input';
import { planJoint, type JointOutcome, type JointPlan } from './plan-joint';
import { MAX_PASSES } from './validation';

function planOf(outcome: JointOutcome): JointPlan {
  if (!outcome.ok) throw new Error(`expected a plan, got ${JSON.stringify(outcome.errors)}`);
  return outcome.plan;
}

function fieldsOf(outcome: JointOutcome): string[] {
  return outcome.ok ? [] : outcome.errors.map((error) => error.field);
}

const base: JointInput = { width: 100, pin: 10, kerf: 3.2 };

describe('planJoint', () => {
  it('lays out both boards and leaves steps empty without a drive', () => {
    const plan = planOf(planJoint(base));
    expect(plan.boards.A.slots).toHaveLength(5);
    expect(plan.boards.B.slots).toHaveLength(5);
    expect(plan.passCount).toBe(40);
    expect(plan.stepsPerMm).toBeNull();
    expect(plan.drive).toBeNull();
    expect(plan.boards.A.passes.every((pass) => pass.steps === null)).toBe(true);
  });

  // REFERENCES.md, Motion [derived]: 200 × 16 / 5 = 640 steps per mm, 0.0015625 mm per step.
  it('indexes every pass at 640 steps/mm for a 5 mm lead at 16 microsteps [derived]', () => {
    const plan = planOf(planJoint({ ...base, lead: 5, microsteps: 16 }));
    expect(plan.stepsPerMm).toBe(640);
    expect(plan.resolution).toBe(0.0015625);
    expect(plan.boards.A.passes[0]).toMatchObject({ position: 10, steps: 6400 });
    expect(plan.maxRoundingError).toBeLessThanOrEqual(0.0015625 / 2);
  });

  // REFERENCES.md, Units [read] and Motion [derived]: 1 in = 25.4 mm; ¾ in on a 0.1 in lead = 1500 full steps.
  it('takes inches and threads per inch, and puts the pass at ¾ in on step 1500 [derived]', () => {
    const plan = planOf(planJoint({ units: 'in', width: 3, pin: 0.25, kerf: 0.125, threadsPerInch: 10 }));
    expect(plan.width).toBeCloseTo(76.2, 12);
    expect(plan.pin).toBeCloseTo(6.35, 12);
    const atThreeQuarters = plan.boards.A.passes.find((pass) => Math.abs(pass.position - inchesToMm(0.75)) < 1e-9);
    expect(atThreeQuarters?.steps).toBe(1500);
  });

  it('gives drive figures: approach rule with backlash, travel, whirling and step-rate limits', () => {
    const plan = planOf(
      planJoint({
        ...base,
        lead: 5,
        microsteps: 16,
        backlash: 0.1,
        rootDiameter: 12.5,
        screwLength: 500,
        fixity: 'fixed-pinned',
        maxStepRate: 20_000,
      }),
    );
    const drive = plan.drive;
    expect(drive?.approach?.takeUpSteps).toBe(64);
    expect(drive?.travel.from).toBeCloseTo(-0.1, 12);
    expect(drive?.whirling?.criticalRpm).toBeGreaterThan(9400);
    expect(drive?.stepRateTopSpeed).toBe(1875);
    expect(drive?.topSpeed).toBe(Math.min(drive?.whirling?.topSpeed ?? Infinity, 1875));
  });

  it('takes the step angle instead of steps per revolution', () => {
    const plan = planOf(planJoint({ ...base, lead: 8, stepAngle: 0.9 }));
    expect(plan.drive?.stepsPerRev).toBe(400);
    expect(plan.stepsPerMm).toBe(50);
  });

  it('warns when the right-edge feature is cut short and suggests symmetric widths', () => {
    const plan = planOf(planJoint({ ...base, width: 95 }));
    expect(plan.warnings.map((warning) => warning.code)).toEqual(['partial-edge']);
    expect(plan.warnings[0]?.message).toContain('5 mm');
    expect(plan.symmetry.map((suggestion) => suggestion.width)).toContain(90);
    expect(plan.symmetry.map((suggestion) => suggestion.width)).toContain(110);
  });

  it('has no warning when the width holds whole features', () => {
    expect(planOf(planJoint(base)).warnings).toEqual([]);
  });

  it('does not change its input', () => {
    const input: JointInput = { ...base, units: 'in', width: 4, pin: 0.5, kerf: 0.125, lead: 2, backlash: 0.01 };
    const copy = structuredClone(input);
    planJoint(Object.freeze(input));
    expect(input).toEqual(copy);
  });

  it('returns plain data that survives JSON', () => {
    const plan = planOf(planJoint({ ...base, lead: 5, microsteps: 16, rootDiameter: 10, screwLength: 300 }));
    expect(JSON.parse(JSON.stringify(plan))).toEqual(plan);
  });
});

describe('planJoint validation', () => {
  it.each([
    [{ ...base, width: 0 }, 'width'],
    [{ ...base, pin: -1 }, 'pin'],
    [{ ...base, pin: Number.NaN }, 'pin'],
    [{ ...base, slot: 0 }, 'slot'],
    [{ ...base, kerf: Infinity }, 'kerf'],
    [{ ...base, lead: 5, threadsPerInch: 10 }, 'threadsPerInch'],
    [{ ...base, lead: 5, microsteps: 300 }, 'microsteps'],
    [{ ...base, lead: 5, microsteps: 2.5 }, 'microsteps'],
    [{ ...base, lead: 5, stepsPerRev: 200, stepAngle: 1.8 }, 'stepAngle'],
    [{ ...base, lead: 5, stepAngle: 1.7 }, 'stepAngle'],
    [{ ...base, lead: 5, backlash: -0.1 }, 'backlash'],
    [{ ...base, lead: 5, rootDiameter: 10 }, 'screwLength'],
    [{ ...base, lead: 5, screwLength: 400 }, 'rootDiameter'],
    [{ ...base, lead: 0 }, 'lead'],
    [{ ...base, lead: 5, maxStepRate: 0 }, 'maxStepRate'],
  ] satisfies Array<[JointInput, string]>)('reports %o on field %s', (input, field) => {
    const outcome = planJoint(input);
    expect(fieldsOf(outcome)).toContain(field);
    if (!outcome.ok) expect(outcome.errors.every((error) => error.message.length > 0)).toBe(true);
  });

  it('rejects units and starting features it does not know', () => {
    const input = { ...base, units: 'cm', start: 'tenon' } as unknown as JointInput;
    expect(fieldsOf(planJoint(input))).toEqual(['units', 'start']);
  });

  it('reports every bad field at once, in form order', () => {
    expect(fieldsOf(planJoint({ width: -1, pin: 0, kerf: 0 }))).toEqual(['width', 'pin', 'kerf']);
  });

  it('refuses a cutter wider than board A’s slots, naming the board', () => {
    const outcome = planJoint({ ...base, slot: 3, kerf: 4 });
    expect(fieldsOf(outcome)).toEqual(['kerf']);
    expect(outcome.ok ? '' : outcome.errors[0]?.message).toContain('board A');
  });

  it('refuses a cutter wider than board B’s slots, which are pin-wide', () => {
    const outcome = planJoint({ ...base, pin: 3, slot: 10, kerf: 4 });
    expect(outcome.ok ? '' : outcome.errors[0]?.message).toContain('board B');
  });

  it('allows a cutter wider than an edge slot only', () => {
    // A: slot 0–3, pin 3–13 (B: pin 0–3, slot 3–13): no interior slot of A exists.
    const plan = planOf(planJoint({ width: 13, pin: 10, slot: 3, kerf: 4, start: 'slot' }));
    expect(plan.boards.A.passes.map((pass) => pass.position)).toEqual([-1]);
  });

  it('needs a board wider than its first feature, so that both boards get a slot', () => {
    expect(fieldsOf(planJoint({ ...base, width: 10 }))).toEqual(['width']);
  });

  it(`refuses more than ${MAX_PASSES} passes`, () => {
    expect(fieldsOf(planJoint({ width: 10_000, pin: 1, kerf: 0.1 }))).toEqual(['kerf']);
    expect(fieldsOf(planJoint({ width: 1e9, pin: 1, kerf: 1 }))).toEqual(['width']);
  });

  it('refuses step counts that do not fit a 32-bit long', () => {
    expect(fieldsOf(planJoint({ ...base, width: 2000, pin: 100, kerf: 50, lead: 0.01, microsteps: 256 }))).toEqual([
      'microsteps',
    ]);
  });

  it('never throws, whatever a form sends', () => {
    const anything = fc.oneof(
      fc.double(),
      fc.integer(),
      fc.string(),
      fc.constant(undefined),
      fc.constantFrom('mm', 'in', 'pin', 'slot', 'fixed-free'),
    );
    const fields = [
      'units',
      'width',
      'pin',
      'slot',
      'kerf',
      'start',
      'lead',
      'threadsPerInch',
      'stepsPerRev',
      'stepAngle',
      'microsteps',
      'backlash',
      'rootDiameter',
      'screwLength',
      'fixity',
      'maxStepRate',
    ] as const;
    const form = fc.record(Object.fromEntries(fields.map((field) => [field, anything])), { requiredKeys: [] });
    fc.assert(
      fc.property(form, (values) => {
        const outcome = planJoint(values as unknown as JointInput);
        expect(typeof outcome.ok).toBe('boolean');
      }),
    );
  });
});
