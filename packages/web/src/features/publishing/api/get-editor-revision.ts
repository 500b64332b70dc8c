import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { editorRevisionKey, revisionPath } from './keys';
import type { EditorRevision } from './types';

/** How often the editor asks again while a drawing is waiting for or in its analysis. */
export const ANALYSIS_POLL_MS = 1000;

export const isAnalysing = (revision: EditorRevision | undefined) =>
  revision?.drawings.some((drawing) => drawing.status === 'queued' || drawing.status === 'analysing') ?? false;

export const editorRevisionQueryOptions = (slug: string, number: number) =>
  queryOptions({
    queryKey: editorRevisionKey(slug, number),
    queryFn: () => api<EditorRevision>(revisionPath(slug, number)),
    // The editor is the one place that changes a draft: no background refetch that would race a save.
    refetchOnWindowFocus: false,
    refetchInterval: (query) => (isAnalysing(query.state.data) ? ANALYSIS_POLL_MS : false),
  });

export function useEditorRevision(slug: string, number: number) {
  return useQuery(editorRevisionQueryOptions(slug, number));
}
