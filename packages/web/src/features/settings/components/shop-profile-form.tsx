import {
  Box,
  Button,
  Field,
  Fieldset,
  Heading,
  HStack,
  IconButton,
  Input,
  NativeSelect,
  SimpleGrid,
  Stack,
  Text,
} from '@chakra-ui/react';
import { useState, type FormEvent, type ReactNode } from 'react';
import type { PriceUnit, ShopProfileValues } from '../api/shop-profile';
import { fromForm, PRICE_UNIT_NAMES, toForm, type FormErrors, type ShopProfileForm } from '../shop-profile-form';

type Units = 'mm' | 'in';

export interface ShopProfileFormProps {
  profile: ShopProfileValues;
  units: Units;
  readOnly?: boolean;
  saving?: boolean;
  /** Errors the server found, by field path, shown beside the fields like the form's own. */
  serverErrors?: FormErrors;
  onSave(profile: ShopProfileValues): void;
}

function LengthInput({
  label,
  value,
  error,
  units,
  hint,
  onChange,
}: {
  label: string;
  value: string;
  error?: string;
  units: Units;
  hint?: string;
  onChange(value: string): void;
}) {
  return (
    <Field.Root invalid={error !== undefined} width="auto">
      <Field.Label>{label}</Field.Label>
      <HStack gap="2">
        <Input value={value} inputMode="decimal" maxW="10rem" onChange={(event) => onChange(event.target.value)} />
        <Text as="span" color="fg.muted">
          {units}
        </Text>
      </HStack>
      {error ? <Field.ErrorText>{error}</Field.ErrorText> : hint && <Field.HelperText>{hint}</Field.HelperText>}
    </Field.Root>
  );
}

function Group({ legend, help, children }: { legend: string; help: string; children: ReactNode }) {
  return (
    <Fieldset.Root>
      <Fieldset.Legend>
        <Heading as="h3" size="sm" color="walnut.700">
          {legend}
        </Heading>
      </Fieldset.Legend>
      <Fieldset.HelperText>{help}</Fieldset.HelperText>
      <Stack gap="3" mt="2">
        {children}
      </Stack>
    </Fieldset.Root>
  );
}

const replaced = <T,>(list: readonly T[], index: number, value: T): T[] =>
  list.map((item, i) => (i === index ? value : item));

