import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reviewQueryKey } from './get-review-queue';
import type { ReviewDecision } from './types';

/** The review decisions on a revision, newest first (its designer, moderators and admins). */
export function getDecisions(slug: string, number: number): Promise<ReviewDecision[]> {
  return api<ReviewDecision[]>(`/plans/${encodeURIComponent(slug)}/revisions/${number}/decisions`);
}

export const decisionsQueryOptions = (slug: string, number: number) =>
  queryOptions({
    queryKey: [...reviewQueryKey, 'decisions', slug, number],
    queryFn: () => getDecisions(slug, number),
  });

export function useDecisions(slug: string, number: number) {
  return useQuery(decisionsQueryOptions(slug, number));
}
