import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { planListQuery, type LibraryFilter } from '../library-filter';
import type { Page, PlanCard } from './types';

export const LIBRARY_PAGE_SIZE = 12;

export function getPlans(filter: LibraryFilter): Promise<Page<PlanCard>> {
  return api<Page<PlanCard>>(`/plans?${planListQuery(filter, LIBRARY_PAGE_SIZE)}`);
}

export const plansQueryKey = ['plans', 'library'] as const;

export const plansQueryOptions = (filter: LibraryFilter) =>
  queryOptions({
    queryKey: [...plansQueryKey, filter],
    queryFn: () => getPlans(filter),
    placeholderData: keepPreviousData,
  });

export function usePlans(filter: LibraryFilter) {
  return useQuery(plansQueryOptions(filter));
}
