import { describe, expect, it } from 'vitest';
import type { DrawingAnalysis } from '../analysis/types';
import { inchesToMm } from '../units/length';
import { buildCutList, cutListPartsFromAnalysis, type CutListPart } from './cut-list';
import { cutListCsv } from './cut-list-csv';

const fence: CutListPart = {
  name: 'fence',
  quantity: 2,
  length: 600,
  width: 80,
  thickness: 19,
  material: 'maple',
  stock: 'solid',
  grain: 'length',
};
const base: CutListPart = {
  name: 'base',
  quantity: 1,
  length: 800,
  width: 500,
  thickness: 18,
  material: 'birch ply',
  stock: 'sheet',
  grain: 'length',
};
const track: CutListPart = {
  name: 'T-track',
  quantity: 3,
  length: 700,
  width: 19,
  thickness: 9.5,
  material: 'aluminium',
  stock: 'linear',
  grain: 'any',
};

describe('cut list', () => {
  it('groups by material and thickness, with rough sizes and board feet', () => {
    const list = buildCutList([fence, base, track]);
    expect(list.groups.map((g) => g.material)).toEqual(['maple', 'birch ply', 'aluminium']);
    const row = list.groups[0]?.rows[0];
    // Default solid allowances [common practice]: +25 mm long, +6 mm wide, +3 mm thick.
    expect(row?.rough).toEqual({ length: 625, width: 86, thickness: 22 });
    // 22 mm rough thickness is under 1 in, so it counts as 1 in (Engineering Aid Basic [read]).
    const perPiece = (1 * (86 / 25.4) * (625 / 25.4)) / 144;
    expect(row?.boardFeet).toBeCloseTo(2 * perPiece, 9);
    expect(list.groups[1]?.sheets?.sheets).toHaveLength(1);
    expect(list.groups[2]?.bars?.bars).toHaveLength(1);
  });

  // Worked example [read]: a 14 ft 2 × 4 (nominal) is 9 1/3 board feet; no allowance so it is exact.
  it('a 14 ft 2 × 4 row is 9 1/3 board feet', () => {
    const twoByFour: CutListPart = {
      ...fence,
      quantity: 1,
      length: inchesToMm(168),
      width: inchesToMm(4),
      thickness: inchesToMm(2),
    };
    const list = buildCutList([twoByFour], { allowances: { solid: { length: 0, width: 0, thickness: 0 } } });
    expect(list.groups[0]?.boardFeet).toBeCloseTo(28 / 3, 9);
    expect(list.groups[0]?.rows[0]?.inches.finished).toBe('168 × 4 × 2');
  });

  it('prices sheets, board feet and metres', () => {
    const list = buildCutList([fence, base, track], {
      prices: { perSheet: { 'birch ply': 80 }, perBoardFoot: { '*': 12 }, perMetre: { aluminium: 10 } },
      barLengths: [2400],
    });
    const [solid, sheet, linear] = list.groups;
    expect(sheet?.cost).toBe(80);
    expect(linear?.cost).toBeCloseTo(24, 9);
    expect(solid?.cost).toBeCloseTo(12 * (solid?.boardFeet ?? 0), 9);
    expect(list.cost).toBeCloseTo((solid?.cost ?? 0) + 80 + 24, 9);
    expect(buildCutList([fence, base]).cost).toBeNull();
  });

  it('writes CSV with quoted fields and CRLF line ends', () => {
    const csv = cutListCsv(buildCutList([{ ...fence, name: 'fence, "tall"' }]));
    const lines = csv.split('\r\n');
    expect(lines[0]).toMatch(/^material,stock,thickness_mm,part,quantity/);
    expect(lines[1]).toContain('"fence, ""tall"""');
    expect(lines[1]?.split(',').length).toBeGreaterThan(10);
  });

  it('takes thickness and material from the layer name', () => {
    const analysis = {
      parts: [{ name: 'base', layer: 'birch-ply-18mm', quantity: 2, length: 400, width: 300 }],
    } as unknown as DrawingAnalysis;
    const { parts, warnings } = cutListPartsFromAnalysis(analysis);
    expect(parts[0]).toMatchObject({ thickness: 18, material: 'birch-ply', quantity: 2, stock: 'sheet' });
    expect(warnings).toEqual([]);
  });

  it('does not mutate its input', () => {
    const parts = [fence, base, track];
    const copy = structuredClone(parts);
    buildCutList(parts, { kerf: 2.4 });
    expect(parts).toEqual(copy);
  });
});
