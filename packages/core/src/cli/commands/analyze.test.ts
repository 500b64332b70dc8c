import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyzeCommand } from './analyze';
import { cutlistCommand } from './cutlist';

const fixtures = path.resolve(__dirname, '../../../fixtures/in');

async function run(
  command: typeof analyzeCommand,
  args: string[],
): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const code = await command(args, { stdout: (t) => (out += t), stderr: (t) => (err += t) });
  return { code, out, err };
}

function tempFile(name: string, content: string): string {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'jigwright-')), name);
  writeFileSync(file, content);
  return file;
}

describe('jigwright analyze', () => {
  it('prints the analysis as JSON in the shape the issue asks for', async () => {
    const { code, out } = await run(analyzeCommand, [path.join(fixtures, 'holes-and-slots.dxf'), '--json']);
    expect(code).toBe(0);
    const analysis = JSON.parse(out);
    expect(analysis.units).toBe('mm');
    expect(analysis.extents).toEqual({ min: [0, 0], max: [500, 200] });
    expect(analysis.parts[0]).toMatchObject({
      name: 'Fence',
      layer: '0',
      quantity: 1,
      length: 500,
      width: 200,
      holes: 4,
    });
    expect(Array.isArray(analysis.dimensions)).toBe(true);
    expect(Array.isArray(analysis.warnings)).toBe(true);
  });

  it('prints a table without --json', async () => {
    const { code, out } = await run(analyzeCommand, [path.join(fixtures, 'rounded-corners.dxf')]);
    expect(code).toBe(0);
    expect(out).toMatch(/Runner cap\s+0\s+1\s+300\.00\s+120\.00/);
  });

  it('reads the drawing in the units asked for', async () => {
    const { out } = await run(analyzeCommand, [path.join(fixtures, 'rectangle.dxf'), '--units', 'in', '--json']);
    expect(JSON.parse(out).parts[0].length).toBeCloseTo(600 * 25.4, 6);
  });

  it.each([
    ['not DXF', 'hello\nworld\n', /not a DXF file.*line 1/],
    ['cut short', '0\nSECTION\n2\nENTITIES\n0\nLINE\n', /cut short.*line 6/],
    ['empty', '', /empty/],
  ])('a file that is %s: exit 2 and one line on stderr', async (_what, content, message) => {
    const { code, err } = await run(analyzeCommand, [tempFile('bad.dxf', content)]);
    expect(code).toBe(2);
    expect(err).toMatch(message);
    expect(err.trimEnd().split('\n')).toHaveLength(1);
  });

  it('a file over the size limit: exit 2 naming the limit', async () => {
    const { code, err } = await run(analyzeCommand, [path.join(fixtures, 'rectangle.dxf'), '--max-size', '100']);
    expect(code).toBe(2);
    expect(err).toMatch(/maxFileSize/);
  });

  it('bad options: exit 2', async () => {
    expect((await run(analyzeCommand, ['--units', 'furlong', path.join(fixtures, 'rectangle.dxf')])).code).toBe(2);
    expect((await run(analyzeCommand, [])).code).toBe(2);
  });
});

describe('jigwright cutlist', () => {
  it('prints JSON with sheet layouts and cost', async () => {
    const { code, out } = await run(cutlistCommand, [
      path.join(fixtures, 'rectangle.dxf'),
      '--json',
      '--price-sheet',
      '75',
      '--kerf',
      '3',
      '--trim',
      '10',
    ]);
    expect(code).toBe(0);
    const list = JSON.parse(out);
    // Layer "base-18mm": 18 mm of "base" (thickness token in the layer name).
    expect(list.groups[0]).toMatchObject({ material: 'base', thickness: 18, stock: 'sheet', cost: 75 });
    expect(list.groups[0].sheets.sheets[0].placements[0]).toMatchObject({ x: 10, y: 10, length: 600, width: 400 });
  });

  it('prints CSV with board feet for solid stock in inches', async () => {
    const { code, out } = await run(cutlistCommand, [
      path.join(fixtures, 'inch-drawing.dxf'),
      '--csv',
      '--stock',
      'solid',
      '--allowance',
      '0,0,0',
    ]);
    expect(code).toBe(0);
    const [head, first] = out.split('\r\n');
    expect(head).toContain('board_feet');
    // 24 × 3-1/2 in of 3/4 in oak counts as 1 in thick: 24 × 3.5 / 144 = 0.58 BF (Engineering Aid Basic rule).
    expect(first).toContain('oak,solid,19.05,oak 3/4in,1,609.6,88.9,19.05');
    expect(first).toContain(',0.58,24 × 3-1/2 × 3/4,');
  });

  it('cuts linear stock from bars', async () => {
    const { out } = await run(cutlistCommand, [
      path.join(fixtures, 'rotated-parts.dxf'),
      '--json',
      '--stock',
      'linear',
      '--bar',
      '1000',
      '--kerf',
      '3',
    ]);
    const bars = JSON.parse(out).groups[0].bars;
    // Five 250 mm pieces with 3 mm kerf: three per 1000 mm bar (4 × 253 > 1003), so two bars.
    expect(bars.bars).toHaveLength(2);
  });

  it('refuses --json with --csv', async () => {
    expect((await run(cutlistCommand, [path.join(fixtures, 'rectangle.dxf'), '--json', '--csv'])).code).toBe(2);
  });
});
