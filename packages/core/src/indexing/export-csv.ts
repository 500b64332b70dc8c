import { mmToInches } from '../units/length';
import { fixed } from './export-text';
import type { BoardName, JointPlan } from './plan-joint';

export const CSV_COLUMNS = ['board', 'slot', 'pass', 'position_mm', 'position_in', 'steps'] as const;

/**
 * The cut sequence of both boards, one pass a row, board A first. RFC 4180 line ends (CRLF);
 * every field is a name or a number, so none needs quoting. `steps` is empty without a drive.
 */
export function jointCsv(plan: JointPlan): string {
  const boards: BoardName[] = ['A', 'B'];
  const rows = boards.flatMap((board) =>
    plan.boards[board].passes.map((pass) =>
      [
        board,
        pass.slot,
        pass.pass,
        fixed(pass.position, 4),
        fixed(mmToInches(pass.position), 5),
        pass.steps ?? '',
      ].join(','),
    ),
  );
  return [CSV_COLUMNS.join(','), ...rows].map((row) => `${row}\r\n`).join('');
}
