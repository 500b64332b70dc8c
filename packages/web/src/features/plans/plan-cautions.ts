import type { Tool } from './api/types';
import { TOOLS } from './vocabulary';

/**
 * The cautions every plan shows when it is motorised or needs a power tool (DESIGN.md §3.10),
 * whatever the designer wrote: guarding and push sticks as OSHA 29 CFR 1910.213 asks of
 * woodworking machinery, and an emergency stop as IEC 60204-1 §9.2.2 describes.
 */
export function usualCautions({ motorised, tools }: { motorised: boolean; tools: readonly Tool[] }): string[] {
  const power = tools.some((tool) => TOOLS[tool].power);
  if (!power && !motorised) return [];
  const points = power
    ? [
        'Keep the guards on the tool as its maker intends, and use push sticks or push blocks near the blade or bit.',
        'Wear eye and hearing protection.',
        'Unplug the tool before changing a blade or bit or adjusting the jig.',
      ]
    : [];
  if (motorised)
    points.push(
      'Mains wiring of the motor supply and controller is work for a qualified person.',
      'Fit a working emergency stop within reach that cuts power to the motor and the cutter, and test it before every session.',
    );
  points.push(
    'Local codes, licensed practice and the tool maker’s instructions come first; these notes do not replace them.',
  );
  return points;
}
