import type { IBlock, IEntity } from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { DrawingError, DrawingLimitError } from '../dxf/drawing-error';
import { countExpandedEntities } from './block-expansion';

const limits = { maxBlockDepth: 8, maxExpandedEntities: 1_000_000 };

function insert(name: string, columns = 1, rows = 1): IEntity {
  return { type: 'INSERT', name, columnCount: columns, rowCount: rows } as unknown as IEntity;
}

function block(name: string, entities: IEntity[]): IBlock {
  return { name, entities } as unknown as IBlock;
}

const line = { type: 'LINE' } as unknown as IEntity;

describe('expansion count before expanding', () => {
  it('counts every array cell of nested inserts', () => {
    const blocks = { A: block('A', [line, line]), B: block('B', [insert('A', 3, 2)]) };
    // B = 1 insert + 6 × 2 lines = 13; the model holds 2 inserts of B in a 2 × 1 array each.
    expect(countExpandedEntities([insert('B', 2)], blocks, limits)).toBe(1 + 2 * 13);
  });

  it('refuses 1e9 columns at once, naming the limit', () => {
    const blocks = { A: block('A', [line]) };
    const started = Date.now();
    expect(() => countExpandedEntities([insert('A', 1e9)], blocks, limits)).toThrow(DrawingLimitError);
    expect(Date.now() - started).toBeLessThan(1000);
  });

  it('refuses arrays of arrays of arrays past the cap', () => {
    const blocks = {
      A: block('A', [line]),
      B: block('B', [insert('A', 200, 200)]),
      C: block('C', [insert('B', 200, 200)]),
    };
    try {
      countExpandedEntities([insert('C', 200, 200)], blocks, limits);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(DrawingLimitError);
      expect((error as DrawingLimitError).limit).toBe('maxExpandedEntities');
    }
  });

  it('names a block that inserts itself, directly or through another', () => {
    expect(() => countExpandedEntities([insert('A')], { A: block('A', [insert('A')]) }, limits)).toThrow(
      /block "A" inserts itself/,
    );
    const loop = { A: block('A', [insert('B')]), B: block('B', [insert('A')]) };
    expect(() => countExpandedEntities([insert('A')], loop, limits)).toThrow(DrawingError);
  });

  it('refuses nesting deeper than the limit', () => {
    const blocks: Record<string, IBlock> = {};
    for (let i = 0; i < 12; i += 1) blocks[`B${i}`] = block(`B${i}`, [i === 11 ? line : insert(`B${i + 1}`)]);
    expect(() => countExpandedEntities([insert('B0')], blocks, limits)).toThrow(/maxBlockDepth/);
  });
});
