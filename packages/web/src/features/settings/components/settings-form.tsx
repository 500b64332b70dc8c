import { Box, Button, Field, Fieldset, HStack, Input, RadioGroup, Stack, Switch, Text } from '@chakra-ui/react';
import { useState, type FormEvent } from 'react';
import type { NotificationSettings, Settings, Units } from '../api/get-settings';

const NOTIFICATION_KINDS: Array<{ key: keyof NotificationSettings; label: string }> = [
  { key: 'revisionDecided', label: 'A revision of my plan is published or sent back' },
  { key: 'buildReported', label: 'Someone reports a build of my plan' },
  { key: 'planAdapted', label: 'Someone adapts my plan' },
  { key: 'flagResolved', label: 'A flag I raised is resolved' },
];

const UNIT_CHOICES: Array<{ value: Units; label: string; hint: string }> = [
  { value: 'mm', label: 'Millimetres', hint: '762 mm' },
  { value: 'in', label: 'Inches', hint: '30 in, fractions to 1/32' },
];

export interface SettingsFormProps {
  settings: Settings;
  /** Suspended members can read their settings but not change them. */
  readOnly?: boolean;
  saving?: boolean;
  onSave(settings: Settings): void;
}

/** Display name, units and e-mail notifications; nothing is sent until Save. */
export function SettingsForm({ settings, readOnly = false, saving = false, onSave }: SettingsFormProps) {
  const [draft, setDraft] = useState(settings);
  const nameMissing = draft.displayName.trim() === '';
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!nameMissing) onSave({ ...draft, displayName: draft.displayName.trim() });
  };
  return (
    <Box as="form" onSubmit={submit} bg="bg.panel" borderWidth="1px" borderColor="border" borderRadius="lg" p="6">
      <Stack gap="8" maxW="xl">
        <Field.Root invalid={nameMissing} disabled={readOnly}>
          <Field.Label>Display name</Field.Label>
          <Input
            value={draft.displayName}
            maxLength={100}
            onChange={(event) => setDraft({ ...draft, displayName: event.target.value })}
          />
          {nameMissing ? (
            <Field.ErrorText>Your display name cannot be empty.</Field.ErrorText>
          ) : (
            <Field.HelperText>Shown on your plans, build reports and profile.</Field.HelperText>
          )}
        </Field.Root>

        <Fieldset.Root disabled={readOnly}>
          <Fieldset.Legend>Units</Fieldset.Legend>
          <Fieldset.HelperText>Measurements on plans and cut lists are shown in these.</Fieldset.HelperText>
          <RadioGroup.Root
            value={draft.units}
            onValueChange={({ value }) => value && setDraft({ ...draft, units: value as Units })}
            mt="2"
          >
            <HStack gap="6" wrap="wrap">
              {UNIT_CHOICES.map((choice) => (
                <RadioGroup.Item key={choice.value} value={choice.value}>
                  <RadioGroup.ItemHiddenInput />
                  <RadioGroup.ItemIndicator />
                  <RadioGroup.ItemText>
                    {choice.label}{' '}
                    <Text as="span" color="fg.muted" className="numeric">
                      ({choice.hint})
                    </Text>
                  </RadioGroup.ItemText>
                </RadioGroup.Item>
              ))}
            </HStack>
          </RadioGroup.Root>
        </Fieldset.Root>

        <Fieldset.Root disabled={readOnly}>
          <Fieldset.Legend>E-mail me when</Fieldset.Legend>
          <Stack gap="3" mt="2">
            {NOTIFICATION_KINDS.map(({ key, label }) => (
              <Switch.Root
                key={key}
                checked={draft.notifications[key]}
                onCheckedChange={({ checked }) =>
                  setDraft({ ...draft, notifications: { ...draft.notifications, [key]: checked } })
                }
              >
                <Switch.HiddenInput />
                <Switch.Control>
                  <Switch.Thumb />
                </Switch.Control>
                <Switch.Label>{label}</Switch.Label>
              </Switch.Root>
            ))}
          </Stack>
        </Fieldset.Root>

        <Box>
          <Button type="submit" colorPalette="steel" loading={saving} disabled={readOnly || nameMissing}>
            Save settings
          </Button>
        </Box>
      </Stack>
    </Box>
  );
}
