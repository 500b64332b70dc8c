import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlanDetail } from './types';

export function getPlan(slug: string): Promise<PlanDetail> {
  return api<PlanDetail>(`/plans/${encodeURIComponent(slug)}`);
}

export const planQueryKey = (slug: string) => ['plans', 'detail', slug] as const;

export const planQueryOptions = (slug: string) =>
  queryOptions({ queryKey: planQueryKey(slug), queryFn: () => getPlan(slug) });

export function usePlan(slug: string) {
  return useQuery(planQueryOptions(slug));
}
