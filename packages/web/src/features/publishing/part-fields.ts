import { formatInchFraction, parseInchFraction, type GrainRule, type StockKind } from '@jigwright/core';
import type { EditorPart, PartChanges } from './api/types';

export type Units = 'mm' | 'in';

const STOCK_NAMES: Record<StockKind, string> = {
  sheet: 'sheet goods',
  solid: 'solid stock',
  linear: 'linear stock',
};

const GRAIN_NAMES: Record<GrainRule, string> = {
  length: 'lengthwise',
  width: 'widthwise',
  any: 'either way',
};

const choicesOf = (names: Record<string, string>) => Object.entries(names).map(([value, label]) => ({ value, label }));
export const STOCK_CHOICES = choicesOf(STOCK_NAMES);
export const GRAIN_CHOICES = choicesOf(GRAIN_NAMES);

/** A part's settings as typed into its row: text, so that a half-typed value is kept as it is. */
export interface PartFields {
  name: string;
  material: string;
  thickness: string;
  stock: StockKind;
  grain: GrainRule;
  /** Empty: the count on the drawing. */
  quantity: string;
}

/** The server's limits for a part (`UpdatePartDto`). */
const THICKNESS_MM = { min: 0.1, max: 500 };
const QUANTITY = { min: 1, max: 10000 };

/** A thickness in the member's units as a field shows it: "18" (mm) or "3/4" (in, to 1/32). */
export function thicknessText(mm: number, units: Units): string {
  return units === 'in' ? formatInchFraction(mm) : String(Math.round(mm * 100) / 100);
}

export function partFields(part: EditorPart, units: Units): PartFields {
  return {
    name: part.name,
    material: part.material,
    thickness: thicknessText(part.thickness, units),
    stock: part.stock,
    grain: part.grain,
    quantity: part.quantityOverride === null ? '' : String(part.quantityOverride),
  };
}

export type PartFieldErrors = Partial<Record<keyof PartFields, string>>;

/**
 * The changes to send for a row, or what is wrong with it. A thickness that reads back to the one
 * saved (the field shows it rounded to 1/32 in) keeps the saved value, so that saving a row without
 * touching its thickness never moves it.
 */
export function partChanges(
  fields: PartFields,
  part: EditorPart,
  units: Units,
): { ok: true; changes: PartChanges } | { ok: false; errors: PartFieldErrors } {
  const errors: PartFieldErrors = {};
  const name = fields.name.trim();
  const material = fields.material.trim();
  if (name.length < 1 || name.length > 120) errors.name = 'A part name needs 1 to 120 characters.';
  if (material.length < 1 || material.length > 120) errors.material = 'A material needs 1 to 120 characters.';

  let thickness = part.thickness;
  if (fields.thickness.trim() !== thicknessText(part.thickness, units)) {
    const read = units === 'in' ? parseInchFraction(fields.thickness) : parseMm(fields.thickness);
    if (read === undefined) {
      errors.thickness =
        units === 'in' ? 'Write inches as 3/4, 1-1/2 or 0.75.' : 'Write the thickness in mm, as 18 or 12.5.';
    } else if (read < THICKNESS_MM.min || read > THICKNESS_MM.max) {
      errors.thickness =
        units === 'in'
          ? 'A thickness is between 0.004 in and 19.68 in (0.1 to 500 mm).'
          : 'A thickness is between 0.1 and 500 mm.';
    } else thickness = read;
  }

  let quantityOverride: number | null = null;
  const quantity = fields.quantity.trim();
  if (quantity !== '') {
    const count = Number(quantity);
    if (!Number.isInteger(count) || count < QUANTITY.min || count > QUANTITY.max) {
      errors.quantity = 'A whole number from 1 to 10,000, or empty for the count on the drawing.';
    } else quantityOverride = count === part.quantity ? null : count;
  }

  if (Object.keys(errors).length > 0) return { ok: false, errors };
  return {
    ok: true,
    changes: { name, material, thickness, stock: fields.stock, grain: fields.grain, quantityOverride },
  };
}

function parseMm(text: string): number | undefined {
  const match = /^\s*(\d+(?:[.,]\d+)?|[.,]\d+)\s*(?:mm)?\s*$/.exec(text);
  return match ? Number(match[1]!.replace(',', '.')) : undefined;
}

/** Whether a row differs from the part as saved. */
export function isPartEdited(fields: PartFields, part: EditorPart, units: Units): boolean {
  const saved = partFields(part, units);
  return (Object.keys(saved) as Array<keyof PartFields>).some((key) => fields[key].trim() !== saved[key]);
}
