import { planJoint, type JointPlan } from '@jigwright/core';
import { describe, expect, it } from 'vitest';
import {
  applySuggestion,
  convertUnits,
  DEFAULT_FORM,
  formFromQuery,
  formToQuery,
  jointInputQuery,
  readNumber,
  toJointInput,
  type JointFormState,
} from './joint-form';
import { planOf } from './test-plans';

const planOfForm = (form: JointFormState): JointPlan => planOf(toJointInput(form));

const positions = (plan: JointPlan) => [...plan.boards.A.passes, ...plan.boards.B.passes].map((pass) => pass.position);

const withText = (form: JointFormState, text: Partial<JointFormState['text']>): JointFormState => ({
  ...form,
  text: { ...form.text, ...text },
});

describe('reading a box', () => {
  it('leaves an empty box out and makes unreadable text NaN, for the core to name', () => {
    expect(readNumber('  ', { fraction: false })).toBeUndefined();
    expect(readNumber('oak', { fraction: false })).toBeNaN();
    expect(readNumber('12,5', { fraction: false })).toBe(12.5);
  });

  it('reads inch fractions as inches', () => {
    expect(readNumber('1-1/2', { fraction: true })).toBeCloseTo(1.5, 12);
    expect(readNumber('3/4', { fraction: true })).toBeCloseTo(0.75, 12);
    expect(readNumber('3/0', { fraction: true })).toBeNaN();
    expect(readNumber('3/4', { fraction: false })).toBeNaN();
  });
});

describe('the form and the core input', () => {
  it('sends only the chosen one of lead and threads per inch', () => {
    const byTpi = { ...DEFAULT_FORM, leadAs: 'threadsPerInch' as const };
    const input = toJointInput(byTpi);
    expect(input.threadsPerInch).toBe(Number(DEFAULT_FORM.text.threadsPerInch));
    expect(input.lead).toBeUndefined();
  });

  it('reports an empty required box through the core, on that field', () => {
    const outcome = planJoint(toJointInput(withText(DEFAULT_FORM, { kerf: '' })));
    expect(outcome.ok ? [] : outcome.errors.map((error) => error.field)).toContain('kerf');
  });

  it('does not change the state it converts', () => {
    const before = structuredClone(DEFAULT_FORM);
    convertUnits(DEFAULT_FORM, 'in');
    expect(DEFAULT_FORM).toEqual(before);
  });
});

describe('switching units', () => {
  // 1 in = 25.4 mm exactly (NBS 1959, REFERENCES.md Units [read]).
  it('writes 1 in as 25.4 mm and 25.4 mm as 1 in', () => {
    const inches = withText({ ...DEFAULT_FORM, units: 'in' }, { width: '1' });
    expect(convertUnits(inches, 'mm').text.width).toBe('25.4');
    expect(convertUnits(withText(DEFAULT_FORM, { width: '25.4' }), 'in').text.width).toBe('1');
  });

  it('keeps the same joint, pass for pass, there and back', () => {
    const metric = withText(DEFAULT_FORM, { width: '156', pin: '12' });
    const inches = convertUnits(metric, 'in');
    const back = convertUnits(inches, 'mm');
    expect(inches.text.width).toBe('6.1417');
    expect(back.text.width).toBe('156');
    for (const form of [inches, back]) {
      const got = positions(planOfForm(form));
      const want = positions(planOfForm(metric));
      expect(got).toHaveLength(want.length);
      got.forEach((position, index) => expect(position).toBeCloseTo(want[index] ?? Number.NaN, 9));
    }
  });

  it('forgets the exact length once the builder types into the box', () => {
    const inches = convertUnits(withText(DEFAULT_FORM, { width: '156' }), 'in');
    expect(toJointInput(inches).width).not.toBe(6.1417);
    expect(toJointInput(withText(inches, { width: '6.142' })).width).toBe(6.142);
  });
});

describe('the query string', () => {
  it('gives the defaults when there is none', () => {
    expect(formFromQuery(new URLSearchParams())).toEqual(DEFAULT_FORM);
  });

  it('reproduces the form it was written from', () => {
    const form: JointFormState = withText(
      {
        ...DEFAULT_FORM,
        units: 'in',
        start: 'slot',
        leadAs: 'threadsPerInch',
        motorAs: 'stepAngle',
        fixity: 'fixed-free',
      },
      { width: '5-1/2', pin: '1/2', slot: '3/8', kerf: '1/8' },
    );
    const read = formFromQuery(new URLSearchParams(formToQuery(form).toString()));
    expect(toJointInput(read)).toEqual(toJointInput(form));
  });

  it('reproduces a units switch exactly, so that the link gives the same passes', () => {
    const inches = convertUnits(withText(DEFAULT_FORM, { width: '156', pin: '12' }), 'in');
    const read = formFromQuery(new URLSearchParams(formToQuery(inches).toString()));
    expect(positions(planOfForm(read))).toEqual(positions(planOfForm(inches)));
  });

  it('leaves out the drive when the link has no lead, and unknown choices fall back', () => {
    const read = formFromQuery(new URLSearchParams('units=cubit&width=100&pin=10&kerf=3&fixity=glued'));
    expect(read.units).toBe('mm');
    expect(read.fixity).toBe(DEFAULT_FORM.fixity);
    expect(planOfForm(read).drive).toBeNull();
  });

  it('writes the fixity only with the screw geometry', () => {
    expect(formToQuery(DEFAULT_FORM).get('fixity')).toBe(DEFAULT_FORM.fixity);
    const noScrew = withText(DEFAULT_FORM, { rootDiameter: '', screwLength: '' });
    expect(formToQuery(noScrew).has('fixity')).toBe(false);
  });
});

describe('symmetric widths', () => {
  it.each(['mm', 'in'] as const)('a suggestion taken into the form makes the layout symmetric (%s)', (units) => {
    const form = convertUnits(withText(DEFAULT_FORM, { width: '150', pin: '12' }), units);
    const suggestions = planOfForm(form).symmetry;
    expect(suggestions.length).toBeGreaterThan(0);
    for (const suggestion of suggestions) {
      const plan = planOfForm(applySuggestion(form, suggestion));
      expect(plan.warnings).toEqual([]);
      expect(plan.symmetry).toEqual([]);
      expect(plan.boards.A.pins).toHaveLength(suggestion.pins);
    }
  });
});

describe('jointInputQuery', () => {
  it('opens a saved set of inputs in the calculator as exactly the same joint', () => {
    const saved = toJointInput(DEFAULT_FORM);
    expect(toJointInput(formFromQuery(jointInputQuery(saved)))).toEqual(saved);
    const inches = {
      units: 'in' as const,
      start: 'slot' as const,
      width: 6.141732283464567,
      pin: 0.5,
      kerf: 0.125,
      threadsPerInch: 10,
      stepAngle: 0.9,
      microsteps: 8,
    };
    expect(toJointInput(formFromQuery(jointInputQuery(inches)))).toEqual(inches);
  });
});
