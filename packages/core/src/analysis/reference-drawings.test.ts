import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import DxfParser, { type IPoint } from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { DrawingError } from '../dxf/drawing-error';
import { analyzeDrawing } from './analyze-drawing';

// Real CAD files from ../shared/reference-data (see its README for origin and licences).
const repoRoot = path.resolve(__dirname, '../../../..');
const referenceData = path.resolve(repoRoot, '../shared/reference-data');
const present = existsSync(referenceData);
if (!present) console.warn(`reference drawings skipped: ${referenceData} is absent (a clone outside the workplace)`);

function dxfFiles(folder: string): string[] {
  const dir = path.join(referenceData, folder);
  return existsSync(dir)
    ? readdirSync(dir)
        .filter((name) => name.endsWith('.dxf'))
        .map((name) => path.join(dir, name))
    : [];
}

describe.skipIf(!present)('reference drawings from other CAD programs', () => {
  const files = [...dxfFiles('dxf/dxf'), ...dxfFiles('dxf/dxf-parser')];

  it('finds the reference files', () => {
    expect(files.length).toBeGreaterThan(60);
  });

  it.each(files.map((file) => [path.relative(referenceData, file), file]))(
    '%s is analysed or refused clearly',
    (_name, file) => {
      const text = readFileSync(file, 'utf8');
      try {
        const analysis = analyzeDrawing(text);
        expect(JSON.parse(JSON.stringify(analysis))).toEqual(analysis);
        const overlapping = analysis.warnings.some((warning) => warning.code === 'overlapping-outlines');
        for (const part of analysis.parts) {
          expect(part.length).toBeGreaterThanOrEqual(part.width);
          if (!overlapping) expect(part.area).toBeGreaterThan(0);
        }
      } catch (error) {
        expect(error).toBeInstanceOf(DrawingError);
        expect((error as Error).message).not.toContain('\n');
      }
    },
  );

  // dxf-extents-current.txt lists the files whose $EXTMIN/$EXTMAX were confirmed current; the
  // same tolerance as that list: 0.1 % of the diagonal + 0.01 drawing units.
  const listPath = path.join(referenceData, 'dxf-extents-current.txt');
  const current = existsSync(listPath)
    ? readFileSync(listPath, 'utf8')
        .split('\n')
        .map((line) => line.trim())
        .filter((line) => line !== '' && !line.startsWith('#'))
    : [];

  it.each(current)('%s: extents agree with the header $EXTMIN/$EXTMAX', (name) => {
    const text = readFileSync(path.join(referenceData, 'dxf/dxf', name), 'utf8');
    const header = new DxfParser().parseSync(text)?.header ?? {};
    const min = header.$EXTMIN as IPoint;
    const max = header.$EXTMAX as IPoint;
    const analysis = analyzeDrawing(text);
    const k = analysis.mmPerUnit;
    const tolerance = (0.001 * Math.hypot(max.x - min.x, max.y - min.y) + 0.01) * k;
    expect(analysis.extents).not.toBeNull();
    const [x0, y0] = analysis.extents?.min ?? [NaN, NaN];
    const [x1, y1] = analysis.extents?.max ?? [NaN, NaN];
    expect(Math.abs(x0 - min.x * k)).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(y0 - min.y * k)).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(x1 - max.x * k)).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(y1 - max.y * k)).toBeLessThanOrEqual(tolerance);
  });

  it('1x1rectangle.dxf is one 10 × 10 mm part', () => {
    const analysis = analyzeDrawing(readFileSync(path.join(referenceData, 'dxf/dxf/1x1rectangle.dxf'), 'utf8'));
    expect(analysis.units).toBe('mm');
    expect(analysis.parts).toHaveLength(1);
    expect(analysis.parts[0]?.length).toBeCloseTo(10, 6);
    expect(analysis.parts[0]?.width).toBeCloseTo(10, 6);
    expect(analysis.parts[0]?.area).toBeCloseTo(100, 6);
  });

  it('arrayed-holes.dxf yields 14 holes', () => {
    const analysis = analyzeDrawing(readFileSync(path.join(referenceData, 'dxf/dxf/arrayed-holes.dxf'), 'utf8'));
    expect(analysis.parts.reduce((sum, part) => sum + part.holes * part.quantity, 0)).toBe(14);
  });

  it('blocks2.dxf, which dxf-parser rejects, gives a clear error', () => {
    expect(() => analyzeDrawing(readFileSync(path.join(referenceData, 'dxf/dxf/blocks2.dxf'), 'utf8'))).toThrow(
      DrawingError,
    );
  });
});
