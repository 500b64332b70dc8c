import { POWERED_CUTTER_CAUTION } from './caution';
import { plain, toAscii, wrapWords } from './export-text';
import type { JointPlan } from './plan-joint';

/** Comment lines stay short enough for controllers with small line buffers. */
export const COMMENT_WIDTH = 70;

function jointLine(plan: JointPlan): string {
  return (
    `Width ${plain(plan.width)} mm, pin ${plain(plan.pin)} mm, slot ${plain(plan.slot)} mm, ` +
    `kerf ${plain(plan.kerf)} mm; board A starts with a ${plan.start}, board B with a ${plan.boards.B.startsWith}.`
  );
}

function driveLines(plan: JointPlan): string[] {
  const { drive, stepsPerMm, resolution } = plan;
  if (drive === null || stepsPerMm === null || resolution === null) return ['No drive given: positions only.'];
  return [
    `Lead ${plain(drive.lead)} mm, ${drive.stepsPerRev} steps/rev, ${drive.microsteps} microsteps: ` +
      `${plain(stepsPerMm)} steps per mm, ${plain(resolution)} mm per step.`,
    ...(drive.approach === null ? [] : [drive.approach.rule]),
    ...(drive.topSpeed === null ? [] : [`Top carriage speed ${Math.floor(drive.topSpeed)} mm/min.`]),
  ];
}

/**
 * The text every export opens with: what joint it is, the drive, positions measured from home,
 * and the cautions. ASCII, wrapped to COMMENT_WIDTH, without comment markers.
 */
export function exportHeaderLines(plan: JointPlan, title: string): string[] {
  const paragraphs = [
    title,
    jointLine(plan),
    'Positions: the left face of the cutter, from home at the left edge of the board.',
    ...driveLines(plan),
    `${POWERED_CUTTER_CAUTION.heading}.`,
    ...POWERED_CUTTER_CAUTION.points.map((point) => `- ${point}`),
    `Sources: ${POWERED_CUTTER_CAUTION.sources.join('; ')}.`,
  ];
  return paragraphs.flatMap((paragraph) => wrapWords(toAscii(paragraph), COMMENT_WIDTH));
}
