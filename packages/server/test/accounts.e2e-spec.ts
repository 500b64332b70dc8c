import { createHash } from 'node:crypto';
import type { INestApplication } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { createTestApp } from './app-factory';
import { createProviderAccount, type ProviderAccount } from './fake-provider';
import { CSRF, signInAs, type CookieJar } from './sign-in-flow';

interface TokenClaims {
  sub: string;
  sid: string;
  iat: number;
  exp: number;
}

describe('sessions, roles and settings (e2e, MariaDB and the local fakes)', () => {
  let app: INestApplication<App>;
  let server: App;
  let dataSource: DataSource;
  let jwt: JwtService;
  let admin: CookieJar;

  beforeAll(async () => {
    app = await createTestApp();
    server = app.getHttpServer();
    dataSource = app.get(DataSource);
    jwt = app.get(JwtService);
    admin = await signInAs(server, 'demo-admin');
  });

  afterAll(async () => {
    await app.close();
  });

  const me = (jar: CookieJar) => request(server).get('/api/me').set('Cookie', jar.header());
  const refresh = (jar: CookieJar) => request(server).post('/api/auth/refresh').set(CSRF).set('Cookie', jar.header());
  const asAdmin = (method: 'post' | 'delete', path: string) =>
    request(server)[method](path).set(CSRF).set('Cookie', admin.header());
  const claimsOf = (jar: CookieJar) => jwt.decode<TokenClaims>(jar.get('jw_session')!);

  async function newMember(prefix: string): Promise<{ account: ProviderAccount; jar: CookieJar }> {
    const account = await createProviderAccount(prefix);
    return { account, jar: await signInAs(server, account.login) };
  }

  /** The same session with its access token already expired, signed with the server's own key. */
  function withExpiredAccessToken(jar: CookieJar): CookieJar {
    const { sub, sid } = claimsOf(jar);
    const expired = jwt.sign({ sub, sid, exp: Math.floor(Date.now() / 1000) - 60 });
    return jar.copy().set('jw_session', expired);
  }

  describe('access and refresh tokens', () => {
    it('issues an access token that lasts ACCESS_TOKEN_TTL_SECONDS (15 minutes by default)', async () => {
      const { jar } = await newMember('ttl');
      const claims = claimsOf(jar);
      expect(claims.exp - claims.iat).toBe(15 * 60);
    });

    it('refuses an expired access token with session_expired, and a refresh gives a working one', async () => {
      const { account, jar } = await newMember('expiry');
      const expired = withExpiredAccessToken(jar);
      const refused = await me(expired).expect(401);
      expect(refused.body).toMatchObject({ statusCode: 401, code: 'session_expired' });

      const expiredToken = expired.get('jw_session');
      expired.take(await refresh(expired).expect(204));
      expect(expired.get('jw_session')).not.toBe(expiredToken);
      expect(expired.get('jw_refresh')).not.toBe(jar.get('jw_refresh'));
      expect((await me(expired).expect(200)).body.login).toBe(account.login);
    });

    it('keeps only a hash of each refresh token, and rotates it on every use', async () => {
      const { jar } = await newMember('rotation');
      const first = jar.get('jw_refresh')!;
      jar.take(await refresh(jar).expect(204));
      const second = jar.get('jw_refresh')!;
      expect(second).not.toBe(first);
      const sha256 = (token: string) => createHash('sha256').update(token).digest('hex');
      const rows: Array<{ token_hash: string; replaced_at: Date | null }> = await dataSource.query(
        'SELECT token_hash, replaced_at FROM refresh_tokens WHERE session_id = ? ORDER BY id',
        [claimsOf(jar).sid],
      );
      expect(rows.map((row) => row.token_hash)).toEqual([sha256(first), sha256(second)]);
      expect(rows[0]!.replaced_at).not.toBeNull();
      expect(rows[1]!.replaced_at).toBeNull();
    });

    it('ends the whole session when a replaced refresh token comes back', async () => {
      const { jar: original } = await newMember('reuse');
      const stolen = original.copy();
      original.take(await refresh(original).expect(204));

      const reused = await refresh(stolen).expect(401);
      expect(reused.body.code).toBe('refresh_reused');
      // The rightful holder's newer tokens are of the same family: refused as well.
      expect((await refresh(original).expect(401)).body.code).toBe('session_ended');
      expect((await me(original).expect(401)).body.code).toBe('session_ended');
      const [session] = await dataSource.query('SELECT end_reason FROM sessions WHERE id = ?', [
        claimsOf(original).sid,
      ]);
      expect(session.end_reason).toBe('refresh_reused');
    });

    it('refuses an expired refresh token', async () => {
      const { jar } = await newMember('refresh-expiry');
      await dataSource.query('UPDATE refresh_tokens SET expires_at = ? WHERE session_id = ?', [
        new Date(Date.now() - 1000),
        claimsOf(jar).sid,
      ]);
      const response = await refresh(jar).expect(401);
      expect(response.body.code).toBe('refresh_expired');
      const cleared = (response.headers['set-cookie'] as unknown as string[]).filter((line) =>
        /Expires=Thu, 01 Jan 1970/.test(line),
      );
      expect(cleared).toHaveLength(2);
    });

    it('refuses a refresh without a refresh token, and one without the CSRF header', async () => {
      const anonymous = await request(server).post('/api/auth/refresh').set(CSRF).expect(401);
      expect(anonymous.body.code).toBe('not_signed_in');
      const { jar } = await newMember('refresh-csrf');
      const forged = await request(server).post('/api/auth/refresh').set('Cookie', jar.header()).expect(403);
      expect(forged.body.code).toBe('csrf_header_missing');
    });

    it('ends the session on sign-out: its access and refresh tokens are refused at once', async () => {
      const { jar } = await newMember('sign-out');
      const kept = jar.copy();
      await request(server).post('/api/auth/sign-out').set(CSRF).set('Cookie', jar.header()).expect(204);
      expect((await me(kept).expect(401)).body.code).toBe('session_ended');
      expect((await refresh(kept).expect(401)).body.code).toBe('session_ended');
    });

    it('signs out with only an expired access token left', async () => {
      const { jar } = await newMember('late-sign-out');
      const expiredOnly = withExpiredAccessToken(jar);
      const { sid } = claimsOf(jar);
      await request(server)
        .post('/api/auth/sign-out')
        .set(CSRF)
        .set('Cookie', `jw_session=${expiredOnly.get('jw_session')}`)
        .expect(204);
      expect((await refresh(jar).expect(401)).body.code).toBe('session_ended');
      const [session] = await dataSource.query('SELECT end_reason FROM sessions WHERE id = ?', [sid]);
      expect(session.end_reason).toBe('signed_out');
    });
  });

  describe('suspension and roles', () => {
    it('ends every session of a suspended member at once; signed in again they can read but not write', async () => {
      const { account, jar: laptop } = await newMember('suspended');
      const phone = await signInAs(server, account.login);
      const suspended = await asAdmin('post', `/api/admin/members/${account.login}/suspension`).expect(200);
      expect(suspended.body).toMatchObject({ login: account.login, suspended: true });

      for (const jar of [laptop, phone]) {
        expect((await me(jar).expect(401)).body.code).toBe('session_ended');
        expect((await refresh(jar).expect(401)).body.code).toBe('session_ended');
      }

      const again = await signInAs(server, account.login);
      expect((await me(again).expect(200)).body).toMatchObject({ suspended: true });
      await request(server).get(`/api/members/${account.login}/settings`).set('Cookie', again.header()).expect(200);
      const write = await request(server)
        .patch(`/api/members/${account.login}/settings`)
        .set(CSRF)
        .set('Cookie', again.header())
        .send({ units: 'in' })
        .expect(403);
      expect(write.body).toMatchObject({ statusCode: 403, code: 'member_suspended' });

      await asAdmin('delete', `/api/admin/members/${account.login}/suspension`).expect(200);
      await request(server)
        .patch(`/api/members/${account.login}/settings`)
        .set(CSRF)
        .set('Cookie', again.header())
        .send({ units: 'in' })
        .expect(200);
    });

    it('applies a role change from the next request, and keeps who did what to whom in the audit log', async () => {
      const { account, jar } = await newMember('promoted');
      expect((await me(jar).expect(200)).body.role).toBe('member');
      await asAdmin('post', `/api/admin/members/${account.login}/moderator`).expect(200);
      expect((await me(jar).expect(200)).body.role).toBe('moderator');
      // Granting again changes nothing and writes no second entry.
      await asAdmin('post', `/api/admin/members/${account.login}/moderator`).expect(200);
      await asAdmin('delete', `/api/admin/members/${account.login}/moderator`).expect(200);
      expect((await me(jar).expect(200)).body.role).toBe('member');

      const audit = await request(server)
        .get('/api/admin/audit?pageSize=100')
        .set('Cookie', admin.header())
        .expect(200);
      const entries = (
        audit.body.items as Array<{ subject: { login: string }; actor: { login: string }; action: string; at: string }>
      ).filter((entry) => entry.subject.login === account.login);
      expect(entries.map((entry) => [entry.actor.login, entry.action])).toEqual([
        ['demo-admin', 'moderator_revoked'],
        ['demo-admin', 'moderator_granted'],
      ]);
      expect(Date.parse(entries[0]!.at)).toBeGreaterThanOrEqual(Date.parse(entries[1]!.at));
    });

    it('made the configured first admin an admin, audited as coming from configuration', async () => {
      expect((await me(admin).expect(200)).body.role).toBe('admin');
      const audit = await request(server)
        .get('/api/admin/audit?pageSize=100')
        .set('Cookie', admin.header())
        .expect(200);
      const granted = (
        audit.body.items as Array<{ subject: { login: string }; actor: unknown; action: string }>
      ).filter((entry) => entry.subject.login === 'demo-admin');
      expect(granted).toEqual([expect.objectContaining({ actor: null, action: 'admin_granted' })]);
    });

    it('refuses to suspend an admin or make one a moderator, and names an unknown login', async () => {
      expect((await asAdmin('post', '/api/admin/members/demo-admin/suspension').expect(409)).body.code).toBe(
        'member_is_admin',
      );
      expect((await asAdmin('post', '/api/admin/members/demo-admin/moderator').expect(409)).body.code).toBe(
        'member_is_admin',
      );
      const unknown = await asAdmin('post', '/api/admin/members/nobody-by-this-name/moderator').expect(404);
      expect(unknown.body).toEqual({
        statusCode: 404,
        code: 'member_not_found',
        message: 'There is no member called nobody-by-this-name.',
      });
    });
  });

  describe('the Members table', () => {
    it('searches logins and names, pages with a total, and filters by role and status', async () => {
      const prefix = `tbl${Date.now().toString(36)}`;
      const made = [];
      for (let i = 0; i < 3; i++) made.push(await newMember(prefix));
      const logins = made.map((m) => m.account.login).sort();
      const list = (query: string) =>
        request(server).get(`/api/admin/members?${query}`).set('Cookie', admin.header()).expect(200);

      const first = await list(`q=${prefix}&pageSize=2`);
      expect(first.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
      expect(first.body.items.map((m: { login: string }) => m.login)).toEqual(logins.slice(0, 2));
      const second = await list(`q=${prefix}&pageSize=2&page=2`);
      expect(second.body.items.map((m: { login: string }) => m.login)).toEqual(logins.slice(2));

      await asAdmin('post', `/api/admin/members/${logins[1]}/moderator`).expect(200);
      await asAdmin('post', `/api/admin/members/${logins[2]}/suspension`).expect(200);
      expect((await list(`q=${prefix}&role=moderator`)).body.items.map((m: { login: string }) => m.login)).toEqual([
        logins[1],
      ]);
      const suspended = await list(`q=${prefix}&status=suspended`);
      expect(suspended.body).toMatchObject({ total: 1, items: [{ login: logins[2], suspended: true }] });
      expect((await list(`q=${prefix}&status=active`)).body.total).toBe(2);
    });

    it('treats % and _ in the search as letters', async () => {
      const response = await request(server).get('/api/admin/members?q=%25').set('Cookie', admin.header()).expect(200);
      expect(response.body.total).toBe(0);
    });

    it('validates the query', async () => {
      const response = await request(server)
        .get('/api/admin/members?pageSize=500&role=owner')
        .set('Cookie', admin.header())
        .expect(400);
      expect(response.body.code).toBe('validation_failed');
      expect(response.body.details).toEqual(
        expect.arrayContaining([expect.stringMatching(/pageSize/), expect.stringMatching(/role/)]),
      );
    });
  });

  describe('profiles and settings', () => {
    it('shows anyone a public profile without the e-mail address', async () => {
      const response = await request(server).get('/api/members/demo-admin').expect(200);
      expect(response.body).toMatchObject({ login: 'demo-admin', displayName: 'Bram Okafor-Lindqvist', role: 'admin' });
      expect(response.body).not.toHaveProperty('email');
      expect((await request(server).get('/api/members/no-such-member').expect(404)).body.code).toBe('member_not_found');
    });

    it('saves display name, units and notifications, and a later sign-in keeps the chosen name', async () => {
      const { account, jar } = await newMember('settings');
      const path = `/api/members/${account.login}/settings`;
      const defaults = await request(server).get(path).set('Cookie', jar.header()).expect(200);
      expect(defaults.body).toEqual({
        displayName: account.name,
        units: 'mm',
        notifications: { revisionDecided: true, buildReported: true, planAdapted: true, flagResolved: true },
      });
      const saved = await request(server)
        .patch(path)
        .set(CSRF)
        .set('Cookie', jar.header())
        .send({ displayName: '  Shop of Ash  ', units: 'in', notifications: { planAdapted: false } })
        .expect(200);
      expect(saved.body).toEqual({
        displayName: 'Shop of Ash',
        units: 'in',
        notifications: { revisionDecided: true, buildReported: true, planAdapted: false, flagResolved: true },
      });
      const again = await signInAs(server, account.login);
      expect((await me(again).expect(200)).body).toMatchObject({ displayName: 'Shop of Ash', units: 'in' });
    });

    it('refuses bad settings with the fields named, and changes nothing', async () => {
      const { account, jar } = await newMember('bad-settings');
      const path = `/api/members/${account.login}/settings`;
      const response = await request(server)
        .patch(path)
        .set(CSRF)
        .set('Cookie', jar.header())
        .send({ displayName: '   ', units: 'cm', notifications: { planAdapted: 'no' }, role: 'admin' })
        .expect(400);
      expect(response.body.code).toBe('validation_failed');
      expect(response.body.details).toEqual(
        expect.arrayContaining([
          'displayName must not be empty',
          expect.stringMatching(/units must be one of/),
          expect.stringMatching(/planAdapted must be a boolean/),
          'property role should not exist',
        ]),
      );
      expect((await request(server).get(path).set('Cookie', jar.header()).expect(200)).body.units).toBe('mm');
    });

    it("refuses a change without the CSRF header, and another member's settings", async () => {
      const { account, jar } = await newMember('csrf-settings');
      const forged = await request(server)
        .patch(`/api/members/${account.login}/settings`)
        .set('Cookie', jar.header())
        .send({ units: 'in' })
        .expect(403);
      expect(forged.body.code).toBe('csrf_header_missing');
      const other = await request(server)
        .get(`/api/members/${account.login}/settings`)
        .set('Cookie', admin.header())
        .expect(403);
      expect(other.body).toMatchObject({ code: 'not_owner', message: 'These settings belong to another member.' });
    });
  });
});
