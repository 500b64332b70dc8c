import { Table, Text } from '@chakra-ui/react';
import type { BoardName, JointPlan } from '@jigwright/core';
import { formatFixed, formatInDecimal, formatInFraction, formatMm } from '../format';

/** Beyond this the page would slow down as you type; the CSV always holds every pass. */
const CUT_TABLE_ROW_LIMIT = 500;

const BOARDS: BoardName[] = ['A', 'B'];

const numeric = { textAlign: 'end', whiteSpace: 'nowrap' } as const;

/** Every pass in cutting order, board A first: where the cutter's left face goes and the steps from home. */
export function CutTable({ plan }: { plan: JointPlan }) {
  const rows = BOARDS.flatMap((board) => plan.boards[board].passes.map((pass) => ({ board, ...pass })));
  const shown = rows.slice(0, CUT_TABLE_ROW_LIMIT);
  return (
    <>
      <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="md" maxH="28rem" bg="bg.panel">
        <Table.Root size="sm" stickyHeader aria-label="Cut table">
          <Table.Header>
            <Table.Row bg="walnut.50">
              <Table.ColumnHeader>Board</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Slot</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Pass</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Position, mm</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Position, in</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Nearest 1/32 in</Table.ColumnHeader>
              <Table.ColumnHeader {...numeric}>Steps from home</Table.ColumnHeader>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {shown.map((row) => (
              <Table.Row key={`${row.board}-${row.slot}-${row.pass}`}>
                <Table.Cell>{row.board}</Table.Cell>
                <Table.Cell {...numeric}>{row.slot}</Table.Cell>
                <Table.Cell {...numeric}>{row.pass}</Table.Cell>
                <Table.Cell {...numeric}>{formatMm(row.position)}</Table.Cell>
                <Table.Cell {...numeric}>{formatInDecimal(row.position)}</Table.Cell>
                <Table.Cell {...numeric}>{formatInFraction(row.position)}</Table.Cell>
                <Table.Cell {...numeric}>{row.steps === null ? '—' : formatFixed(row.steps, 0)}</Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      </Table.ScrollArea>
      <Text fontSize="sm" color="fg.muted" mt="2">
        {rows.length > shown.length
          ? `The first ${shown.length} of ${rows.length} passes; the CSV holds them all.`
          : `${rows.length} passes.`}{' '}
        Positions are the cutter's left face, measured from home at the board's left edge.
      </Text>
    </>
  );
}
