import { jointCHeader, jointCsv, jointGcode, type BoardName, type JointPlan } from '@jigwright/core';

export type ExportFile =
  | { id: string; label: string; filename: string; type: string; ok: true; text: string }
  | { id: string; label: string; filename: string; type: string; ok: false; reason: string };

const gcodeFile = (plan: JointPlan, board: BoardName): ExportFile => ({
  id: `gcode-${board}`,
  label: `G-code, board ${board}`,
  filename: `finger-joint-board-${board.toLowerCase()}.nc`,
  type: 'text/plain',
  ok: true,
  text: jointGcode(plan, board),
});

function cHeaderFile(plan: JointPlan): ExportFile {
  const file = { id: 'c-header', label: 'C header', filename: 'finger_joint_steps.h', type: 'text/x-chdr' };
  const outcome = jointCHeader(plan);
  return outcome.ok
    ? { ...file, ok: true, text: outcome.text }
    : { ...file, ok: false, reason: outcome.errors.map((error) => error.message).join(' ') };
}

/** The three exports of a plan, built in the browser from the core's writers. */
export function exportFiles(plan: JointPlan): ExportFile[] {
  return [
    { id: 'csv', label: 'CSV', filename: 'finger-joint-cuts.csv', type: 'text/csv', ok: true, text: jointCsv(plan) },
    gcodeFile(plan, 'A'),
    gcodeFile(plan, 'B'),
    cHeaderFile(plan),
  ];
}
