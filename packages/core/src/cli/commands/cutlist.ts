import { parseArgs } from 'node:util';
import {
  buildCutList,
  DEFAULT_KERF,
  type CutList,
  type PartStockSettings,
  type StockKind,
} from '../../cutlist/cut-list';
import { cutListCsv } from '../../cutlist/cut-list-csv';
import type { GrainRule, SheetSize } from '../../nesting/guillotine-layout';
import { cutListPartsFromAnalysis } from '../../cutlist/cut-list';
import type { CommandIo } from '../main';
import { DRAWING_OPTIONS, loadDrawing, positiveNumber, runCommand, table, UsageError } from './analyze';

const HELP = `Usage: jigwright cutlist FILE.dxf [options] [--json|--csv]

Derives the cut list of a drawing: rows by material and thickness with finished and rough sizes,
board feet, sheet layouts, bar plans and cost. Sizes in mm unless marked.

  --units UNITS          read the drawing in these units (wins over $INSUNITS)
  --tolerance MM         join end points and group equal parts within this distance
  --stock KIND           solid, sheet or linear: the stock every part comes from (default sheet)
  --material NAME        material of every part (default: the layer name without its thickness)
  --thickness MM         thickness where the layer name has none (e.g. "birch-18mm")
  --grain RULE           length, width or any: how parts lie on a sheet's grain (default length)
  --part NAME=K:V,...    settings for one part: stock, material, thickness, grain
                         e.g. --part "Fence=stock:solid,material:maple,thickness:19"
  --sheet LxW            a sheet size on sale, repeatable (default 2440x1220)
  --bar MM               a bar length on sale, repeatable (default 2400)
  --kerf MM              saw kerf (default ${DEFAULT_KERF})
  --trim MM              edge trim on every sheet edge (default 0)
  --allowance L,W,T      milling allowance on solid stock (default 25,6,3)
  --price-sheet N        price of a sheet
  --price-bf N           price of a board foot
  --price-metre N        price of a metre of bar
  --json | --csv         print as JSON or CSV instead of a table
`;

const OPTIONS = {
  ...DRAWING_OPTIONS,
  csv: { type: 'boolean', default: false },
  stock: { type: 'string' },
  material: { type: 'string' },
  thickness: { type: 'string' },
  grain: { type: 'string' },
  part: { type: 'string', multiple: true },
  sheet: { type: 'string', multiple: true },
  bar: { type: 'string', multiple: true },
  kerf: { type: 'string' },
  trim: { type: 'string' },
  allowance: { type: 'string' },
  'price-sheet': { type: 'string' },
  'price-bf': { type: 'string' },
  'price-metre': { type: 'string' },
} as const;

export async function cutlistCommand(args: string[], io: CommandIo): Promise<number> {
  return runCommand('cutlist', io, () => {
    const { values, positionals } = parseArgs({ args, options: OPTIONS, allowPositionals: true });
    if (values.help) {
      io.stdout(HELP);
      return 0;
    }
    if (values.json && values.csv) throw new UsageError('choose --json or --csv, not both');
    const analysis = loadDrawing(positionals[0], values);
    const defaults: PartStockSettings = {
      ...(values.stock !== undefined ? { stock: stockKind(values.stock) } : {}),
      ...(values.material !== undefined ? { material: values.material } : {}),
      ...(values.thickness !== undefined ? { thickness: positiveNumber('--thickness', values.thickness) } : {}),
      ...(values.grain !== undefined ? { grain: grainRule(values.grain) } : {}),
    };
    const byName = Object.fromEntries((values.part ?? []).map(partSetting));
    const { parts, warnings } = cutListPartsFromAnalysis(analysis, { defaults, byName });
    const cutList = buildCutList(parts, {
      ...(values.sheet ? { sheets: values.sheet.map(sheetSize) } : {}),
      ...(values.bar ? { barLengths: values.bar.map((bar) => positiveNumber('--bar', bar)) } : {}),
      ...(values.kerf !== undefined ? { kerf: nonNegative('--kerf', values.kerf) } : {}),
      ...(values.trim !== undefined ? { edgeTrim: nonNegative('--trim', values.trim) } : {}),
      ...(values.allowance !== undefined ? { allowances: { solid: allowance(values.allowance) } } : {}),
      prices: {
        ...(values['price-sheet'] !== undefined
          ? { perSheet: { '*': nonNegative('--price-sheet', values['price-sheet']) } }
          : {}),
        ...(values['price-bf'] !== undefined
          ? { perBoardFoot: { '*': nonNegative('--price-bf', values['price-bf']) } }
          : {}),
        ...(values['price-metre'] !== undefined
          ? { perMetre: { '*': nonNegative('--price-metre', values['price-metre']) } }
          : {}),
      },
    });
    const result = { ...cutList, warnings: [...warnings, ...cutList.warnings] };
    if (values.json) io.stdout(`${JSON.stringify(result, null, 2)}\n`);
    else if (values.csv) io.stdout(cutListCsv(result));
    else io.stdout(cutListTable(result));
    return 0;
  });
}

