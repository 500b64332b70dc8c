import type { INestApplication } from '@nestjs/common';
import type { App } from 'supertest/types';
import type { PlanDetailDto } from '../src/plans/dto/plan.dto';
import type { DrawingDto, RevisionDetailDto } from '../src/plans/dto/revision.dto';
import { slugOf as slugOfTitle } from '../src/plans/plans.service';
import { RevisionsService } from '../src/plans/revisions.service';
import { createTestApp } from './app-factory';
import { createProviderAccount } from './fake-provider';
import {
  client,
  objectKeys,
  PLAN,
  planIdOf,
  rectangleDxf,
  revisionIdOf,
  rowCount,
  settledRevision,
  SLED_DXF,
  type Client,
} from './plan-helpers';
import { signInAs } from './sign-in-flow';

describe('plans, revisions and drawings (e2e, MariaDB and the fake S3)', () => {
  let app: INestApplication<App>;
  let owner: Client;
  let other: Client;
  let visitor: Client;

  beforeAll(async () => {
    app = await createTestApp();
    const server = app.getHttpServer();
    const [designer, someoneElse] = await Promise.all([
      createProviderAccount('plans-owner'),
      createProviderAccount('plans-other'),
    ]);
    owner = client(server, await signInAs(server, designer.login));
    other = client(server, await signInAs(server, someoneElse.login));
    visitor = client(server);
  });

  afterAll(async () => {
    await app.close();
  });

  async function newPlan(title = PLAN.title): Promise<PlanDetailDto> {
    return (
      await owner
        .post('/api/plans')
        .send({ ...PLAN, title })
        .expect(201)
    ).body as PlanDetailDto;
  }

  async function uploadSled(slug: string, number = 1): Promise<RevisionDetailDto> {
    await owner
      .post(`/api/plans/${slug}/revisions/${number}/drawings`)
      .attach('file', SLED_DXF, 'sled.dxf')
      .expect(201);
    return settledRevision(owner, slug, number);
  }

  const publish = async (slug: string, number: number) =>
    app.get(RevisionsService).publish(await revisionIdOf(app, slug, number), new Date('2025-01-15T10:00:00Z'));

  describe('creating and changing a plan', () => {
    it('creates the plan with its r1 as a draft, under a slug made from the title', async () => {
      const plan = await newPlan('Créme Taper Jig — 2');
      expect(plan).toMatchObject({
        slug: 'creme-taper-jig-2',
        category: 'taper-jig',
        tools: ['table-saw'],
        viewerIsOwner: true,
        latestRevision: null,
        revisions: [{ number: 1, state: 'draft', changelog: '', publishedAt: null }],
      });
      const again = await newPlan('Créme Taper Jig — 2');
      expect(again.slug).toBe('creme-taper-jig-2-2');
    });

    it('gives two plans created at once with the same title a slug each', async () => {
      const title = `Simultaneous sled ${Date.now()}`;
      const [first, second] = await Promise.all([newPlan(title), newPlan(title)]);
      expect([first!.slug, second!.slug].sort()).toEqual([slugOfTitle(title), `${slugOfTitle(title)}-2`]);
    });

    it('says which fields are wrong', async () => {
      const response = await owner
        .post('/api/plans')
        .send({ ...PLAN, title: 'x', category: 'dovetail', licence: 'GPL-3.0', toolsNeeded: ['chainsaw'] })
        .expect(400);
      expect(response.body.code).toBe('validation_failed');
      expect(response.body.details).toEqual(
        expect.arrayContaining([
          'The title needs 3 to 120 characters.',
          'Choose a category from the list.',
          'Choose one of the open licences.',
          'Choose the tools from the list.',
        ]),
      );
    });

    it('shows an unpublished plan to its owner only', async () => {
      const plan = await newPlan();
      await visitor.get(`/api/plans/${plan.slug}`).expect(404);
      await other.get(`/api/plans/${plan.slug}`).expect(404);
      await other.get(`/api/plans/${plan.slug}/revisions/1`).expect(404);
      expect((await owner.get(`/api/plans/${plan.slug}`).expect(200)).body.viewerIsOwner).toBe(true);
    });

    it('lets the owner change the details and the tools, and no one else', async () => {
      const plan = await newPlan();
      const changed = await owner
        .patch(`/api/plans/${plan.slug}`)
        .send({
          expectedUpdatedAt: plan.updatedAt,
          title: 'Test taper jig, longer',
          toolsNeeded: ['band-saw', 'hand-plane'],
          tags: ['Taper', 'LEGS', 'tables'],
        })
        .expect(200);
      expect(changed.body).toMatchObject({
        slug: plan.slug,
        title: 'Test taper jig, longer',
        tools: ['band-saw', 'hand-plane'],
        tags: ['taper', 'legs', 'tables'],
      });
      expect(Date.parse(changed.body.updatedAt)).toBeGreaterThan(Date.parse(plan.updatedAt));
      const refused = await other
        .patch(`/api/plans/${plan.slug}`)
        .send({ expectedUpdatedAt: changed.body.updatedAt, title: 'Mine now' })
        .expect(403);
      expect(refused.body.code).toBe('not_owner');
      await owner
        .patch('/api/plans/no-such-plan')
        .send({ expectedUpdatedAt: plan.updatedAt, title: 'Nothing' })
        .expect(404);
      await owner.patch(`/api/plans/${plan.slug}`).send({ title: 'No check' }).expect(400);
    });

    it('refuses a change of details made from a stale copy with 409 plan_changed, and keeps the newer one', async () => {
      const plan = await newPlan();
      const first = await owner
        .patch(`/api/plans/${plan.slug}`)
        .send({ expectedUpdatedAt: plan.updatedAt, summary: 'Saved in the first tab.' })
        .expect(200);
      // The second tab still holds the copy it loaded before the first tab saved.
      const stale = await owner
        .patch(`/api/plans/${plan.slug}`)
        .send({ expectedUpdatedAt: plan.updatedAt, summary: 'Saved in the second tab.' })
        .expect(409);
      expect(stale.body).toMatchObject({ statusCode: 409, code: 'plan_changed' });
      const now = (await owner.get(`/api/plans/${plan.slug}`).expect(200)).body;
      expect(now.summary).toBe('Saved in the first tab.');
      expect(now.updatedAt).toBe(first.body.updatedAt);
    });

    it('lists the owner’s plans with every revision in My workshop', async () => {
      const plan = await newPlan('Workshop listing check');
      const mine = await owner.get('/api/me/plans?pageSize=100').expect(200);
      const listed = (mine.body.items as PlanDetailDto[]).find((item) => item.slug === plan.slug);
      expect(listed?.revisions.map((revision) => revision.state)).toEqual(['draft']);
      const theirs = await other.get('/api/me/plans').expect(200);
      expect((theirs.body.items as PlanDetailDto[]).map((item) => item.slug)).not.toContain(plan.slug);
      await visitor.get('/api/me/plans').expect(401);
    });
  });

  describe('drawings', () => {
    it('analyses an uploaded drawing off the request and makes its parts, thickness and material from the layer', async () => {
      const plan = await newPlan();
      const upload = await owner
        .post(`/api/plans/${plan.slug}/revisions/1/drawings`)
        .attach('file', SLED_DXF, 'sled.dxf')
        .expect(201);
      expect(upload.body).toMatchObject({
        originalName: 'sled.dxf',
        size: SLED_DXF.length,
        status: 'queued',
        analysis: null,
      });
      expect(upload.body.sha256).toMatch(/^[0-9a-f]{64}$/);

      const revision = await settledRevision(owner, plan.slug, 1);
      const [drawing] = revision.drawings;
      expect(drawing).toMatchObject({ status: 'done', error: null, units: 'mm', needsUnits: false });
      expect(drawing!.entityCount).toBeGreaterThan(0);
      // The names and counts the demo plan declares for this drawing (plans-seed/.../plan.json).
      expect(revision.parts.map((part) => [part.name, part.quantity]).sort()).toEqual(
        [
          ['Front fence', 1],
          ['Rear fence layer', 2],
          ['Runner', 2],
          ['Sled base', 1],
        ].sort(),
      );
      const base = revision.parts.find((part) => part.name === 'Sled base')!;
      // The base is drawn 600 × 450 mm (the plan's summary) on a 12 mm layer.
      expect(base.length).toBeCloseTo(600, 3);
      expect(base.width).toBeCloseTo(450, 3);
      expect(base.outline.points.length).toBeGreaterThanOrEqual(4);
      expect(revision.parts.every((part) => part.thickness > 0 && part.material.length > 0)).toBe(true);
    });

    it('lets the owner edit a part of a draft, and no one else', async () => {
      const plan = await newPlan();
      const revision = await uploadSled(plan.slug);
      const runner = revision.parts.find((part) => part.name === 'Runner')!;
      const path = `/api/plans/${plan.slug}/revisions/1/parts/${runner.id}`;
      const edited = await owner
        .patch(path)
        .send({
          expectedUpdatedAt: runner.updatedAt,
          material: 'maple',
          thickness: 8,
          stock: 'linear',
          grain: 'length',
          quantityOverride: 3,
        })
        .expect(200);
      expect(edited.body).toMatchObject({
        material: 'maple',
        thickness: 8,
        stock: 'linear',
        quantity: 2,
        quantityOverride: 3,
      });
      expect(Date.parse(edited.body.updatedAt)).toBeGreaterThan(Date.parse(runner.updatedAt));
      const current = edited.body.updatedAt as string;
      await other.patch(path).send({ expectedUpdatedAt: current, material: 'oak' }).expect(403);
      await owner.patch(path).send({ expectedUpdatedAt: current, thickness: -1 }).expect(400);
      await owner
        .patch(`/api/plans/${plan.slug}/revisions/1/parts/999999`)
        .send({ expectedUpdatedAt: current, material: 'oak' })
        .expect(404);
    });

    it('refuses a part save from an editor that loaded the part before the last save, with 409 part_changed', async () => {
      const plan = await newPlan();
      const revision = await uploadSled(plan.slug);
      const runner = revision.parts.find((part) => part.name === 'Runner')!;
      const path = `/api/plans/${plan.slug}/revisions/1/parts/${runner.id}`;

      await owner.patch(path).send({ expectedUpdatedAt: runner.updatedAt, material: 'maple' }).expect(200);
      // A second tab still holding the first load.
      const stale = await owner.patch(path).send({ expectedUpdatedAt: runner.updatedAt, material: 'oak' }).expect(409);
      expect(stale.body).toMatchObject({ statusCode: 409, code: 'part_changed' });
      expect(stale.body.message).toMatch(/Runner.*another tab/);
      const reread = await owner.get(`/api/plans/${plan.slug}/revisions/1`).expect(200);
      const kept = (reread.body as RevisionDetailDto).parts.find((part) => part.id === runner.id)!;
      expect(kept.material).toBe('maple');

      // Each save moves updatedAt on: only the newest one is accepted.
      const first = await owner.patch(path).send({ expectedUpdatedAt: kept.updatedAt, grain: 'width' }).expect(200);
      await owner.patch(path).send({ expectedUpdatedAt: kept.updatedAt, grain: 'any' }).expect(409);
      await owner.patch(path).send({ expectedUpdatedAt: first.body.updatedAt, grain: 'any' }).expect(200);
      await owner.patch(path).send({ material: 'No date' }).expect(400);
    });

    it('asks for units when the drawing has none, and reads it again in the ones chosen', async () => {
      const plan = await newPlan();
      await owner
        .post(`/api/plans/${plan.slug}/revisions/1/drawings`)
        .attach('file', rectangleDxf(), 'panel.dxf')
        .expect(201);
      const before = await settledRevision(owner, plan.slug, 1);
      expect(before.drawings[0]).toMatchObject({ status: 'done', units: null, needsUnits: true });
      expect(before.parts[0]!.length).toBeCloseTo(100, 6);

      const drawingId = before.drawings[0]!.id;
      await owner.patch(`/api/plans/${plan.slug}/revisions/1/drawings/${drawingId}`).send({ units: 'in' }).expect(200);
      const after = await settledRevision(owner, plan.slug, 1);
      expect(after.drawings[0]).toMatchObject({ status: 'done', units: 'in', needsUnits: false });
      // 100 in = 2540 mm, 40 in = 1016 mm (1 in = 25.4 mm exactly, NIST SP 811).
      expect(after.parts[0]!.length).toBeCloseTo(2540, 6);
      expect(after.parts[0]!.width).toBeCloseTo(1016, 6);
    });

    it('refuses to change the units of a drawing that declares them', async () => {
      const plan = await newPlan();
      const revision = await uploadSled(plan.slug);
      const response = await owner
        .patch(`/api/plans/${plan.slug}/revisions/1/drawings/${revision.drawings[0]!.id}`)
        .send({ units: 'in' })
        .expect(409);
      expect(response.body.code).toBe('drawing_has_units');
    });

    it('keeps a failed analysis with its reason and no parts; deleting it leaves nothing behind', async () => {
      const plan = await newPlan();
      const truncated = Buffer.from('0\nSECTION\n2\nENTITIES\n0\nLINE\n8\n0\n10\n');
      await owner
        .post(`/api/plans/${plan.slug}/revisions/1/drawings`)
        .attach('file', truncated, 'broken.dxf')
        .expect(201);
      const revision = await settledRevision(owner, plan.slug, 1);
      const [drawing] = revision.drawings as [DrawingDto];
      expect(drawing.status).toBe('failed');
      expect(drawing.error).toEqual(expect.any(String));
      expect(drawing.error!.length).toBeGreaterThan(5);
      expect(revision.parts).toEqual([]);

      const submit = await owner.post(`/api/plans/${plan.slug}/revisions/1/submit`).expect(400);
      expect(submit.body.code).toBe('revision_incomplete');

      const revisionId = await revisionIdOf(app, plan.slug, 1);
      const prefix = `plans/${await planIdOf(app, plan.slug)}/`;
      expect(await objectKeys(app, prefix)).toHaveLength(1);
      await other.delete(`/api/plans/${plan.slug}/revisions/1/drawings/${drawing.id}`).expect(403);
      await owner.delete(`/api/plans/${plan.slug}/revisions/1/drawings/${drawing.id}`).expect(204);
      expect(await rowCount(app, 'drawings', revisionId)).toBe(0);
      expect(await objectKeys(app, prefix)).toEqual([]);
    });

    describe('refused uploads leave no row and no object', () => {
      let slug: string;
      let revisionId: number;
      let prefix: string;

      beforeAll(async () => {
        slug = (await newPlan()).slug;
        revisionId = await revisionIdOf(app, slug, 1);
        prefix = `plans/${await planIdOf(app, slug)}/`;
      });

      afterEach(async () => {
        expect(await rowCount(app, 'drawings', revisionId)).toBe(0);
        expect(await rowCount(app, 'attachments', revisionId)).toBe(0);
        expect(await objectKeys(app, prefix)).toEqual([]);
      });

      const drawings = () => `/api/plans/${slug}/revisions/1/drawings`;

      it('refuses a binary DXF with a message saying how to save it', async () => {
        const binary = Buffer.concat([Buffer.from('AutoCAD Binary DXF\r\n\x1a\x00', 'latin1'), Buffer.alloc(64, 1)]);
        const response = await owner.post(drawings()).attach('file', binary, 'sled.dxf').expect(400);
        expect(response.body).toMatchObject({ statusCode: 400, code: 'binary_dxf' });
        expect(response.body.message).toMatch(/ASCII DXF/);
      });

      it('refuses a file that is not a drawing, whatever its name', async () => {
        const response = await owner
          .post(drawings())
          .attach('file', Buffer.from('%PDF-1.7\n%…'), 'sled.dxf')
          .expect(400);
        expect(response.body.code).toBe('not_dxf');
      });

      it('refuses a drawing over the size limit', async () => {
        const huge = Buffer.concat([Buffer.from('0\nSECTION\n2\nENTITIES\n'), Buffer.alloc(16 * 1024 * 1024, 0x20)]);
        const response = await owner.post(drawings()).attach('file', huge, 'huge.dxf').expect(413);
        expect(response.body).toMatchObject({ statusCode: 413, code: 'file_too_large' });
        expect(response.body.message).toMatch(/16 MB/);
      });

      it('refuses an upload without a file', async () => {
        const response = await owner.post(drawings()).field('units', 'mm').expect(400);
        expect(response.body.code).toBe('file_missing');
      });

      it('refuses an attachment that is neither a PDF, an image nor text', async () => {
        const zip = Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0, 0, 0, 0x08, 0]);
        const response = await owner
          .post(`/api/plans/${slug}/revisions/1/attachments`)
          .attach('file', zip, 'code.zip')
          .expect(400);
        expect(response.body.code).toBe('attachment_kind_refused');
      });

      it("refuses an upload to another member's revision", async () => {
        await other.post(drawings()).attach('file', SLED_DXF, 'sled.dxf').expect(403);
        await visitor.post(drawings()).attach('file', SLED_DXF, 'sled.dxf').expect(401);
      });
    });

    it('refuses the same file twice on one revision, leaving the first as it was', async () => {
      const plan = await newPlan();
      await uploadSled(plan.slug);
      const response = await owner
        .post(`/api/plans/${plan.slug}/revisions/1/drawings`)
        .attach('file', SLED_DXF, 'sled-copy.dxf')
        .expect(409);
      expect(response.body).toMatchObject({ code: 'duplicate_drawing' });
      expect(response.body.message).toMatch(/sled\.dxf/);
      const revisionId = await revisionIdOf(app, plan.slug, 1);
      expect(await rowCount(app, 'drawings', revisionId)).toBe(1);
      expect(await objectKeys(app, `plans/${await planIdOf(app, plan.slug)}/`)).toHaveLength(1);
    });
  });

  describe('attachments', () => {
    it('stores code by its content, streams it back with its type and name, and deletes it from a draft', async () => {
      const plan = await newPlan();
      const code = Buffer.from('// Indexer\nvoid setup() {}\nvoid loop() {}\n');
      const uploaded = await owner
        .post(`/api/plans/${plan.slug}/revisions/1/attachments`)
        .field('description', 'Controller sketch')
        .attach('file', code, 'finger indexer ü.ino')
        .expect(201);
      expect(uploaded.body).toMatchObject({
        name: 'finger indexer ü.ino',
        mediaType: 'text/x-c++src',
        size: code.length,
      });

      const download = await owner.get(uploaded.body.downloadUrl).expect(200);
      expect(download.headers['content-type']).toBe('text/x-c++src; charset=utf-8');
      expect(download.headers['content-disposition']).toBe(
        `attachment; filename="finger indexer _.ino"; filename*=UTF-8''finger%20indexer%20%C3%BC.ino`,
      );
      expect(Buffer.from(download.text)).toEqual(code);
      // Not published: only the owner may fetch it.
      await visitor.get(uploaded.body.downloadUrl).expect(404);

      const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d]);
      const image = await owner
        .post(`/api/plans/${plan.slug}/revisions/1/attachments`)
        .attach('file', png, 'photo.txt')
        .expect(201);
      expect(image.body.mediaType).toBe('image/png');
      await owner.post(`/api/plans/${plan.slug}/revisions/1/attachments`).attach('file', png, 'again.png').expect(409);

      await other.delete(`/api/plans/${plan.slug}/revisions/1/attachments/${image.body.id}`).expect(403);
      await owner.delete(`/api/plans/${plan.slug}/revisions/1/attachments/${image.body.id}`).expect(204);
      await owner.get(`/api/plans/${plan.slug}/revisions/1/attachments/${image.body.id}`).expect(404);
      expect(await objectKeys(app, `plans/${await planIdOf(app, plan.slug)}/`)).toHaveLength(1);
    });
  });

  describe('saving a draft', () => {
    it('saves notes, safety notes, hardware and the indexing set, and refuses a stale save with 409', async () => {
      const plan = await newPlan();
      const path = `/api/plans/${plan.slug}/revisions/1`;
      const loaded = (await owner.get(path).expect(200)).body as RevisionDetailDto;
      const hardware = [{ item: 'Wood screw', specification: '4 × 30 mm', quantity: 6, note: '' }];
      const indexing = { name: 'Test set', inputs: { units: 'mm', width: 156, pin: 12, kerf: 6 } };

      const saved = await owner
        .patch(path)
        .send({
          expectedUpdatedAt: loaded.updatedAt,
          notes: '# Build\nGlue it.',
          safetyNotes: 'Use a push stick.',
          hardware,
          indexing,
        })
        .expect(200);
      expect(saved.body).toMatchObject({
        notes: '# Build\nGlue it.',
        safetyNotes: 'Use a push stick.',
        hardware,
        indexing,
      });
      expect(Date.parse(saved.body.updatedAt)).toBeGreaterThan(Date.parse(loaded.updatedAt));

      // A second tab still holding the first load.
      const stale = await owner
        .patch(path)
        .send({ expectedUpdatedAt: loaded.updatedAt, notes: 'Overwrite' })
        .expect(409);
      expect(stale.body).toMatchObject({ statusCode: 409, code: 'revision_changed' });
      expect(stale.body.message).toMatch(/another tab/);
      expect((await owner.get(path).expect(200)).body.notes).toBe('# Build\nGlue it.');

      await other.patch(path).send({ expectedUpdatedAt: saved.body.updatedAt, notes: 'Mine' }).expect(403);
      await owner.patch(path).send({ notes: 'No date' }).expect(400);
      const badSet = await owner
        .patch(path)
        .send({
          expectedUpdatedAt: saved.body.updatedAt,
          indexing: { name: 'Bad', inputs: { width: 10, pin: 0, kerf: 6 } },
        })
        .expect(400);
      expect(badSet.body.code).toBe('indexing_invalid');
    });
  });

  describe('the life of a revision', () => {
    it('goes draft → submitted → withdrawn → submitted → published; r2 starts as a copy and needs a changelog', async () => {
      const plan = await newPlan('Revision lifecycle jig');
      const r1 = `/api/plans/${plan.slug}/revisions/1`;

      const empty = await owner.post(`${r1}/submit`).expect(400);
      expect(empty.body.details).toEqual(['Upload a drawing and let it be analysed.']);

      await uploadSled(plan.slug);
      await owner.post(`${r1}/attachments`).attach('file', Buffer.from('#define STEPS 400\n'), 'steps.h').expect(201);
      await other.post(`${r1}/submit`).expect(403);
      expect((await owner.post(`${r1}/submit`).expect(200)).body).toMatchObject({
        state: 'submitted',
        editable: false,
      });

      const loaded = (await owner.get(r1).expect(200)).body as RevisionDetailDto;
      const locked = await owner.patch(r1).send({ expectedUpdatedAt: loaded.updatedAt, notes: 'late' }).expect(409);
      expect(locked.body.code).toBe('revision_not_editable');
      await owner.post(`${r1}/submit`).expect(409);
      await owner.post(`/api/plans/${plan.slug}/revisions`).expect(409);

      await other.post(`${r1}/withdraw`).expect(403);
      expect((await owner.post(`${r1}/withdraw`).expect(200)).body.state).toBe('draft');
      await owner.post(`${r1}/withdraw`).expect(409);
      await owner.post(`${r1}/submit`).expect(200);

      await publish(plan.slug, 1);
      const published = (await visitor.get(`/api/plans/${plan.slug}`).expect(200)).body as PlanDetailDto;
      expect(published).toMatchObject({
        viewerIsOwner: false,
        latestRevision: { number: 1, publishedAt: '2025-01-15T10:00:00.000Z' },
        revisions: [{ number: 1, state: 'published' }],
      });
      expect(published.thumbnail!.outlines.length).toBe(6);
      expect(published.thumbnail!.extents.min).toEqual([0, 0]);
      const publicR1 = (await visitor.get(r1).expect(200)).body as RevisionDetailDto;
      expect(publicR1.parts).toHaveLength(4);
      expect(publicR1.drawings[0]!.analysis!.parts).toHaveLength(4);
      await visitor.get(publicR1.attachments[0]!.downloadUrl).expect(200);
      await owner.delete(r1).expect(409);

      const started = await owner.post(`/api/plans/${plan.slug}/revisions`).expect(201);
      const r2 = started.body as RevisionDetailDto;
      expect(r2).toMatchObject({ number: 2, state: 'draft', changelog: '', editable: true });
      expect(r2.parts.map((part) => part.name).sort()).toEqual(publicR1.parts.map((part) => part.name).sort());
      expect(r2.drawings[0]!.sha256).toBe(publicR1.drawings[0]!.sha256);
      expect(r2.attachments).toHaveLength(1);
      await owner.post(`/api/plans/${plan.slug}/revisions`).expect(409);
      // Others see r1 only while r2 is a draft.
      expect(((await visitor.get(`/api/plans/${plan.slug}`).expect(200)).body as PlanDetailDto).revisions).toHaveLength(
        1,
      );
      await visitor.get(`/api/plans/${plan.slug}/revisions/2`).expect(404);

      const noChangelog = await owner.post(`/api/plans/${plan.slug}/revisions/2/submit`).expect(400);
      expect(noChangelog.body.details).toEqual(['Write a changelog: what changed since the revision before, and why.']);

      const r2Id = await revisionIdOf(app, plan.slug, 2);
      const r2Prefix = `plans/${await planIdOf(app, plan.slug)}/revisions/${r2Id}/`;
      expect(await objectKeys(app, r2Prefix)).toHaveLength(2);
      await other.delete(`/api/plans/${plan.slug}/revisions/2`).expect(403);
      await owner.delete(`/api/plans/${plan.slug}/revisions/2`).expect(204);
      expect(await objectKeys(app, r2Prefix)).toEqual([]);
      expect(await rowCount(app, 'parts', r2Id)).toBe(0);
      // r1's own files are untouched.
      await visitor.get(publicR1.attachments[0]!.downloadUrl).expect(200);

      const again = (await owner.post(`/api/plans/${plan.slug}/revisions`).expect(201)).body as RevisionDetailDto;
      expect(again.number).toBe(2);
      const saved = await owner
        .patch(`/api/plans/${plan.slug}/revisions/2`)
        .send({ expectedUpdatedAt: again.updatedAt, changelog: 'Wider runners.' })
        .expect(200);
      expect(saved.body.changelog).toBe('Wider runners.');
      await owner.post(`/api/plans/${plan.slug}/revisions/2/submit`).expect(200);
    });

    it('keeps a plan’s only revision', async () => {
      const plan = await newPlan();
      const response = await owner.delete(`/api/plans/${plan.slug}/revisions/1`).expect(409);
      expect(response.body.code).toBe('last_revision');
    });
  });
});
