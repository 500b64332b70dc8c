/** The error body the API sends: `{ statusCode, code, message, details? }`. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly code?: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

interface ErrorBody {
  statusCode?: number;
  code?: string;
  message?: string | string[];
  details?: unknown;
}

/** The ApiError for an error answer's status and body text (shared with the upload helper). */
export function apiErrorOf(status: number, statusText: string, text: string): ApiError {
  let body: ErrorBody = {};
  try {
    body = JSON.parse(text) as ErrorBody;
  } catch {
    // Not JSON (a proxy's error page, say): the status text will do.
  }
  const message = Array.isArray(body.message) ? body.message.join('; ') : body.message;
  return new ApiError(status, message || statusText || `Request failed (${status})`, body.code, body.details);
}

async function errorFrom(response: Response): Promise<ApiError> {
  return apiErrorOf(response.status, response.statusText, await response.text().catch(() => ''));
}

/** The header every changing request carries; the server refuses changes without it (see send). */
export const CSRF_HEADER = { 'X-Requested-With': 'jigwright' } as const;

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
}

function send(path: string, { method = 'GET', body, signal }: RequestOptions): Promise<Response> {
  return fetch(`/api${path}`, {
    method,
    credentials: 'same-origin',
    headers: {
      Accept: 'application/json',
      ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
      // Marks the request as coming from our own scripts (a cross-site form cannot set it); the
      // server refuses changes without it.
      ...CSRF_HEADER,
    },
    body: body === undefined ? undefined : JSON.stringify(body),
    signal,
  });
}

let refreshing: Promise<boolean> | null = null;

/**
 * Trades the refresh token for new tokens, once for all requests that found their access token
 * expired. Across tabs a Web Lock keeps two refreshes from presenting the same refresh token, which
 * the server would take for a stolen copy and end the session.
 */
export function refreshSession(): Promise<boolean> {
  refreshing ??= (async () => {
    const run = async () => (await send('/auth/refresh', { method: 'POST' })).ok;
    try {
      return typeof navigator !== 'undefined' && navigator.locks
        ? await navigator.locks.request('jigwright-session-refresh', run)
        : await run();
    } finally {
      refreshing = null;
    }
  })();
  return refreshing;
}

/** Sends a request; an access token that has expired is refreshed once and the request sent again, unseen by the caller. */
async function request(path: string, options: RequestOptions): Promise<Response> {
  let response = await send(path, options);
  if (!response.ok) {
    const error = await errorFrom(response);
    if (error.code !== 'session_expired' || path.startsWith('/auth/') || !(await refreshSession())) throw error;
    response = await send(path, options);
    if (!response.ok) throw await errorFrom(response);
  }
  return response;
}

/** The one API client: JSON in and out, the session cookie sent, errors as ApiError. */
export async function api<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const response = await request(path, options);
  if (response.status === 204) return undefined as T;
  return (await response.json()) as T;
}

/** A text file from the API (an attachment's content), with the same session handling as `api`. */
export async function apiText(path: string, options: RequestOptions = {}): Promise<string> {
  return (await request(path, options)).text();
}
