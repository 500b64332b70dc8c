import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { editorRevisionKey, revisionPath } from './keys';
import type { EditorPart, EditorRevision, PartChanges } from './types';

/** Saves one part; 409 `part_changed` when it was saved elsewhere since `expectedUpdatedAt`. */
export function updatePart(
  slug: string,
  number: number,
  partId: number,
  changes: PartChanges,
  expectedUpdatedAt: string,
): Promise<EditorPart> {
  return api<EditorPart>(`${revisionPath(slug, number)}/parts/${partId}`, {
    method: 'PATCH',
    body: { ...changes, expectedUpdatedAt },
  });
}

export function useUpdatePart(slug: string, number: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ part, changes }: { part: EditorPart; changes: PartChanges }) =>
      updatePart(slug, number, part.id, changes, part.updatedAt),
    onSuccess: (saved) =>
      queryClient.setQueryData<EditorRevision>(
        editorRevisionKey(slug, number),
        (revision) =>
          revision && { ...revision, parts: revision.parts.map((part) => (part.id === saved.id ? saved : part)) },
      ),
  });
}
