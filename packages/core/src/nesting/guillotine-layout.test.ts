import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { layoutSheets, type Placement, type SheetPiece } from './guillotine-layout';

function overlaps(p: Placement, q: Placement, gap: number): boolean {
  return (
    p.x < q.x + q.length + gap - 1e-9 &&
    q.x < p.x + p.length + gap - 1e-9 &&
    p.y < q.y + q.width + gap - 1e-9 &&
    q.y < p.y + p.width + gap - 1e-9
  );
}

const pieceArb = fc.record({
  name: fc.constantFrom('side', 'shelf', 'fence', 'base'),
  length: fc.integer({ min: 50, max: 1500 }),
  width: fc.integer({ min: 30, max: 600 }),
  grain: fc.constantFrom<SheetPiece['grain']>('length', 'width', 'any'),
});

describe('guillotine sheet layout', () => {
  // PS 1 metric trade size 2440 × 1220 mm [read via a summary]: eight 610 × 610 squares fill it exactly.
  it('eight 610 × 610 panels fill one 2440 × 1220 sheet with no kerf or trim', () => {
    const pieces = Array.from({ length: 8 }, () => ({ name: 'panel', length: 610, width: 610, grain: 'any' as const }));
    const plan = layoutSheets(pieces);
    expect(plan.sheets).toHaveLength(1);
    expect(plan.sheets[0]?.yield).toBeCloseTo(1, 12);
  });

  // With a 3.2 mm kerf a 1220 mm width holds one 610 row (2 × 610 + 3.2 > 1220) and a 2440 mm length
  // three (4 × 610 + 3 × 3.2 > 2440), so eight squares take ⌈8 / 3⌉ = 3 sheets [derived].
  it('a 3.2 mm kerf leaves three 610 squares a sheet, so eight take three sheets', () => {
    const pieces = Array.from({ length: 8 }, () => ({ name: 'panel', length: 610, width: 610, grain: 'any' as const }));
    expect(layoutSheets(pieces, { kerf: 3.2 }).sheets).toHaveLength(3);
  });

  it('never turns a part whose grain must run along the sheet', () => {
    const plan = layoutSheets([{ name: 'door', length: 1250, width: 1100, grain: 'length' }], {
      kerf: 3,
      edgeTrim: 10,
    });
    expect(plan.sheets[0]?.placements[0]).toMatchObject({ rotated: false, length: 1250, width: 1100, x: 10, y: 10 });
    // Across the grain its 1250 mm would have to fit the 1220 − 2 × 10 mm width.
    const across = layoutSheets([{ name: 'door', length: 1250, width: 1100, grain: 'width' }], {
      kerf: 3,
      edgeTrim: 10,
    });
    expect(across.unplaced).toHaveLength(1);
  });

  it('keeps parts a kerf apart, inside the trim, and places every part once', () => {
    fc.assert(
      fc.property(fc.array(pieceArb, { minLength: 1, maxLength: 40 }), (pieces) => {
        const kerf = 3.2;
        const trim = 10;
        const plan = layoutSheets(pieces, { kerf, edgeTrim: trim });
        const placed = plan.sheets.reduce((n, s) => n + s.placements.length, 0);
        expect(placed + plan.unplaced.length).toBe(pieces.length);
        expect(plan.sheets.length).toBeGreaterThanOrEqual(plan.lowerBound);
        for (const sheet of plan.sheets) {
          for (const p of sheet.placements) {
            expect(p.x).toBeGreaterThanOrEqual(trim - 1e-9);
            expect(p.y).toBeGreaterThanOrEqual(trim - 1e-9);
            expect(p.x + p.length).toBeLessThanOrEqual(2440 - trim + 1e-9);
            expect(p.y + p.width).toBeLessThanOrEqual(1220 - trim + 1e-9);
          }
          sheet.placements.forEach((p, i) =>
            sheet.placements.slice(i + 1).forEach((q) => expect(overlaps(p, q, kerf)).toBe(false)),
          );
        }
      }),
      { numRuns: 60 },
    );
  });

  it('uses the sheet size that needs least area', () => {
    const pieces = [{ name: 'top', length: 1400, width: 1400, grain: 'any' as const }];
    const plan = layoutSheets(pieces, {
      sheets: [
        { length: 2440, width: 1220 },
        { length: 1525, width: 1525 },
      ],
    });
    expect(plan.sheets[0]?.sheet).toEqual({ length: 1525, width: 1525 });
  });

  it('does not mutate its input', () => {
    const pieces = [{ name: 'a', length: 300, width: 200, grain: 'any' as const }];
    const copy = structuredClone(pieces);
    layoutSheets(pieces, { kerf: 3 });
    expect(pieces).toEqual(copy);
  });
});
