import { Table, Text } from '@chakra-ui/react';
import type { HardwareRow } from '../api/types';

export function HardwareTable({ rows }: { rows: readonly HardwareRow[] }) {
  if (rows.length === 0) return <Text color="fg.muted">This revision lists no hardware.</Text>;
  return (
    <Table.Root size="sm" aria-label="Hardware list" bg="bg.panel">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeader>Item</Table.ColumnHeader>
          <Table.ColumnHeader>Specification</Table.ColumnHeader>
          <Table.ColumnHeader textAlign="end">Quantity</Table.ColumnHeader>
          <Table.ColumnHeader>Note</Table.ColumnHeader>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {rows.map((row, i) => (
          <Table.Row key={`${row.item}-${i}`}>
            <Table.Cell>{row.item}</Table.Cell>
            <Table.Cell>{row.specification}</Table.Cell>
            <Table.Cell textAlign="end">{row.quantity}</Table.Cell>
            <Table.Cell color="fg.muted">{row.note}</Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
