import { Box, chakra, Field, Fieldset, Input, SimpleGrid, Switch, Text, Textarea } from '@chakra-ui/react';
import { ChoiceSelect } from './choice-select';
import type { PlanDetailsForm, PlanFieldErrors, PlanVocabulary } from '../plan-details';

/** Title, summary, category, tags, tools needed, licence and motorised, each with its message beside it. */
export function PlanDetailsFields({
  form,
  errors,
  vocabulary,
  disabled = false,
  onChange,
}: {
  form: PlanDetailsForm;
  errors: PlanFieldErrors;
  vocabulary: PlanVocabulary;
  disabled?: boolean;
  onChange(form: PlanDetailsForm): void;
}) {
  const set = (patch: Partial<PlanDetailsForm>) => onChange({ ...form, ...patch });
  const toggleTool = (tool: string, on: boolean) =>
    set({
      toolsNeeded: on
        ? vocabulary.tools
            .map((choice) => choice.value)
            .filter((value) => value === tool || form.toolsNeeded.includes(value))
        : form.toolsNeeded.filter((value) => value !== tool),
    });
  return (
    <Box display="grid" gap="5">
      <Field.Root invalid={Boolean(errors.title)} required disabled={disabled}>
        <Field.Label>
          Title <Field.RequiredIndicator />
        </Field.Label>
        <Input value={form.title} maxLength={120} onChange={(event) => set({ title: event.target.value })} />
        {errors.title ? (
          <Field.ErrorText>{errors.title}</Field.ErrorText>
        ) : (
          <Field.HelperText>What the jig is and does, as a woodworker would say it.</Field.HelperText>
        )}
      </Field.Root>

      <Field.Root invalid={Boolean(errors.summary)} required disabled={disabled}>
        <Field.Label>
          Summary <Field.RequiredIndicator />
        </Field.Label>
        <Textarea
          value={form.summary}
          rows={3}
          maxLength={500}
          onChange={(event) => set({ summary: event.target.value })}
        />
        {errors.summary ? (
          <Field.ErrorText>{errors.summary}</Field.ErrorText>
        ) : (
          <Field.HelperText>
            10 to 500 characters; shown on the library card and at the top of the plan page.
          </Field.HelperText>
        )}
      </Field.Root>

      <SimpleGrid columns={{ base: 1, md: 2 }} gap="5">
        <Field.Root invalid={Boolean(errors.category)} required disabled={disabled}>
          <Field.Label>
            Category <Field.RequiredIndicator />
          </Field.Label>
          <ChoiceSelect
            choices={vocabulary.categories}
            value={form.category}
            prompt="Choose a category"
            onChange={(category) => set({ category })}
          />
          <Field.ErrorText>{errors.category}</Field.ErrorText>
        </Field.Root>

        <Field.Root invalid={Boolean(errors.licence)} required disabled={disabled}>
          <Field.Label>
            Licence <Field.RequiredIndicator />
          </Field.Label>
          <ChoiceSelect
            choices={vocabulary.licences}
            value={form.licence}
            prompt="Choose an open licence"
            onChange={(licence) => set({ licence })}
          />
          {errors.licence ? (
            <Field.ErrorText>{errors.licence}</Field.ErrorText>
          ) : (
            <Field.HelperText>How others may build, change and share your plan.</Field.HelperText>
          )}
        </Field.Root>
      </SimpleGrid>

      <Field.Root invalid={Boolean(errors.tags)} disabled={disabled}>
        <Field.Label>Tags</Field.Label>
        <Input
          value={form.tags}
          placeholder="crosscut, runners, t-track"
          onChange={(event) => set({ tags: event.target.value })}
        />
        {errors.tags ? (
          <Field.ErrorText>{errors.tags}</Field.ErrorText>
        ) : (
          <Field.HelperText>Separated by commas; up to 12, each up to 30 characters.</Field.HelperText>
        )}
      </Field.Root>

      <Fieldset.Root invalid={Boolean(errors.toolsNeeded)} disabled={disabled}>
        <Fieldset.Legend fontWeight="500">Tools needed</Fieldset.Legend>
        <SimpleGrid columns={{ base: 2, md: 4 }} gap="2" mt="2">
          {vocabulary.tools.map((choice) => (
            <chakra.label
              key={choice.value}
              display="inline-flex"
              alignItems="center"
              gap="2"
              fontSize="sm"
              cursor="pointer"
            >
              <chakra.input
                type="checkbox"
                checked={form.toolsNeeded.includes(choice.value)}
                disabled={disabled}
                onChange={(event) => toggleTool(choice.value, event.target.checked)}
                width="4"
                height="4"
                accentColor="steel.600"
              />
              {choice.label}
            </chakra.label>
          ))}
        </SimpleGrid>
        {errors.toolsNeeded && <Fieldset.ErrorText>{errors.toolsNeeded}</Fieldset.ErrorText>}
        <Fieldset.HelperText>With a power tool ticked, the plan page shows the usual cautions.</Fieldset.HelperText>
      </Fieldset.Root>

      <Box>
        <Switch.Root
          checked={form.motorised}
          disabled={disabled}
          onCheckedChange={({ checked }) => set({ motorised: checked })}
          colorPalette="steel"
        >
          <Switch.HiddenInput />
          <Switch.Control>
            <Switch.Thumb />
          </Switch.Control>
          <Switch.Label>The jig has a motor</Switch.Label>
        </Switch.Root>
        <Text fontSize="sm" color="fg.muted" mt="1">
          A stepper, a drive or mains wiring: the plan page then always shows the cautions for mains electricity.
        </Text>
      </Box>
    </Box>
  );
}
