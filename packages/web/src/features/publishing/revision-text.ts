import type { EditorRevision, HardwareRow, RevisionText } from './api/types';

/** The text the editor saves, as the revision holds it now. */
export function textOf(revision: EditorRevision): RevisionText {
  return {
    changelog: revision.changelog,
    notes: revision.notes,
    safetyNotes: revision.safetyNotes,
    hardware: revision.hardware,
  };
}

const sameRow = (a: HardwareRow, b: HardwareRow) =>
  a.item === b.item && a.specification === b.specification && a.quantity === b.quantity && a.note === b.note;

export function sameText(a: RevisionText, b: RevisionText): boolean {
  return (
    a.changelog === b.changelog &&
    a.notes === b.notes &&
    a.safetyNotes === b.safetyNotes &&
    a.hardware.length === b.hardware.length &&
    a.hardware.every((row, i) => sameRow(row, b.hardware[i]!))
  );
}

/** A copy with the row at `index` moved one place (-1 up, +1 down); the same rows at the ends. */
export function moveRow<T>(rows: readonly T[], index: number, by: -1 | 1): T[] {
  const to = index + by;
  if (to < 0 || to >= rows.length) return [...rows];
  const next = [...rows];
  [next[index], next[to]] = [next[to]!, next[index]!];
  return next;
}

/** The server's rules for a hardware row (`HardwareRowDto`). */
export function hardwareRowErrors(row: HardwareRow): { item?: string; quantity?: string } {
  const errors: { item?: string; quantity?: string } = {};
  if (row.item.trim().length < 1 || row.item.length > 200)
    errors.item = 'Each row needs an item (1 to 200 characters).';
  if (!Number.isInteger(row.quantity) || row.quantity < 1 || row.quantity > 100000) {
    errors.quantity = 'A whole number from 1.';
  }
  return errors;
}

/** The text as the server takes it: hardware rows trimmed. Null when a row breaks the rules. */
export function textToSave(text: RevisionText): RevisionText | null {
  if (text.hardware.some((row) => Object.keys(hardwareRowErrors(row)).length > 0)) return null;
  return {
    ...text,
    hardware: text.hardware.map((row) => ({
      item: row.item.trim(),
      specification: row.specification.trim(),
      quantity: row.quantity,
      note: row.note.trim(),
    })),
  };
}
