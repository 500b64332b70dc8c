/** What the comparison needs of a part. */
export interface ComparedPart {
  name: string;
  quantity: number;
  length: number;
  width: number;
  thickness: number;
}

type Sizes = Pick<ComparedPart, 'length' | 'width' | 'thickness'>;

export type PartChange =
  | { kind: 'added'; name: string; after: ComparedPart }
  | { kind: 'removed'; name: string; before: ComparedPart }
  | {
      kind: 'resized' | 'unchanged';
      name: string;
      before: ComparedPart;
      after: ComparedPart;
      difference: Sizes;
      quantityDifference: number;
    };

/** Sizes closer than this are the same part: the analysis measures to well under it. */
const SAME_SIZE_MM = 0.05;

/**
 * Part-by-part comparison of two revisions, matched by name: parts only in the later one are
 * added, only in the earlier one removed; the rest resized when any size moved, with the
 * differences (later minus earlier) in mm. In the later revision's order, then the removed ones.
 */
export function compareRevisionParts(before: readonly ComparedPart[], after: readonly ComparedPart[]): PartChange[] {
  const earlier = new Map(before.map((part) => [part.name, part]));
  const later = new Set(after.map((part) => part.name));
  const changes: PartChange[] = after.map((part) => {
    const old = earlier.get(part.name);
    if (!old) return { kind: 'added', name: part.name, after: part };
    const difference = {
      length: part.length - old.length,
      width: part.width - old.width,
      thickness: part.thickness - old.thickness,
    };
    const moved = Object.values(difference).some((d) => Math.abs(d) > SAME_SIZE_MM);
    return {
      kind: moved ? 'resized' : 'unchanged',
      name: part.name,
      before: old,
      after: part,
      difference,
      quantityDifference: part.quantity - old.quantity,
    };
  });
  const removed = before
    .filter((part) => !later.has(part.name))
    .map((part): PartChange => ({ kind: 'removed', name: part.name, before: part }));
  return [...changes, ...removed];
}
