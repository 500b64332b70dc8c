import { Button, Fieldset, SimpleGrid, Stack } from '@chakra-ui/react';
import type { EdgeFeature, JointUnits, ScrewFixity } from '@jigwright/core';
import { convertUnits, type JointFormState, type LeadAs, type MotorAs, type TextField } from '../joint-form';
import { SegmentChoice, SelectChoice, type Choice } from './choice-field';
import { NumberField } from './number-field';

const UNIT_CHOICES: Choice<JointUnits>[] = [
  { value: 'mm', label: 'mm' },
  { value: 'in', label: 'in' },
];

const START_CHOICES: Choice<EdgeFeature>[] = [
  { value: 'pin', label: 'Pin' },
  { value: 'slot', label: 'Slot' },
];

const LEAD_CHOICES: Choice<LeadAs>[] = [
  { value: 'lead', label: 'mm per rev' },
  { value: 'threadsPerInch', label: 'threads per inch' },
];

const MOTOR_CHOICES: Choice<MotorAs>[] = [
  { value: 'stepsPerRev', label: 'steps per rev' },
  { value: 'stepAngle', label: 'step angle' },
];

const FIXITY_CHOICES: Choice<ScrewFixity>[] = [
  { value: 'fixed-free', label: 'Fixed – free' },
  { value: 'pinned-pinned', label: 'Supported – supported' },
  { value: 'fixed-pinned', label: 'Fixed – supported' },
  { value: 'fixed-fixed', label: 'Fixed – fixed' },
];

export interface JointFormFieldsProps {
  form: JointFormState;
  onChange: (next: JointFormState) => void;
  onReset: () => void;
  /** The core's message for each field that has one. */
  errors: Partial<Record<TextField, string>>;
}

/** Every input of the calculator, grouped as a builder measures them: the joint, the drive, the screw. */
export function JointFormFields({ form, onChange, onReset, errors }: JointFormFieldsProps) {
  const unit = form.units;
  const box = (
    field: TextField,
    label: string,
    extra: { unit?: string; helper?: string; placeholder?: string } = {},
  ) => (
    <NumberField
      label={label}
      value={form.text[field]}
      onChange={(text) => onChange({ ...form, text: { ...form.text, [field]: text } })}
      error={errors[field]}
      {...extra}
    />
  );
  const lengthHelper = unit === 'in' ? 'Decimals or fractions such as 1/2 or 5-3/4.' : undefined;

  return (
    <Stack as="form" gap="6" aria-label="Finger joint inputs" onSubmit={(event) => event.preventDefault()}>
      <Fieldset.Root>
        <Fieldset.Legend color="walnut.700" fontWeight="600">
          Joint
        </Fieldset.Legend>
        <Fieldset.Content>
          <SimpleGrid columns={2} gap="4">
            <SegmentChoice
              label="Units"
              value={form.units}
              choices={UNIT_CHOICES}
              onChange={(units) => onChange(convertUnits(form, units))}
            />
            <SegmentChoice
              label="Board A starts with"
              value={form.start}
              choices={START_CHOICES}
              onChange={(start) => onChange({ ...form, start })}
            />
          </SimpleGrid>
          {box('width', 'Board width', { unit, helper: lengthHelper })}
          <SimpleGrid columns={2} gap="4">
            {box('pin', 'Pin width', { unit })}
            {box('slot', 'Slot width', { unit, placeholder: 'same as pin' })}
          </SimpleGrid>
          {box('kerf', 'Kerf (cutter width)', { unit, helper: 'Blade kerf, dado stack or bit width.' })}
        </Fieldset.Content>
      </Fieldset.Root>

      <Fieldset.Root>
        <Fieldset.Legend color="walnut.700" fontWeight="600">
          Drive
        </Fieldset.Legend>
        <Fieldset.HelperText color="fg.muted">Leave the lead empty for positions only.</Fieldset.HelperText>
        <Fieldset.Content>
          <SimpleGrid columns={2} gap="4" alignItems="end">
            <SelectChoice
              label="Screw given as"
              value={form.leadAs}
              choices={LEAD_CHOICES}
              onChange={(leadAs) => onChange({ ...form, leadAs })}
            />
            {form.leadAs === 'lead'
              ? box('lead', 'Lead', { unit: 'mm/rev' })
              : box('threadsPerInch', 'Threads per inch', { unit: 'TPI' })}
          </SimpleGrid>
          <SimpleGrid columns={2} gap="4" alignItems="end">
            <SelectChoice
              label="Motor given as"
              value={form.motorAs}
              choices={MOTOR_CHOICES}
              onChange={(motorAs) => onChange({ ...form, motorAs })}
            />
            {form.motorAs === 'stepsPerRev'
              ? box('stepsPerRev', 'Steps per revolution', { unit: 'steps', placeholder: '200' })
              : box('stepAngle', 'Step angle', { unit: '°' })}
          </SimpleGrid>
          <SimpleGrid columns={2} gap="4">
            {box('microsteps', 'Microstepping', { unit: '×', placeholder: '1' })}
            {box('backlash', 'Backlash', { unit, placeholder: 'none' })}
          </SimpleGrid>
          {box('maxStepRate', 'Controller step rate', { unit: 'steps/s', placeholder: 'not known' })}
        </Fieldset.Content>
      </Fieldset.Root>

      <Fieldset.Root>
        <Fieldset.Legend color="walnut.700" fontWeight="600">
          Screw, for the whirling speed
        </Fieldset.Legend>
        <Fieldset.HelperText color="fg.muted">
          Optional; steel screw taken as a plain rod of its root diameter.
        </Fieldset.HelperText>
        <Fieldset.Content>
          <SimpleGrid columns={2} gap="4">
            {box('rootDiameter', 'Root diameter', { unit })}
            {box('screwLength', 'Length between bearings', { unit })}
          </SimpleGrid>
          <SelectChoice
            label="End fixity"
            value={form.fixity}
            choices={FIXITY_CHOICES}
            onChange={(fixity) => onChange({ ...form, fixity })}
          />
        </Fieldset.Content>
      </Fieldset.Root>

      <Button type="button" variant="outline" colorPalette="steel" alignSelf="flex-start" onClick={onReset}>
        Back to the example joint
      </Button>
    </Stack>
  );
}
