import { Badge, Box, Button, HStack, Progress, Stack, Text } from '@chakra-ui/react';
import { useId, useRef, useState } from 'react';
import { DRAWING_MAX_BYTES, uploadDrawing, useDeleteDrawing, useSetDrawingUnits, deleteDrawing } from '../api/drawings';
import type { EditorDrawing, EditorRevision } from '../api/types';
import { formatBytes, notDrawingMessage, tooLargeMessage } from '../upload-queue';
import { useRevisionUploads, type RevisionFiles } from '../use-revision-uploads';
import { ChoiceSelect } from './choice-select';
import { ConfirmDialog } from './confirm-dialog';
import { EditorSection } from './editor-section';
import { FileDropzone, UploadList } from './file-dropzone';

const DRAWING: RevisionFiles = {
  what: 'drawing',
  maxBytes: DRAWING_MAX_BYTES,
  upload: uploadDrawing,
  remove: deleteDrawing,
  refuse: (file) => notDrawingMessage(file) ?? tooLargeMessage(file, DRAWING),
};

/** The units the server reads a unitless drawing in (`CHOOSABLE_UNITS`). */
const UNIT_CHOICES = [
  { value: 'mm', label: 'millimetres (mm)' },
  { value: 'cm', label: 'centimetres (cm)' },
  { value: 'm', label: 'metres (m)' },
  { value: 'in', label: 'inches (in)' },
  { value: 'ft', label: 'feet (ft)' },
];

const STATUS: Record<EditorDrawing['status'], { label: string; palette: string }> = {
  queued: { label: 'Waiting for analysis', palette: 'gray' },
  analysing: { label: 'Analysing', palette: 'steel' },
  done: { label: 'Analysed', palette: 'sage' },
  failed: { label: 'Analysis failed', palette: 'brick' },
};

function UnitsChoice({
  drawing,
  busy,
  onChoose,
}: {
  drawing: EditorDrawing;
  busy: boolean;
  onChoose(units: string): void;
}) {
  const id = useId();
  const [units, setUnits] = useState('mm');
  return (
    <Box borderLeftWidth="3px" borderColor="steel.600" ps="3" py="1">
      <Text fontSize="sm" mb="2">
        This drawing does not say what units it is drawn in. Choose them and it is read again; until then its parts are
        measured as if in millimetres.
      </Text>
      <HStack gap="2" wrap="wrap">
        <label htmlFor={id}>
          <Text as="span" fontSize="sm" fontWeight="500">
            Drawn in
          </Text>
        </label>
        <ChoiceSelect id={id} size="sm" width="auto" choices={UNIT_CHOICES} value={units} onChange={setUnits} />
        <Button size="sm" colorPalette="steel" loading={busy} onClick={() => onChoose(units)}>
          Read it in {units}
        </Button>
      </HStack>
      <Text srOnly>{drawing.originalName}</Text>
    </Box>
  );
}