/** Kerf, sheet and bar sizes, milling allowance and prices: what every cut list the member reads is worked out with. */
export function ShopProfileFormView({
  profile,
  units,
  readOnly = false,
  saving = false,
  serverErrors = {},
  onSave,
}: ShopProfileFormProps) {
  const [form, setForm] = useState<ShopProfileForm>(() => toForm(profile, units));
  const [errors, setErrors] = useState<FormErrors>({});
  // The server's errors are about what was sent: they go once the member edits again.
  const [editedSinceSave, setEditedSinceSave] = useState(false);
  const shown = { ...(editedSinceSave ? {} : serverErrors), ...errors };
  const edit = (next: ShopProfileForm) => {
    setForm(next);
    setEditedSinceSave(true);
    if (Object.keys(errors).length > 0) setErrors({});
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    setEditedSinceSave(false);
    const result = fromForm(form, profile, units);
    if (result.errors) setErrors(result.errors);
    else onSave(result.values);
  };

  return (
    <Box
      as="form"
      aria-label="Shop profile"
      onSubmit={submit}
      bg="bg.panel"
      borderWidth="1px"
      borderColor="border"
      borderRadius="lg"
      p="6"
    >
      <fieldset disabled={readOnly || saving} style={{ border: 0, margin: 0, padding: 0, minWidth: 0 }}>
        <Stack gap="8" maxW="2xl">
          <Group legend="Saw" help="Kerf is the width of the cut: the cut list leaves it between parts.">
            <LengthInput
              label="Blade kerf"
              units={units}
              value={form.kerf}
              error={shown.kerf}
              hint={
                units === 'in'
                  ? 'A full-kerf blade is about 1/8 in, a thin-kerf one 3/32 in.'
                  : 'A full-kerf blade is about 3.2 mm, a thin-kerf one 2.4 mm.'
              }
              onChange={(kerf) => edit({ ...form, kerf })}
            />
          </Group>

          <Group legend="Sheet goods" help="Sheet sizes you can buy; parts are laid out on the fewest sheets.">
            {shown.sheets && (
              <Text color="brick.700" role="alert">
                {shown.sheets}
              </Text>
            )}
            {form.sheets.map((sheet, i) => (
              <HStack key={i} gap="4" align="end" wrap="wrap">
                <LengthInput
                  label={`Sheet ${i + 1} length`}
                  units={units}
                  value={sheet.length}
                  error={shown[`sheets.${i}.length`]}
                  onChange={(length) => edit({ ...form, sheets: replaced(form.sheets, i, { ...sheet, length }) })}
                />
                <LengthInput
                  label={`Sheet ${i + 1} width`}
                  units={units}
                  value={sheet.width}
                  error={shown[`sheets.${i}.width`]}
                  onChange={(width) => edit({ ...form, sheets: replaced(form.sheets, i, { ...sheet, width }) })}
                />
                <IconButton
                  aria-label={`Remove sheet ${i + 1}`}
                  variant="ghost"
                  colorPalette="brick"
                  disabled={form.sheets.length === 1}
                  onClick={() => edit({ ...form, sheets: form.sheets.filter((_, j) => j !== i) })}
                >
                  ×
                </IconButton>
              </HStack>
            ))}
            <HStack gap="4" wrap="wrap">
              <Button
                size="sm"
                variant="outline"
                disabled={form.sheets.length >= 6}
                onClick={() => edit({ ...form, sheets: [...form.sheets, { length: '', width: '' }] })}
              >
                Add a sheet size
              </Button>
            </HStack>
            <LengthInput
              label="Edge trim"
              units={units}
              value={form.edgeTrim}
              error={shown.edgeTrim}
              hint="Taken off every sheet edge before parts are laid out, for damaged or out-of-square factory edges."
              onChange={(edgeTrim) => edit({ ...form, edgeTrim })}
            />
          </Group>

          <Group
            legend="Linear stock"
            help="Bar lengths for T-track, rod and dowel; parts are cut from the fewest bars."
          >
            {shown.barLengths && (
              <Text color="brick.700" role="alert">
                {shown.barLengths}
              </Text>
            )}
            <SimpleGrid columns={{ base: 1, sm: 2 }} gap="4">
              {form.barLengths.map((bar, i) => (
                <HStack key={i} gap="2" align="end">
                  <LengthInput
                    label={`Bar ${i + 1}`}
                    units={units}
                    value={bar}
                    error={shown[`barLengths.${i}`]}
                    onChange={(value) => edit({ ...form, barLengths: replaced(form.barLengths, i, value) })}
                  />
                  <IconButton
                    aria-label={`Remove bar ${i + 1}`}
                    variant="ghost"
                    colorPalette="brick"
                    disabled={form.barLengths.length === 1}
                    onClick={() => edit({ ...form, barLengths: form.barLengths.filter((_, j) => j !== i) })}
                  >
                    ×
                  </IconButton>
                </HStack>
              ))}
            </SimpleGrid>
            <Box>
              <Button
                size="sm"
                variant="outline"
                disabled={form.barLengths.length >= 6}
                onClick={() => edit({ ...form, barLengths: [...form.barLengths, ''] })}
              >
                Add a bar length
              </Button>
            </Box>
          </Group>

          <Group legend="Solid stock" help="Added to each finished size to give the rough size you cut before milling.">
            <HStack gap="4" wrap="wrap" align="start">
              {(['length', 'width', 'thickness'] as const).map((side) => (
                <LengthInput
                  key={side}
                  label={`Extra ${side}`}
                  units={units}
                  value={form.allowance[side]}
                  error={shown[`allowance.${side}`]}
                  onChange={(value) => edit({ ...form, allowance: { ...form.allowance, [side]: value } })}
                />
              ))}
            </HStack>
          </Group>

          <Group
            legend="Prices"
            help="What you pay, so that cut lists show the cost. Name materials as plans do; * prices any material without its own price."
          >
            <Field.Root invalid={shown.currency !== undefined}>
              <Field.Label>Currency</Field.Label>
              <Input
                value={form.currency}
                maxW="6rem"
                maxLength={3}
                textTransform="uppercase"
                onChange={(event) => edit({ ...form, currency: event.target.value })}
              />
              {shown.currency ? (
                <Field.ErrorText>{shown.currency}</Field.ErrorText>
              ) : (
                <Field.HelperText>ISO 4217 code, such as EUR, GBP or USD.</Field.HelperText>
              )}
            </Field.Root>
            {form.prices.map((price, i) => (
              <HStack key={i} gap="3" align="start" wrap="wrap" role="group" aria-label={`Price ${i + 1}`}>
                <Field.Root invalid={shown[`prices.${i}.material`] !== undefined} flex="2" minW="12rem">
                  <Field.Label>Material</Field.Label>
                  <Input
                    value={price.material}
                    onChange={(event) =>
                      edit({ ...form, prices: replaced(form.prices, i, { ...price, material: event.target.value }) })
                    }
                  />
                  {shown[`prices.${i}.material`] && <Field.ErrorText>{shown[`prices.${i}.material`]}</Field.ErrorText>}
                </Field.Root>
                <Field.Root invalid={shown[`prices.${i}.amount`] !== undefined} flex="1" minW="7rem">
                  <Field.Label>Price ({form.currency.toUpperCase() || '—'})</Field.Label>
                  <Input
                    value={price.amount}
                    inputMode="decimal"
                    textAlign="end"
                    onChange={(event) =>
                      edit({ ...form, prices: replaced(form.prices, i, { ...price, amount: event.target.value }) })
                    }
                  />
                  {shown[`prices.${i}.amount`] && <Field.ErrorText>{shown[`prices.${i}.amount`]}</Field.ErrorText>}
                </Field.Root>
                <Field.Root flex="1" minW="9rem">
                  <Field.Label>Bought</Field.Label>
                  <NativeSelect.Root>
                    <NativeSelect.Field
                      value={price.per}
                      onChange={(event) =>
                        edit({
                          ...form,
                          prices: replaced(form.prices, i, { ...price, per: event.target.value as PriceUnit }),
                        })
                      }
                    >
                      {Object.entries(PRICE_UNIT_NAMES).map(([value, name]) => (
                        <option key={value} value={value}>
                          {name}
                        </option>
                      ))}
                    </NativeSelect.Field>
                    <NativeSelect.Indicator />
                  </NativeSelect.Root>
                </Field.Root>
                <IconButton
                  aria-label={`Remove price ${i + 1}`}
                  variant="ghost"
                  colorPalette="brick"
                  mt="7"
                  onClick={() => edit({ ...form, prices: form.prices.filter((_, j) => j !== i) })}
                >
                  ×
                </IconButton>
              </HStack>
            ))}
            <Box>
              <Button
                size="sm"
                variant="outline"
                disabled={form.prices.length >= 40}
                onClick={() => edit({ ...form, prices: [...form.prices, { material: '', per: 'sheet', amount: '' }] })}
              >
                Add a price
              </Button>
            </Box>
          </Group>

          {Object.keys(shown).length > 0 && (
            <Text color="brick.700" role="alert">
              Some values need a look; each is marked above. Nothing was saved.
            </Text>
          )}
          <Box>
            <Button type="submit" colorPalette="steel" loading={saving} disabled={readOnly}>
              Save shop profile
            </Button>
          </Box>
        </Stack>
      </fieldset>
    </Box>
  );
}
