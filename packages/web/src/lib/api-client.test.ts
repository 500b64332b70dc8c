import { afterEach, describe, expect, it, vi } from 'vitest';
import { api, ApiError } from './api-client';

type Answer = { status: number; body?: unknown };

/** A stand-in for the server that answers each request from a script and records what it was sent. */
function serve(answers: Record<string, Answer[]>) {
  const calls: Array<{ url: string; method: string; headers: Record<string, string> }> = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = String(input);
      calls.push({ url, method: init?.method ?? 'GET', headers: init?.headers as Record<string, string> });
      const answer = answers[url]?.shift() ?? { status: 404, body: { statusCode: 404, code: 'not_found' } };
      return answer.status === 204
        ? new Response(null, { status: 204 })
        : Response.json(answer.body ?? {}, { status: answer.status });
    }),
  );
  return calls;
}

const expired = {
  status: 401,
  body: { statusCode: 401, code: 'session_expired', message: 'Your session has expired.' },
};

describe('the API client', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('refreshes an expired session once and sends the request again', async () => {
    const calls = serve({
      '/api/me': [expired, { status: 200, body: { login: 'demo-builder' } }],
      '/api/auth/refresh': [{ status: 204 }],
    });
    await expect(api('/me')).resolves.toEqual({ login: 'demo-builder' });
    expect(calls.map((call) => `${call.method} ${call.url}`)).toEqual([
      'GET /api/me',
      'POST /api/auth/refresh',
      'GET /api/me',
    ]);
    expect(calls[1]!.headers['X-Requested-With']).toBe('jigwright');
  });

  it('shares one refresh among requests that expire together', async () => {
    const calls = serve({
      '/api/a': [expired, { status: 200, body: 'a' }],
      '/api/b': [expired, { status: 200, body: 'b' }],
      '/api/auth/refresh': [{ status: 204 }],
    });
    await expect(Promise.all([api('/a'), api('/b')])).resolves.toEqual(['a', 'b']);
    expect(calls.filter((call) => call.url === '/api/auth/refresh')).toHaveLength(1);
  });

  it('gives up with the original error when the refresh is refused', async () => {
    serve({ '/api/me': [expired], '/api/auth/refresh': [{ status: 401, body: { code: 'session_ended' } }] });
    const error = await api('/me').catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 401, code: 'session_expired' });
  });

  it('does not refresh for a visitor who never signed in, nor for other errors', async () => {
    const calls = serve({
      '/api/me': [{ status: 401, body: { statusCode: 401, code: 'not_signed_in', message: 'Sign in first.' } }],
      '/api/admin/members': [
        { status: 403, body: { statusCode: 403, code: 'role_required', message: 'Admins only.' } },
      ],
    });
    await expect(api('/me')).rejects.toMatchObject({ code: 'not_signed_in' });
    await expect(api('/admin/members')).rejects.toMatchObject({ status: 403, message: 'Admins only.' });
    expect(calls.map((call) => call.url)).toEqual(['/api/me', '/api/admin/members']);
  });
});
