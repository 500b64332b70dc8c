import { Box, Button, Field, Input, Link, NativeSelect, Stack, Text } from '@chakra-ui/react';
import type { JointInput } from '@jigwright/core';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { paths } from '../../../../config/paths';
import { ApiError } from '../../../../lib/api-client';
import { useIndexingTargets, useSaveIndexingSet, type IndexingTarget } from '../../api/indexing-targets';

const keyOf = (target: IndexingTarget) => `${target.slug}/${target.number}`;

/** A name that says what the set makes, in the units it was typed in. */
export function suggestedSetName(input: JointInput): string {
  const unit = input.units === 'in' ? 'in' : 'mm';
  const round = (value: number) => String(Number(value.toFixed(unit === 'in' ? 3 : 1)));
  return `${round(input.pin)} ${unit} fingers across a ${round(input.width)} ${unit} board, ${round(input.kerf)} ${unit} kerf`;
}

function failureText(error: unknown): string {
  if (error instanceof ApiError && error.code === 'revision_changed')
    return 'That draft was saved elsewhere a moment ago (another tab?). Nothing was overwritten: save again to put these settings on the newest version.';
  return error instanceof Error ? error.message : String(error);
}

/**
 * Saves the calculator's inputs to a draft of one of the member's indexing-jig plans, so that the
 * plan page shows the cut sequence and the files for the jig.
 */
export function SaveToPlan({ input }: { input: JointInput | null }) {
  const targets = useIndexingTargets();
  const save = useSaveIndexingSet();
  const [chosen, setChosen] = useState<string>('');
  const [name, setName] = useState<string | null>(null);
  const [savedTo, setSavedTo] = useState<IndexingTarget | null>(null);

  if (targets.isPending) return <Text color="fg.muted">Looking for your indexing-jig drafts…</Text>;
  if (targets.isError)
    return (
      <Text role="alert" color="brick.700">
        Your plans could not be loaded: {targets.error.message}
      </Text>
    );
  if (targets.data.length === 0)
    return (
      <Text color="fg.muted">
        Settings can be saved to a draft revision of one of your indexing-jig plans, where the plan page shows the cut
        sequence and the files. You have no such draft:{' '}
        <Link asChild color="steel.700" textDecoration="underline">
          <RouterLink to={paths.newPlan.getHref()}>start a plan</RouterLink>
        </Link>{' '}
        in the category “indexing jig”, or start a new revision of one.
      </Text>
    );

  const target = targets.data.find((candidate) => keyOf(candidate) === chosen) ?? targets.data[0]!;
  const nameText = name ?? (input ? suggestedSetName(input) : '');
  const nameMissing = nameText.trim() === '';
  return (
    <Stack
      as="form"
      gap="3"
      maxW="lg"
      aria-label="Save to a plan"
      onSubmit={(event) => {
        event.preventDefault();
        if (!input || nameMissing) return;
        setSavedTo(null);
        save.mutate({ target, name: nameText.trim(), inputs: input }, { onSuccess: () => setSavedTo(target) });
      }}
    >
      <Field.Root>
        <Field.Label>Revision</Field.Label>
        <NativeSelect.Root>
          <NativeSelect.Field value={keyOf(target)} onChange={(event) => setChosen(event.target.value)}>
            {targets.data.map((candidate) => (
              <option key={keyOf(candidate)} value={keyOf(candidate)}>
                {candidate.title}, r{candidate.number}
              </option>
            ))}
          </NativeSelect.Field>
          <NativeSelect.Indicator />
        </NativeSelect.Root>
      </Field.Root>
      <Field.Root invalid={nameMissing}>
        <Field.Label>Name of the set</Field.Label>
        <Input value={nameText} maxLength={200} onChange={(event) => setName(event.target.value)} />
        {nameMissing ? (
          <Field.ErrorText>Give the set a name builders will recognise.</Field.ErrorText>
        ) : (
          <Field.HelperText>
            Shown on the plan page above the cut sequence. Saving replaces the draft’s set.
          </Field.HelperText>
        )}
      </Field.Root>
      {!input && (
        <Text color="brick.700" role="status">
          Correct the marked boxes first: only a set that makes a joint can be saved.
        </Text>
      )}
      {save.isError && (
        <Text role="alert" color="brick.700">
          Not saved: {failureText(save.error)}
        </Text>
      )}
      {savedTo && !save.isError && (
        <Text role="status" color="sage.700">
          Saved to {savedTo.title}, r{savedTo.number}.{' '}
          <Link asChild color="steel.700" textDecoration="underline">
            <RouterLink to={paths.revisionEditor.getHref(savedTo.slug, savedTo.number)}>Open the draft</RouterLink>
          </Link>
        </Text>
      )}
      <Box>
        <Button type="submit" colorPalette="steel" loading={save.isPending} disabled={!input || nameMissing}>
          Save to r{target.number} of {target.title}
        </Button>
      </Box>
    </Stack>
  );
}
