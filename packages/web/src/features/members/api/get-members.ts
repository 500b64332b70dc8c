import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { AdminMember, Page } from './types';

export const MEMBERS_PAGE_SIZE = 20;

export interface MemberListFilter {
  q: string;
  page: number;
}

export function getMembers({ q, page }: MemberListFilter): Promise<Page<AdminMember>> {
  const query = new URLSearchParams({ page: String(page), pageSize: String(MEMBERS_PAGE_SIZE) });
  if (q) query.set('q', q);
  return api<Page<AdminMember>>(`/admin/members?${query}`);
}

export const membersQueryKey = ['admin', 'members'] as const;

export const membersQueryOptions = (filter: MemberListFilter) =>
  queryOptions({
    queryKey: [...membersQueryKey, filter],
    queryFn: () => getMembers(filter),
    placeholderData: keepPreviousData,
  });

export function useMembers(filter: MemberListFilter) {
  return useQuery(membersQueryOptions(filter));
}
