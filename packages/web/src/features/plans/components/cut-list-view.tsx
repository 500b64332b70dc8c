import { Badge, Box, Button, Flex, Heading, HStack, Stack, Table, Text } from '@chakra-ui/react';
import { cutListCsv, type BarPlan, type CutList, type CutListGroup, type SheetLayout } from '@jigwright/core';
import { formatLength, formatSize, type Units } from '../units';
import { useId } from 'react';

const color = (token: string) => `var(--chakra-colors-${token.replace('.', '-')})`;
const HAIRLINE = { vectorEffect: 'non-scaling-stroke', strokeWidth: 1 } as const;

const STOCK_NAMES: Record<CutListGroup['stock'], string> = {
  sheet: 'sheet goods',
  solid: 'solid stock',
  linear: 'linear stock',
};

/** An amount in the shop profile's currency (ISO 4217), or a plain two-decimal number without one. */
export function formatMoney(amount: number, currency?: string): string {
  if (!currency) return amount.toFixed(2);
  try {
    return new Intl.NumberFormat(undefined, { style: 'currency', currency }).format(amount);
  } catch {
    return `${amount.toFixed(2)} ${currency}`;
  }
}

function SheetPicture({
  layout,
  index,
  count,
  kerf,
  units,
}: {
  layout: SheetLayout;
  index: number;
  count: number;
  kerf: number;
  units: Units;
}) {
  const { sheet } = layout;
  const hatchId = `offcut-hatch-${useId().replace(/:/g, '')}`;
  // About 60 hatch lines along the sheet, whatever its size.
  const hatch = sheet.length / 60;
  const pieces = layout.placements.length;
  const label = `Sheet ${index + 1} of ${count}: ${pieces} ${pieces === 1 ? 'part' : 'parts'}, ${Math.round(layout.yield * 100)} % used`;
  return (
    <Stack gap="1" as="figure" m="0">
      <svg
        role="img"
        aria-label={label}
        data-sheet={index + 1}
        viewBox={`-4 -4 ${sheet.length + 8} ${sheet.width + 8}`}
        style={{ width: '100%', maxWidth: '40rem', height: 'auto', display: 'block' }}
      >
        <defs>
          <pattern
            id={hatchId}
            patternUnits="userSpaceOnUse"
            width={hatch}
            height={hatch}
            patternTransform="rotate(45)"
          >
            <line x1="0" y1="0" x2="0" y2={hatch} stroke={color('walnut.200')} strokeWidth={hatch / 6} />
          </pattern>
        </defs>
        <rect width={sheet.length} height={sheet.width} fill="white" />
        <rect
          width={sheet.length}
          height={sheet.width}
          fill={`url(#${hatchId})`}
          stroke={color('graphite')}
          {...HAIRLINE}
        />
        {layout.placements.map((placement, i) => (
          <g key={`${placement.name}-${i}`} data-placement={placement.name}>
            <rect
              x={placement.x}
              y={sheet.width - placement.y - placement.width}
              width={placement.length}
              height={placement.width}
              fill={color('walnut.100')}
              stroke={color('walnut.700')}
              {...HAIRLINE}
            >
              <title>{`${placement.name}${placement.rotated ? ' (turned across the grain)' : ''}`}</title>
            </rect>
            <text
              x={placement.x + placement.length / 2}
              y={sheet.width - placement.y - placement.width / 2}
              fontSize={Math.min(placement.width * 0.4, sheet.width / 16)}
              textAnchor="middle"
              dominantBaseline="middle"
              fill={color('graphite')}
            >
              {placement.name}
            </text>
          </g>
        ))}
      </svg>
      <Text as="figcaption" fontSize="sm" color="fg.muted">
        {label}; the hatched wood is offcut; {formatLength(kerf, units)} kerf between cuts.
      </Text>
    </Stack>
  );
}

function BarPicture({ plan, units }: { plan: BarPlan; units: Units }) {
  return (
    <Stack gap="2">
      {plan.bars.map((bar, i) => (
        <Stack key={i} gap="1" as="figure" m="0">
          <svg
            role="img"
            aria-label={`Bar ${i + 1}: ${bar.pieces.length} pieces from ${formatLength(bar.length, units)}, ${formatLength(bar.offcut, units)} left over`}
            data-bar={i + 1}
            viewBox={`-2 -2 ${bar.length + 4} ${bar.length / 24 + 4}`}
            style={{ width: '100%', maxWidth: '40rem', height: 'auto', display: 'block' }}
          >
            <rect width={bar.length} height={bar.length / 24} fill="white" stroke={color('graphite')} {...HAIRLINE} />
            {bar.pieces.map((piece, j) => (
              <rect
                key={j}
                data-piece={piece.name}
                x={piece.offset}
                width={piece.length}
                height={bar.length / 24}
                fill={color('walnut.100')}
                stroke={color('walnut.700')}
                {...HAIRLINE}
              >
                <title>{`${piece.name}: ${formatLength(piece.length, units)}`}</title>
              </rect>
            ))}
          </svg>
          <Text as="figcaption" fontSize="sm" color="fg.muted">
            Bar {i + 1} of {plan.bars.length}: {bar.pieces.map((piece) => piece.name).join(', ')}; offcut{' '}
            {formatLength(bar.offcut, units)}
          </Text>
        </Stack>
      ))}
    </Stack>
  );
}

