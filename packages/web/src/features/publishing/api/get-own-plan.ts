import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { ownPlanKey, planPath } from './keys';
import type { OwnPlan } from './types';

export const ownPlanQueryOptions = (slug: string) =>
  queryOptions({ queryKey: ownPlanKey(slug), queryFn: () => api<OwnPlan>(planPath(slug)) });

export function useOwnPlan(slug: string) {
  return useQuery(ownPlanQueryOptions(slug));
}
