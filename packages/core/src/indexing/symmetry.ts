import { LENGTH_TOLERANCE_MM, type EdgeFeature } from './finger-layout';

/** A nearby set of widths with which board A has the same whole feature at both edges. */
export interface SymmetrySuggestion {
  /** Which input the suggestion changes; the others stay as given. */
  change: 'width' | 'pin';
  width: number;
  pin: number;
  slot: number;
  /** The feature at both edges of board A. */
  edges: EdgeFeature;
  pins: number;
  slots: number;
}

export interface SymmetryInput {
  width: number;
  pin: number;
  slot: number;
  kerf: number;
  start: EdgeFeature;
}

export interface SymmetryOptions {
  /** The slot width was not given and follows the pin width. */
  slotFollowsPin: boolean;
}

function counts(start: EdgeFeature, repeats: number): Pick<SymmetrySuggestion, 'pins' | 'slots'> {
  return start === 'pin' ? { pins: repeats + 1, slots: repeats } : { pins: repeats, slots: repeats + 1 };
}

function neighbours(repeats: number): number[] {
  return [...new Set([Math.floor(repeats), Math.ceil(repeats)])].filter((count) => count >= 1);
}

/**
 * Board A has the same feature at both edges when the width holds `m + 1` of its first feature
 * and `m` of the other. Returns the nearest such widths (keeping pin and slot), and the nearest pin
 * widths that fit the given width; none when the layout is already symmetric. Never applied to
 * the layout: the builder chooses.
 */
export function suggestSymmetricLayouts(
  input: SymmetryInput,
  { slotFollowsPin }: SymmetryOptions,
): SymmetrySuggestion[] {
  const { width, pin, slot, kerf, start } = input;
  const first = start === 'pin' ? pin : slot;
  const repeats = (width - first) / (pin + slot);
  if (Math.abs(repeats - Math.round(repeats)) * (pin + slot) < LENGTH_TOLERANCE_MM) return [];
  const byWidth = neighbours(repeats).map((count): SymmetrySuggestion => ({
    change: 'width',
    width: (count + 1) * first + count * (pin + slot - first),
    pin,
    slot,
    edges: start,
    ...counts(start, count),
  }));
  const byPin = neighbours(repeats)
    .map((count): SymmetrySuggestion => {
      const pins = counts(start, count).pins;
      const newPin = slotFollowsPin ? width / (2 * count + 1) : (width - (2 * count + 1 - pins) * slot) / pins;
      return {
        change: 'pin',
        width,
        pin: newPin,
        slot: slotFollowsPin ? newPin : slot,
        edges: start,
        ...counts(start, count),
      };
    })
    .filter(
      (suggestion) => suggestion.pin >= kerf - LENGTH_TOLERANCE_MM && suggestion.slot >= kerf - LENGTH_TOLERANCE_MM,
    );
  return [...byWidth, ...byPin];
}
