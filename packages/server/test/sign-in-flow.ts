import request from 'supertest';
import type { App } from 'supertest/types';

/** Cookies from a response's Set-Cookie headers as one Cookie header value. */
export function cookiesFrom(response: request.Response): string {
  const raw = response.headers['set-cookie'] as unknown as string[] | undefined;
  return (raw ?? [])
    .map((line) => line.split(';')[0]!)
    .filter((pair) => !pair.endsWith('='))
    .join('; ');
}

export interface ProviderStep {
  /** The authorize address our server redirected to. */
  authorizeUrl: URL;
  /** The state cookie our server set. */
  stateCookie: string;
}

export async function startSignIn(server: App, returnTo = '/'): Promise<ProviderStep> {
  const response = await request(server)
    .get(`/api/auth/github?returnTo=${encodeURIComponent(returnTo)}`)
    .expect(302);
  return { authorizeUrl: new URL(response.headers.location!), stateCookie: cookiesFrom(response) };
}

/** Picks an account on the fake provider's page (a form post) and returns where it sends the browser back to. */
export async function pickAccount(step: ProviderStep, login: string | null): Promise<URL> {
  const form = new URLSearchParams({
    client_id: step.authorizeUrl.searchParams.get('client_id') ?? '',
    redirect_uri: step.authorizeUrl.searchParams.get('redirect_uri') ?? '',
    state: step.authorizeUrl.searchParams.get('state') ?? '',
    ...(login ? { login } : { deny: '1' }),
  });
  const response = await fetch(new URL('/login/oauth/authorize', step.authorizeUrl), {
    method: 'POST',
    body: form,
    redirect: 'manual',
  });
  if (response.status !== 302) throw new Error(`The provider answered ${response.status}`);
  return new URL(response.headers.get('location')!);
}

export async function finishSignIn(server: App, callback: URL, stateCookie: string): Promise<request.Response> {
  return request(server)
    .get(callback.pathname + callback.search)
    .set('Cookie', stateCookie)
    .expect(302);
}

/** The whole round trip for one account; returns the session cookie. */
export async function signInAs(server: App, login: string): Promise<string> {
  const step = await startSignIn(server);
  const callback = await pickAccount(step, login);
  const response = await finishSignIn(server, callback, step.stateCookie);
  const session = cookiesFrom(response);
  if (!session.includes('jw_session='))
    throw new Error(`No session after signing in as ${login}: ${response.headers.location}`);
  return session;
}
