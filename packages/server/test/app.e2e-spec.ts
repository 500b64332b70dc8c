import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { createTestApp } from './app-factory';
import { createProviderAccount, failNextProviderStep } from './fake-provider';
import { CSRF, finishSignIn, pickAccount, signInAs, startSignIn } from './sign-in-flow';

describe('the application (e2e, MariaDB and the local fakes)', () => {
  let app: INestApplication<App>;
  let server: App;
  let dataSource: DataSource;

  beforeAll(async () => {
    app = await createTestApp();
    server = app.getHttpServer();
    dataSource = app.get(DataSource);
  });

  afterAll(async () => {
    await app.close();
  });

  const memberCount = async (githubId: number) =>
    Number((await dataSource.query('SELECT COUNT(*) AS n FROM members WHERE github_id = ?', [githubId]))[0].n);
  const sessionCount = async () => Number((await dataSource.query('SELECT COUNT(*) AS n FROM sessions'))[0].n);

  /** Signs in with a fresh provider account that a step makes fail; checks nothing was kept. */
  async function failedFirstSignIn(breakIt: (callback: URL) => Promise<void> | void): Promise<string | undefined> {
    const account = await createProviderAccount('refused');
    const sessionsBefore = await sessionCount();
    const step = await startSignIn(server);
    const callback = await pickAccount(step, account.login);
    await breakIt(callback);
    const response = await finishSignIn(server, callback, step.stateCookie);
    expect(await memberCount(account.githubId)).toBe(0);
    expect(await sessionCount()).toBe(sessionsBefore);
    expect(response.headers['set-cookie'] ?? []).not.toEqual(
      expect.arrayContaining([expect.stringMatching(/^jw_(session|refresh)=[^;]/)]),
    );
    return response.headers.location;
  }

  describe('GET /api/health', () => {
    it('reports the database and the storage as up', async () => {
      const response = await request(server).get('/api/health').expect(200);
      expect(response.body).toEqual({ status: 'ok', database: { status: 'up' }, storage: { status: 'up' } });
    });
  });

  describe('OpenAPI', () => {
    it('publishes the JSON document with the routes', async () => {
      const response = await request(server).get('/api/docs-json').expect(200);
      expect(response.body.openapi).toMatch(/^3\./);
      expect(Object.keys(response.body.paths)).toEqual(
        expect.arrayContaining(['/api/health', '/api/me', '/api/auth/github']),
      );
    });
  });

  describe('sign-in through the GitHub provider', () => {
    it('refuses /api/me without a session', async () => {
      await request(server).get('/api/me').expect(401);
    });

    it('creates the member on first sign-in and returns them from /api/me', async () => {
      const session = await signInAs(server, 'demo-builder');
      const me = await request(server).get('/api/me').set('Cookie', session.header()).expect(200);
      expect(me.body).toMatchObject({
        login: 'demo-builder',
        displayName: 'Tomas Quillfeather',
        email: 'demo-builder@example.com',
        role: 'member',
        suspended: false,
      });
      expect(me.body.avatarUrl).toMatch(/\/avatars\/demo-builder\.svg$/);
    });

    it('matches a returning member by GitHub id instead of creating a second one', async () => {
      await signInAs(server, 'demo-designer');
      await signInAs(server, 'demo-designer');
      expect(await memberCount(910001)).toBe(1);
    });

    it('sets the session cookie httpOnly and SameSite=Lax, and returns to the page the visitor came from', async () => {
      const step = await startSignIn(server, '/calculators?units=in');
      const callback = await pickAccount(step, 'demo-builder');
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/calculators?units=in');
      const setCookie = (response.headers['set-cookie'] as unknown as string[]).find((line) =>
        line.startsWith('jw_session='),
      );
      expect(setCookie).toMatch(/HttpOnly/i);
      expect(setCookie).toMatch(/SameSite=Lax/i);
      const refreshCookie = (response.headers['set-cookie'] as unknown as string[]).find((line) =>
        line.startsWith('jw_refresh='),
      );
      expect(refreshCookie).toMatch(/HttpOnly/i);
      expect(refreshCookie).toMatch(/SameSite=Strict/i);
      expect(refreshCookie).toMatch(/Path=\/api\/auth(;|$)/);
    });

    it('never returns to another site after sign-in', async () => {
      const step = await startSignIn(server, 'https://elsewhere.example/');
      const callback = await pickAccount(step, 'demo-builder');
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/');
    });

    it('rejects a callback whose state does not match, creating no account', async () => {
      const location = await failedFirstSignIn((callback) => callback.searchParams.set('state', 'forged-state'));
      expect(location).toBe('/sign-in?error=state_mismatch');
    });

    it('rejects a callback without the state cookie (started in another browser)', async () => {
      const step = await startSignIn(server);
      const callback = await pickAccount(step, 'demo-moderator');
      const response = await finishSignIn(server, callback, '');
      expect(response.headers.location).toBe('/sign-in?error=state_mismatch');
    });

    it('reports a cancelled authorisation', async () => {
      const step = await startSignIn(server);
      const callback = await pickAccount(step, null);
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/sign-in?error=cancelled');
    });

    it('reports a code the provider rejects, creating no account', async () => {
      const location = await failedFirstSignIn((callback) =>
        callback.searchParams.set('code', 'not-a-code-the-provider-issued'),
      );
      expect(location).toBe('/sign-in?error=token_rejected');
    });

    it('reports an access token the provider refuses when asked for the profile, creating no account', async () => {
      const location = await failedFirstSignIn(() => failNextProviderStep('user'));
      expect(location).toBe('/sign-in?error=token_rejected');
    });

    it('reports an error the provider sends back instead of a code, creating no account', async () => {
      const account = await createProviderAccount('provider-error');
      const step = await startSignIn(server);
      await failNextProviderStep('authorize');
      const callback = await pickAccount(step, account.login);
      expect(callback.searchParams.get('error')).toBe('temporarily_unavailable');
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/sign-in?error=provider_error');
      expect(await memberCount(account.githubId)).toBe(0);
    });

    it('reports a provider that fails to issue a token, creating no account', async () => {
      const location = await failedFirstSignIn(() => failNextProviderStep('token'));
      expect(location).toBe('/sign-in?error=provider_unavailable');
    });

    it('refuses an account without a verified e-mail address, creating no account', async () => {
      const step = await startSignIn(server);
      const callback = await pickAccount(step, 'unverified-visitor');
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/sign-in?error=no_verified_email');
      expect(await memberCount(919999)).toBe(0);
    });

    it('refuses a fresh account without a verified e-mail address, keeping nothing', async () => {
      const account = await createProviderAccount('unverified', { emailVerified: false });
      const sessionsBefore = await sessionCount();
      const step = await startSignIn(server);
      const callback = await pickAccount(step, account.login);
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/sign-in?error=no_verified_email');
      expect(await memberCount(account.githubId)).toBe(0);
      expect(await sessionCount()).toBe(sessionsBefore);
    });

    it('signs out by clearing both token cookies', async () => {
      const session = await signInAs(server, 'demo-builder');
      const response = await request(server)
        .post('/api/auth/sign-out')
        .set(CSRF)
        .set('Cookie', session.header())
        .expect(204);
      const cleared = (response.headers['set-cookie'] as unknown as string[]).filter((line) =>
        /Expires=Thu, 01 Jan 1970/.test(line),
      );
      expect(cleared.map((line) => line.split('=')[0]).sort()).toEqual(['jw_refresh', 'jw_session']);
    });

    it('refuses a tampered session token', async () => {
      const session = await signInAs(server, 'demo-builder');
      const token = session.get('jw_session')!;
      const tampered = session.copy().set('jw_session', `${token.slice(0, -3)}abc`);
      const response = await request(server).get('/api/me').set('Cookie', tampered.header()).expect(401);
      expect(response.body).toMatchObject({ statusCode: 401, code: 'session_invalid' });
    });
  });

  describe('validation and errors', () => {
    it('answers an unknown API route with a JSON 404', async () => {
      const response = await request(server).get('/api/no-such-route').expect(404);
      expect(response.body).toEqual({ statusCode: 404, code: 'not_found', message: 'Cannot GET /api/no-such-route' });
    });
  });
});
