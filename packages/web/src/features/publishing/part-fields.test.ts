import { describe, expect, it } from 'vitest';
import type { EditorPart } from './api/types';
import { isPartEdited, partChanges, partFields } from './part-fields';

// 3/4 in is 19.05 mm exactly: 1 in = 25.4 mm (NBS, refinement of values for the yard and the pound, 1959).
const base: EditorPart = {
  id: 7,
  drawingId: 1,
  name: 'Runner',
  quantity: 2,
  quantityOverride: null,
  length: 600,
  width: 19.05,
  thickness: 9.525,
  material: 'maple',
  stock: 'solid',
  grain: 'length',
  updatedAt: '2026-12-01T10:00:00.123Z',
};

describe('a part row', () => {
  it('shows the thickness in the member units: mm, or inches with a fraction', () => {
    expect(partFields(base, 'mm').thickness).toBe('9.53');
    expect(partFields(base, 'in').thickness).toBe('3/8');
    expect(partFields({ ...base, quantityOverride: 3 }, 'mm').quantity).toBe('3');
  });

  it('reads inches with fractions back into mm', () => {
    const outcome = partChanges({ ...partFields(base, 'in'), thickness: '3/4' }, base, 'in');
    expect(outcome.ok && outcome.changes.thickness).toBeCloseTo(19.05, 9);
    const mixed = partChanges({ ...partFields(base, 'in'), thickness: '1-1/2' }, base, 'in');
    expect(mixed.ok && mixed.changes.thickness).toBeCloseTo(38.1, 9);
  });

  it('keeps the saved thickness when the field was not changed, though the field shows it rounded', () => {
    // 9.6 mm shows as 3/8 in (9.525 mm) but must not become 9.525 when another field is saved.
    const part = { ...base, thickness: 9.6 };
    const outcome = partChanges({ ...partFields(part, 'in'), material: 'oak' }, part, 'in');
    expect(outcome).toEqual({
      ok: true,
      changes: {
        name: 'Runner',
        material: 'oak',
        thickness: 9.6,
        stock: 'solid',
        grain: 'length',
        quantityOverride: null,
      },
    });
  });

  it('sends no override when the count typed is the drawing’s own', () => {
    const same = partChanges({ ...partFields(base, 'mm'), quantity: '2' }, base, 'mm');
    expect(same.ok && same.changes.quantityOverride).toBeNull();
    const more = partChanges({ ...partFields(base, 'mm'), quantity: '4' }, base, 'mm');
    expect(more.ok && more.changes.quantityOverride).toBe(4);
  });

  it('names each field that is wrong, with the server’s limits', () => {
    const outcome = partChanges(
      { name: ' ', material: 'ply', thickness: '3/0', stock: 'sheet', grain: 'any', quantity: '2.5' },
      base,
      'in',
    );
    expect(outcome.ok).toBe(false);
    if (!outcome.ok) expect(Object.keys(outcome.errors).sort()).toEqual(['name', 'quantity', 'thickness']);
    const thick = partChanges({ ...partFields(base, 'mm'), thickness: '501' }, base, 'mm');
    expect(!thick.ok && thick.errors.thickness).toBe('A thickness is between 0.1 and 500 mm.');
    expect(partChanges({ ...partFields(base, 'mm'), thickness: '12,5' }, base, 'mm')).toMatchObject({
      ok: true,
      changes: { thickness: 12.5 },
    });
  });

  it('knows when a row differs from the saved part', () => {
    expect(isPartEdited(partFields(base, 'in'), base, 'in')).toBe(false);
    expect(isPartEdited({ ...partFields(base, 'in'), grain: 'any' }, base, 'in')).toBe(true);
    expect(isPartEdited({ ...partFields(base, 'in'), name: 'Runner ' }, base, 'in')).toBe(false);
  });
});
