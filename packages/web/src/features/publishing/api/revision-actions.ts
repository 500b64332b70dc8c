import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { editorRevisionKey, myPlansKey, ownPlanKey, planPath, revisionPath } from './keys';
import type { EditorRevision } from './types';

/** After a state change the plan (its history and pages) and My workshop are read again. */
function refreshPlan(queryClient: QueryClient, slug: string) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: ownPlanKey(slug) }),
    queryClient.invalidateQueries({ queryKey: myPlansKey }),
  ]);
}

function useRevisionChange(slug: string, run: () => Promise<EditorRevision>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: (revision) => {
      queryClient.setQueryData(editorRevisionKey(slug, revision.number), revision);
      return refreshPlan(queryClient, slug);
    },
  });
}

/** 400 `revision_incomplete` lists in `details` what is missing. */
export const useSubmitRevision = (slug: string, number: number) =>
  useRevisionChange(slug, () => api<EditorRevision>(`${revisionPath(slug, number)}/submit`, { method: 'POST' }));

export const useWithdrawRevision = (slug: string, number: number) =>
  useRevisionChange(slug, () => api<EditorRevision>(`${revisionPath(slug, number)}/withdraw`, { method: 'POST' }));

/** The next revision of a published plan, a draft copied from the latest published one. */
export const useStartRevision = (slug: string) =>
  useRevisionChange(slug, () => api<EditorRevision>(`${planPath(slug)}/revisions`, { method: 'POST' }));

/** Deletes a draft with its files; 409 when it is the plan's only revision. */
export function useDeleteRevision(slug: string, number: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(revisionPath(slug, number), { method: 'DELETE' }),
    onSuccess: () => {
      // Gone: the editor must not read it again while it leaves.
      queryClient.removeQueries({ queryKey: editorRevisionKey(slug, number) });
      return refreshPlan(queryClient, slug);
    },
  });
}
