import { Box, Button, Grid, Input, Stack, Text, type GridProps } from '@chakra-ui/react';
import type { ReactNode } from 'react';
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

/**
 * The parts as rows of one grid: columns from md up (the header row above them), on a phone each part
 * as a small card of labelled fields.
 */
const ROW: GridProps = {
  gap: '2',
  alignItems: 'start',
  gridTemplateColumns: {
    base: '1fr 1fr',
    md: 'minmax(7rem, 1.3fr) 7.5rem minmax(7rem, 1.2fr) 4.5rem 8rem 7.5rem 4.5rem 4.25rem',
  },
  gridTemplateAreas: {
    base: `"name name" "size size" "material material" "thickness quantity" "stock grain" "save save" "message message"`,
    md: `"name size material thickness stock grain quantity save" "message message message message message message message message"`,
  },
};

/** One field of a part's row, with its column's name shown above it on a phone. */
function Cell({ area, label, children, ...rest }: { area: string; label?: string; children: ReactNode } & GridProps) {
  return (
    <Box gridArea={area} minW="0" {...rest}>
      {label && (
        <Text
          aria-hidden
          display={{ base: 'block', md: 'none' }}
          fontSize="xs"
          color="fg.muted"
          mb="1"
          textAlign="start"
        >
          {label}
        </Text>
      )}
      {children}
    </Box>
  );
}

function CellInput({
  label,
  value,
  error,
  onChange,
  disabled,
  placeholder,
  inputMode,
}: {
  label: string;
  value: string;
  error?: string;
  onChange(value: string): void;
  disabled: boolean;
  placeholder?: string;
  inputMode?: 'decimal' | 'numeric' | 'text';
}) {
  return (
    <Box>
      <Input
        size="sm"
        width="full"
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
        <Text fontSize="xs" color="brick.700" mt="1">
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
    <Grid
      as="li"
      aria-label={part.name}
      data-edited={edited || undefined}
      {...ROW}
      py="3"
      borderTopWidth="1px"
      borderColor="border"
    >
      <Cell area="name" label="Part">
        <CellInput
          label={label('Name')}
          value={fields.name}
          error={errors.name}
          disabled={disabled}
          onChange={(name) => change({ name })}
        />
        {drawingName && (
          <Text fontSize="xs" color="fg.muted" mt="1">
            {drawingName}
          </Text>
        )}
      </Cell>
      <Cell
        area="size"
        label="Size (L × W)"
        textAlign={{ base: 'start', md: 'end' }}
        whiteSpace="nowrap"
        className="numeric"
        pt={{ md: '1.5' }}
      >
        {sizeText(part, units)}
      </Cell>
      <Cell area="material" label="Material">
        <CellInput
          label={label('Material')}
          value={fields.material}
          error={errors.material}
          disabled={disabled}
          onChange={(material) => change({ material })}
        />
      </Cell>
      <Cell area="thickness" label="Thickness">
        <CellInput
          label={label(`Thickness (${units})`)}
          value={fields.thickness}
          error={errors.thickness}
          inputMode={units === 'in' ? 'text' : 'decimal'}
          disabled={disabled}
          onChange={(thickness) => change({ thickness })}
        />
      </Cell>
      <Cell area="stock" label="Stock">
        <ChoiceSelect
          label={label('Stock')}
          size="sm"
          choices={STOCK_CHOICES}
          value={fields.stock}
          disabled={disabled}
          onChange={(stock) => change({ stock: stock as StockKind })}
        />
      </Cell>
      <Cell area="grain" label="Grain">
        <ChoiceSelect
          label={label('Grain')}
          size="sm"
          choices={GRAIN_CHOICES}
          value={fields.grain}
          disabled={disabled}
          onChange={(grain) => change({ grain: grain as GrainRule })}
        />
      </Cell>
      <Cell area="quantity" label="Quantity">
        <CellInput
          label={label('Quantity')}
          value={fields.quantity}
          error={errors.quantity}
          inputMode="numeric"
          placeholder={String(part.quantity)}
          disabled={disabled}
          onChange={(quantity) => change({ quantity })}
        />
      </Cell>
      {!readOnly && (
        <Cell area="save">
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
        </Cell>
      )}
      {save.error && (
        <Box gridArea="message" bg="brick.50" borderRadius="md" px="3" py="2">
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
        </Box>
      )}
    </Grid>
  );
}

const COLUMNS = [
  ['name', 'Part'],
  ['size', 'Size (L × W)'],
  ['material', 'Material'],
  ['thickness', 'Thickness'],
  ['stock', 'Stock'],
  ['grain', 'Grain'],
  ['quantity', 'Quantity'],
] as const;

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
      <Box borderWidth="1px" borderColor="border" borderRadius="md" px="3">
        <Grid {...ROW} display={{ base: 'none', md: 'grid' }} py="2" aria-hidden>
          {COLUMNS.map(([area, column]) => (
            <Text
              key={area}
              gridArea={area}
              fontSize="sm"
              fontWeight="600"
              textAlign={area === 'size' ? 'end' : undefined}
            >
              {column}
            </Text>
          ))}
        </Grid>
        <Box as="ul" listStyleType="none" aria-label="Parts">
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
        </Box>
      </Box>
    </Stack>
  );
}
