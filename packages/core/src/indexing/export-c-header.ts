import { exportHeaderLines } from './export-summary';
import type { JointFieldError } from './joint-input';
import type { BoardName, JointPlan } from './plan-joint';

export type CHeaderOutcome = { ok: true; text: string } | { ok: false; errors: JointFieldError[] };

const VALUES_PER_LINE = 8;

function stepArray(plan: JointPlan, board: BoardName): string[] {
  const steps = plan.boards[board].passes.map((pass) => pass.steps ?? 0);
  const count = `JOINT_BOARD_${board}_PASSES`;
  const rows = Array.from(
    { length: Math.ceil(steps.length / VALUES_PER_LINE) },
    (_, row) => `  ${steps.slice(row * VALUES_PER_LINE, (row + 1) * VALUES_PER_LINE).join(', ')},`,
  );
  return [
    `#define ${count} ${steps.length}`,
    `static const long joint_board_${board.toLowerCase()}_steps[${count}] = {`,
    ...rows,
    '};',
  ];
}

/**
 * A C header for a microcontroller: steps per mm as a comment, and per board a `const long` array
 * of absolute step positions from home in cutting order with its length. `static` so that more
 * than one source file may include it.
 */
export function jointCHeader(plan: JointPlan): CHeaderOutcome {
  if (plan.drive === null) {
    return { ok: false, errors: [{ field: 'lead', message: 'The step table needs the screw lead.' }] };
  }
  const title = `Jigwright finger joint: absolute step positions, ${plan.passCount} passes.`;
  const lines = [
    '/*',
    ...exportHeaderLines(plan, title).map((line) => ` * ${line.replace(/\*\//g, '* /')}`),
    ' */',
    '#ifndef JIGWRIGHT_FINGER_JOINT_H',
    '#define JIGWRIGHT_FINGER_JOINT_H',
    '',
    ...(plan.drive.approach === null ? [] : [`#define JOINT_TAKE_UP_STEPS ${plan.drive.approach.takeUpSteps}`, '']),
    ...stepArray(plan, 'A'),
    '',
    ...stepArray(plan, 'B'),
    '',
    '#endif',
  ];
  return { ok: true, text: lines.map((line) => `${line}\n`).join('') };
}
