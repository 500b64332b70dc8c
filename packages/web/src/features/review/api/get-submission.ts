import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reviewQueryKey } from './get-review-queue';
import type { Submission } from './types';

export function getSubmission(slug: string, number: number): Promise<Submission> {
  return api<Submission>(`/review/revisions/${encodeURIComponent(slug)}/${number}`);
}

export const submissionQueryOptions = (slug: string, number: number) =>
  queryOptions({
    queryKey: [...reviewQueryKey, 'submission', slug, number],
    queryFn: () => getSubmission(slug, number),
  });

export function useSubmission(slug: string, number: number) {
  return useQuery(submissionQueryOptions(slug, number));
}
