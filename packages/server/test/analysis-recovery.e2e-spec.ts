import type { INestApplication } from '@nestjs/common';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import {
  ANALYSIS_SWEEP_INTERVAL_MS,
  DrawingAnalysisService,
  GAVE_UP_MESSAGE,
  MAX_ANALYSIS_ATTEMPTS,
} from '../src/plans/drawing-analysis.service';
import type { PlanDetailDto } from '../src/plans/dto/plan.dto';
import type { DrawingDto, RevisionDetailDto } from '../src/plans/dto/revision.dto';
import { createTestApp } from './app-factory';
import { createProviderAccount } from './fake-provider';
import { client, PLAN, rectangleDxf, type Client } from './plan-helpers';
import { signInAs, type CookieJar } from './sign-in-flow';

interface DrawingRow {
  status: string;
  error: string | null;
  attempts: number;
  claimToken: string | null;
  leaseUntil: Date | null;
  parts: number;
}

/**
 * A replica that stops while a drawing is queued or in analysis leaves its claim in the row; these
 * specs make such rows by uploading a drawing and then setting the row by SQL, as the stopped
 * replica would have left it. Only setInterval is faked, so that the periodic sweep runs exactly
 * when a spec advances it and never races the sweeps a spec starts itself.
 */
describe('analyses left unfinished by a stopped replica (e2e, MariaDB and the fake S3)', () => {
  let app: INestApplication<App>;
  let jar: CookieJar;
  let owner: Client;
  let slug: string;
  let width = 100;

  beforeAll(async () => {
    jest.useFakeTimers({
      doNotFake: [
        'Date',
        'hrtime',
        'nextTick',
        'performance',
        'queueMicrotask',
        'setImmediate',
        'clearImmediate',
        'setTimeout',
        'clearTimeout',
      ],
    });
    app = await createTestApp();
    const designer = await createProviderAccount('recovery-owner');
    jar = await signInAs(app.getHttpServer(), designer.login);
    owner = client(app.getHttpServer(), jar);
    const plan = (
      await owner
        .post('/api/plans')
        .send({ ...PLAN, title: 'Recovery test sled' })
        .expect(201)
    ).body as PlanDetailDto;
    slug = plan.slug;
  });

  afterAll(async () => {
    await app.close();
    jest.useRealTimers();
  });

  const sql = (query: string, parameters: unknown[] = []) => app.get(DataSource).query(query, parameters);

  async function rowOf(id: number): Promise<DrawingRow> {
    const [row] = (await sql(
      `SELECT status, error, attempts, claim_token AS claimToken, lease_until AS leaseUntil,
        (SELECT COUNT(*) FROM parts WHERE drawing_id = d.id) AS parts
       FROM drawings d WHERE id = ?`,
      [id],
    )) as Array<DrawingRow & { parts: string }>;
    return { ...row!, parts: Number(row!.parts) };
  }

  async function settled(id: number): Promise<DrawingRow> {
    for (let poll = 0; poll < 300; poll++) {
      const row = await rowOf(id);
      if (row.status === 'done' || row.status === 'failed') return row;
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    throw new Error(`drawing ${id} was never analysed`);
  }

  /** Uploads a one-part drawing, lets it be analysed, then leaves its row as a replica that stopped mid-analysis would. */
  async function stuckDrawing({ lease, attempts }: { lease: 'expired' | 'fresh'; attempts: number }): Promise<number> {
    width += 10;
    const uploaded = await owner
      .post(`/api/plans/${slug}/revisions/1/drawings`)
      .attach('file', rectangleDxf({ width, units: 4 }), `panel-${width}.dxf`)
      .expect(201);
    const { id } = uploaded.body as DrawingDto;
    expect(await settled(id)).toMatchObject({ status: 'done', parts: 1 });
    await sql('DELETE FROM parts WHERE drawing_id = ?', [id]);
    await sql(
      `UPDATE drawings SET status = 'analysing', analysis = NULL, entity_count = NULL, error = NULL,
        claim_token = UUID(), attempts = ?, lease_until = NOW(3) + INTERVAL ? SECOND WHERE id = ?`,
      [attempts, lease === 'expired' ? -1 : 60, id],
    );
    return id;
  }

  it('is taken on by the sweep of a server started after the one that stopped', async () => {
    const id = await stuckDrawing({ lease: 'expired', attempts: 1 });
    await app.close();
    app = await createTestApp();
    owner = client(app.getHttpServer(), jar);
    // Nobody calls the sweep here: the one at start-up does it.
    expect(await settled(id)).toEqual({
      status: 'done',
      error: null,
      attempts: 2,
      claimToken: null,
      leaseUntil: null,
      parts: 1,
    });
  });

  it('is taken on by the next periodic sweep of a running server', async () => {
    const id = await stuckDrawing({ lease: 'expired', attempts: 1 });
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect((await rowOf(id)).status).toBe('analysing');
    jest.advanceTimersByTime(ANALYSIS_SWEEP_INTERVAL_MS);
    expect(await settled(id)).toMatchObject({ status: 'done', attempts: 2, parts: 1 });
    const revision = (await owner.get(`/api/plans/${slug}/revisions/1`).expect(200)).body as RevisionDetailDto;
    expect(revision.parts.filter((part) => part.drawingId === id)).toHaveLength(1);
  });

  it('leaves alone a drawing whose claim is still held', async () => {
    const id = await stuckDrawing({ lease: 'fresh', attempts: 1 });
    const before = await rowOf(id);
    const sweep = await app.get(DrawingAnalysisService).sweep();
    await sweep.analysed;
    expect(sweep.claimed).not.toContain(id);
    expect(await rowOf(id)).toEqual(before);
    expect(before).toMatchObject({ status: 'analysing', attempts: 1, parts: 0 });
    // Finish it, so that the revision settles for the specs after this one.
    await sql('UPDATE drawings SET lease_until = NOW(3) - INTERVAL 1 SECOND WHERE id = ?', [id]);
    await (
      await app.get(DrawingAnalysisService).sweep()
    ).analysed;
    expect(await settled(id)).toMatchObject({ status: 'done', attempts: 2, parts: 1 });
  });

  it(`ends failed, saying why, a drawing taken on ${MAX_ANALYSIS_ATTEMPTS} times without an outcome`, async () => {
    const id = await stuckDrawing({ lease: 'expired', attempts: MAX_ANALYSIS_ATTEMPTS });
    const sweep = await app.get(DrawingAnalysisService).sweep();
    expect(sweep.gaveUp).toContain(id);
    expect(sweep.claimed).not.toContain(id);
    expect(await rowOf(id)).toEqual({
      status: 'failed',
      error: GAVE_UP_MESSAGE,
      attempts: MAX_ANALYSIS_ATTEMPTS,
      claimToken: null,
      leaseUntil: null,
      parts: 0,
    });
    const revision = (await owner.get(`/api/plans/${slug}/revisions/1`).expect(200)).body as RevisionDetailDto;
    expect(revision.drawings.find((drawing) => drawing.id === id)).toMatchObject({
      status: 'failed',
      error: GAVE_UP_MESSAGE,
    });
  });

  it('lets only one of two replicas sweeping at once take each drawing on', async () => {
    const replica = await createTestApp();
    try {
      const ids = [
        await stuckDrawing({ lease: 'expired', attempts: 0 }),
        await stuckDrawing({ lease: 'expired', attempts: 1 }),
        await stuckDrawing({ lease: 'expired', attempts: 2 }),
      ];
      const before = await Promise.all(ids.map(rowOf));
      const [first, second] = await Promise.all([
        app.get(DrawingAnalysisService).sweep(),
        replica.get(DrawingAnalysisService).sweep(),
      ]);
      await Promise.all([first.analysed, second.analysed]);
      expect(first.claimed.filter((id) => second.claimed.includes(id))).toEqual([]);
      // Other specs' unfinished drawings may be taken on too; these three must be, each by one replica.
      const claimed = [...first.claimed, ...second.claimed].filter((id) => ids.includes(id));
      expect(claimed.sort((a, b) => a - b)).toEqual(ids);
      const after = await Promise.all(ids.map(settled));
      expect(after.map((row) => [row.status, row.attempts, row.parts])).toEqual(
        before.map((row) => ['done', row.attempts + 1, 1]),
      );
    } finally {
      await replica.close();
    }
  });
});
