import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { editorRevisionKey, revisionPath } from './keys';
import type { EditorRevision, RevisionText } from './types';

/** Saves the draft's text; 409 `revision_changed` when it was saved elsewhere since `expectedUpdatedAt`. */
export function updateRevision(
  slug: string,
  number: number,
  text: RevisionText,
  expectedUpdatedAt: string,
): Promise<EditorRevision> {
  return api<EditorRevision>(revisionPath(slug, number), { method: 'PATCH', body: { ...text, expectedUpdatedAt } });
}

export function useUpdateRevision(slug: string, number: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ text, expectedUpdatedAt }: { text: RevisionText; expectedUpdatedAt: string }) =>
      updateRevision(slug, number, text, expectedUpdatedAt),
    onSuccess: (revision) => queryClient.setQueryData(editorRevisionKey(slug, number), revision),
  });
}
