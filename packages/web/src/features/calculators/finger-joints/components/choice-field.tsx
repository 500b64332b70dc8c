import { Field, NativeSelect, SegmentGroup, Stack, Text } from '@chakra-ui/react';
import { useId } from 'react';

export interface Choice<T extends string> {
  value: T;
  label: string;
}

interface ChoiceProps<T extends string> {
  label: string;
  value: T;
  choices: readonly Choice<T>[];
  onChange: (value: T) => void;
}

function chosen<T extends string>(choices: readonly Choice<T>[], value: string | null): T | undefined {
  return choices.find((choice) => choice.value === value)?.value;
}

/** Two or three short options side by side, such as the units. */
export function SegmentChoice<T extends string>({ label, value, choices, onChange }: ChoiceProps<T>) {
  const labelId = useId();
  return (
    <Stack gap="1.5">
      <Text id={labelId} fontSize="sm" fontWeight="500">
        {label}
      </Text>
      <SegmentGroup.Root
        value={value}
        onValueChange={(details) => {
          const next = chosen(choices, details.value);
          if (next !== undefined) onChange(next);
        }}
        aria-labelledby={labelId}
        size="sm"
        bg="bg.panel"
        alignSelf="flex-start"
      >
        <SegmentGroup.Indicator bg="steel.600" />
        <SegmentGroup.Items
          items={choices.map((choice) => ({ value: choice.value, label: choice.label }))}
          px="3"
          _checked={{ color: 'white' }}
        />
      </SegmentGroup.Root>
    </Stack>
  );
}

/** A longer list of options, as a native select. */
export function SelectChoice<T extends string>({ label, value, choices, onChange }: ChoiceProps<T>) {
  return (
    <Field.Root>
      <Field.Label>{label}</Field.Label>
      <NativeSelect.Root size="md" bg="bg.panel">
        <NativeSelect.Field
          value={value}
          onChange={(event) => {
            const next = chosen(choices, event.target.value);
            if (next !== undefined) onChange(next);
          }}
        >
          {choices.map((choice) => (
            <option key={choice.value} value={choice.value}>
              {choice.label}
            </option>
          ))}
        </NativeSelect.Field>
        <NativeSelect.Indicator />
      </NativeSelect.Root>
    </Field.Root>
  );
}
