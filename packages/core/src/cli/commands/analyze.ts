import { readFileSync, statSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { analyzeDrawing, DEFAULT_TOLERANCE, type AnalysisOptions } from '../../analysis/analyze-drawing';
import type { DrawingAnalysis } from '../../analysis/types';
import { DrawingError } from '../../dxf/drawing-error';
import { DEFAULT_DRAWING_LIMITS } from '../../dxf/limits';
import { parseDrawingUnits } from '../../units/insunits';
import type { CommandIo } from '../main';

const HELP = `Usage: jigwright analyze FILE.dxf [--units mm|in|ft|cm|m|…] [--tolerance MM] [--json]

Measures the parts of a drawing: outlines chained into parts with holes, length × width of the
smallest enclosing rectangle, area, perimeter, dimensions and extents, all in millimetres.

  --units UNITS      read the drawing in these units (wins over the file's $INSUNITS)
  --tolerance MM     join end points and group equal parts within this distance (default ${DEFAULT_TOLERANCE})
  --max-size CHARS   refuse larger files (default ${DEFAULT_DRAWING_LIMITS.maxFileSize})
  --json             print the analysis as JSON
`;

/** Options shared by `analyze` and `cutlist` for reading a drawing. */
export const DRAWING_OPTIONS = {
  units: { type: 'string' },
  tolerance: { type: 'string' },
  'max-size': { type: 'string' },
  json: { type: 'boolean', default: false },
  help: { type: 'boolean', short: 'h', default: false },
} as const;

/** A problem with the command line itself, reported like a drawing error: one line, exit 2. */
export class UsageError extends Error {}

/** Reads and analyses the drawing named on the command line; throws UsageError or DrawingError. */
export function loadDrawing(
  file: string | undefined,
  values: { units?: string; tolerance?: string; 'max-size'?: string },
): DrawingAnalysis {
  if (!file) throw new UsageError('name a DXF file');
  const options: AnalysisOptions = {};
  if (values.units !== undefined) {
    const units = parseDrawingUnits(values.units);
    if (!units || units === 'unknown') throw new UsageError(`unknown units "${values.units}"`);
    options.units = units;
  }
  if (values.tolerance !== undefined) options.tolerance = positiveNumber('--tolerance', values.tolerance);
  const maxFileSize =
    values['max-size'] === undefined
      ? DEFAULT_DRAWING_LIMITS.maxFileSize
      : positiveNumber('--max-size', values['max-size']);
  options.limits = { maxFileSize };
  let size: number;
  try {
    size = statSync(file).size;
  } catch {
    throw new UsageError(`cannot read ${file}`);
  }
  // Refuse before reading, so a huge file never reaches memory.
  if (size > maxFileSize) {
    throw new DrawingError(
      'limit',
      `drawing exceeds the maxFileSize limit of ${maxFileSize}: the file has ${size} bytes`,
    );
  }
  return analyzeDrawing(decodeDrawing(readFileSync(file)), options);
}

/** DXF from R2007 on is UTF-8; older files are in a Windows code page, read here as Latin-1. */
function decodeDrawing(bytes: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return new TextDecoder('latin1').decode(bytes);
  }
}

export function positiveNumber(flag: string, text: string): number {
  const value = Number(text);
  if (!Number.isFinite(value) || value <= 0) throw new UsageError(`${flag} needs a positive number, not "${text}"`);
  return value;
}

/** Runs a command body, turning usage and drawing errors into one line on stderr and exit code 2. */
export async function runCommand(name: string, io: CommandIo, body: () => number): Promise<number> {
  try {
    return body();
  } catch (error) {
    if (error instanceof DrawingError || error instanceof UsageError || isParseArgsError(error)) {
      io.stderr(`jigwright ${name}: ${(error as Error).message}\n`);
      return 2;
    }
    throw error;
  }
}

function isParseArgsError(error: unknown): boolean {
  return error instanceof TypeError && typeof (error as { code?: unknown }).code === 'string';
}

export async function analyzeCommand(args: string[], io: CommandIo): Promise<number> {
  return runCommand('analyze', io, () => {
    const { values, positionals } = parseArgs({ args, options: DRAWING_OPTIONS, allowPositionals: true });
    if (values.help) {
      io.stdout(HELP);
      return 0;
    }
    const analysis = loadDrawing(positionals[0], values);
    io.stdout(values.json ? `${JSON.stringify(analysis, null, 2)}\n` : analysisTable(analysis));
    return 0;
  });
}

/** The analysis as a table for a terminal. */
export function analysisTable(analysis: DrawingAnalysis): string {
  const lines: string[] = [];
  const e = analysis.extents;
  lines.push(`units: ${analysis.units}`);
  lines.push(
    e
      ? `extents: ${fixed(e.min[0])}, ${fixed(e.min[1])} to ${fixed(e.max[0])}, ${fixed(e.max[1])} mm`
      : 'extents: none',
  );
  lines.push('');
  const rows = analysis.parts.map((p) => [
    p.name,
    p.layer,
    String(p.quantity),
    fixed(p.length),
    fixed(p.width),
    fixed(p.area),
    fixed(p.perimeter),
    String(p.holes),
  ]);
  lines.push(...table(['part', 'layer', 'qty', 'length mm', 'width mm', 'area mm²', 'perimeter mm', 'holes'], rows));
  if (analysis.dimensions.length > 0) {
    lines.push('');
    const dims = analysis.dimensions.map((d) => [d.type, `${fixed(d.measured)} ${d.unit}`, d.text ?? '']);
    lines.push(...table(['dimension', 'measured', 'text'], dims));
  }
  if (analysis.warnings.length > 0) {
    lines.push('');
    for (const w of analysis.warnings) lines.push(`warning ${w.code}: ${w.message}`);
  }
  return `${lines.join('\n')}\n`;
}

function fixed(value: number): string {
  return value.toFixed(2);
}

/** Columns padded to their widest cell; numbers right-aligned. */
export function table(head: string[], rows: string[][]): string[] {
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((row) => (row[i] ?? '').length)));
  const numeric = head.map((_, i) => rows.length > 0 && rows.every((row) => /^[-\d.,/ ]+[a-z²]*$/.test(row[i] ?? '')));
  const line = (cells: string[]): string =>
    cells
      .map((cell, i) => (numeric[i] ? cell.padStart(widths[i] ?? 0) : cell.padEnd(widths[i] ?? 0)))
      .join('  ')
      .trimEnd();
  return [line(head), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)];
}
