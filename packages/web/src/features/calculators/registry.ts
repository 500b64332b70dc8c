export interface CalculatorEntry {
  title: string;
  summary: string;
  href: string;
}

/** The calculators the Calculators page lists, in the order shown. */
export const calculators: CalculatorEntry[] = [];
