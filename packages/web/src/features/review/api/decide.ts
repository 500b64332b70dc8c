import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reviewQueryKey } from './get-review-queue';
import type { ReviewDecisionKind, ReviewDecisionResult } from './types';

export interface DecisionRequest {
  slug: string;
  number: number;
  decision: ReviewDecisionKind;
  /** Notes to the designer; the reason, for a hide. */
  text: string;
}

/**
 * The plans feature keeps its library and plan pages under this key; a decision changes what they
 * show (a features folder may not import another, so the key is named here).
 */
const PLANS_QUERY_KEY = ['plans'] as const;

export function decide({ slug, number, decision, text }: DecisionRequest): Promise<ReviewDecisionResult> {
  const trimmed = text.trim();
  const body = decision === 'hide' ? { reason: trimmed } : trimmed ? { notes: trimmed } : {};
  return api<ReviewDecisionResult>(`/plans/${encodeURIComponent(slug)}/revisions/${number}/${decision}`, {
    method: 'POST',
    body,
  });
}

export function useDecide() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: decide,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: reviewQueryKey }),
        queryClient.invalidateQueries({ queryKey: PLANS_QUERY_KEY }),
      ]),
  });
}
