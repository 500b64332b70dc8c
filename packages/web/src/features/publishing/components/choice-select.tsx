import { NativeSelect } from '@chakra-ui/react';
import type { Choice } from '../plan-details';

/** A native select of fixed choices, with an optional empty first choice that asks for one. */
export function ChoiceSelect({
  choices,
  value,
  onChange,
  prompt,
  id,
  label,
  size = 'md',
  width,
  disabled,
}: {
  choices: readonly Choice[];
  value: string;
  onChange(value: string): void;
  prompt?: string;
  id?: string;
  /** Its accessible name, when no label element names it. */
  label?: string;
  size?: 'sm' | 'md';
  width?: string;
  disabled?: boolean;
}) {
  return (
    <NativeSelect.Root size={size} width={width} disabled={disabled}>
      <NativeSelect.Field id={id} aria-label={label} value={value} onChange={(event) => onChange(event.target.value)}>
        {prompt !== undefined && <option value="">{prompt}</option>}
        {choices.map((choice) => (
          <option key={choice.value} value={choice.value}>
            {choice.label}
          </option>
        ))}
      </NativeSelect.Field>
      <NativeSelect.Indicator />
    </NativeSelect.Root>
  );
}
