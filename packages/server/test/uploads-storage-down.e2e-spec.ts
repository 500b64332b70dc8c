import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import { createServer } from 'node:net';
import type { App } from 'supertest/types';
import { AppModule } from '../src/app.module';
import type { Environment } from '../src/config/environment';
import type { PlanDetailDto } from '../src/plans/dto/plan.dto';
import { setupApp } from '../src/setup-app';
import { StorageService } from '../src/storage/storage.service';
import { createProviderAccount } from './fake-provider';
import { client, PLAN, revisionIdOf, rowCount, SLED_DXF, type Client } from './plan-helpers';
import { signInAs } from './sign-in-flow';

/** A loopback port with nothing listening on it: a file store that is down. */
async function closedPort(): Promise<number> {
  const probe = createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
  const { port } = probe.address() as { port: number };
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  return port;
}

describe('uploads while the file store is down (e2e)', () => {
  let app: INestApplication<App>;
  let owner: Client;
  let plan: PlanDetailDto;

  beforeAll(async () => {
    const port = await closedPort();
    const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
      .overrideProvider(StorageService)
      .useFactory({
        inject: [ConfigService],
        // The real S3 client, pointed at an address where no store answers.
        factory: (config: ConfigService<Environment, true>) =>
          new StorageService({
            get: (key: keyof Environment) => (key === 'S3_ENDPOINT' ? `http://127.0.0.1:${port}` : config.get(key)),
          } as ConfigService<Environment, true>),
      })
      .compile();
    app = moduleRef.createNestApplication({ logger: false });
    setupApp(app);
    await app.init();
    const server = app.getHttpServer();
    const account = await createProviderAccount('storage-down');
    owner = client(server, await signInAs(server, account.login));
    plan = (await owner.post('/api/plans').send(PLAN).expect(201)).body as PlanDetailDto;
  });

  afterAll(async () => {
    await app.close();
  });

  it('answers 503 for a drawing and keeps no row', async () => {
    const response = await owner
      .post(`/api/plans/${plan.slug}/revisions/1/drawings`)
      .attach('file', SLED_DXF, 'sled.dxf')
      .expect(503);
    expect(response.body).toMatchObject({ statusCode: 503, code: 'storage_unavailable' });
    const revisionId = await revisionIdOf(app, plan.slug, 1);
    expect(await rowCount(app, 'drawings', revisionId)).toBe(0);
    expect(await rowCount(app, 'parts', revisionId)).toBe(0);
  });

  it('answers 503 for an attachment and keeps no row', async () => {
    await owner
      .post(`/api/plans/${plan.slug}/revisions/1/attachments`)
      .attach('file', Buffer.from('void loop() {}\n'), 'sketch.ino')
      .expect(503);
    expect(await rowCount(app, 'attachments', await revisionIdOf(app, plan.slug, 1))).toBe(0);
  });

  it('still lets the owner save the draft’s text', async () => {
    const loaded = await owner.get(`/api/plans/${plan.slug}/revisions/1`).expect(200);
    await owner
      .patch(`/api/plans/${plan.slug}/revisions/1`)
      .send({ expectedUpdatedAt: loaded.body.updatedAt, notes: 'Written while the store was down.' })
      .expect(200);
  });
});
