import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Page, Submission } from './types';

export const REVIEW_PAGE_SIZE = 20;

export function getReviewQueue(page: number): Promise<Page<Submission>> {
  return api<Page<Submission>>(`/review/revisions?page=${page}&pageSize=${REVIEW_PAGE_SIZE}`);
}

/** Everything of the review desk is under this key, so that a decision refreshes all of it. */
export const reviewQueryKey = ['review'] as const;

export const reviewQueueQueryOptions = (page: number) =>
  queryOptions({ queryKey: [...reviewQueryKey, 'queue', page], queryFn: () => getReviewQueue(page) });

export function useReviewQueue(page: number) {
  return useQuery({ ...reviewQueueQueryOptions(page), placeholderData: keepPreviousData });
}
