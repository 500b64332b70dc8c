import { formatInchFraction, parseInchFraction } from '@jigwright/core';
import type { PriceUnit, ShopProfileValues } from './api/shop-profile';

type Units = 'mm' | 'in';

/** The shop-profile form as typed: lengths in the member's units (inches may be fractions). */
export interface ShopProfileForm {
  kerf: string;
  edgeTrim: string;
  sheets: Array<{ length: string; width: string }>;
  barLengths: string[];
  allowance: { length: string; width: string; thickness: string };
  currency: string;
  prices: Array<{ material: string; per: PriceUnit; amount: string }>;
}

/** Field path → message, e.g. `sheets.1.width`. */
export type FormErrors = Record<string, string>;

export const PRICE_UNIT_NAMES: Record<PriceUnit, string> = {
  sheet: 'per sheet',
  'board-foot': 'per board foot',
  metre: 'per metre',
};

/** A length as the form shows it: "3.2" (mm, to 0.1) or "1/8" (in, to 1/32). */
export function lengthText(mm: number, units: Units): string {
  return units === 'in' ? formatInchFraction(mm) : String(Math.round(mm * 10) / 10);
}

/** Millimetres from what was typed: a decimal in mm, or in inches a decimal or fraction (3/4, 1-1/2, 48). */
export function readLength(text: string, units: Units): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  if (units === 'in') return parseInchFraction(trimmed);
  return /^\d+(?:\.\d+)?$|^\.\d+$/.test(trimmed) ? Number(trimmed) : undefined;
}

export function toForm(profile: ShopProfileValues, units: Units): ShopProfileForm {
  const text = (mm: number) => lengthText(mm, units);
  return {
    kerf: text(profile.kerf),
    edgeTrim: text(profile.edgeTrim),
    sheets: profile.sheets.map((sheet) => ({ length: text(sheet.length), width: text(sheet.width) })),
    barLengths: profile.barLengths.map(text),
    allowance: {
      length: text(profile.solidAllowance.length),
      width: text(profile.solidAllowance.width),
      thickness: text(profile.solidAllowance.thickness),
    },
    currency: profile.currency,
    prices: profile.prices.map((price) => ({
      material: price.material,
      per: price.per,
      amount: price.amount.toFixed(2),
    })),
  };
}

const unitName = (units: Units) => (units === 'in' ? 'inches' : 'millimetres');
const limitText = (mm: number, units: Units) => (units === 'in' ? `${formatInchFraction(mm)} in` : `${mm} mm`);

/**
 * The profile the form stands for, or the errors of every field that is wrong. A length whose text
 * is what `toForm` wrote keeps its saved value exactly, so that switching units and saving changes
 * nothing that was not retyped (3.2 mm shows as 1/8 in, which is 3.175 mm).
 */
export function fromForm(
  form: ShopProfileForm,
  saved: ShopProfileValues,
  units: Units,
): { values: ShopProfileValues; errors?: undefined } | { errors: FormErrors } {
  const errors: FormErrors = {};
  const length = (path: string, text: string, savedMm: number | undefined, min: number, max: number): number => {
    if (savedMm !== undefined && text === lengthText(savedMm, units)) return savedMm;
    const mm = readLength(text, units);
    if (mm === undefined)
      errors[path] = `Write a length in ${unitName(units)}${units === 'in' ? ' (3/4 or 0.75)' : ''}.`;
    else if (mm < min - 1e-9 || mm > max + 1e-9)
      errors[path] = `Between ${limitText(min, units)} and ${limitText(max, units)}.`;
    return mm ?? 0;
  };

  const kerf = length('kerf', form.kerf, saved.kerf, 0, 12);
  const edgeTrim = length('edgeTrim', form.edgeTrim, saved.edgeTrim, 0, 50);
  if (form.sheets.length === 0) errors.sheets = 'Give at least one sheet size.';
  const sheets = form.sheets.map((sheet, i) => ({
    length: length(`sheets.${i}.length`, sheet.length, saved.sheets[i]?.length, 100, 6000),
    width: length(`sheets.${i}.width`, sheet.width, saved.sheets[i]?.width, 100, 6000),
  }));
  if (form.barLengths.length === 0) errors.barLengths = 'Give at least one bar length.';
  const barLengths = form.barLengths.map((text, i) => length(`barLengths.${i}`, text, saved.barLengths[i], 100, 12000));
  const solidAllowance = {
    length: length('allowance.length', form.allowance.length, saved.solidAllowance.length, 0, 200),
    width: length('allowance.width', form.allowance.width, saved.solidAllowance.width, 0, 200),
    thickness: length('allowance.thickness', form.allowance.thickness, saved.solidAllowance.thickness, 0, 50),
  };
  const currency = form.currency.trim().toUpperCase();
  if (!/^[A-Z]{3}$/.test(currency)) errors.currency = 'A three-letter ISO 4217 code such as EUR, GBP or USD.';

  const seen = new Map<string, number>();
  const prices = form.prices.map((price, i) => {
    const material = price.material.trim();
    if (material === '') errors[`prices.${i}.material`] = 'Name the material as plans do, or * for any.';
    else if (material.length > 120) errors[`prices.${i}.material`] = 'At most 120 characters.';
    const key = `${material.toLowerCase()} ${price.per}`;
    const earlier = seen.get(key);
    if (material && earlier !== undefined)
      errors[`prices.${i}.material`] =
        `${material} already has a price ${PRICE_UNIT_NAMES[price.per]} (row ${earlier + 1}).`;
    seen.set(key, earlier ?? i);
    const amountText = price.amount.trim().replace(',', '.');
    const amount = Number(amountText);
    if (!/^\d+(?:\.\d{1,2})?$/.test(amountText) || amount > 1_000_000)
      errors[`prices.${i}.amount`] = 'A price such as 58.50 (at most two decimals).';
    return { material, per: price.per, amount };
  });

  if (Object.keys(errors).length > 0) return { errors };
  return { values: { kerf, edgeTrim, sheets, barLengths, solidAllowance, currency, prices } };
}
