import type { IInsertEntity } from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { DrawingError, DrawingLimitError } from '../dxf/drawing-error';
import { countExpandedEntities } from './block-expansion';
import type { FlatBlock, FlatItem } from './entity-items';

const limits = { maxBlockDepth: 8, maxExpandedEntities: 1_000_000 };

const common = { handle: '', layer: '0', notes: undefined };

function insert(name: string, columns = 1, rows = 1): FlatItem {
  const entity = { type: 'INSERT', name, columnCount: columns, rowCount: rows } as unknown as IInsertEntity;
  return { ...common, type: 'INSERT', kind: 'insert', insert: entity };
}

function blocks(definitions: Record<string, FlatItem[]>): Map<string, FlatBlock> {
  return new Map(Object.entries(definitions).map(([name, items]) => [name, { base: { x: 0, y: 0 }, items }]));
}

const line: FlatItem = { ...common, type: 'LINE', kind: 'other' };

describe('expansion count before expanding', () => {
  it('counts every array cell of nested inserts', () => {
    const tree = blocks({ A: [line, line], B: [insert('A', 3, 2)] });
    // B = 1 insert + 6 × 2 lines = 13; the model holds 2 inserts of B in a 2 × 1 array each.
    expect(countExpandedEntities([insert('B', 2)], tree, limits)).toBe(1 + 2 * 13);
  });

  it('refuses 1e9 columns at once, naming the limit', () => {
    const tree = blocks({ A: [line] });
    const started = Date.now();
    expect(() => countExpandedEntities([insert('A', 1e9)], tree, limits)).toThrow(DrawingLimitError);
    expect(Date.now() - started).toBeLessThan(1000);
  });

  it('refuses arrays of arrays of arrays past the cap', () => {
    const tree = blocks({ A: [line], B: [insert('A', 200, 200)], C: [insert('B', 200, 200)] });
    try {
      countExpandedEntities([insert('C', 200, 200)], tree, limits);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(DrawingLimitError);
      expect((error as DrawingLimitError).limit).toBe('maxExpandedEntities');
    }
  });

  it('names a block that inserts itself, directly or through another', () => {
    expect(() => countExpandedEntities([insert('A')], blocks({ A: [insert('A')] }), limits)).toThrow(
      /block "A" inserts itself/,
    );
    const loop = blocks({ A: [insert('B')], B: [insert('A')] });
    expect(() => countExpandedEntities([insert('A')], loop, limits)).toThrow(DrawingError);
  });

  it('refuses nesting deeper than the limit', () => {
    const chain: Record<string, FlatItem[]> = {};
    for (let i = 0; i < 12; i += 1) chain[`B${i}`] = [i === 11 ? line : insert(`B${i + 1}`)];
    expect(() => countExpandedEntities([insert('B0')], blocks(chain), limits)).toThrow(/maxBlockDepth/);
  });
});
