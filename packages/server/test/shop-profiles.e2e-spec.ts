import type { INestApplication } from '@nestjs/common';
import { DEFAULT_KERF, DEFAULT_SHEET } from '@jigwright/core';
import request from 'supertest';
import type { App } from 'supertest/types';
import { createTestApp } from './app-factory';
import { createProviderAccount } from './fake-provider';
import { CSRF, signInAs, type CookieJar } from './sign-in-flow';

const profile = {
  kerf: 2.4,
  edgeTrim: 10,
  sheets: [
    { length: 1220, width: 2440 },
    { length: 1525, width: 1525 },
  ],
  barLengths: [1000, 2000],
  solidAllowance: { length: 30, width: 5, thickness: 2 },
  currency: 'gbp',
  prices: [
    { material: 'Baltic birch plywood', per: 'sheet', amount: 58.5 },
    { material: '*', per: 'board-foot', amount: 6.2 },
    { material: 'Aluminium T-track', per: 'metre', amount: 12 },
  ],
};

describe('shop profiles (e2e, MariaDB)', () => {
  let app: INestApplication<App>;
  let server: App;
  let builder: { login: string; jar: CookieJar };
  let other: CookieJar;

  beforeAll(async () => {
    app = await createTestApp();
    server = app.getHttpServer();
    const account = await createProviderAccount('shop');
    builder = { login: account.login, jar: await signInAs(server, account.login) };
    other = await signInAs(server, (await createProviderAccount('shop-other')).login);
  });

  afterAll(async () => {
    await app.close();
  });

  const path = () => `/api/members/${builder.login}/shop-profile`;
  const get = (jar = builder.jar) => request(server).get(path()).set('Cookie', jar.header());
  const put = (body: object, jar = builder.jar) =>
    request(server).put(path()).set(CSRF).set('Cookie', jar.header()).send(body);

  it('answers the cut list’s own defaults until the member saves a profile', async () => {
    const { body } = await get().expect(200);
    expect(body).toMatchObject({ saved: false, updatedAt: null, kerf: DEFAULT_KERF, prices: [] });
    expect(body.sheets).toEqual([DEFAULT_SHEET]);
  });

  it('saves the whole profile, long side of each sheet first, bars longest first, the currency in capitals', async () => {
    const saved = (await put(profile).expect(200)).body;
    expect(saved).toMatchObject({ saved: true, kerf: 2.4, edgeTrim: 10, currency: 'GBP' });
    expect(saved.sheets).toEqual([
      { length: 2440, width: 1220 },
      { length: 1525, width: 1525 },
    ]);
    expect(saved.barLengths).toEqual([2000, 1000]);
    expect(saved.prices).toEqual(profile.prices);
    expect(Date.parse(saved.updatedAt)).toBeGreaterThan(Date.now() - 60_000);
    expect((await get().expect(200)).body).toEqual(saved);
  });

  it.each([
    ['a negative kerf', { kerf: -1 }, /kerf cannot be negative/],
    ['a currency that ISO 4217 does not list', { currency: 'XYZ' }, /ISO 4217/],
    ['no sheet size', { sheets: [] }, /at least one sheet size/],
    ['a sheet smaller than 100 mm', { sheets: [{ length: 2440, width: 50 }] }, /sheets\.0\..*at least 100 mm wide/],
    [
      'a price per something else',
      { prices: [{ material: 'Oak', per: 'pound', amount: 3 }] },
      /prices\.0\..*per sheet/,
    ],
  ])('refuses %s with the field named, and keeps the saved profile', async (_, change, message) => {
    const before = (await get().expect(200)).body;
    const refused = await put({ ...profile, ...change }).expect(400);
    expect(refused.body.code).toBe('validation_failed');
    expect(refused.body.details).toEqual(expect.arrayContaining([expect.stringMatching(message)]));
    expect((await get().expect(200)).body).toEqual(before);
  });

  it('refuses two prices for one material and unit', async () => {
    const refused = await put({
      ...profile,
      prices: [
        { material: 'Oak', per: 'board-foot', amount: 9 },
        { material: 'oak', per: 'board-foot', amount: 11 },
      ],
    }).expect(400);
    expect(refused.body).toMatchObject({ code: 'price_repeated' });
    expect(refused.body.message).toContain('oak has two prices per board-foot');
  });

  it('is private: another member can neither read nor change it', async () => {
    expect((await get(other).expect(403)).body.code).toBeDefined();
    await put({ ...profile, kerf: 1 }, other).expect(403);
    expect((await get().expect(200)).body.kerf).toBe(2.4);
    await request(server).get(path()).expect(401);
  });
});
