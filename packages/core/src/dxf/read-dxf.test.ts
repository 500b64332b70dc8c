import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import type { IBlock, IDxf, IEntity } from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { DrawingError } from './drawing-error';
import { DEFAULT_DRAWING_LIMITS } from './limits';
import { readDxf, readDxfInChunks } from './read-dxf';
import { splitDxf } from './split-dxf';

// The pieces, parsed one by one, must give exactly what one parse of the whole text gives: the
// golden drawings and every reference file (skipped when ../shared is absent), cut very small.
const fixtures = path.resolve(__dirname, '../../fixtures/in');
const referenceData = path.resolve(__dirname, '../../../../../shared/reference-data');
const files = [
  ...readdirSync(fixtures).map((name) => path.join(fixtures, name)),
  ...['dxf/dxf', 'dxf/dxf-parser'].flatMap((folder) => {
    const dir = path.join(referenceData, folder);
    return existsSync(dir) ? readdirSync(dir).map((name) => path.join(dir, name)) : [];
  }),
].filter((file) => file.endsWith('.dxf'));

type Outcome = { header: IDxf['header']; entities: IEntity[]; blocks: Record<string, IBlock> } | { error: string };

function outcome(read: () => Outcome): Outcome {
  try {
    return read();
  } catch (error) {
    expect(error).toBeInstanceOf(DrawingError);
    return { error: (error as Error).message };
  }
}

function whole(text: string): Outcome {
  const dxf = readDxf(text, DEFAULT_DRAWING_LIMITS);
  return { header: dxf.header ?? {}, entities: dxf.entities ?? [], blocks: dxf.blocks ?? {} };
}

function inChunks(text: string, groupsPerChunk: number): Outcome {
  const { header, parts } = readDxfInChunks(text, DEFAULT_DRAWING_LIMITS, { groupsPerChunk });
  const entities: IEntity[] = [];
  const blocks: Record<string, IBlock> = {};
  for (const part of parts) {
    entities.push(...(part.entities ?? []));
    Object.assign(blocks, part.blocks);
  }
  return { header, entities, blocks };
}

describe('reading a drawing in pieces', () => {
  it.each(files.map((file) => [path.basename(file), file]))('%s reads the same as in one parse', (_name, file) => {
    const text = readFileSync(file, 'utf8');
    const expected = outcome(() => whole(text));
    expect(outcome(() => inChunks(text, 7))).toEqual(expected);
    expect(outcome(() => inChunks(text, 1))).toEqual(expected);
  });

  it('cuts a plain drawing at entity boundaries rather than parsing it whole', () => {
    const text = readFileSync(path.join(fixtures, 'nested-arrayed-blocks.dxf'), 'utf8');
    const layout = splitDxf(text, 10);
    expect(layout?.chunks.filter((chunk) => chunk.section === 'ENTITIES').length).toBeGreaterThan(1);
    expect(layout?.chunks.some((chunk) => chunk.section === 'BLOCKS')).toBe(true);
  });

  it('parses a text that strays from the plain layout in one go, with the same result', () => {
    const text = '0\nSECTION\n2\nENTITIES\n0\nLINE\n10\n0\n20\n0\n11\n1\n21\n1\n0\nEOF\n';
    expect(splitDxf(text, 10)).toBeUndefined();
    expect(outcome(() => inChunks(text, 1))).toEqual(outcome(() => whole(text)));
  });
});
