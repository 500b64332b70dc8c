import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MemberProfile } from './types';

export function getProfile(login: string): Promise<MemberProfile> {
  return api<MemberProfile>(`/members/${encodeURIComponent(login)}`);
}

export const profileQueryOptions = (login: string) =>
  queryOptions({ queryKey: ['members', 'profile', login], queryFn: () => getProfile(login) });

export function useProfile(login: string) {
  return useQuery(profileQueryOptions(login));
}
