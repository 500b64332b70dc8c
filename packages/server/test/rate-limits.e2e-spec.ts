import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { CSRF } from './sign-in-flow';

describe('rate limits on the sign-in and token routes (e2e)', () => {
  let app: INestApplication<App>;

  beforeAll(async () => {
    // This file's own app (Jest loads modules afresh per file), with a limit small enough to reach.
    process.env.AUTH_RATE_LIMIT_PER_MINUTE = '3';
    const { createTestApp } = await import('./app-factory');
    app = await createTestApp();
  });

  afterAll(async () => {
    await app.close();
  });

  it.each([
    ['GET', '/api/auth/github', 302],
    ['GET', '/api/auth/github/callback', 302],
    ['POST', '/api/auth/refresh', 401],
  ])('answers %s %s normally up to the limit, then 429 with a clear message', async (method, path, normal) => {
    const send = () =>
      method === 'GET' ? request(app.getHttpServer()).get(path) : request(app.getHttpServer()).post(path).set(CSRF);
    for (let i = 0; i < 3; i++) await send().expect(normal);
    const limited = await send().expect(429);
    expect(limited.body).toMatchObject({ statusCode: 429, code: 'rate_limited' });
    expect(limited.body.message).toMatch(/Wait a minute/);
    expect(limited.headers['retry-after']).toMatch(/^\d+$/);
  });

  it('counts each route on its own and leaves the rest of the API alone', async () => {
    for (let i = 0; i < 5; i++) await request(app.getHttpServer()).get('/api/health').expect(200);
  });
});
