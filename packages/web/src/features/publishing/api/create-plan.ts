import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { myPlansKey, ownPlanKey } from './keys';
import type { OwnPlan, PlanDetailsInput } from './types';

export function createPlan(details: PlanDetailsInput): Promise<OwnPlan> {
  return api<OwnPlan>('/plans', { method: 'POST', body: details });
}

export function useCreatePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPlan,
    onSuccess: (plan) => {
      queryClient.setQueryData(ownPlanKey(plan.slug), plan);
      return queryClient.invalidateQueries({ queryKey: myPlansKey });
    },
  });
}
