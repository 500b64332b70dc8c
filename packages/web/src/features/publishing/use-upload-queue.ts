import { useCallback, useEffect, useReducer, useRef } from 'react';
import { isAbortError, type UploadOptions } from '../../lib/upload';
import { newUploadItem, uploadFailureMessage, uploadQueueReducer, type UploadTarget } from './upload-queue';

interface InFlight {
  controller: AbortController;
  sent: boolean;
  cancelled: boolean;
}

export interface UploadQueueHandlers {
  /** Sends one file; resolves with what the server stored. */
  send: (file: File, options: UploadOptions) => Promise<{ id: number }>;
  /** Deletes what the server stored, for a file cancelled after its last byte had left. */
  remove: (id: number) => Promise<unknown>;
  /** A file arrived or was removed again: read the revision again. */
  onSettled: () => void;
  /** A message for a file that should not be sent at all, or null. */
  refuse: (file: File) => string | null;
}

let nextKey = 0;

/** Uploads files one request each, side by side, with progress, Cancel and a reason for each failure. */
/** `target` should be a constant: what is uploaded and the server's limit. */
export function useUploadQueue(target: UploadTarget, { send, remove, onSettled, refuse }: UploadQueueHandlers) {
  const [items, dispatch] = useReducer(uploadQueueReducer, []);
  const inFlight = useRef(new Map<string, InFlight>());

  // Leaving the page cancels what is still on its way.
  useEffect(() => {
    const flights = inFlight.current;
    return () => flights.forEach((flight) => flight.controller.abort());
  }, []);

  const start = useCallback(
    async (key: string, file: File) => {
      const flight: InFlight = { controller: new AbortController(), sent: false, cancelled: false };
      inFlight.current.set(key, flight);
      try {
        const stored = await send(file, {
          signal: flight.controller.signal,
          onProgress: ({ loaded, total }) => dispatch({ type: 'progress', key, loaded, total }),
          onSent: () => {
            flight.sent = true;
            dispatch({ type: 'sent', key });
          },
        });
        if (flight.cancelled) await remove(stored.id);
        dispatch({ type: 'remove', key });
        onSettled();
      } catch (error) {
        if (isAbortError(error) || flight.cancelled) dispatch({ type: 'remove', key });
        else dispatch({ type: 'failed', key, message: uploadFailureMessage(error, file.name, target) });
      } finally {
        inFlight.current.delete(key);
      }
    },
    [send, remove, onSettled, target],
  );

  const add = useCallback(
    (files: readonly File[]) => {
      const added = files.map((file) => ({ key: `upload-${++nextKey}`, file, refused: refuse(file) }));
      dispatch({ type: 'add', items: added.map(({ key, file, refused }) => newUploadItem(key, file, refused)) });
      for (const { key, file, refused } of added) if (!refused) void start(key, file);
    },
    [refuse, start],
  );

  const cancel = useCallback((key: string) => {
    const flight = inFlight.current.get(key);
    if (!flight) return;
    flight.cancelled = true;
    if (flight.sent) dispatch({ type: 'cancelling', key });
    else flight.controller.abort();
  }, []);

  const dismiss = useCallback((key: string) => dispatch({ type: 'remove', key }), []);

  return { items, add, cancel, dismiss };
}
