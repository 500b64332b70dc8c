import { Box, Button, Field, HStack, Input, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import type { HardwareRow } from '../api/types';
import { hardwareRowErrors, moveRow } from '../revision-text';

/** The hardware list's rows, edited in place: add, change, remove, move up and down. Saved with the revision. */
export function HardwareEditor({
  rows,
  readOnly,
  showErrors,
  onChange,
}: {
  rows: readonly HardwareRow[];
  readOnly: boolean;
  showErrors: boolean;
  onChange(rows: HardwareRow[]): void;
}) {
  const update = (index: number, patch: Partial<HardwareRow>) =>
    onChange(rows.map((row, i) => (i === index ? { ...row, ...patch } : row)));
  const add = () => onChange([...rows, { item: '', specification: '', quantity: 1, note: '' }]);
  const remove = (index: number) => onChange(rows.filter((_, i) => i !== index));

  return (
    <Stack gap="3">
      {rows.length === 0 && (
        <Text color="fg.muted">
          No hardware yet: screws, bearings, T-track, lead screw, stepper motor, driver, switches…
        </Text>
      )}
      <Stack as="ol" gap="3" listStyleType="none" aria-label="Hardware rows">
        {rows.map((row, index) => {
          const errors = showErrors ? hardwareRowErrors(row) : {};
          const n = index + 1;
          return (
            <Box
              as="li"
              key={index}
              aria-label={`Hardware row ${n}`}
              borderWidth="1px"
              borderColor="border"
              borderRadius="md"
              p="3"
            >
              <SimpleGrid columns={{ base: 1, md: 12 }} gap="3" alignItems="start">
                <Field.Root gridColumn={{ md: 'span 3' }} invalid={Boolean(errors.item)} disabled={readOnly}>
                  <Field.Label fontSize="sm">Item</Field.Label>
                  <Input
                    size="sm"
                    value={row.item}
                    maxLength={200}
                    onChange={(event) => update(index, { item: event.target.value })}
                  />
                  <Field.ErrorText>{errors.item}</Field.ErrorText>
                </Field.Root>
                <Field.Root gridColumn={{ md: 'span 4' }} disabled={readOnly}>
                  <Field.Label fontSize="sm">Specification</Field.Label>
                  <Input
                    size="sm"
                    value={row.specification}
                    maxLength={300}
                    onChange={(event) => update(index, { specification: event.target.value })}
                  />
                </Field.Root>
                <Field.Root gridColumn={{ md: 'span 1' }} invalid={Boolean(errors.quantity)} disabled={readOnly}>
                  <Field.Label fontSize="sm">Quantity</Field.Label>
                  <Input
                    size="sm"
                    type="number"
                    min={1}
                    max={100000}
                    step={1}
                    textAlign="end"
                    value={Number.isNaN(row.quantity) ? '' : String(row.quantity)}
                    onChange={(event) => update(index, { quantity: event.target.valueAsNumber })}
                  />
                  <Field.ErrorText>{errors.quantity}</Field.ErrorText>
                </Field.Root>
                <Field.Root gridColumn={{ md: 'span 4' }} disabled={readOnly}>
                  <Field.Label fontSize="sm">Note</Field.Label>
                  <Input
                    size="sm"
                    value={row.note}
                    maxLength={500}
                    onChange={(event) => update(index, { note: event.target.value })}
                  />
                </Field.Root>
              </SimpleGrid>
              {!readOnly && (
                <HStack mt="2" gap="2" justify="flex-end">
                  <Button
                    size="xs"
                    variant="ghost"
                    disabled={index === 0}
                    onClick={() => onChange(moveRow(rows, index, -1))}
                    aria-label={`Move hardware row ${n} up`}
                  >
                    ↑ Up
                  </Button>
                  <Button
                    size="xs"
                    variant="ghost"
                    disabled={index === rows.length - 1}
                    onClick={() => onChange(moveRow(rows, index, 1))}
                    aria-label={`Move hardware row ${n} down`}
                  >
                    ↓ Down
                  </Button>
                  <Button
                    size="xs"
                    variant="ghost"
                    colorPalette="brick"
                    onClick={() => remove(index)}
                    aria-label={`Remove hardware row ${n}`}
                  >
                    Remove
                  </Button>
                </HStack>
              )}
            </Box>
          );
        })}
      </Stack>
      {!readOnly && (
        <Box>
          <Button size="sm" variant="outline" colorPalette="steel" onClick={add}>
            Add a hardware row
          </Button>
        </Box>
      )}
    </Stack>
  );
}
