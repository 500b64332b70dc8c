import { Badge, Box, Button, HStack, Link, Stack, Text } from '@chakra-ui/react';
import { useCallback, useEffect, useRef, useState, type ReactNode } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useBlocker } from 'react-router';
import { ApiError } from '../../../lib/api-client';
import { ownPlanKey } from '../api/keys';
import { useDeleteRevision, useStartRevision, useSubmitRevision, useWithdrawRevision } from '../api/revision-actions';
import type { EditorRevision, OwnPlan, RevisionState, RevisionText } from '../api/types';
import { useUpdatePlan } from '../api/update-plan';
import { useUpdateRevision } from '../api/update-revision';
import type { Units } from '../part-fields';
import {
  planDetailsOf,
  planFormErrors,
  planFormOf,
  rebaseForm,
  sameForm,
  serverFieldErrors,
  type PlanFieldErrors,
  type PlanVocabulary,
} from '../plan-details';
import { sameText, textOf, textToSave } from '../revision-text';
import { AttachmentsSection } from './attachments-section';
import { ConfirmDialog } from './confirm-dialog';
import { DrawingsSection } from './drawings-section';
import { EditorSection } from './editor-section';
import { HardwareEditor } from './hardware-editor';
import { MarkdownField } from './markdown-field';
import { PartsTable } from './parts-table';
import { PlanDetailsFields } from './plan-details-fields';

export const STATE_NAMES: Record<RevisionState, string> = {
  draft: 'Draft',
  submitted: 'Waiting for review',
  published: 'Published',
  'sent-back': 'Sent back',
  declined: 'Declined',
  hidden: 'Hidden',
};

export const STATE_PALETTES: Record<RevisionState, string> = {
  draft: 'gray',
  submitted: 'steel',
  published: 'sage',
  'sent-back': 'amber',
  declined: 'brick',
  hidden: 'gray',
};

const STATE_LEADS: Record<RevisionState, string> = {
  draft: 'Only you can see this draft. Save as often as you like; submit it for review when it is complete.',
  submitted:
    'A moderator will review it. It is read-only until then: withdraw it to change something, and submit it again.',
  published: 'Published revisions never change. Start a new revision to change the plan.',
  'sent-back': 'A moderator sent this revision back. Change what the notes ask, save, and submit it again.',
  declined: 'A moderator declined this revision; it stays as it was. Start a new revision to rework the plan.',
  hidden: 'A moderator hid this revision after a flag was upheld.',
};

/** States a next revision can start from (the latest published one, else the newest declined or hidden). */
const FINISHED: readonly RevisionState[] = ['published', 'declined', 'hidden'];

/** `session_expired` and friends read plainly; the server's own message otherwise. */
function problemText(error: Error): string {
  return error instanceof ApiError && error.status === 401
    ? 'Your session has ended. Sign in again in another tab, then save here: your text is kept.'
    : error.message;
}

function PlanDetailsSection({
  plan,
  vocabulary,
  readOnly,
  onEditedChange,
}: {
  plan: OwnPlan;
  vocabulary: PlanVocabulary;
  readOnly: boolean;
  onEditedChange(edited: boolean): void;
}) {
  const update = useUpdatePlan(plan.slug);
  const queryClient = useQueryClient();
  const [form, setForm] = useState(() => planFormOf(plan));
  // The saved copy the form started from; a newer one (after a 409, or saved in another tab) is
  // laid under the member's changes instead of replacing them.
  const [base, setBase] = useState(plan);
  if (plan !== base && plan.updatedAt !== base.updatedAt) {
    setForm(rebaseForm(form, planFormOf(base), planFormOf(plan)));
    setBase(plan);
  }
  const [errors, setErrors] = useState<PlanFieldErrors>({});
  const edited = !sameForm(form, planFormOf(plan));
  useEffect(() => onEditedChange(edited), [edited, onEditedChange]);

  const save = () => {
    const found = planFormErrors(form, vocabulary);
    setErrors(found);
    if (Object.keys(found).length > 0) return;
    update.mutate(
      { details: planDetailsOf(form), expectedUpdatedAt: plan.updatedAt },
      {
        onSuccess: (saved) => {
          setForm(planFormOf(saved));
          setBase(saved);
        },
        onError: (error) => {
          if (error instanceof ApiError && error.code === 'validation_failed')
            setErrors(serverFieldErrors(error.details).fields);
        },
      },
    );
  };
  return (
    <EditorSection
      title="Plan details"
      lead="These belong to the plan, not to one revision: a change shows on the plan page at once."
      actions={
        !readOnly && (
          <Button
            size="sm"
            colorPalette="steel"
            variant={edited ? 'solid' : 'outline'}
            disabled={!edited}
            loading={update.isPending}
            onClick={save}
          >
            Save details
          </Button>
        )
      }
    >
      <PlanDetailsFields
        form={form}
        errors={errors}
        vocabulary={vocabulary}
        disabled={readOnly || update.isPending}
        onChange={(next) => {
          setForm(next);
          setErrors({});
        }}
      />
      {update.error && !(update.error instanceof ApiError && update.error.code === 'validation_failed') && (
        <Stack gap="2" role="alert">
          <Text color="brick.700">{problemText(update.error)}</Text>
          {update.error instanceof ApiError && update.error.code === 'plan_changed' && (
            <Box>
              <Button
                size="sm"
                variant="outline"
                onClick={() => {
                  update.reset();
                  void queryClient.invalidateQueries({ queryKey: ownPlanKey(plan.slug) });
                }}
              >
                Load the saved details, keep what I typed
              </Button>
            </Box>
          )}
        </Stack>
      )}
      {update.isSuccess && !edited && (
        <Text color="sage.700" fontSize="sm" role="status">
          Details saved.
        </Text>
      )}
    </EditorSection>
  );
}

