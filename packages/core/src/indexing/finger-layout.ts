/** Which edge feature a board starts with at its left edge. */
export type EdgeFeature = 'pin' | 'slot';

/** A stretch of the board's width, [from, to] in mm from the left edge. */
export type Span = readonly [from: number, to: number];

export interface BoardLayout {
  startsWith: EdgeFeature;
  pins: Span[];
  slots: Span[];
}

export interface FingerLayoutInput {
  /** Board width, mm. */
  width: number;
  /** Width of board A's pins (= board B's slots), mm. */
  pin: number;
  /** Width of board A's slots (= board B's pins), mm. */
  slot: number;
  /** The feature at board A's left edge; board B starts with the other one. */
  start: EdgeFeature;
}

export interface FingerLayout {
  A: BoardLayout;
  B: BoardLayout;
}

/**
 * Lengths closer than this (mm) are the same length. Far below any shop measurement, yet far
 * above the floating-point noise of sums of a few thousand widths.
 */
export const LENGTH_TOLERANCE_MM = 1e-9;

/** How many pins and slots, together, fit across the width (the last one may be cut short). */
export function featureCount({ width, pin, slot, start }: FingerLayoutInput): number {
  const first = start === 'pin' ? pin : slot;
  const pairs = Math.floor((width + LENGTH_TOLERANCE_MM) / (pin + slot));
  const rest = width - pairs * (pin + slot);
  return 2 * pairs + (rest > LENGTH_TOLERANCE_MM ? 1 : 0) + (rest > first + LENGTH_TOLERANCE_MM ? 1 : 0);
}

/**
 * Board A's features from left to right, alternating from `start`; board B has a slot wherever A
 * has a pin, so the slots of the two boards tile the width. Each edge is computed from counts of
 * whole features rather than by adding widths one after another, so errors do not build up.
 */
export function layoutFingers(input: FingerLayoutInput): FingerLayout {
  const { width, pin, slot, start } = input;
  const first = start === 'pin' ? pin : slot;
  const second = start === 'pin' ? slot : pin;
  const edgeBefore = (index: number): number => Math.ceil(index / 2) * first + Math.floor(index / 2) * second;
  const count = featureCount(input);
  const spans = Array.from({ length: count }, (_, index): Span => [
    edgeBefore(index),
    index === count - 1 ? width : edgeBefore(index + 1),
  ]);
  const startSide = spans.filter((_, index) => index % 2 === 0);
  const otherSide = spans.filter((_, index) => index % 2 === 1);
  const aPins = start === 'pin' ? startSide : otherSide;
  const aSlots = start === 'pin' ? otherSide : startSide;
  return {
    A: { startsWith: start, pins: aPins, slots: aSlots },
    B: { startsWith: start === 'pin' ? 'slot' : 'pin', pins: aSlots, slots: aPins },
  };
}
