import { Box, Button, Input, Stack, Table, Text } from '@chakra-ui/react';
import type { GrainRule, StockKind } from '@jigwright/core';
import { formatInchFraction } from '@jigwright/core';
import { useCallback, useEffect, useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useUpdatePart } from '../api/update-part';
import type { EditorDrawing, EditorPart, EditorRevision } from '../api/types';
import {
  GRAIN_CHOICES,
  isPartEdited,
  partChanges,
  partFields,
  STOCK_CHOICES,
  type PartFieldErrors,
  type PartFields,
  type Units,
} from '../part-fields';
import { ChoiceSelect } from './choice-select';

function sizeText(part: EditorPart, units: Units): string {
  const numbers = [part.length, part.width].map((mm) =>
    units === 'in' ? formatInchFraction(mm) : String(Math.round(mm * 10) / 10),
  );
  return `${numbers.join(' × ')} ${units}`;
}

function CellInput({
  label,
  value,
  error,
  onChange,
  disabled,
  width,
  placeholder,
  inputMode,
}: {
  label: string;
  value: string;
  error?: string;
  onChange(value: string): void;
  disabled: boolean;
  width: string;
  placeholder?: string;
  inputMode?: 'decimal' | 'numeric' | 'text';
}) {
  return (
    <Box>
      <Input
        size="sm"
        width={width}
        value={value}
        aria-label={label}
        aria-invalid={error ? true : undefined}
        borderColor={error ? 'brick.600' : undefined}
        placeholder={placeholder}
        inputMode={inputMode}
        disabled={disabled}
        onChange={(event) => onChange(event.target.value)}
      />
      {error && (
        <Text fontSize="xs" color="brick.700" mt="1" maxW={width}>
          {error}
        </Text>
      )}
    </Box>
  );
}

/**
 * One part's row, saved on its own with the part's `updatedAt`. What was typed stays in the row
 * through a refused save and a reload: a reload only moves the row on to the newer saved part.
 */
function PartRow({
  slug,
  number,
  part,
  drawingName,
  units,
  readOnly,
  onEdited,
  onReload,
}: {
  slug: string;
  number: number;
  part: EditorPart;
  drawingName: string | undefined;
  units: Units;
  readOnly: boolean;
  onEdited(partId: number, edited: boolean): void;
  onReload(): Promise<unknown>;
}) {
  const save = useUpdatePart(slug, number);
  const [reloading, setReloading] = useState(false);
  const reload = async () => {
    setReloading(true);
    await onReload().finally(() => setReloading(false));
    save.reset();
  };
  const [fields, setFields] = useState<PartFields>(() => partFields(part, units));
  const [errors, setErrors] = useState<PartFieldErrors>({});
  const [shownUnits, setShownUnits] = useState(units);
  if (shownUnits !== units) {
    setShownUnits(units);
    setFields(partFields(part, units));
  }
  const edited = isPartEdited(fields, part, units);
  useEffect(() => onEdited(part.id, edited), [edited, onEdited, part.id]);
  // A row that goes (its drawing removed) has nothing left unsaved.
  useEffect(() => () => onEdited(part.id, false), [onEdited, part.id]);

  const conflict = save.error instanceof ApiError && save.error.code === 'part_changed';
  const change = (patch: Partial<PartFields>) => {
    setFields({ ...fields, ...patch });
    setErrors({});
  };
  const submit = () => {
    const outcome = partChanges(fields, part, units);
    if (!outcome.ok) {
      setErrors(outcome.errors);
      return;
    }
    save.mutate({ part, changes: outcome.changes }, { onSuccess: (saved) => setFields(partFields(saved, units)) });
  };
  const label = (what: string) => `${what} of ${part.name}`;
  const disabled = readOnly || save.isPending;

  return (
    <>
      <Table.Row aria-label={part.name} data-edited={edited || undefined}>
        <Table.Cell>
          <CellInput
            label={label('Name')}
            value={fields.name}
            error={errors.name}
            width="40"
            disabled={disabled}
            onChange={(name) => change({ name })}
          />
          {drawingName && (
            <Text fontSize="xs" color="fg.muted" mt="1">
              {drawingName}
            </Text>
          )}
        </Table.Cell>
        <Table.Cell textAlign="end" whiteSpace="nowrap">
          {sizeText(part, units)}
        </Table.Cell>
        <Table.Cell>
          <CellInput
            label={label('Material')}
            value={fields.material}
            error={errors.material}
            width="40"
            disabled={disabled}
            onChange={(material) => change({ material })}
          />
        </Table.Cell>
        <Table.Cell>
          <CellInput
            label={label(`Thickness (${units})`)}
            value={fields.thickness}
            error={errors.thickness}
            width="20"
            inputMode={units === 'in' ? 'text' : 'decimal'}
            disabled={disabled}
            onChange={(thickness) => change({ thickness })}
          />
        </Table.Cell>
        <Table.Cell>
          <ChoiceSelect
            label={label('Stock')}
            size="sm"
            width="36"
            choices={STOCK_CHOICES}
            value={fields.stock}
            disabled={disabled}
            onChange={(stock) => change({ stock: stock as StockKind })}
          />
        </Table.Cell>
        <Table.Cell>
          <ChoiceSelect
            label={label('Grain')}
            size="sm"
            width="36"
            choices={GRAIN_CHOICES}
            value={fields.grain}
            disabled={disabled}
            onChange={(grain) => change({ grain: grain as GrainRule })}
          />
        </Table.Cell>
        <Table.Cell>
          <CellInput
            label={label('Quantity')}
            value={fields.quantity}
            error={errors.quantity}
            width="20"
            inputMode="numeric"
            placeholder={String(part.quantity)}
            disabled={disabled}
            onChange={(quantity) => change({ quantity })}
          />
        </Table.Cell>
        {!readOnly && (
          <Table.Cell>
            <Button
              size="sm"
              colorPalette="steel"
              variant={edited ? 'solid' : 'outline'}
              disabled={!edited}
              loading={save.isPending}
              onClick={submit}
              aria-label={`Save ${part.name}`}
            >
              Save
            </Button>
          </Table.Cell>
        )}
      </Table.Row>
      {save.error && (
        <Table.Row>
          <Table.Cell colSpan={8} bg="brick.50">
            <Text role="alert" color="brick.700" fontSize="sm">
              {conflict
                ? `“${part.name}” was changed in another tab or window. Reload to get that version; what you typed stays here, and saving then replaces it.`
                : save.error.message}
            </Text>
            {conflict && (
              <Button
                mt="2"
                size="xs"
                variant="outline"
                colorPalette="steel"
                loading={reloading}
                onClick={() => void reload()}
              >
                Reload this part
              </Button>
            )}
          </Table.Cell>
        </Table.Row>
      )}
    </>
  );
}

