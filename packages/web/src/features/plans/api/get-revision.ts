import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { RevisionDetail } from './types';

export function getRevision(slug: string, number: number): Promise<RevisionDetail> {
  return api<RevisionDetail>(`/plans/${encodeURIComponent(slug)}/revisions/${number}`);
}

export const revisionQueryKey = (slug: string, number: number) =>
  ['plans', 'detail', slug, 'revisions', number] as const;

export const revisionQueryOptions = (slug: string, number: number) =>
  queryOptions({
    queryKey: revisionQueryKey(slug, number),
    queryFn: () => getRevision(slug, number),
    // A published revision never changes.
    staleTime: 5 * 60_000,
  });

export function useRevision(slug: string, number: number | null) {
  return useQuery({ ...revisionQueryOptions(slug, number ?? 0), enabled: number !== null });
}
