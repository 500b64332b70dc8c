import { Heading, Skeleton, Stack, Text } from '@chakra-ui/react';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { LoaderFunctionArgs } from 'react-router';
import { Notice } from '../../components/notice';
import { Page } from '../../components/page';
import { meQueryOptions, useMe } from '../../features/auth/api/get-me';
import { requireMember } from '../../features/auth/require-member';
import { settingsQueryOptions, useSettings } from '../../features/settings/api/get-settings';
import { useUpdateSettings } from '../../features/settings/api/update-settings';
import { ApiError } from '../../lib/api-client';
import { shopProfileQueryOptions, useSaveShopProfile, useShopProfile } from '../../features/settings/api/shop-profile';
import { SettingsForm } from '../../features/settings/components/settings-form';
import { ShopProfileFormView } from '../../features/settings/components/shop-profile-form';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const member = await requireMember(queryClient, request);
    await Promise.all([
      queryClient.ensureQueryData(settingsQueryOptions(member.login)),
      // The shop profile is its own section: if it fails, the rest of the page still works.
      queryClient.prefetchQuery(shopProfileQueryOptions(member.login)),
    ]);
    return null;
  };

function SettingsPanel({ login, suspended }: { login: string; suspended: boolean }) {
  const queryClient = useQueryClient();
  const settings = useSettings(login);
  const update = useUpdateSettings(login);
  const [savedAt, setSavedAt] = useState<number | null>(null);
  if (!settings.data) return <Skeleton height="80" />;
  return (
    <>
      {suspended && (
        <Notice tone="amber">Your account is suspended: you can read your settings, but not change them.</Notice>
      )}
      {update.isError && <Notice tone="brick">{`Your settings were not saved: ${update.error.message}`}</Notice>}
      {savedAt !== null && !update.isError && <Notice tone="sage">Settings saved.</Notice>}
      <SettingsForm
        key={savedAt ?? 0}
        settings={settings.data}
        readOnly={suspended}
        saving={update.isPending}
        onSave={(changes) =>
          update.mutate(changes, {
            onSuccess: () => {
              setSavedAt(Date.now());
              // The header shows the display name; units reach every page through the member.
              void queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey });
            },
          })
        }
      />
    </>
  );
}

const SERVER_FIELDS: Array<[field: string, word: RegExp]> = [
  ['kerf', /kerf/i],
  ['edgeTrim', /edgeTrim|edge trim/i],
  ['currency', /currency/i],
  ['sheets', /sheet/i],
  ['barLengths', /bar/i],
];

/** The server's validation messages (`details`) beside the fields they are about. */
function fieldErrorsOf(error: unknown): Record<string, string> {
  if (!(error instanceof ApiError) || !Array.isArray(error.details)) return {};
  const errors: Record<string, string> = {};
  for (const detail of error.details as unknown[]) {
    if (typeof detail !== 'string') continue;
    const field = SERVER_FIELDS.find(([, word]) => word.test(detail))?.[0];
    if (field) errors[field] ??= detail;
  }
  return errors;
}

function ShopProfilePanel({ login, units, suspended }: { login: string; units: 'mm' | 'in'; suspended: boolean }) {
  const profile = useShopProfile(login);
  const save = useSaveShopProfile(login);
  const [savedAt, setSavedAt] = useState<number | null>(null);
  if (profile.isError)
    return <Notice tone="brick">{`Your shop profile could not be loaded: ${profile.error.message}`}</Notice>;
  if (!profile.data) return <Skeleton height="80" />;
  return (
    <Stack gap="4">
      {!profile.data.saved && (
        <Text color="fg.muted">
          These are the usual values every visitor's cut list uses. Save your own, and every plan's cut list, sheet
          layouts and cost follow your shop.
        </Text>
      )}
      {save.isError && <Notice tone="brick">{`Your shop profile was not saved: ${save.error.message}`}</Notice>}
      {savedAt !== null && !save.isError && <Notice tone="sage">Shop profile saved.</Notice>}
      <ShopProfileFormView
        key={`${savedAt ?? 0}-${units}`}
        profile={profile.data}
        units={units}
        readOnly={suspended}
        saving={save.isPending}
        serverErrors={fieldErrorsOf(save.error)}
        onSave={(values) => save.mutate(values, { onSuccess: () => setSavedAt(Date.now()) })}
      />
    </Stack>
  );
}

export default function SettingsRoute() {
  const { data: member } = useMe();
  if (!member) return null;
  return (
    <Page
      title="Settings"
      lead="How your name appears, which units you measure in, which e-mails you get, and the shop your cut lists are worked out for."
    >
      <SettingsPanel login={member.login} suspended={member.suspended} />
      <Stack as="section" aria-label="Shop profile" gap="3" mt="10">
        <Heading as="h2" size="lg" color="walnut.700" fontWeight="600">
          Shop profile
        </Heading>
        <ShopProfilePanel login={member.login} units={member.units} suspended={member.suspended} />
      </Stack>
    </Page>
  );
}