function DrawingRow({
  drawing,
  partCount,
  readOnly,
  unitsBusy,
  onRemove,
  onReupload,
  onUnits,
}: {
  drawing: EditorDrawing;
  partCount: number;
  readOnly: boolean;
  unitsBusy: boolean;
  onRemove(): void;
  onReupload(file: File): void;
  onUnits(units: string): void;
}) {
  const picker = useRef<HTMLInputElement>(null);
  const status = STATUS[drawing.status];
  // The units question below says what the units warning would.
  const warnings = (drawing.analysis?.warnings ?? []).filter(
    (warning) => !(drawing.needsUnits && warning.code === 'units-unknown'),
  );
  return (
    <Box as="li" borderWidth="1px" borderColor="border" borderRadius="md" p="3" aria-label={drawing.originalName}>
      <Stack gap="2">
        <HStack justify="space-between" align="flex-start" gap="3" wrap="wrap">
          <Box minW="0">
            <Text fontWeight="600" wordBreak="break-all">
              {drawing.originalName}
            </Text>
            <Text fontSize="sm" color="fg.muted" className="numeric">
              {formatBytes(drawing.size)}
              {drawing.status === 'done' &&
                ` · ${partCount} ${partCount === 1 ? 'part' : 'parts'} from ${drawing.entityCount ?? 0} entities · units: ${drawing.units ?? 'not stated'}`}
            </Text>
          </Box>
          <HStack gap="2">
            <Badge colorPalette={status.palette} variant="subtle" size="md">
              {status.label}
            </Badge>
            {!readOnly && (
              <Button size="xs" variant="outline" colorPalette="brick" onClick={onRemove}>
                Remove
              </Button>
            )}
          </HStack>
        </HStack>
        {(drawing.status === 'queued' || drawing.status === 'analysing') && (
          <Progress.Root size="xs" colorPalette="steel" value={null}>
            <Progress.Track aria-label={`Analysis of ${drawing.originalName}`}>
              <Progress.Range />
            </Progress.Track>
          </Progress.Root>
        )}
        {drawing.status === 'failed' && (
          <Box>
            <Text role="alert" color="brick.700" fontSize="sm">
              {drawing.error ?? 'The drawing could not be read.'}
            </Text>
            {!readOnly && (
              <>
                <input
                  ref={picker}
                  type="file"
                  accept=".dxf"
                  hidden
                  aria-label={`A fixed file for ${drawing.originalName}`}
                  onChange={(event) => {
                    const file = event.target.files?.[0];
                    event.target.value = '';
                    if (file) onReupload(file);
                  }}
                />
                <Button mt="2" size="sm" colorPalette="steel" onClick={() => picker.current?.click()}>
                  Upload a fixed file
                </Button>
                <Text fontSize="xs" color="fg.muted" mt="1">
                  This one is removed and the file you pick is uploaded in its place.
                </Text>
              </>
            )}
          </Box>
        )}
        {drawing.needsUnits && !readOnly && <UnitsChoice drawing={drawing} busy={unitsBusy} onChoose={onUnits} />}
        {warnings.length > 0 && (
          <Box as="ul" ps="5" listStyleType="disc" fontSize="sm" color="fg.muted" aria-label="Warnings">
            {warnings.map((warning, i) => (
              <li key={i}>{warning.message}</li>
            ))}
          </Box>
        )}
      </Stack>
    </Box>
  );
}

/** Upload drawings, follow their analysis, set units where a drawing has none, remove them. */
export function DrawingsSection({ revision, readOnly }: { revision: EditorRevision; readOnly: boolean }) {
  const { planSlug: slug, number } = revision;
  const queue = useRevisionUploads(slug, number, DRAWING);
  const removeDrawing = useDeleteDrawing(slug, number);
  const setUnits = useSetDrawingUnits(slug, number);
  const [removing, setRemoving] = useState<EditorDrawing | null>(null);

  const reupload = async (drawing: EditorDrawing, file: File) => {
    await removeDrawing.mutateAsync(drawing.id);
    queue.add([file]);
  };

  return (
    <EditorSection
      title="Drawings"
      lead="ASCII DXF files up to 16 MB. Each is analysed on the server: its closed outlines become the parts below."
    >
      {!readOnly && (
        <FileDropzone
          label="Choose drawings"
          hint="DXF files (.dxf), several at once if you like."
          accept={{ 'image/vnd.dxf': ['.dxf'], 'application/dxf': ['.dxf'] }}
          onFiles={queue.add}
        />
      )}
      <UploadList items={queue.items} onCancel={queue.cancel} onDismiss={queue.dismiss} />
      {revision.drawings.length === 0 && queue.items.length === 0 ? (
        <Text color="fg.muted">No drawings yet. A revision needs at least one analysed drawing to be submitted.</Text>
      ) : (
        <Stack as="ul" gap="2" listStyleType="none" aria-label="Drawings on this revision">
          {revision.drawings.map((drawing) => (
            <DrawingRow
              key={drawing.id}
              drawing={drawing}
              partCount={revision.parts.filter((part) => part.drawingId === drawing.id).length}
              readOnly={readOnly}
              unitsBusy={setUnits.isPending && setUnits.variables?.drawingId === drawing.id}
              onRemove={() => setRemoving(drawing)}
              onReupload={(file) => void reupload(drawing, file)}
              onUnits={(units) => setUnits.mutate({ drawingId: drawing.id, units })}
            />
          ))}
        </Stack>
      )}
      {(setUnits.error || removeDrawing.error) && (
        <Text role="alert" color="brick.700">
          {(setUnits.error ?? removeDrawing.error)?.message}
        </Text>
      )}
      <ConfirmDialog
        open={removing !== null}
        title={`Remove ${removing?.originalName ?? 'the drawing'}?`}
        confirm="Remove drawing"
        busy={removeDrawing.isPending}
        onCancel={() => setRemoving(null)}
        onConfirm={() => removing && removeDrawing.mutate(removing.id, { onSuccess: () => setRemoving(null) })}
      >
        <Text>
          The drawing, its file and the parts made from it are removed from this revision, with your settings on them.
        </Text>
      </ConfirmDialog>
    </EditorSection>
  );
}
