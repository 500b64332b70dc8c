import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { myPlansKey, ownPlanKey, planPath } from './keys';
import type { OwnPlan, PlanDetailsInput } from './types';

export function updatePlan(slug: string, details: PlanDetailsInput): Promise<OwnPlan> {
  return api<OwnPlan>(planPath(slug), { method: 'PATCH', body: details });
}

export function useUpdatePlan(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (details: PlanDetailsInput) => updatePlan(slug, details),
    onSuccess: (plan) => {
      queryClient.setQueryData(ownPlanKey(slug), plan);
      return queryClient.invalidateQueries({ queryKey: myPlansKey });
    },
  });
}
