import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { MM_PER_INCH } from '../units/length';
import { CSV_COLUMNS, jointCsv } from './export-csv';
import { planJoint, type JointPlan } from './plan-joint';

function planOf(outcome: ReturnType<typeof planJoint>): JointPlan {
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.errors));
  return outcome.plan;
}

// Re-read with a general-purpose CSV parser from npm.
describe('jointCsv', () => {
  it('lists every pass of both boards with mm, inches (25.4 mm each, exactly [read]) and steps', () => {
    const plan = planOf(planJoint({ units: 'in', width: 4, pin: 0.375, kerf: 0.125, lead: 2, microsteps: 8 }));
    const rows: Record<string, string>[] = parse(jointCsv(plan), { columns: true });
    const passes = [
      ...plan.boards.A.passes.map((pass) => ({ board: 'A', ...pass })),
      ...plan.boards.B.passes.map((pass) => ({ board: 'B', ...pass })),
    ];
    expect(rows).toHaveLength(plan.passCount);
    expect(Object.keys(rows[0] ?? {})).toEqual([...CSV_COLUMNS]);
    rows.forEach((row, index) => {
      const pass = passes[index];
      expect(row.board).toBe(pass?.board);
      expect(Number(row.slot)).toBe(pass?.slot);
      expect(Number(row.pass)).toBe(pass?.pass);
      expect(Number(row.position_mm)).toBeCloseTo(pass?.position ?? Number.NaN, 4);
      expect(Number(row.position_in) * MM_PER_INCH).toBeCloseTo(Number(row.position_mm), 3);
      expect(Number(row.steps)).toBe(pass?.steps);
    });
  });

  it('leaves the steps empty without a drive', () => {
    const plan = planOf(planJoint({ width: 50, pin: 10, kerf: 5 }));
    const rows: Record<string, string>[] = parse(jointCsv(plan), { columns: true });
    expect(rows.every((row) => row.steps === '')).toBe(true);
  });
});
