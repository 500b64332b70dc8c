import { Box, Button, Field, HStack, Heading, Input, Stack, Text } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Notice } from '../../components/notice';
import { EmptyState, Page } from '../../components/page';
import { paths } from '../../config/paths';
import { requireAdmin } from '../../features/auth/require-member';
import { useChangeMember } from '../../features/members/api/change-member';
import { auditLogQueryOptions, useAuditLog } from '../../features/members/api/get-audit-log';
import { MEMBERS_PAGE_SIZE, membersQueryOptions, useMembers } from '../../features/members/api/get-members';
import { AuditLogList } from '../../features/members/components/audit-log-list';
import { ConfirmChangeDialog, type PendingChange } from '../../features/members/components/confirm-change-dialog';
import { MembersTable } from '../../features/members/components/members-table';

function filterOf(params: URLSearchParams) {
  const page = Number(params.get('page') ?? '1');
  return { q: params.get('q')?.trim() ?? '', page: Number.isInteger(page) && page > 0 ? page : 1 };
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireAdmin(queryClient, request, 'The Members page');
    await Promise.all([
      queryClient.ensureQueryData(membersQueryOptions(filterOf(new URL(request.url).searchParams))),
      queryClient.ensureQueryData(auditLogQueryOptions()),
    ]);
    return null;
  };

const DONE: Record<PendingChange['change'], string> = {
  'grant-moderator': 'is now a moderator',
  'revoke-moderator': 'is no longer a moderator',
  suspend: 'is suspended and has been signed out everywhere',
  restore: 'is restored',
};

export default function MembersRoute() {
  const [params, setParams] = useSearchParams();
  const filter = filterOf(params);
  const members = useMembers(filter);
  const audit = useAuditLog();
  const change = useChangeMember();
  const [pending, setPending] = useState<PendingChange | null>(null);
  const [outcome, setOutcome] = useState<{ tone: 'sage' | 'brick'; text: string } | null>(null);
  const total = members.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / MEMBERS_PAGE_SIZE));

  const confirm = ({ member, change: what }: PendingChange) =>
    change.mutate(
      { login: member.login, change: what },
      {
        onSuccess: () => setOutcome({ tone: 'sage', text: `${member.displayName} ${DONE[what]}.` }),
        onError: (error) => setOutcome({ tone: 'brick', text: `Nothing was changed: ${error.message}` }),
        onSettled: () => setPending(null),
      },
    );

  return (
    <Page title="Members" lead="Everyone who has signed in. Make members moderators, or suspend and restore them.">
      <Field.Root maxW="md">
        <Field.Label>Search members</Field.Label>
        <Input
          type="search"
          placeholder="Login or display name"
          defaultValue={filter.q}
          onChange={(event) => {
            const q = event.target.value.trim();
            setParams(new URLSearchParams(paths.members.getHref({ q }).split('?')[1] ?? ''), { replace: true });
          }}
        />
      </Field.Root>

      {outcome && <Notice tone={outcome.tone}>{outcome.text}</Notice>}

      {members.data && members.data.items.length > 0 ? (
        <Stack gap="3">
          <MembersTable
            members={members.data.items}
            profileHref={paths.memberProfile.getHref}
            onChange={(member, what) => {
              setOutcome(null);
              setPending({ member, change: what });
            }}
          />
          <HStack justify="space-between" wrap="wrap">
            <Text color="fg.muted" className="numeric" aria-live="polite">
              {total === 1 ? '1 member' : `${total} members`} · page {filter.page} of {pages}
            </Text>
            <HStack gap="2">
              <Button
                size="sm"
                variant="outline"
                disabled={filter.page <= 1}
                onClick={() =>
                  setParams(paths.members.getHref({ q: filter.q, page: filter.page - 1 }).split('?')[1] ?? '')
                }
              >
                Previous page
              </Button>
              <Button
                size="sm"
                variant="outline"
                disabled={filter.page >= pages}
                onClick={() =>
                  setParams(paths.members.getHref({ q: filter.q, page: filter.page + 1 }).split('?')[1] ?? '')
                }
              >
                Next page
              </Button>
            </HStack>
          </HStack>
        </Stack>
      ) : (
        <EmptyState title={filter.q ? `No member matches “${filter.q}”` : 'Nobody has signed in yet'}>
          <Text>
            {filter.q ? 'Try part of a login or a display name.' : 'Members appear here after their first sign-in.'}
          </Text>
        </EmptyState>
      )}

      <Stack as="section" gap="3" aria-labelledby="recent-changes">
        <Heading as="h2" size="lg" id="recent-changes" color="walnut.700">
          Recent changes
        </Heading>
        <Box bg="bg.panel" borderWidth="1px" borderColor="border" borderRadius="lg" p="4">
          <AuditLogList entries={audit.data?.items ?? []} />
        </Box>
      </Stack>

      <ConfirmChangeDialog
        pending={pending}
        busy={change.isPending}
        onConfirm={confirm}
        onCancel={() => setPending(null)}
      />
    </Page>
  );
}
