import { Button, chakra, HStack, Stack, Text } from '@chakra-ui/react';
import { useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useCreatePlan } from '../api/create-plan';
import type { OwnPlan } from '../api/types';
import {
  EMPTY_PLAN_FORM,
  planDetailsOf,
  planFormErrors,
  serverFieldErrors,
  type PlanFieldErrors,
  type PlanVocabulary,
} from '../plan-details';
import { PlanDetailsFields } from './plan-details-fields';

/** Starts a plan: its details, then its r1 is a draft to fill in the editor. */
export function CreatePlanForm({
  vocabulary,
  onCreated,
  onCancel,
}: {
  vocabulary: PlanVocabulary;
  onCreated(plan: OwnPlan): void;
  onCancel(): void;
}) {
  const create = useCreatePlan();
  const [form, setForm] = useState(EMPTY_PLAN_FORM);
  const [tried, setTried] = useState(false);
  const [serverErrors, setServerErrors] = useState<{ fields: PlanFieldErrors; other: string[] }>({
    fields: {},
    other: [],
  });
  const errors: PlanFieldErrors = { ...(tried ? planFormErrors(form, vocabulary) : {}), ...serverErrors.fields };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setTried(true);
    if (Object.keys(planFormErrors(form, vocabulary)).length > 0) return;
    create.mutate(planDetailsOf(form), {
      onSuccess: onCreated,
      onError: (error) => {
        if (error instanceof ApiError && error.code === 'validation_failed')
          setServerErrors(serverFieldErrors(error.details));
      },
    });
  };
  const otherError =
    create.error && !(create.error instanceof ApiError && create.error.code === 'validation_failed')
      ? create.error.message
      : serverErrors.other.join(' ');

  return (
    <chakra.form
      noValidate
      onSubmit={submit}
      bg="bg.panel"
      borderWidth="1px"
      borderColor="border"
      borderRadius="lg"
      p={{ base: '4', md: '6' }}
      maxW="4xl"
    >
      <Stack gap="6">
        <PlanDetailsFields
          form={form}
          errors={errors}
          vocabulary={vocabulary}
          disabled={create.isPending}
          onChange={(next) => {
            setForm(next);
            setServerErrors({ fields: {}, other: [] });
          }}
        />
        {tried && Object.keys(errors).length > 0 && (
          <Text role="alert" color="brick.700">
            Some details need attention: see the messages beside the fields.
          </Text>
        )}
        {otherError && (
          <Text role="alert" color="brick.700">
            {otherError}
          </Text>
        )}
        <HStack gap="3" wrap="wrap">
          <Button type="submit" colorPalette="steel" loading={create.isPending}>
            Create the plan
          </Button>
          <Button variant="ghost" onClick={onCancel} disabled={create.isPending}>
            Cancel
          </Button>
          <Text fontSize="sm" color="fg.muted">
            Next you upload its drawings and write its notes; nothing is public until a moderator publishes it.
          </Text>
        </HStack>
      </Stack>
    </chakra.form>
  );
}
