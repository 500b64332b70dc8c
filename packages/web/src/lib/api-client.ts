/** The error body the API sends: `{ statusCode, code?, message, details? }`. */
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

async function errorFrom(response: Response): Promise<ApiError> {
  let body: ErrorBody = {};
  try {
    body = (await response.json()) as ErrorBody;
  } catch {
    // Not JSON (a proxy's error page, say): the status text will do.
  }
  const message = Array.isArray(body.message) ? body.message.join('; ') : body.message;
  return new ApiError(
    response.status,
    message || response.statusText || `Request failed (${response.status})`,
    body.code,
    body.details,
  );
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
}

/** The one API client: JSON in and out, the session cookie sent, errors as ApiError. */
export async function api<T>(path: string, { method = 'GET', body, signal }: RequestOptions = {}): Promise<T> {
  const response = await fetch(`/api${path}`, {
    method,
    credentials: 'same-origin',
    headers: {
      Accept: 'application/json',
      ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
      // Marks the request as coming from our own scripts (a cross-site form cannot set it).
      'X-Requested-With': 'jigwright',
    },
    body: body === undefined ? undefined : JSON.stringify(body),
    signal,
  });
  if (!response.ok) throw await errorFrom(response);
  if (response.status === 204) return undefined as T;
  return (await response.json()) as T;
}
