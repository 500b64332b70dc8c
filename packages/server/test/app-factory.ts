import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import { createServer } from 'node:net';
import type { App } from 'supertest/types';
import { AppModule } from '../src/app.module';
import type { Environment } from '../src/config/environment';
import { setupApp } from '../src/setup-app';
import { StorageService } from '../src/storage/storage.service';

/** The real application module, configured exactly as main.ts does, against the e2e database and fakes. */
export async function createTestApp(): Promise<INestApplication> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication({ logger: ['error'] });
  setupApp(app);
  await app.init();
  return app;
}

/** A loopback port with nothing listening on it. */
async function closedPort(): Promise<number> {
  const probe = createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
  const { port } = probe.address() as { port: number };
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  return port;
}

/** The same app with its file store down: the real S3 client, pointed at an address where no store answers. */
export async function createTestAppWithStorageDown(): Promise<INestApplication<App>> {
  const port = await closedPort();
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
    .overrideProvider(StorageService)
    .useFactory({
      inject: [ConfigService],
      factory: (config: ConfigService<Environment, true>) =>
        new StorageService({
          get: (key: keyof Environment) => (key === 'S3_ENDPOINT' ? `http://127.0.0.1:${port}` : config.get(key)),
        } as ConfigService<Environment, true>),
    })
    .compile();
  const app = moduleRef.createNestApplication<INestApplication<App>>({ logger: false });
  setupApp(app);
  await app.init();
  return app;
}
