import { CSV_COLUMNS, type JointPlan } from '@jigwright/core';
import { describe, expect, it } from 'vitest';
import { planOf } from './test-plans';
import { exportFiles } from './export-files';

const byId = (plan: JointPlan) => Object.fromEntries(exportFiles(plan).map((file) => [file.id, file]));

describe('exportFiles', () => {
  const plan = planOf({ width: 100, pin: 10, kerf: 3.2, lead: 5, microsteps: 16 });

  it('writes the CSV with its header line and one row per pass', () => {
    const csv = byId(plan).csv;
    if (!csv?.ok) throw new Error('expected the CSV');
    const lines = csv.text.trimEnd().split('\r\n');
    expect(lines[0]).toBe(CSV_COLUMNS.join(','));
    expect(lines).toHaveLength(plan.passCount + 1);
  });

  it('writes one G-code program per board, each ending with M2', () => {
    for (const board of ['A', 'B'] as const) {
      const file = byId(plan)[`gcode-${board}`];
      if (!file?.ok) throw new Error(`expected the G-code of board ${board}`);
      expect(file.text).toContain(`board ${board}`);
      expect(file.text.trimEnd().split('\n').at(-1)).toMatch(/^M2\b/);
      expect(file.text.match(/^M0\b/gm)).toHaveLength(plan.boards[board].passes.length);
    }
  });

  it('offers the C header only with a drive, and says why not', () => {
    expect(byId(plan)['c-header']?.ok).toBe(true);
    const noDrive = byId(planOf({ width: 100, pin: 10, kerf: 3.2 }))['c-header'];
    expect(noDrive?.ok).toBe(false);
    expect(noDrive && !noDrive.ok && noDrive.reason).toContain('lead');
  });
});
