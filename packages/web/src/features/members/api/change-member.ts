import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { auditLogQueryKey } from './get-audit-log';
import { membersQueryKey } from './get-members';
import type { AdminMember } from './types';

/** What an admin can do to a member; each is its own sub-resource on the server. */
export type MemberChange = 'grant-moderator' | 'revoke-moderator' | 'suspend' | 'restore';

const REQUESTS: Record<MemberChange, { method: 'POST' | 'DELETE'; resource: 'moderator' | 'suspension' }> = {
  'grant-moderator': { method: 'POST', resource: 'moderator' },
  'revoke-moderator': { method: 'DELETE', resource: 'moderator' },
  suspend: { method: 'POST', resource: 'suspension' },
  restore: { method: 'DELETE', resource: 'suspension' },
};

export function changeMember(login: string, change: MemberChange): Promise<AdminMember> {
  const { method, resource } = REQUESTS[change];
  return api<AdminMember>(`/admin/members/${encodeURIComponent(login)}/${resource}`, { method });
}

export function useChangeMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ login, change }: { login: string; change: MemberChange }) => changeMember(login, change),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: membersQueryKey }),
        queryClient.invalidateQueries({ queryKey: auditLogQueryKey }),
      ]),
  });
}