const numeric = { textAlign: 'end', whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' } as const;

function GroupTable({
  group,
  units,
  selectedPart,
  onSelectPart,
}: {
  group: CutListGroup;
  units: Units;
  selectedPart: string | null;
  onSelectPart: (name: string) => void;
}) {
  const solid = group.stock === 'solid';
  const title = `${group.material}, ${formatLength(group.thickness, units)}, ${STOCK_NAMES[group.stock]}`;
  return (
    <Table.Root size="sm" aria-label={title} variant="line" bg="bg.panel">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeader>Part</Table.ColumnHeader>
          <Table.ColumnHeader css={numeric}>Quantity</Table.ColumnHeader>
          <Table.ColumnHeader css={numeric}>Finished L × W × T</Table.ColumnHeader>
          <Table.ColumnHeader css={numeric}>Rough L × W × T</Table.ColumnHeader>
          {solid && <Table.ColumnHeader css={numeric}>Board feet</Table.ColumnHeader>}
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {group.rows.map((row) => {
          const selected = row.name === selectedPart;
          return (
            <Table.Row
              key={row.name}
              data-part-row={row.name}
              data-selected={selected || undefined}
              bg={selected ? 'steel.50' : undefined}
            >
              <Table.Cell>
                <Button
                  variant="plain"
                  size="sm"
                  px="0"
                  h="auto"
                  color="steel.700"
                  aria-pressed={selected}
                  onClick={() => onSelectPart(row.name)}
                  fontWeight={selected ? '600' : '400'}
                >
                  {row.name}
                </Button>
              </Table.Cell>
              <Table.Cell css={numeric}>{row.quantity}</Table.Cell>
              <Table.Cell css={numeric}>
                {formatSize([row.finished.length, row.finished.width, row.finished.thickness], units)}
              </Table.Cell>
              <Table.Cell css={numeric}>
                {formatSize([row.rough.length, row.rough.width, row.rough.thickness], units)}
              </Table.Cell>
              {solid && (
                <Table.Cell css={numeric}>
                  {row.boardFeet === null ? '' : `${row.boardFeet.toFixed(2)} bd ft`}
                </Table.Cell>
              )}
            </Table.Row>
          );
        })}
      </Table.Body>
      {solid && group.boardFeet !== null && (
        <Table.Footer>
          <Table.Row>
            <Table.Cell colSpan={4}>Total</Table.Cell>
            <Table.Cell css={numeric}>{group.boardFeet.toFixed(2)} bd ft</Table.Cell>
          </Table.Row>
        </Table.Footer>
      )}
    </Table.Root>
  );
}

function download(text: string, fileName: string) {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv;charset=utf-8' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  URL.revokeObjectURL(url);
}

/**
 * The cut list: one table per material and thickness, sheet layouts and bar plans drawn as pictures,
 * cost when prices are known, the CSV, and a button to print it as the shop sheet.
 */
export function CutListView({
  cutList,
  units,
  kerf,
  fileName,
  selectedPart,
  onSelectPart,
  currency,
}: {
  cutList: CutList;
  units: Units;
  kerf: number;
  fileName: string;
  selectedPart: string | null;
  onSelectPart: (name: string) => void;
  /** ISO 4217 code of the prices the cut list was priced with. */
  currency?: string;
}) {
  return (
    <Stack gap="6">
      <HStack gap="2" data-print-hide="" flexWrap="wrap">
        <Button size="sm" colorPalette="steel" onClick={() => download(cutListCsv(cutList), fileName)}>
          Download CSV
        </Button>
        <Button size="sm" variant="outline" colorPalette="steel" onClick={() => window.print()}>
          Print shop sheet
        </Button>
      </HStack>
      {cutList.warnings.map((warning) => (
        <Text key={warning} color="brick.700" role="note">
          {warning}
        </Text>
      ))}
      {cutList.groups.map((group) => (
        <Stack key={`${group.material}-${group.thickness}-${group.stock}`} gap="3" className="cut-list-group">
          <Flex gap="3" align="baseline" flexWrap="wrap">
            <Heading as="h3" size="md" color="walnut.700" fontWeight="600">
              {group.material}
            </Heading>
            <Text color="fg.muted" css={{ fontVariantNumeric: 'tabular-nums' }}>
              {formatLength(group.thickness, units)} · {STOCK_NAMES[group.stock]}
            </Text>
            {group.cost !== null && (
              <Badge colorPalette="sage" variant="subtle">
                Cost {formatMoney(group.cost, currency)}
              </Badge>
            )}
          </Flex>
          <Box overflowX="auto">
            <GroupTable group={group} units={units} selectedPart={selectedPart} onSelectPart={onSelectPart} />
          </Box>
          {group.sheets &&
            group.sheets.sheets.map((layout, i) => (
              <SheetPicture
                key={i}
                layout={layout}
                index={i}
                count={group.sheets?.sheets.length ?? 0}
                kerf={kerf}
                units={units}
              />
            ))}
          {group.bars && <BarPicture plan={group.bars} units={units} />}
        </Stack>
      ))}
      {cutList.cost !== null && (
        <Text fontWeight="600" css={{ fontVariantNumeric: 'tabular-nums' }}>
          Stock cost {formatMoney(cutList.cost, currency)}
        </Text>
      )}
    </Stack>
  );
}
