import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, ApiError } from '../../../lib/api-client';

export type MemberRole = 'member' | 'moderator' | 'admin';

export interface Member {
  id: number;
  login: string;
  displayName: string;
  avatarUrl: string | null;
  email: string;
  role: MemberRole;
  suspended: boolean;
  units: 'mm' | 'in';
}

/** The signed-in member, or null for a visitor. */
export async function getMe(): Promise<Member | null> {
  try {
    return await api<Member>('/me');
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: ['me'], queryFn: getMe, staleTime: 60_000 });

export function useMe() {
  return useQuery(meQueryOptions());
}
