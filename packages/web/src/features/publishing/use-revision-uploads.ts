import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { UploadOptions } from '../../lib/upload';
import { editorRevisionKey } from './api/keys';
import type { UploadTarget } from './upload-queue';
import { useUploadQueue } from './use-upload-queue';

/** How one kind of file goes onto a revision and off it again; a module constant. */
export interface RevisionFiles extends UploadTarget {
  upload(slug: string, number: number, file: File, options: UploadOptions): Promise<{ id: number }>;
  remove(slug: string, number: number, id: number): Promise<unknown>;
  refuse(file: File): string | null;
}

/** The upload queue of a revision's drawings or attachments; the revision is read again after each file. */
export function useRevisionUploads(slug: string, number: number, files: RevisionFiles) {
  const queryClient = useQueryClient();
  const onSettled = useCallback(
    () => void queryClient.invalidateQueries({ queryKey: editorRevisionKey(slug, number) }),
    [queryClient, slug, number],
  );
  const send = useCallback(
    (file: File, options: UploadOptions) => files.upload(slug, number, file, options),
    [files, slug, number],
  );
  const remove = useCallback((id: number) => files.remove(slug, number, id), [files, slug, number]);
  return useUploadQueue(files, { send, remove, onSettled, refuse: files.refuse });
}
