import { apiErrorOf, CSRF_HEADER, refreshSession } from './api-client';

export interface UploadProgress {
  /** Bytes of the request body sent so far. */
  loaded: number;
  /** Bytes of the whole request body (the file and the form around it). */
  total: number;
}

export interface UploadOptions {
  /** Further form fields sent before the file. */
  fields?: Record<string, string>;
  onProgress?: (progress: UploadProgress) => void;
  /** Every byte has left: from here on the server is checking and storing the file. */
  onSent?: () => void;
  /** Aborting stops the transfer; the promise then rejects with an `AbortError`. */
  signal?: AbortSignal;
}

interface Answer {
  status: number;
  statusText: string;
  text: string;
}

function abortError(): DOMException {
  return new DOMException('The upload was cancelled.', 'AbortError');
}

function sendForm(path: string, file: File, options: UploadOptions): Promise<Answer> {
  return new Promise((resolve, reject) => {
    if (options.signal?.aborted) {
      reject(abortError());
      return;
    }
    const form = new FormData();
    for (const [name, value] of Object.entries(options.fields ?? {})) form.append(name, value);
    form.append('file', file, file.name);

    // fetch reports no upload progress; XMLHttpRequest does.
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    // The same request as the API client's: same-origin cookies (as fetch's credentials:
    // 'same-origin'), JSON back, the CSRF header.
    xhr.setRequestHeader('Accept', 'application/json');
    for (const [name, value] of Object.entries(CSRF_HEADER)) xhr.setRequestHeader(name, value);

    const onAbort = () => xhr.abort();
    options.signal?.addEventListener('abort', onAbort, { once: true });
    const settle = () => options.signal?.removeEventListener('abort', onAbort);

    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) options.onProgress?.({ loaded: event.loaded, total: event.total });
    };
    xhr.upload.onload = () => options.onSent?.();
    xhr.onload = () => {
      settle();
      resolve({ status: xhr.status, statusText: xhr.statusText, text: xhr.responseText });
    };
    xhr.onerror = () => {
      settle();
      reject(new TypeError('The upload could not reach the server. Check the connection and try again.'));
    };
    xhr.onabort = () => {
      settle();
      reject(abortError());
    };
    xhr.send(form);
  });
}

/**
 * Sends one file as `multipart/form-data` (field `file`) to an API route with upload progress, and
 * reads the JSON answer. Errors are `ApiError`s as from `api`; an expired access token is refreshed
 * once and the file sent again, as `api` does.
 */
export async function uploadFile<T>(path: string, file: File, options: UploadOptions = {}): Promise<T> {
  let answer = await sendForm(path, file, options);
  if (answer.status === 401 && apiErrorOf(answer.status, answer.statusText, answer.text).code === 'session_expired') {
    if (await refreshSession()) answer = await sendForm(path, file, options);
  }
  if (answer.status < 200 || answer.status >= 300) throw apiErrorOf(answer.status, answer.statusText, answer.text);
  return JSON.parse(answer.text) as T;
}

export function isAbortError(error: unknown): boolean {
  return error instanceof DOMException && error.name === 'AbortError';
}
