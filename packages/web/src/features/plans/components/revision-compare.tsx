import { Badge, Field, HStack, NativeSelect, Stack, Table, Text } from '@chakra-ui/react';
import { useState } from 'react';
import { useRevision } from '../api/get-revision';
import type { RevisionSummary } from '../api/types';
import { compareRevisionParts, type PartChange } from '../revision-diff';
import { formatDifferenceMm, formatSize, type Units } from '../units';

const KIND_TONE: Record<PartChange['kind'], string> = {
  added: 'sage',
  removed: 'brick',
  resized: 'steel',
  unchanged: 'gray',
};

function sizes(part: { length: number; width: number; thickness: number }, units: Units) {
  return formatSize([part.length, part.width, part.thickness], units);
}

function ChangeRow({ change, units }: { change: PartChange; units: Units }) {
  const before = change.kind === 'added' ? '—' : sizes(change.before, units);
  const after = change.kind === 'removed' ? '—' : sizes(change.after, units);
  const difference =
    change.kind === 'resized'
      ? [change.difference.length, change.difference.width, change.difference.thickness]
          .map(formatDifferenceMm)
          .join(' × ')
      : '';
  return (
    <Table.Row data-change={change.kind}>
      <Table.Cell>{change.name}</Table.Cell>
      <Table.Cell>
        <Badge colorPalette={KIND_TONE[change.kind]} variant="subtle">
          {change.kind}
        </Badge>
      </Table.Cell>
      <Table.Cell textAlign="end">{before}</Table.Cell>
      <Table.Cell textAlign="end">{after}</Table.Cell>
      <Table.Cell textAlign="end">{difference}</Table.Cell>
    </Table.Row>
  );
}

function RevisionChoice({
  label,
  value,
  revisions,
  onChange,
}: {
  label: string;
  value: number;
  revisions: readonly RevisionSummary[];
  onChange: (n: number) => void;
}) {
  return (
    <Field.Root maxW="40">
      <Field.Label fontSize="sm">{label}</Field.Label>
      <NativeSelect.Root size="sm" bg="bg.panel">
        <NativeSelect.Field value={value} onChange={(event) => onChange(Number(event.target.value))}>
          {revisions.map((revision) => (
            <option key={revision.number} value={revision.number}>
              r{revision.number}
            </option>
          ))}
        </NativeSelect.Field>
        <NativeSelect.Indicator />
      </NativeSelect.Root>
    </Field.Root>
  );
}

/** Any two revisions side by side, part by part: added, removed, resized with the differences in mm. */
export function RevisionCompare({
  slug,
  revisions,
  units,
}: {
  slug: string;
  revisions: readonly RevisionSummary[];
  units: Units;
}) {
  const numbers = revisions.map((revision) => revision.number);
  const [from, setFrom] = useState(numbers.at(-2) ?? numbers[0] ?? 1);
  const [to, setTo] = useState(numbers.at(-1) ?? 1);
  const earlier = useRevision(slug, from);
  const later = useRevision(slug, to);
  const changes = earlier.data && later.data ? compareRevisionParts(earlier.data.parts, later.data.parts) : null;
  const changed = changes?.filter((change) => change.kind !== 'unchanged').length ?? 0;
  return (
    <Stack gap="3">
      <HStack gap="4" align="flex-end">
        <RevisionChoice label="Compare" value={from} revisions={revisions} onChange={setFrom} />
        <RevisionChoice label="with" value={to} revisions={revisions} onChange={setTo} />
      </HStack>
      {(earlier.isError || later.isError) && (
        <Text role="alert" color="brick.700">
          A revision could not be loaded for the comparison.
        </Text>
      )}
      {changes && (
        <>
          <Text color="fg.muted" aria-live="polite">
            {from === to
              ? 'The same revision twice: nothing differs.'
              : `${changed} of ${changes.length} parts differ between r${from} and r${to}.`}
          </Text>
          <Table.Root size="sm" aria-label={`Parts of r${from} and r${to}`} bg="bg.panel">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeader>Part</Table.ColumnHeader>
                <Table.ColumnHeader>Change</Table.ColumnHeader>
                <Table.ColumnHeader textAlign="end">r{from} L × W × T</Table.ColumnHeader>
                <Table.ColumnHeader textAlign="end">r{to} L × W × T</Table.ColumnHeader>
                <Table.ColumnHeader textAlign="end">Difference</Table.ColumnHeader>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {changes.map((change) => (
                <ChangeRow key={`${change.kind}-${change.name}`} change={change} units={units} />
              ))}
            </Table.Body>
          </Table.Root>
        </>
      )}
    </Stack>
  );
}
