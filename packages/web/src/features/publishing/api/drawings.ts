import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { uploadFile, type UploadOptions } from '../../../lib/upload';
import { editorRevisionKey, revisionPath } from './keys';
import type { EditorAttachment, EditorDrawing } from './types';

/** The server's limits (`uploads.service.ts`), checked here first so that nobody waits to be told. */
export const DRAWING_MAX_BYTES = 16 * 1024 * 1024;
export const ATTACHMENT_MAX_BYTES = 8 * 1024 * 1024;

export function uploadDrawing(slug: string, number: number, file: File, options: UploadOptions) {
  return uploadFile<EditorDrawing>(`${revisionPath(slug, number)}/drawings`, file, options);
}

export function uploadAttachment(slug: string, number: number, file: File, options: UploadOptions) {
  return uploadFile<EditorAttachment>(`${revisionPath(slug, number)}/attachments`, file, options);
}

export function deleteDrawing(slug: string, number: number, drawingId: number) {
  return api<void>(`${revisionPath(slug, number)}/drawings/${drawingId}`, { method: 'DELETE' });
}

export function deleteAttachment(slug: string, number: number, attachmentId: number) {
  return api<void>(`${revisionPath(slug, number)}/attachments/${attachmentId}`, { method: 'DELETE' });
}

/** Every change to a revision's files is followed by reading the revision again (parts come and go). */
function useFileChange<TArgs>(slug: string, number: number, run: (args: TArgs) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSettled: () => queryClient.invalidateQueries({ queryKey: editorRevisionKey(slug, number) }),
  });
}

export const useDeleteDrawing = (slug: string, number: number) =>
  useFileChange(slug, number, (drawingId: number) => deleteDrawing(slug, number, drawingId));

export const useDeleteAttachment = (slug: string, number: number) =>
  useFileChange(slug, number, (attachmentId: number) => deleteAttachment(slug, number, attachmentId));

/** For a drawing that declares no units: read it again in these. */
export const useSetDrawingUnits = (slug: string, number: number) =>
  useFileChange(slug, number, ({ drawingId, units }: { drawingId: number; units: string }) =>
    api<EditorDrawing>(`${revisionPath(slug, number)}/drawings/${drawingId}`, { method: 'PATCH', body: { units } }),
  );
