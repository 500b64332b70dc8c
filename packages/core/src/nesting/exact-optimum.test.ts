import fc from 'fast-check';
import solver, { type Model, type SolveResult } from 'javascript-lp-solver';
import { describe, expect, it } from 'vitest';
import { cutBars } from './bar-cutting';
import { layoutSheets } from './guillotine-layout';

/**
 * Exact bin count by a general-purpose MILP solver (javascript-lp-solver): binary x[i][j] puts
 * item i in bin j, binary y[j] opens bin j; Σ_j x = 1, Σ_i s·x ≤ C·y, minimise Σ y. Item i may only
 * go in bins 0…i and bins open in order, which removes symmetric copies of each solution.
 */
function exactBins(sizes: readonly number[], capacity: number): number {
  const model: Model = { optimize: 'bins', opType: 'min', constraints: {}, variables: {}, binaries: {} };
  const n = sizes.length;
  for (let j = 0; j < n; j += 1) {
    model.constraints[`cap${j}`] = { max: 0 };
    if (j + 1 < n) model.constraints[`order${j}`] = { min: 0 };
    const y: Record<string, number> = { bins: 1, [`cap${j}`]: -capacity };
    if (j + 1 < n) y[`order${j}`] = 1;
    if (j > 0) y[`order${j - 1}`] = -1;
    model.variables[`y${j}`] = y;
    (model.binaries as Record<string, boolean>)[`y${j}`] = true;
  }
  sizes.forEach((size, i) => {
    model.constraints[`item${i}`] = { equal: 1 };
    for (let j = 0; j <= i; j += 1) {
      model.variables[`x${i}_${j}`] = { [`item${i}`]: 1, [`cap${j}`]: size };
      (model.binaries as Record<string, boolean>)[`x${i}_${j}`] = true;
    }
  });
  // Without `full`, Solve returns the simplified result object (javascript-lp-solver's typings say unknown).
  const result = solver.Solve(model) as SolveResult;
  expect(result.feasible).toBe(true);
  return Math.round(result.result);
}

describe('against exact optima from a MILP solver', () => {
  it('the MILP finds the known optimum of a small case (5+3+2 | 4+3+3 in bins of 10)', () => {
    expect(exactBins([5, 4, 3, 3, 3, 2], 10)).toBe(2);
  });

  it('bars: the cutter uses the optimal number of bars on small random instances', () => {
    const rows: string[] = [];
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 100, max: 1800 }), { minLength: 2, maxLength: 8 }), (lengths) => {
        const kerf = 3;
        const bar = 2400;
        // Kerf folded in as the cutter does: items take length + kerf, the bar holds length + kerf.
        const optimum = exactBins(
          lengths.map((l) => l + kerf),
          bar + kerf,
        );
        const used = cutBars(
          lengths.map((length, i) => ({ name: `p${i}`, length })),
          { barLengths: [bar], kerf },
        ).bars.length;
        rows.push(`${lengths.length} pieces: optimum ${optimum}, used ${used}`);
        expect(used).toBeGreaterThanOrEqual(optimum);
        expect(used).toBe(optimum);
      }),
      { numRuns: 25 },
    );
    console.log(`bars against the MILP optimum:\n${rows.join('\n')}`);
  });

  // The sheet layout is a heuristic (a guillotine free-rectangle packer), so it may miss the optimum;
  // full-width strips are a 1D case where the MILP gives the exact answer to compare with. Found, for
  // example: strips of 1252, 781, 781, 675, 574 and 382 mm fit on 2 sheets, the packer uses 3, as
  // first-fit decreasing does. It must never beat the optimum (that would be a bug) nor miss it by more
  // than one sheet; how often it matches is printed.
  it('sheets: full-width strips reduce to 1D; never fewer sheets than the exact optimum, at most one more', () => {
    const rows: string[] = [];
    let matched = 0;
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 100, max: 1500 }), { minLength: 2, maxLength: 8 }), (lengths) => {
        const kerf = 3;
        const trim = 10;
        const usableWidth = 1220 - 2 * trim;
        const pieces = lengths.map((length, i) => ({
          name: `p${i}`,
          length,
          width: usableWidth,
          grain: 'length' as const,
        }));
        const optimum = exactBins(
          lengths.map((l) => l + kerf),
          2440 - 2 * trim + kerf,
        );
        const used = layoutSheets(pieces, { kerf, edgeTrim: trim }).sheets.length;
        if (used === optimum) matched += 1;
        rows.push(`[${lengths.join(', ')}]: optimum ${optimum}, used ${used}`);
        expect(used).toBeGreaterThanOrEqual(optimum);
        expect(used).toBeLessThanOrEqual(optimum + 1);
      }),
      { numRuns: 25 },
    );
    console.log(
      `sheets of full-width strips against the MILP optimum (${matched} of ${rows.length} equal):\n${rows.join('\n')}`,
    );
  });

  it('sheets: never fewer than the exact area bound, on small random instances', () => {
    const rows: string[] = [];
    fc.assert(
      fc.property(
        fc.array(
          fc.record({ length: fc.integer({ min: 200, max: 2000 }), width: fc.integer({ min: 100, max: 1000 }) }),
          {
            minLength: 2,
            maxLength: 7,
          },
        ),
        (sizes) => {
          // Sheets of one area unit each: a bin-packing bound every 2D layout must meet.
          const bound = exactBins(
            sizes.map((s) => s.length * s.width),
            2440 * 1220,
          );
          const plan = layoutSheets(sizes.map((s, i) => ({ name: `p${i}`, ...s, grain: 'any' as const })));
          rows.push(`${sizes.length} parts: area bound ${bound}, used ${plan.sheets.length}`);
          expect(plan.sheets.length).toBeGreaterThanOrEqual(bound);
        },
      ),
      { numRuns: 25 },
    );
    console.log(`sheets against the MILP area bound:\n${rows.join('\n')}`);
  });
});
