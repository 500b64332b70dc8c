import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyzeDrawing } from './analyze-drawing';

// Golden files: drawings written by tools/drawings (a general-purpose DXF writer) in fixtures/in,
// expected analyses in fixtures/out. Regenerate on purpose only: UPDATE_GOLDEN=1 npm test.
const fixtures = path.resolve(__dirname, '../../fixtures');
const update = process.env.UPDATE_GOLDEN === '1';

/** Floats rounded to 1e-3 so that the last bits of trigonometry do not make a test fail. */
function rounded(value: unknown): unknown {
  if (typeof value === 'number') {
    const r = Math.round(value * 1000) / 1000;
    return Object.is(r, -0) ? 0 : r;
  }
  if (Array.isArray(value)) return value.map(rounded);
  if (value && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).map(([key, inner]) => [key, rounded(inner)]));
  }
  return value;
}

const names = readdirSync(path.join(fixtures, 'in'))
  .filter((name) => name.endsWith('.dxf'))
  .map((name) => name.replace(/\.dxf$/, ''));

describe('golden drawings', () => {
  it('has drawings to check', () => {
    expect(names.length).toBeGreaterThanOrEqual(6);
  });

  it.each(names)('%s matches its expected analysis', (name) => {
    const analysis = rounded(analyzeDrawing(readFileSync(path.join(fixtures, 'in', `${name}.dxf`), 'utf8')));
    const expectedPath = path.join(fixtures, 'out', `${name}.json`);
    if (update) {
      mkdirSync(path.dirname(expectedPath), { recursive: true });
      writeFileSync(expectedPath, `${JSON.stringify(analysis, null, 1)}\n`);
    }
    expect(existsSync(expectedPath)).toBe(true);
    expect(analysis).toEqual(JSON.parse(readFileSync(expectedPath, 'utf8')));
  });
});
