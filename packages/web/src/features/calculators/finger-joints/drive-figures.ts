import { mmToInches, WHIRLING_SAFE_FRACTION, type JointPlan } from '@jigwright/core';
import { formatFixed, formatLengthBoth, formatSignificant, formatSpeed } from './format';

export interface Figure {
  label: string;
  value: string;
  /** How the figure came about, in a word or two. */
  note?: string;
}

const FIXITY_NAMES = {
  'fixed-free': 'fixed – free',
  'pinned-pinned': 'supported – supported',
  'fixed-pinned': 'fixed – supported',
  'fixed-fixed': 'fixed – fixed',
} as const;

/** The drive's figures as label and text, in the order a builder checks them; none without a drive. */
export function driveFigures(plan: JointPlan): Figure[] {
  const { drive, stepsPerMm, resolution, maxRoundingError, units } = plan;
  if (drive === null || stepsPerMm === null || resolution === null || maxRoundingError === null) return [];
  const { approach, travel, whirling } = drive;
  return [
    {
      label: 'Steps per mm',
      value: formatSignificant(stepsPerMm, 8),
      note: `${drive.stepsPerRev} steps/rev × ${drive.microsteps} microsteps ÷ ${formatSignificant(drive.lead, 6)} mm lead`,
    },
    {
      label: 'Resolution',
      value: `${formatSignificant(resolution, 4)} mm per step`,
      note: `${formatSignificant(mmToInches(resolution), 3)} in`,
    },
    {
      label: 'Largest rounding error',
      value: `${formatFixed(maxRoundingError * 1000, 2)} µm`,
      note: 'each pass rounded from home, so errors never add up',
    },
    ...(approach === null
      ? []
      : [
          {
            label: 'Approach',
            value: `Take up ${formatFixed(approach.takeUpSteps, 0)} steps (${formatSignificant(approach.takeUp, 4)} mm) for ${formatSignificant(drive.backlash, 4)} mm backlash`,
            note: approach.rule,
          },
        ]),
    {
      label: 'Carriage travel',
      value: formatLengthBoth(travel.length, units),
      note: `from ${formatSignificant(travel.from, 5)} mm to ${formatSignificant(travel.to, 5)} mm`,
    },
    ...(whirling === null
      ? []
      : [
          {
            label: 'Whirling speed',
            value: `${formatFixed(whirling.criticalRpm, 0)} rpm`,
            note: `${FIXITY_NAMES[whirling.fixity]}; run at most ${formatFixed(whirling.safeRpm, 0)} rpm (${WHIRLING_SAFE_FRACTION * 100} %)`,
          },
          { label: 'Top speed, screw', value: formatSpeed(whirling.topSpeed, units), note: 'at the safe screw speed' },
        ]),
    ...(drive.stepRateTopSpeed === null
      ? []
      : [{ label: 'Top speed, step rate', value: formatSpeed(drive.stepRateTopSpeed, units) }]),
    ...(drive.topSpeed === null
      ? []
      : [{ label: 'Top carriage speed', value: formatSpeed(drive.topSpeed, units), note: 'the lower limit' }]),
  ];
}
