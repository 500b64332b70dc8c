import type { DrawingAnalysis } from '../analysis/types';
import { cutBars, type BarPlan } from '../nesting/bar-cutting';
import { layoutSheets, type GrainRule, type SheetPlan, type SheetSize } from '../nesting/guillotine-layout';
import { formatInchFraction } from '../units/inch-fraction';
import { parseThicknessToken } from '../units/thickness-token';
import { boardFeet } from './board-feet';

export type StockKind = 'solid' | 'sheet' | 'linear';

/** A part as the cut list needs it: sizes in mm and the stock it comes from. */
export interface CutListPart {
  name: string;
  quantity: number;
  length: number;
  width: number;
  thickness: number;
  material: string;
  stock: StockKind;
  grain: GrainRule;
}

export interface Size {
  length: number;
  width: number;
  thickness: number;
}

/** Added to the finished size to get the rough size to cut from the stock, mm. */
export type Allowance = Size;

export interface CutListRow {
  name: string;
  quantity: number;
  finished: Size;
  rough: Size;
  /** Board feet of all pieces of the row on their rough size; solid stock only. */
  boardFeet: number | null;
  /** Sizes in inches to 1/32 in, "L × W × T". */
  inches: { finished: string; rough: string };
  grain: GrainRule;
}

export interface CutListGroup {
  material: string;
  thickness: number;
  stock: StockKind;
  rows: CutListRow[];
  boardFeet: number | null;
  sheets: SheetPlan | null;
  bars: BarPlan | null;
  cost: number | null;
}

export interface CutList {
  groups: CutListGroup[];
  /** Sum of the groups' costs, when every group has a price. */
  cost: number | null;
  warnings: string[];
}

export interface Prices {
  /** Price of one sheet, by material name (`*` for any). */
  perSheet?: Readonly<Record<string, number>>;
  perBoardFoot?: Readonly<Record<string, number>>;
  perMetre?: Readonly<Record<string, number>>;
}

export interface CutListOptions {
  allowances?: Partial<Record<StockKind, Partial<Allowance>>>;
  sheets?: readonly SheetSize[];
  barLengths?: readonly number[];
  kerf?: number;
  edgeTrim?: number;
  prices?: Prices;
}

/**
 * Milling allowances when none are given [common practice]: solid stock is bought rough and
 * milled, about 1 in long, 1/4 in wide and 1/8 in thick over; sheets and bars are cut to size.
 */
export const DEFAULT_ALLOWANCES: Record<StockKind, Allowance> = {
  solid: { length: 25, width: 6, thickness: 3 },
  sheet: { length: 0, width: 0, thickness: 0 },
  linear: { length: 0, width: 0, thickness: 0 },
};
export const DEFAULT_KERF = 3.2;
export const DEFAULT_BAR_LENGTHS: readonly number[] = [2400];

/** The cut list: rows grouped by material and thickness, sheet layouts, bar plans and cost. */
export function buildCutList(parts: readonly CutListPart[], options: CutListOptions = {}): CutList {
  const kerf = options.kerf ?? DEFAULT_KERF;
  const groups = new Map<string, CutListPart[]>();
  for (const part of parts) {
    const key = `${part.material}\u0000${part.thickness}\u0000${part.stock}`;
    const members = groups.get(key);
    if (members) members.push(part);
    else groups.set(key, [part]);
  }
  const warnings: string[] = [];
  const out = [...groups.values()].map((members) => {
    const { material, thickness, stock } = members[0] as CutListPart;
    const allowance = { ...DEFAULT_ALLOWANCES[stock], ...options.allowances?.[stock] };
    const rows = members.map((part) => cutListRow(part, allowance));
    const pieces = members.flatMap((part, i) =>
      Array.from({ length: part.quantity }, () => ({ part, row: rows[i] as CutListRow })),
    );
    const sheets =
      stock === 'sheet'
        ? layoutSheets(
            pieces.map(({ part, row }) => ({
              name: part.name,
              length: row.rough.length,
              width: row.rough.width,
              grain: part.grain,
            })),
            { sheets: options.sheets ?? [], kerf, edgeTrim: options.edgeTrim ?? 0 },
          )
        : null;
    const bars =
      stock === 'linear'
        ? cutBars(
            pieces.map(({ part, row }) => ({ name: part.name, length: row.rough.length })),
            { barLengths: options.barLengths ?? DEFAULT_BAR_LENGTHS, kerf },
          )
        : null;
    for (const piece of [...(sheets?.unplaced ?? []), ...(bars?.unplaced ?? [])]) {
      warnings.push(`${piece.name} (${material}) is larger than every ${stock === 'sheet' ? 'sheet' : 'bar'} given`);
    }
    const feet = stock === 'solid' ? rows.reduce((sum, row) => sum + (row.boardFeet ?? 0), 0) : null;
    const group: CutListGroup = { material, thickness, stock, rows, boardFeet: feet, sheets, bars, cost: null };
    return { ...group, cost: groupCost(group, options.prices) };
  });
  const costs = out.map((group) => group.cost);
  const cost =
    costs.length > 0 && costs.every((c) => c !== null) ? costs.reduce((sum: number, c) => sum + (c ?? 0), 0) : null;
  return { groups: out, cost, warnings };
}