const COLUMNS = ['Part', 'Size (L × W)', 'Material', 'Thickness', 'Stock', 'Grain', 'Quantity'];

/** The parts the drawings gave, with the owner's settings; each row is saved on its own. */
export function PartsTable({
  revision,
  units,
  readOnly,
  onEditedChange,
  onReload,
}: {
  revision: EditorRevision;
  units: Units;
  readOnly: boolean;
  /** How many rows have changes not saved yet. */
  onEditedChange(count: number): void;
  onReload(): Promise<unknown>;
}) {
  const [edited, setEdited] = useState<ReadonlySet<number>>(new Set());
  const markEdited = useCallback((partId: number, isEdited: boolean) => {
    setEdited((current) => {
      if (current.has(partId) === isEdited) return current;
      const next = new Set(current);
      if (isEdited) next.add(partId);
      else next.delete(partId);
      return next;
    });
  }, []);
  useEffect(() => onEditedChange(edited.size), [edited, onEditedChange]);

  const drawingNames = new Map<number, string>(
    revision.drawings.map((drawing: EditorDrawing) => [drawing.id, drawing.originalName]),
  );
  const manyDrawings = revision.drawings.length > 1;
  if (revision.parts.length === 0) {
    return (
      <Text color="fg.muted">
        {revision.drawings.some((drawing) => drawing.status === 'queued' || drawing.status === 'analysing')
          ? 'The parts appear here as soon as the analysis is done.'
          : 'No parts yet: they come from the closed outlines of an analysed drawing.'}
      </Text>
    );
  }
  return (
    <Stack gap="2">
      <Text fontSize="sm" color="fg.muted">
        Sizes are measured from the drawing. Thickness in{' '}
        {units === 'in' ? 'inches (3/4, 1-1/2 or 0.75)' : 'millimetres'}; leave Quantity empty for the count on the
        drawing.
      </Text>
      <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="md">
        <Table.Root size="sm" aria-label="Parts">
          <Table.Header>
            <Table.Row>
              {COLUMNS.map((column) => (
                <Table.ColumnHeader
                  key={column}
                  textAlign={column.startsWith('Size') ? 'end' : undefined}
                  whiteSpace="nowrap"
                >
                  {column}
                </Table.ColumnHeader>
              ))}
              {!readOnly && <Table.ColumnHeader srOnly>Save</Table.ColumnHeader>}
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {revision.parts.map((part) => (
              <PartRow
                key={part.id}
                slug={revision.planSlug}
                number={revision.number}
                part={part}
                drawingName={manyDrawings ? drawingNames.get(part.drawingId) : undefined}
                units={units}
                readOnly={readOnly}
                onEdited={markEdited}
                onReload={onReload}
              />
            ))}
          </Table.Body>
        </Table.Root>
      </Table.ScrollArea>
    </Stack>
  );
}
