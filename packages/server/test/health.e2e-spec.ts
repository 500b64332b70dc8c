import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import { createServer } from 'node:net';
import request from 'supertest';
import type { App } from 'supertest/types';
import { AppModule } from '../src/app.module';
import type { Environment } from '../src/config/environment';
import { setupApp } from '../src/setup-app';
import { StorageService } from '../src/storage/storage.service';

/** A loopback port with nothing listening on it: a storage service that is down. */
async function closedPort(): Promise<number> {
  const probe = createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
  const { port } = probe.address() as { port: number };
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  return port;
}

describe('GET /api/health when the storage is down (e2e)', () => {
  let app: INestApplication<App>;

  beforeAll(async () => {
    const port = await closedPort();
    const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
      .overrideProvider(StorageService)
      .useFactory({
        inject: [ConfigService],
        // The real S3 client, pointed at an address where no storage answers.
        factory: (config: ConfigService<Environment, true>) =>
          new StorageService({
            get: (key: keyof Environment) => (key === 'S3_ENDPOINT' ? `http://127.0.0.1:${port}` : config.get(key)),
          } as ConfigService<Environment, true>),
      })
      .compile();
    app = moduleRef.createNestApplication({ logger: false });
    setupApp(app);
    await app.init();
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
