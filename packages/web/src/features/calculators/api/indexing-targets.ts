import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { JointInput } from '@jigwright/core';
import { api } from '../../../lib/api-client';

type RevisionState = 'draft' | 'submitted' | 'published' | 'sent-back' | 'declined' | 'hidden';

interface OwnPlan {
  slug: string;
  title: string;
  category: string;
  revisions: Array<{ number: number; state: RevisionState }>;
}

/** A revision of the member's own indexing-jig plan that can still take a saved set. */
export interface IndexingTarget {
  slug: string;
  title: string;
  number: number;
}

const EDITABLE: readonly RevisionState[] = ['draft', 'sent-back'];

export function indexingTargetsOf(plans: readonly OwnPlan[]): IndexingTarget[] {
  return plans
    .filter((plan) => plan.category === 'indexing-jig')
    .flatMap((plan) =>
      plan.revisions
        .filter((revision) => EDITABLE.includes(revision.state))
        .map((revision) => ({ slug: plan.slug, title: plan.title, number: revision.number })),
    );
}

/** The signed-in member's drafts of indexing-jig plans (a member has few plans: one page of 100 holds them). */
export function useIndexingTargets() {
  return useQuery({
    queryKey: ['me', 'plans', 'indexing-targets'],
    queryFn: async () => indexingTargetsOf((await api<{ items: OwnPlan[] }>('/me/plans?pageSize=100')).items),
  });
}

const revisionPath = (target: IndexingTarget) => `/plans/${encodeURIComponent(target.slug)}/revisions/${target.number}`;

/**
 * Saves a set of inputs to a draft. The draft is read first for its `updatedAt`, so that a save
 * made in the editor meanwhile is never overwritten: the server answers 409 instead.
 */
export function useSaveIndexingSet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ target, name, inputs }: { target: IndexingTarget; name: string; inputs: JointInput }) => {
      const { updatedAt } = await api<{ updatedAt: string }>(revisionPath(target));
      return api<unknown>(revisionPath(target), {
        method: 'PATCH',
        body: { expectedUpdatedAt: updatedAt, indexing: { name, inputs } },
      });
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['plans'] }),
  });
}
