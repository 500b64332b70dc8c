import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { createTestAppWithStorageDown } from './app-factory';

describe('GET /api/health when the storage is down (e2e)', () => {
  let app: INestApplication<App>;

  beforeAll(async () => {
    app = await createTestAppWithStorageDown();
  });

  afterAll(async () => {
    await app.close();
  });

  it('answers 503 and names the storage as down while the database is up', async () => {
    const response = await request(app.getHttpServer()).get('/api/health').expect(503);
    expect(response.body.status).toBe('degraded');
    expect(response.body.database).toEqual({ status: 'up' });
    expect(response.body.storage.status).toBe('down');
    expect(typeof response.body.storage.error).toBe('string');
  });
});
