import { MM_PER_INCH } from './length';

export interface InchFractionOptions {
  /** Finest fraction shown; DESIGN.md asks for 1/32 in. */
  denominator?: number;
}

/**
 * Writes millimetres as inches with a fraction reduced to lowest terms, rounded to the
 * nearest 1/denominator: 19.05 → "3/4", 88.9 → "3-1/2", 25.4 → "1".
 */
export function formatInchFraction(mm: number, options: InchFractionOptions = {}): string {
  const denominator = options.denominator ?? 32;
  const sign = mm < 0 ? '-' : '';
  const steps = Math.round((Math.abs(mm) / MM_PER_INCH) * denominator);
  const whole = Math.floor(steps / denominator);
  let numerator = steps % denominator;
  let reduced = denominator;
  while (numerator > 0 && numerator % 2 === 0 && reduced % 2 === 0) {
    numerator /= 2;
    reduced /= 2;
  }
  if (numerator === 0) return `${steps === 0 ? '' : sign}${whole}`;
  const fraction = `${numerator}/${reduced}`;
  return whole === 0 ? `${sign}${fraction}` : `${sign}${whole}-${fraction}`;
}

/** Reads `3/4`, `1-1/2`, `1 1/2`, `2.5` (inches) into millimetres; undefined when not a number. */
export function parseInchFraction(text: string): number | undefined {
  const match = /^\s*(?:(\d+)(?:[-\s]+))?(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  if (match) {
    const whole = Number(match[1] ?? 0);
    const denominator = Number(match[3]);
    if (denominator === 0) return undefined;
    return (whole + Number(match[2]) / denominator) * MM_PER_INCH;
  }
  const decimal = /^\s*(\d+(?:\.\d+)?|\.\d+)\s*$/.exec(text);
  return decimal ? Number(decimal[1]) * MM_PER_INCH : undefined;
}