function stockKind(text: string): StockKind {
  if (text === 'solid' || text === 'sheet' || text === 'linear') return text;
  throw new UsageError(`stock must be solid, sheet or linear, not "${text}"`);
}

function grainRule(text: string): GrainRule {
  if (text === 'length' || text === 'width' || text === 'any') return text;
  throw new UsageError(`grain must be length, width or any, not "${text}"`);
}

function nonNegative(flag: string, text: string): number {
  const value = Number(text);
  if (!Number.isFinite(value) || value < 0) throw new UsageError(`${flag} needs a number of 0 or more, not "${text}"`);
  return value;
}

function sheetSize(text: string): SheetSize {
  const match = /^\s*(\d+(?:\.\d+)?)\s*[x×]\s*(\d+(?:\.\d+)?)\s*$/i.exec(text);
  if (!match) throw new UsageError(`--sheet needs LENGTHxWIDTH in mm, not "${text}"`);
  const a = Number(match[1]);
  const b = Number(match[2]);
  return { length: Math.max(a, b), width: Math.min(a, b) };
}

function allowance(text: string): { length: number; width: number; thickness: number } {
  const numbers = text.split(',').map((part) => nonNegative('--allowance', part));
  if (numbers.length !== 3) throw new UsageError(`--allowance needs LENGTH,WIDTH,THICKNESS, not "${text}"`);
  const [length, width, thickness] = numbers as [number, number, number];
  return { length, width, thickness };
}

function partSetting(text: string): [string, PartStockSettings] {
  const at = text.lastIndexOf('=');
  if (at <= 0) throw new UsageError(`--part needs NAME=key:value,…, not "${text}"`);
  const settings: PartStockSettings = {};
  for (const pair of text.slice(at + 1).split(',')) {
    const [key, value = ''] = pair.split(':').map((s) => s.trim());
    if (key === 'stock') settings.stock = stockKind(value);
    else if (key === 'material') settings.material = value;
    else if (key === 'thickness') settings.thickness = positiveNumber('--part thickness', value);
    else if (key === 'grain') settings.grain = grainRule(value);
    else throw new UsageError(`--part knows stock, material, thickness and grain, not "${key}"`);
  }
  return [text.slice(0, at), settings];
}

/** The cut list as tables for a terminal. */
export function cutListTable(cutList: CutList): string {
  const lines: string[] = [];
  for (const group of cutList.groups) {
    lines.push(`${group.material}, ${group.thickness} mm (${group.stock})`);
    const rows = group.rows.map((row) => [
      row.name,
      String(row.quantity),
      `${fixed(row.finished.length)} × ${fixed(row.finished.width)}`,
      `${fixed(row.rough.length)} × ${fixed(row.rough.width)} × ${fixed(row.rough.thickness)}`,
      row.inches.finished,
      row.boardFeet === null ? '' : row.boardFeet.toFixed(2),
    ]);
    lines.push(...table(['part', 'qty', 'finished mm', 'rough mm', 'finished in', 'BF'], rows));
    if (group.sheets) {
      for (const [i, sheet] of group.sheets.sheets.entries()) {
        lines.push(
          `  sheet ${i + 1}: ${sheet.sheet.length} × ${sheet.sheet.width}, ${sheet.placements.length} parts, yield ${(sheet.yield * 100).toFixed(1)} %`,
        );
      }
    }
    if (group.bars) {
      for (const [i, bar] of group.bars.bars.entries()) {
        lines.push(
          `  bar ${i + 1}: ${bar.length} mm: ${bar.pieces.map((p) => `${p.name} ${fixed(p.length)}`).join(', ')}; offcut ${fixed(bar.offcut)}`,
        );
      }
    }
    if (group.boardFeet !== null) lines.push(`  board feet: ${group.boardFeet.toFixed(2)}`);
    if (group.cost !== null) lines.push(`  cost: ${group.cost.toFixed(2)}`);
    lines.push('');
  }
  if (cutList.cost !== null) lines.push(`total cost: ${cutList.cost.toFixed(2)}`);
  for (const warning of cutList.warnings) lines.push(`warning: ${warning}`);
  return `${lines.join('\n')}\n`;
}

function fixed(value: number): string {
  return value.toFixed(1);
}
