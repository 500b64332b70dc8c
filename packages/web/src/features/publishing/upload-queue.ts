import { ApiError } from '../../lib/api-client';

/** What is uploaded where: the words the messages use, and the server's limit. */
export interface UploadTarget {
  what: 'drawing' | 'attachment';
  maxBytes: number;
}

/**
 * One file on its way: `sending` while bytes leave (Cancel aborts the transfer, so the server keeps
 * nothing), `checking` once all are sent and the server checks and stores it (Cancel then waits for
 * the answer and deletes what was stored), `failed` with the reason until dismissed. A file that
 * arrived leaves the queue: it is in the revision's list from then on.
 */
export interface UploadItem {
  key: string;
  name: string;
  size: number;
  loaded: number;
  total: number;
  phase: 'sending' | 'checking' | 'failed';
  cancelling: boolean;
  message: string | null;
}

export type UploadAction =
  | { type: 'add'; items: UploadItem[] }
  | { type: 'progress'; key: string; loaded: number; total: number }
  | { type: 'sent'; key: string }
  | { type: 'cancelling'; key: string }
  | { type: 'failed'; key: string; message: string }
  | { type: 'remove'; key: string };

export function newUploadItem(
  key: string,
  file: Pick<File, 'name' | 'size'>,
  message: string | null = null,
): UploadItem {
  return {
    key,
    name: file.name,
    size: file.size,
    loaded: 0,
    total: file.size,
    phase: message ? 'failed' : 'sending',
    cancelling: false,
    message,
  };
}

export function uploadQueueReducer(items: readonly UploadItem[], action: UploadAction): UploadItem[] {
  if (action.type === 'add') return [...items, ...action.items];
  if (action.type === 'remove') return items.filter((item) => item.key !== action.key);
  return items.map((item) => {
    if (item.key !== action.key) return item;
    switch (action.type) {
      case 'progress':
        return { ...item, loaded: Math.min(action.loaded, action.total), total: action.total };
      case 'sent':
        return { ...item, loaded: item.total, phase: 'checking' };
      case 'cancelling':
        return { ...item, cancelling: true };
      case 'failed':
        return { ...item, phase: 'failed', cancelling: false, message: action.message };
    }
  });
}

/** Whole percent of the bytes sent, for the progress bar. */
export function percentSent(item: Pick<UploadItem, 'loaded' | 'total'>): number {
  return item.total > 0 ? Math.floor((item.loaded / item.total) * 100) : 0;
}

/** "512 bytes", "38.2 KB", "16 MB" (binary multiples, as the server's limits are written). */
export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  const kib = bytes / 1024;
  if (kib < 1024) return `${Math.round(kib * 10) / 10} KB`;
  return `${Math.round((kib / 1024) * 10) / 10} MB`;
}

/** Checked before sending, with the server's own limit; null when the file may go. */
export function tooLargeMessage(file: Pick<File, 'name' | 'size'>, { what, maxBytes }: UploadTarget): string | null {
  if (file.size <= maxBytes) return null;
  return `“${file.name}” is ${formatBytes(file.size)}; a ${what} may be at most ${formatBytes(maxBytes)}.`;
}

/** Drawings are ASCII DXF files; the server checks the content, this checks the name first. */
export function notDrawingMessage(file: Pick<File, 'name'>): string | null {
  if (/\.dxf$/i.test(file.name)) return null;
  return `“${file.name}” is not a DXF drawing. Export the drawing from your CAD program as DXF (ASCII) and upload that.`;
}

/** What to tell the designer when the server refused a file, in the server's own words where it has them. */
export function uploadFailureMessage(error: unknown, name: string, { what }: UploadTarget): string {
  if (error instanceof ApiError) {
    if (error.code === 'duplicate_drawing' || error.code === 'duplicate_attachment') {
      return `“${name}” is already on this revision: the same file was uploaded before.`;
    }
    if (error.code === 'file_too_large') return `“${name}”: ${error.message}`;
    if (error.status === 401) return `Your session has ended. Sign in again, then upload “${name}” again.`;
    return `“${name}” was not kept: ${error.message}`;
  }
  if (error instanceof Error) return `“${name}” was not uploaded: ${error.message}`;
  return `“${name}” was not uploaded. Try the ${what} again.`;
}
