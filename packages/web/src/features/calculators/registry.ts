import { paths } from '../../config/paths';

export interface CalculatorEntry {
  title: string;
  summary: string;
  href: string;
}

/** The calculators the Calculators page lists, in the order shown. */
export const calculators: CalculatorEntry[] = [
  {
    title: 'Finger joints',
    summary: 'Pins, slots and every cutter pass of a box joint, with the stepper moves and G-code for an indexing jig.',
    href: paths.fingerJoints.getHref(),
  },
];
