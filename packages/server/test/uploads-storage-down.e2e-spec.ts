import type { INestApplication } from '@nestjs/common';
import type { App } from 'supertest/types';
import { createTestAppWithStorageDown } from './app-factory';
import type { PlanDetailDto } from '../src/plans/dto/plan.dto';
import { createProviderAccount } from './fake-provider';
import { client, PLAN, revisionIdOf, rowCount, SLED_DXF, type Client } from './plan-helpers';
import { signInAs } from './sign-in-flow';

describe('uploads while the file store is down (e2e)', () => {
  let app: INestApplication<App>;
  let owner: Client;
  let plan: PlanDetailDto;

  beforeAll(async () => {
    app = await createTestAppWithStorageDown();
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
