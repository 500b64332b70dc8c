import { Field, Input, InputGroup } from '@chakra-ui/react';

export interface NumberFieldProps {
  label: string;
  value: string;
  onChange: (text: string) => void;
  unit?: string;
  error?: string;
  helper?: string;
  placeholder?: string;
}

/** A number box with its label, its unit inside the box, and the core's message when it is wrong. */
export function NumberField({ label, value, onChange, unit, error, helper, placeholder }: NumberFieldProps) {
  return (
    <Field.Root invalid={error !== undefined}>
      <Field.Label>{label}</Field.Label>
      <InputGroup endElement={unit} endElementProps={{ color: 'fg.muted', fontSize: 'sm' }}>
        <Input
          value={value}
          onChange={(event) => onChange(event.target.value)}
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          placeholder={placeholder}
          bg="bg.panel"
          className="numeric"
          _invalid={{ borderColor: 'brick.600', focusRingColor: 'brick.600' }}
        />
      </InputGroup>
      {error !== undefined ? (
        <Field.ErrorText color="brick.700">{error}</Field.ErrorText>
      ) : (
        helper !== undefined && <Field.HelperText color="fg.muted">{helper}</Field.HelperText>
      )}
    </Field.Root>
  );
}
