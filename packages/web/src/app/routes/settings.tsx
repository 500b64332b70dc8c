import { Box, Skeleton } from '@chakra-ui/react';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { LoaderFunctionArgs } from 'react-router';
import { Page } from '../../components/page';
import { meQueryOptions, useMe } from '../../features/auth/api/get-me';
import { requireMember } from '../../features/auth/require-member';
import { settingsQueryOptions, useSettings } from '../../features/settings/api/get-settings';
import { useUpdateSettings } from '../../features/settings/api/update-settings';
import { SettingsForm } from '../../features/settings/components/settings-form';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const member = await requireMember(queryClient, request);
    await queryClient.ensureQueryData(settingsQueryOptions(member.login));
    return null;
  };

function Notice({ tone, children }: { tone: 'sage' | 'brick' | 'amber'; children: string }) {
  return (
    <Box
      role={tone === 'brick' ? 'alert' : 'status'}
      borderLeftWidth="4px"
      borderColor={`${tone}.600`}
      bg={`${tone}.50`}
      color="graphite"
      p="3"
      borderRadius="sm"
    >
      {children}
    </Box>
  );
}

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

export default function SettingsRoute() {
  const { data: member } = useMe();
  if (!member) return null;
  return (
    <Page title="Settings" lead="How your name appears, which units you measure in, and which e-mails you get.">
      <SettingsPanel login={member.login} suspended={member.suspended} />
    </Page>
  );
}