function Checklist({ title, items }: { title: string; items: string[] }) {
  return (
    <Box role="alert" borderWidth="1px" borderColor="brick.600" bg="brick.50" borderRadius="md" p="4">
      <Text fontWeight="600" color="brick.700">
        {title}
      </Text>
      <Stack as="ul" mt="2" gap="1" listStyleType="none" aria-label="What is missing">
        {items.map((item) => (
          <HStack as="li" key={item} align="flex-start" gap="2">
            <Text as="span" aria-hidden color="brick.700" fontWeight="700">
              ☐
            </Text>
            <Text as="span">{item}</Text>
          </HStack>
        ))}
      </Stack>
    </Box>
  );
}

export interface RevisionEditorProps {
  plan: OwnPlan;
  revision: EditorRevision;
  units: Units;
  vocabulary: PlanVocabulary;
  /** The plan page's Markdown rendering, for the previews. */
  renderMarkdown(text: string): ReactNode;
  /** The moderator's notes, for a revision sent back or declined. */
  reviewNotes?: ReactNode;
  planHref: string;
  /** Reads the revision again from the server. */
  onReload(): Promise<unknown>;
  onDeleted(): void;
  onStarted(number: number): void;
}

/**
 * The owner's screen for one revision: everything of a draft (or a revision sent back) editable,
 * read-only otherwise. The revision's text is saved with `expectedUpdatedAt`; a save refused because
 * another tab saved first keeps the text typed here.
 */
