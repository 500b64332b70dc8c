import { formatInchFraction } from '@jigwright/core';

/** The units a member reads measurements in. */
export type Units = 'mm' | 'in';

export function parseUnits(text: string | null): Units {
  return text === 'in' ? 'in' : 'mm';
}

function formatMmNumber(mm: number): string {
  return String(Math.round(mm * 10) / 10);
}

/** A length in the member's units: "305.5 mm" or "12-1/32 in" (to 1/32 in). */
export function formatLength(mm: number, units: Units): string {
  return units === 'in' ? `${formatInchFraction(mm)} in` : `${formatMmNumber(mm)} mm`;
}

/** Sizes written as the trade writes them, units once at the end: "600 × 300 × 18 mm". */
export function formatSize(lengths: readonly number[], units: Units): string {
  const numbers = lengths.map((mm) => (units === 'in' ? formatInchFraction(mm) : formatMmNumber(mm)));
  return `${numbers.join(' × ')} ${units}`;
}

/** A signed difference in mm, as the revision comparison shows it: "+12 mm", "−3.2 mm". */
export function formatDifferenceMm(mm: number): string {
  const rounded = Math.round(mm * 10) / 10;
  if (rounded === 0) return '0 mm';
  return `${rounded > 0 ? '+' : '−'}${formatMmNumber(Math.abs(rounded))} mm`;
}
