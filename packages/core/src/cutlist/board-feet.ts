import { MM_PER_INCH } from '../units/length';

/**
 * Board feet of a piece: T(in) × W(in) × L(ft) / 12, i.e. in³ / 144, with stock under 1 in thick
 * counted as 1 in (US Navy, *Engineering Aid Basic*, lumber chapter [read]).
 */
export function boardFeet(thicknessMm: number, widthMm: number, lengthMm: number): number {
  const thickness = Math.max(1, thicknessMm / MM_PER_INCH);
  return (thickness * (widthMm / MM_PER_INCH) * (lengthMm / MM_PER_INCH)) / 144;
}