export function RevisionEditor({
  plan,
  revision,
  units,
  vocabulary,
  renderMarkdown,
  reviewNotes,
  planHref,
  onReload,
  onDeleted,
  onStarted,
}: RevisionEditorProps) {
  const { planSlug: slug, number, editable } = revision;
  const readOnly = !editable;
  const saveText = useUpdateRevision(slug, number);
  const submit = useSubmitRevision(slug, number);
  const withdraw = useWithdrawRevision(slug, number);
  const remove = useDeleteRevision(slug, number);
  const start = useStartRevision(slug);

  const [text, setText] = useState<RevisionText>(() => textOf(revision));
  const [showRowErrors, setShowRowErrors] = useState(false);
  const [editedParts, setEditedParts] = useState(0);
  const [detailsEdited, setDetailsEdited] = useState(false);
  const [missing, setMissing] = useState<string[] | null>(null);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [reloading, setReloading] = useState(false);
  const [submitted, setSubmitted] = useState(false);

  const textEdited = editable && !sameText(text, textOf(revision));
  const unsaved = textEdited || editedParts > 0 || detailsEdited;
  const conflict = saveText.error instanceof ApiError && saveText.error.code === 'revision_changed';

  // The same text again when the revision's state changes (withdrawn, submitted) or another is shown.
  const [shownKey, setShownKey] = useState(`${number}:${revision.state}`);
  if (shownKey !== `${number}:${revision.state}`) {
    setShownKey(`${number}:${revision.state}`);
    setText(textOf(revision));
  }

  // Set just before leaving on purpose (the draft deleted, a new revision started).
  const leaving = useRef(false);
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      unsaved && !leaving.current && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (!unsaved) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [unsaved]);

  const onEditedParts = useCallback((count: number) => setEditedParts(count), []);
  const onEditedDetails = useCallback((edited: boolean) => setDetailsEdited(edited), []);

  /** Saves the text; true when it is saved (or had nothing to save). */
  const save = async (): Promise<boolean> => {
    const toSave = textToSave(text);
    if (!toSave) {
      setShowRowErrors(true);
      return false;
    }
    setShowRowErrors(false);
    if (!textEdited) return true;
    try {
      await saveText.mutateAsync({ text: toSave, expectedUpdatedAt: revision.updatedAt });
      return true;
    } catch {
      return false;
    }
  };

  const reload = async (keepMine: boolean) => {
    setReloading(true);
    try {
      await onReload();
      saveText.reset();
      // The shown text follows the newer save unless the designer keeps theirs to save over it.
      if (!keepMine) setShownKey('');
    } finally {
      setReloading(false);
    }
  };

  const submitForReview = async () => {
    setMissing(null);
    if (editedParts > 0 || detailsEdited) {
      setMissing([
        ...(detailsEdited ? ['Save or undo the changes to the plan details.'] : []),
        ...(editedParts > 0
          ? [`Save or undo the changes in ${editedParts} ${editedParts === 1 ? 'part row' : 'part rows'}.`]
          : []),
      ]);
      return;
    }
    if (!(await save())) return;
    submit.mutate(undefined, {
      onSuccess: () => setSubmitted(true),
      onError: (error) => {
        if (error instanceof ApiError && error.code === 'revision_incomplete' && Array.isArray(error.details)) {
          setMissing(error.details.filter((item): item is string => typeof item === 'string'));
        }
      },
    });
  };

  const laterInProgress = plan.revisions.some(
    (other) => other.number !== number && ['draft', 'submitted', 'sent-back'].includes(other.state),
  );
  const isLatest = plan.revisions.every((other) => other.number <= number);
  const actionError = [submit, withdraw, start]
    .map((mutation) => mutation.error)
    .find(
      (error): error is Error => error !== null && !(error instanceof ApiError && error.code === 'revision_incomplete'),
    );

  return (
    <Stack gap="6" pb="24">
      <Box
        borderLeftWidth="4px"
        borderColor={`${STATE_PALETTES[revision.state]}.600`}
        bg="bg.panel"
        borderRadius="md"
        p="4"
      >
        <HStack gap="3" wrap="wrap">
          <Badge colorPalette={STATE_PALETTES[revision.state]} size="lg" variant="subtle">
            r{number} · {STATE_NAMES[revision.state]}
          </Badge>
          <Link asChild color="steel.700" fontSize="sm">
            <RouterLink to={planHref}>See it as builders will</RouterLink>
          </Link>
        </HStack>
        <Text mt="2">{STATE_LEADS[revision.state]}</Text>
        {submitted && revision.state === 'submitted' && (
          <Text mt="2" color="sage.700" role="status" fontWeight="500">
            Submitted for review. You will get an e-mail when a moderator has decided.
          </Text>
        )}
      </Box>

      {reviewNotes}

      <PlanDetailsSection plan={plan} vocabulary={vocabulary} readOnly={readOnly} onEditedChange={onEditedDetails} />
      <DrawingsSection revision={revision} readOnly={readOnly} />
      <EditorSection
        title="Parts"
        lead="Measured from the drawings. Name each part and say what it is cut from; the cut list is made from these."
      >
        <PartsTable
          revision={revision}
          units={units}
          readOnly={readOnly}
          onEditedChange={onEditedParts}
          onReload={onReload}
        />
      </EditorSection>
      <AttachmentsSection revision={revision} readOnly={readOnly} />

      {conflict && (
        <Box role="alert" borderWidth="1px" borderColor="brick.600" bg="brick.50" borderRadius="md" p="4">
          <Text fontWeight="600" color="brick.700">
            This draft was saved in another tab or window after you opened it.
          </Text>
          <Text mt="1">
            Your text is kept below, unsaved. Reload to take the other save as the starting point: keep your text and
            save it over the other one, or use the saved version instead of yours.
          </Text>
          <HStack mt="3" gap="2" wrap="wrap">
            <Button size="sm" colorPalette="steel" loading={reloading} onClick={() => void reload(true)}>
              Reload, keep my text
            </Button>
            <Button size="sm" variant="outline" disabled={reloading} onClick={() => void reload(false)}>
              Reload, use the saved version
            </Button>
          </HStack>
        </Box>
      )}

      <EditorSection
        title="Hardware list"
        lead="Bought items, in the order a builder gathers them. Saved with the revision."
      >
        <HardwareEditor
          rows={text.hardware}
          readOnly={readOnly}
          showErrors={showRowErrors}
          onChange={(hardware) => setText({ ...text, hardware })}
        />
      </EditorSection>
      <EditorSection title="Build notes" lead="Markdown: headings, lists, links, code. Raw HTML is not shown.">
        <MarkdownField
          label="Build notes"
          value={text.notes}
          maxLength={200000}
          rows={14}
          readOnly={readOnly}
          renderPreview={renderMarkdown}
          onChange={(notes) => setText({ ...text, notes })}
        />
      </EditorSection>
      <EditorSection
        title="Safety notes"
        lead="What is particular to this jig: guards, where hands go, what to unplug. The usual cautions for power tools and mains wiring are shown beside them on the plan page."
      >
        <MarkdownField
          label="Safety notes"
          value={text.safetyNotes}
          maxLength={20000}
          rows={6}
          readOnly={readOnly}
          renderPreview={renderMarkdown}
          onChange={(safetyNotes) => setText({ ...text, safetyNotes })}
        />
      </EditorSection>
      <EditorSection
        title="Changelog"
        lead={
          number > 1
            ? 'Required: what changed since the revision before, and why. Builders read it in the revision history.'
            : 'Optional for a first revision.'
        }
      >
        <MarkdownField
          label="Changelog"
          value={text.changelog}
          maxLength={5000}
          rows={4}
          readOnly={readOnly}
          renderPreview={renderMarkdown}
          onChange={(changelog) => setText({ ...text, changelog })}
        />
      </EditorSection>

      {editable && (
        <HStack gap="3" wrap="wrap" justify="flex-end">
          <Text fontSize="sm" color="fg.muted">
            No longer needed?
          </Text>
          <Button size="sm" variant="outline" colorPalette="brick" onClick={() => setConfirmDelete(true)}>
            Delete draft
          </Button>
        </HStack>
      )}
      {missing && missing.length > 0 && <Checklist title="Before it can be submitted:" items={missing} />}
      {actionError && (
        <Text role="alert" color="brick.700">
          {problemText(actionError)}
        </Text>
      )}

      <Box
        position="sticky"
        bottom="0"
        zIndex="docked"
        bg="bg.panel"
        borderWidth="1px"
        borderColor="border"
        borderRadius="lg"
        boxShadow="md"
        px={{ base: '3', md: '4' }}
        py={{ base: '2', md: '3' }}
        aria-label="Revision actions"
        role="region"
      >
        <HStack gap="2" justify="space-between" wrap="wrap">
          <Text fontSize="sm" color={unsaved ? 'brick.700' : 'fg.muted'} role="status">
            {editable
              ? saveText.isPending
                ? 'Saving…'
                : unsaved
                  ? 'Unsaved changes'
                  : 'All changes saved'
              : `r${number} is read-only`}
          </Text>
          <HStack gap="2" wrap="wrap">
            {editable && (
              <>
                <Button
                  size="sm"
                  colorPalette="steel"
                  variant="outline"
                  loading={saveText.isPending}
                  disabled={!textEdited}
                  onClick={() => void save()}
                >
                  Save
                </Button>
                <Button
                  size="sm"
                  colorPalette="steel"
                  loading={submit.isPending}
                  onClick={() => void submitForReview()}
                >
                  Submit for review
                </Button>
              </>
            )}
            {revision.state === 'submitted' && (
              <Button
                size="sm"
                colorPalette="steel"
                variant="outline"
                loading={withdraw.isPending}
                onClick={() => withdraw.mutate()}
              >
                Withdraw to edit
              </Button>
            )}
            {FINISHED.includes(revision.state) && isLatest && !laterInProgress && (
              <Button
                size="sm"
                colorPalette="steel"
                loading={start.isPending}
                onClick={() =>
                  start.mutate(undefined, {
                    onSuccess: (next) => {
                      leaving.current = true;
                      onStarted(next.number);
                    },
                  })
                }
              >
                Start a new revision
              </Button>
            )}
          </HStack>
        </HStack>
        {saveText.error && !conflict && (
          <Text role="alert" color="brick.700" fontSize="sm" mt="2">
            {problemText(saveText.error)}
          </Text>
        )}
        {showRowErrors && (
          <Text role="alert" color="brick.700" fontSize="sm" mt="2">
            Some hardware rows need an item and a whole-number quantity: see the messages in the list.
          </Text>
        )}
      </Box>

      <ConfirmDialog
        open={confirmDelete}
        title={`Delete r${number}?`}
        confirm="Delete draft"
        busy={remove.isPending}
        error={remove.error && problemText(remove.error)}
        onCancel={() => {
          setConfirmDelete(false);
          remove.reset();
        }}
        onConfirm={() =>
          remove.mutate(undefined, {
            onSuccess: () => {
              leaving.current = true;
              onDeleted();
            },
          })
        }
      >
        <Text>
          The draft, its drawings, parts, attachments and notes are deleted for good.
          {number === 1 && ' A plan’s only revision cannot be deleted.'}
        </Text>
      </ConfirmDialog>

      <ConfirmDialog
        open={blocker.state === 'blocked'}
        title="Leave without saving?"
        confirm="Leave and lose the changes"
        cancel="Stay here"
        onCancel={() => blocker.reset?.()}
        onConfirm={() => blocker.proceed?.()}
      >
        <Text>You have changes that are not saved yet. They are lost if you leave this page now.</Text>
      </ConfirmDialog>
    </Stack>
  );
}
