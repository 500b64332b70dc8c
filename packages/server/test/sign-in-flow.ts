import request from 'supertest';
import type { App } from 'supertest/types';

/** The header every change must carry (the CSRF defence); the web app's API client sends it. */
export const CSRF = { 'X-Requested-With': 'jigwright' } as const;

/** Cookies from a response's Set-Cookie headers as one Cookie header value. */
export function cookiesFrom(response: request.Response): string {
  return new CookieJar().take(response).header();
}

/** What a browser keeps between requests: set cookies replace, cleared ones go (paths are ignored). */
export class CookieJar {
  private readonly cookies = new Map<string, string>();

  take(response: request.Response): this {
    const raw = response.headers['set-cookie'] as unknown as string[] | undefined;
    for (const line of raw ?? []) {
      const pair = line.split(';')[0]!;
      const [name, ...rest] = pair.split('=');
      const value = rest.join('=');
      if (!value || /Expires=Thu, 01 Jan 1970/i.test(line)) this.cookies.delete(name!);
      else this.cookies.set(name!, value);
    }
    return this;
  }

  get(name: string): string | undefined {
    return this.cookies.get(name);
  }

  set(name: string, value: string): this {
    this.cookies.set(name, value);
    return this;
  }

  header(): string {
    return [...this.cookies].map(([name, value]) => `${name}=${value}`).join('; ');
  }

  copy(): CookieJar {
    const jar = new CookieJar();
    for (const [name, value] of this.cookies) jar.set(name, value);
    return jar;
  }
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

/** The whole round trip for one account; returns the browser's cookies (access and refresh token). */
export async function signInAs(server: App, login: string): Promise<CookieJar> {
  const step = await startSignIn(server);
  const callback = await pickAccount(step, login);
  const response = await finishSignIn(server, callback, step.stateCookie);
  const jar = new CookieJar().take(response);
  if (!jar.get('jw_session') || !jar.get('jw_refresh'))
    throw new Error(`No session after signing in as ${login}: ${response.headers.location}`);
  return jar;
}
