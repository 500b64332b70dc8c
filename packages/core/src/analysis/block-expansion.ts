import type { IInsertEntity } from 'dxf-parser';
import { DrawingError, DrawingLimitError } from '../dxf/drawing-error';
import type { DrawingLimits } from '../dxf/limits';
import type { FlatBlock, FlatItem } from './entity-items';

/** Copies an INSERT stands for: its column × row array, each count at least 1. */
export function insertCopies(insert: Pick<IInsertEntity, 'columnCount' | 'rowCount'>): number {
  return Math.max(1, Math.floor(insert.columnCount || 1)) * Math.max(1, Math.floor(insert.rowCount || 1));
}

/**
 * Counts the entities a drawing expands to, by arithmetic on the block tree and before anything is
 * expanded: an array of 1e9 columns fails at once, a block that inserts itself is named, and a
 * chain of blocks deeper than the limit is refused.
 */
export function countExpandedEntities(
  items: readonly FlatItem[],
  blocks: ReadonlyMap<string, FlatBlock>,
  limits: Pick<DrawingLimits, 'maxBlockDepth' | 'maxExpandedEntities'>,
): number {
  // Per block: entities it expands to, and how many levels of blocks it holds below itself.
  const known = new Map<string, { count: number; height: number }>();
  const visiting = new Set<string>();
  const cap = limits.maxExpandedEntities;

  const tooDeep = (name: string, depth: number): DrawingLimitError =>
    new DrawingLimitError('maxBlockDepth', limits.maxBlockDepth, `block "${name}" is nested ${depth} deep`);

  const countBlock = (name: string, depth: number): { count: number; height: number } => {
    const seen = known.get(name);
    if (seen) {
      if (depth + seen.height > limits.maxBlockDepth) throw tooDeep(name, depth + seen.height);
      return seen;
    }
    if (visiting.has(name)) throw new DrawingError('block-cycle', `block "${name}" inserts itself`);
    if (depth > limits.maxBlockDepth) throw tooDeep(name, depth);
    const block = blocks.get(name);
    if (!block) return { count: 0, height: 0 };
    visiting.add(name);
    const result = countList(block.items, depth);
    visiting.delete(name);
    known.set(name, result);
    return result;
  };

  const countList = (list: readonly FlatItem[], depth: number): { count: number; height: number } => {
    let count = 0;
    let height = 0;
    for (const item of list) {
      count += 1;
      if (item.kind === 'insert') {
        const insert = item.insert;
        const inner = countBlock(insert.name, depth + 1);
        count += insertCopies(insert) * inner.count;
        height = Math.max(height, inner.height + 1);
      }
      // Saturate: the exact figure past the cap does not matter, only that it is past it.
      if (count > cap) return { count: cap + 1, height };
    }
    return { count, height };
  };

  const total = countList(items, 0).count;
  if (total > cap) {
    throw new DrawingLimitError('maxExpandedEntities', cap, 'inserts and arrays expand to more entities than that');
  }
  return total;
}
