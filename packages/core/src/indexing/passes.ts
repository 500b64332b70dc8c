import { LENGTH_TOLERANCE_MM, type BoardLayout, type Span } from './finger-layout';

/** One cut: the cutter's left face at `position` mm from the board's left edge removes [position, position + kerf]. */
export interface Pass {
  /** 1-based number of the slot on its board, left to right. */
  slot: number;
  /** 1-based number of the pass within its slot, left to right. */
  pass: number;
  position: number;
}

export interface PassOptions {
  /** Board width, mm: a slot ending there has no pin on its right. */
  width: number;
}

/** The fewest passes of a cutter `kerf` wide that clear a slot `slotWidth` wide. */
export function passCount(slotWidth: number, kerf: number): number {
  return Math.max(1, Math.ceil((slotWidth - LENGTH_TOLERANCE_MM) / kerf));
}

/**
 * Cutter positions for one slot, ascending: the first flush with the slot's left side, the last
 * flush with its right side, the rest evenly between. A slot narrower than the cutter can only be
 * at a board edge; its single pass sits against the pin and runs past the edge.
 */
export function slotPassPositions(slot: Span, kerf: number, { width }: PassOptions): number[] {
  const [from, to] = slot;
  const slotWidth = to - from;
  if (slotWidth < kerf - LENGTH_TOLERANCE_MM) {
    const hasPinOnRight = to < width - LENGTH_TOLERANCE_MM;
    return [hasPinOnRight ? to - kerf : from];
  }
  const count = passCount(slotWidth, kerf);
  if (count === 1) return [from];
  const spacing = (slotWidth - kerf) / (count - 1);
  return Array.from({ length: count }, (_, index) => (index === count - 1 ? to - kerf : from + index * spacing));
}

/** Every pass of a board, left to right. */
export function boardPasses(board: BoardLayout, kerf: number, options: PassOptions): Pass[] {
  return board.slots.flatMap((slot, slotIndex) =>
    slotPassPositions(slot, kerf, options).map((position, passIndex) => ({
      slot: slotIndex + 1,
      pass: passIndex + 1,
      position,
    })),
  );
}

/** How many passes a board needs, counted without listing them (to refuse huge layouts cheaply). */
export function boardPassCount(board: BoardLayout, kerf: number): number {
  return board.slots.reduce((sum, [from, to]) => sum + passCount(to - from, kerf), 0);
}
