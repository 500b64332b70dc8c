import { exportHeaderLines } from './export-summary';
import { fixed } from './export-text';
import type { BoardName, JointPlan } from './plan-joint';

/** RS274NGC comments are parenthesised and cannot nest. */
function comment(text: string): string {
  return `(${text.replace(/[()]/g, '')})`;
}

/**
 * One board's program: G21 (mm) and G90 (absolute), a move to each pass, M0 to pause for the
 * cut, M2 at the end. Moves are rapids, unless a top carriage speed is known (whirling or step
 * rate): then they are feed moves at that speed, so the carriage never outruns the screw.
 */
export function jointGcode(plan: JointPlan, board: BoardName): string {
  const { passes } = plan.boards[board];
  const topSpeed = plan.drive?.topSpeed ?? null;
  const move = topSpeed === null ? 'G0' : 'G1';
  const takeUp = plan.drive?.approach?.takeUp ?? 0;
  const first = passes[0];
  const header = exportHeaderLines(plan, `Jigwright finger joint, board ${board}: ${passes.length} passes.`);
  const lines = [
    ...header.map(comment),
    `G21 ${comment('millimetres')}`,
    `G90 ${comment('absolute positions')}`,
    ...(topSpeed === null ? [] : [`F${Math.floor(topSpeed)} ${comment('mm/min, top carriage speed')}`]),
    ...(takeUp > 0 && first !== undefined
      ? [`${move} X${fixed(first.position - takeUp, 4)} ${comment('take up the backlash')}`]
      : []),
    ...passes.flatMap((pass) => [
      `${move} X${fixed(pass.position, 4)}`,
      `M0 ${comment(`cut slot ${pass.slot} pass ${pass.pass}, then resume`)}`,
    ]),
    `M2 ${comment('end')}`,
  ];
  return lines.map((line) => `${line}\n`).join('');
}
