import { Box, Grid, Heading, Stack, Text } from '@chakra-ui/react';
import {
  planJoint,
  POWERED_CUTTER_CAUTION,
  type JointFieldError,
  type JointInput,
  type JointPlan,
} from '@jigwright/core';
import { useDeferredValue, useMemo, useState, type ReactNode } from 'react';
import { useLocation } from 'react-router';
import { activeFields, applySuggestion, DEFAULT_FORM, formToQuery, toJointInput, type TextField } from '../joint-form';
import { useJointForm } from '../use-joint-form';
import { CautionPanel } from './caution-panel';
import { CutTable } from './cut-table';
import { DriveFiguresList } from './drive-figures-list';
import { ExportButtons } from './export-buttons';
import { JointFormFields } from './joint-form-fields';
import { JointPicture } from './joint-picture';
import { LayoutNotes } from './layout-notes';

/** The last plan that worked, so that a slip in one box never blanks the picture under the builder. */
function useLastGoodPlan(current: JointPlan | null): JointPlan | null {
  const [last, setLast] = useState(current);
  if (current !== null && current !== last) setLast(current);
  return current ?? last;
}

function errorsByField(errors: JointFieldError[], shown: readonly TextField[]) {
  const byField: Partial<Record<TextField, string>> = {};
  const elsewhere: string[] = [];
  for (const { field, message } of errors) {
    const box = shown.find((name) => name === field);
    if (box === undefined) elsewhere.push(message);
    else byField[box] ??= message;
  }
  return { byField, elsewhere };
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Box as="section" aria-label={title}>
      <Heading as="h2" size="lg" color="walnut.700" fontWeight="600" mb="3">
        {title}
      </Heading>
      {children}
    </Box>
  );
}

export interface FingerJointsCalculatorProps {
  /** What a signed-in member may do with inputs that make a joint (null while they do not), from the route. */
  saveSection?: (input: JointInput | null) => ReactNode;
}

export function FingerJointsCalculator({ saveSection }: FingerJointsCalculatorProps = {}) {
  const [form, setForm] = useJointForm();
  const location = useLocation();
  const input = useMemo(() => toJointInput(form), [form]);
  // Typing stays quick on a large joint: the plan catches up when the browser has a moment.
  const deferredInput = useDeferredValue(input);
  const outcome = useMemo(() => planJoint(deferredInput), [deferredInput]);
  const current = outcome.ok ? outcome.plan : null;
  const plan = useLastGoodPlan(current);
  const { byField, elsewhere } = errorsByField(outcome.ok ? [] : outcome.errors, activeFields(form));
  const shareHref = `${location.pathname}?${formToQuery(form).toString()}`;

  return (
    <Grid templateColumns={{ base: '1fr', lg: '22rem 1fr' }} gap="8" alignItems="start">
      <Box bg="bg.panel" borderWidth="1px" borderColor="border" borderRadius="lg" p="5">
        <JointFormFields form={form} onChange={setForm} onReset={() => setForm(DEFAULT_FORM)} errors={byField} />
      </Box>
      <Stack gap="8" minW="0">
        <CautionPanel caution={POWERED_CUTTER_CAUTION} />
        {elsewhere.map((message) => (
          <Text key={message} role="alert" color="brick.700">
            {message}
          </Text>
        ))}
        {current === null && plan !== null && (
          <Text role="status" borderLeftWidth="3px" borderColor="brick.600" ps="3">
            The picture and figures below are for the last inputs that worked; correct the marked box to update them.
          </Text>
        )}
        {plan === null ? (
          <Text color="fg.muted">Fill in the board width, the pin width and the kerf to see the joint.</Text>
        ) : (
          <Stack gap="8" opacity={current === null ? 0.55 : 1} transition="opacity 0.2s">
            <Section title="The joint">
              <Stack gap="4">
                <JointPicture plan={plan} />
                <LayoutNotes plan={plan} onApply={(suggestion) => setForm(applySuggestion(form, suggestion))} />
              </Stack>
            </Section>
            <Section title="Drive">
              <DriveFiguresList plan={plan} />
            </Section>
            <Section title="Files">
              <ExportButtons plan={plan} stale={current === null} shareHref={shareHref} />
            </Section>
            {saveSection && <Section title="Save to a plan">{saveSection(current ? deferredInput : null)}</Section>}
            <Section title="Cut table">
              <CutTable plan={plan} />
            </Section>
          </Stack>
        )}
      </Stack>
    </Grid>
  );
}
