import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { createTestApp } from './app-factory';
import { finishSignIn, pickAccount, signInAs, startSignIn } from './sign-in-flow';

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
      const me = await request(server).get('/api/me').set('Cookie', session).expect(200);
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
    });

    it('never returns to another site after sign-in', async () => {
      const step = await startSignIn(server, 'https://elsewhere.example/');
      const callback = await pickAccount(step, 'demo-builder');
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/');
    });

    it('rejects a callback whose state does not match, creating no account', async () => {
      const step = await startSignIn(server);
      const callback = await pickAccount(step, 'demo-moderator');
      callback.searchParams.set('state', 'forged-state');
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/sign-in?error=state_mismatch');
      expect(await memberCount(910003)).toBe(0);
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

    it('reports a code the provider rejects', async () => {
      const step = await startSignIn(server);
      const callback = await pickAccount(step, 'demo-moderator');
      callback.searchParams.set('code', 'not-a-code-the-provider-issued');
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/sign-in?error=token_rejected');
      expect(await memberCount(910003)).toBe(0);
    });

    it('refuses an account without a verified e-mail address, creating no account', async () => {
      const step = await startSignIn(server);
      const callback = await pickAccount(step, 'unverified-visitor');
      const response = await finishSignIn(server, callback, step.stateCookie);
      expect(response.headers.location).toBe('/sign-in?error=no_verified_email');
      expect(await memberCount(919999)).toBe(0);
    });

    it('signs out by clearing the session cookie', async () => {
      const response = await request(server).post('/api/auth/sign-out').expect(204);
      const setCookie = (response.headers['set-cookie'] as unknown as string[]).find((line) =>
        line.startsWith('jw_session='),
      );
      expect(setCookie).toMatch(/Expires=Thu, 01 Jan 1970/);
    });

    it('refuses a tampered session token', async () => {
      const session = await signInAs(server, 'demo-builder');
      const tampered = session.replace(
        /jw_session=([^;]+)/,
        (_all, token: string) => `jw_session=${token.slice(0, -3)}abc`,
      );
      await request(server).get('/api/me').set('Cookie', tampered).expect(401);
    });
  });

  describe('validation and errors', () => {
    it('answers an unknown API route with a JSON 404', async () => {
      const response = await request(server).get('/api/no-such-route').expect(404);
      expect(response.body).toMatchObject({ statusCode: 404 });
    });
  });
});
