import { formatInchFraction, mmToInches, type JointUnits } from '@jigwright/core';

/** Fixed decimals, grouped thousands, and never "-0.000". */
export function formatFixed(value: number, decimals: number): string {
  const rounded = Number(value.toFixed(decimals));
  return (rounded === 0 ? 0 : rounded).toLocaleString('en-US', {
    minimumFractionDigits: decimals,
    maximumFractionDigits: decimals,
  });
}

/** Up to `digits` significant figures, without trailing zeros. */
export function formatSignificant(value: number, digits: number): string {
  return Number(value.toPrecision(digits)).toLocaleString('en-US', { maximumFractionDigits: 12 });
}

export const formatMm = (mm: number, decimals = 3): string => `${formatFixed(mm, decimals)} mm`;

export const formatInDecimal = (mm: number, decimals = 4): string => `${formatFixed(mmToInches(mm), decimals)} in`;

/** Inches the way a rule reads them, to the nearest 1/32 in. */
export const formatInFraction = (mm: number): string => `${formatInchFraction(mm)} in`;

/** A length in the builder's units first and the other units after it. */
export function formatLengthBoth(mm: number, units: JointUnits): string {
  const metric = `${formatSignificant(mm, 5)} mm`;
  const imperial = formatInFraction(mm);
  return units === 'in' ? `${imperial} (${metric})` : `${metric} (${imperial})`;
}

/** A carriage speed in mm/min, with in/min when the builder works in inches. */
export function formatSpeed(mmPerMin: number, units: JointUnits): string {
  const metric = `${formatFixed(mmPerMin, 0)} mm/min`;
  return units === 'in' ? `${formatFixed(mmToInches(mmPerMin), 1)} in/min (${metric})` : metric;
}
