import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { myPlansKey, ownPlanKey, planPath } from './keys';
import type { OwnPlan, PlanDetailsInput } from './types';

/**
 * Saves a plan's details. `expectedUpdatedAt` is the plan's `updatedAt` as the editor loaded it: a
 * save made meanwhile elsewhere gets 409 `plan_changed` instead of being overwritten.
 */
export function updatePlan(slug: string, details: PlanDetailsInput, expectedUpdatedAt: string): Promise<OwnPlan> {
  return api<OwnPlan>(planPath(slug), { method: 'PATCH', body: { ...details, expectedUpdatedAt } });
}

export function useUpdatePlan(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ details, expectedUpdatedAt }: { details: PlanDetailsInput; expectedUpdatedAt: string }) =>
      updatePlan(slug, details, expectedUpdatedAt),
    onSuccess: (plan) => {
      queryClient.setQueryData(ownPlanKey(slug), plan);
      return queryClient.invalidateQueries({ queryKey: myPlansKey });
    },
  });
}