function cutListRow(part: CutListPart, allowance: Allowance): CutListRow {
  const finished = { length: part.length, width: part.width, thickness: part.thickness };
  const rough = {
    length: part.length + allowance.length,
    width: part.width + allowance.width,
    thickness: part.thickness + allowance.thickness,
  };
  return {
    name: part.name,
    quantity: part.quantity,
    finished,
    rough,
    boardFeet: part.stock === 'solid' ? part.quantity * boardFeet(rough.thickness, rough.width, rough.length) : null,
    inches: { finished: inchSize(finished), rough: inchSize(rough) },
    grain: part.grain,
  };
}

function inchSize(size: Size): string {
  return `${formatInchFraction(size.length)} × ${formatInchFraction(size.width)} × ${formatInchFraction(size.thickness)}`;
}

function price(table: Readonly<Record<string, number>> | undefined, material: string): number | undefined {
  return table?.[material] ?? table?.['*'];
}

function groupCost(group: CutListGroup, prices: Prices | undefined): number | null {
  if (group.stock === 'sheet') {
    const each = price(prices?.perSheet, group.material);
    return each === undefined || !group.sheets ? null : each * group.sheets.sheets.length;
  }
  if (group.stock === 'linear') {
    const each = price(prices?.perMetre, group.material);
    return each === undefined || !group.bars ? null : (each * group.bars.totalLength) / 1000;
  }
  const each = price(prices?.perBoardFoot, group.material);
  return each === undefined ? null : each * (group.boardFeet ?? 0);
}

/** Per-part choices of the caller; anything left out falls back to the defaults, then the layer name. */
export interface PartStockSettings {
  material?: string;
  thickness?: number;
  stock?: StockKind;
  grain?: GrainRule;
}

export interface PartsFromAnalysisOptions {
  defaults?: PartStockSettings;
  byName?: Readonly<Record<string, PartStockSettings>>;
}

/**
 * Cut-list parts from a drawing analysis. Thickness and material default to a token in the layer
 * name ("birch-ply-18mm" → 18 mm of birch-ply); linear stock is cut to the part's length.
 */
export function cutListPartsFromAnalysis(
  analysis: DrawingAnalysis,
  options: PartsFromAnalysisOptions = {},
): { parts: CutListPart[]; warnings: string[] } {
  const warnings: string[] = [];
  const parts = analysis.parts.map((part) => {
    const own = options.byName?.[part.name] ?? {};
    const token = parseThicknessToken(part.layer);
    const thickness = own.thickness ?? token?.thickness ?? options.defaults?.thickness;
    if (thickness === undefined)
      warnings.push(`${part.name}: no thickness given and none in layer "${part.layer}"; counted as 18 mm`);
    return {
      name: part.name,
      quantity: part.quantity,
      length: part.length,
      width: part.width,
      thickness: thickness ?? 18,
      material: own.material ?? options.defaults?.material ?? (token?.rest || part.layer),
      stock: own.stock ?? options.defaults?.stock ?? 'sheet',
      grain: own.grain ?? options.defaults?.grain ?? 'length',
    };
  });
  return { parts, warnings };
}
