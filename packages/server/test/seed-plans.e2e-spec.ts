import type { INestApplication } from '@nestjs/common';
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { PlanDetailDto } from '../src/plans/dto/plan.dto';
import type { RevisionDetailDto } from '../src/plans/dto/revision.dto';
import { seedDemoData } from '../src/seed/seed-demo-data';
import { createTestApp } from './app-factory';
import { client, objectKeys, SEED_DIR, type Client } from './plan-helpers';

const SLUGS = readdirSync(join(SEED_DIR, 'plans')).sort();

describe('the demo plans seed (e2e, MariaDB and the fake S3)', () => {
  let app: INestApplication<App>;
  let dataSource: DataSource;
  let visitor: Client;

  beforeAll(async () => {
    app = await createTestApp();
    dataSource = app.get(DataSource);
    visitor = client(app.getHttpServer());
    await seedDemoData(app, SEED_DIR);
  }, 120_000);

  afterAll(async () => {
    await app.close();
  });

  /** Everything the seed writes, as text, to compare one run with the next. */
  async function snapshot(): Promise<string> {
    const tables = [
      ['plans', 'slug'],
      ['revisions', 'plan_id, number'],
      ['drawings', 'revision_id, sha256'],
      ['parts', 'drawing_id, position'],
      ['attachments', 'revision_id, sha256'],
      ['members', 'github_id'],
    ];
    const rows = await Promise.all(
      tables.map(([table, order]) => dataSource.query(`SELECT * FROM \`${table}\` ORDER BY ${order}`)),
    );
    return JSON.stringify(rows);
  }

  it('publishes every demo plan with its revisions, dated as the files say', async () => {
    expect(SLUGS).toHaveLength(9);
    for (const slug of SLUGS) {
      const plan = (await visitor.get(`/api/plans/${slug}`).expect(200)).body as PlanDetailDto;
      expect(plan.revisions.every((revision) => revision.state === 'published')).toBe(true);
      expect(plan.thumbnail?.outlines.length).toBeGreaterThan(0);
    }
    const sled = (await visitor.get('/api/plans/five-cut-crosscut-sled').expect(200)).body as PlanDetailDto;
    expect(sled).toMatchObject({
      category: 'sled',
      designer: { login: 'demo-designer' },
      licence: 'CC-BY-4.0',
      tools: ['table-saw', 'hand-drill', 'hand-plane'],
      latestRevision: { number: 2, publishedAt: '2025-04-21T00:00:00.000Z' },
    });
    expect(sled.revisions.map((revision) => revision.number)).toEqual([1, 2]);
    const taper = (await visitor.get('/api/plans/hinged-taper-jig').expect(200)).body as PlanDetailDto;
    expect(taper.designer.login).toBe('hettie-ashgrove');
  });

  it('gives the parts their settings from plan.json, and r2 only its own drawing', async () => {
    const r2 = (await visitor.get('/api/plans/five-cut-crosscut-sled/revisions/2').expect(200))
      .body as RevisionDetailDto;
    expect(r2.drawings.map((drawing) => drawing.originalName)).toEqual(['sled.dxf']);
    expect(r2.changelog).toMatch(/blade guard block/);
    expect(r2.notes.length).toBeGreaterThan(100);
    expect(r2.hardware).toHaveLength(8);
    const track = r2.parts.find((part) => part.name === 'T-track')!;
    expect(track).toMatchObject({
      material: 'aluminium T-track',
      thickness: 9.5,
      stock: 'linear',
      grain: 'length',
      quantityOverride: null,
    });
    const guard = r2.parts.find((part) => part.name === 'Blade guard layer')!;
    expect(guard).toMatchObject({ quantity: 3, grain: 'any' });
  });

  it('keeps the indexer’s attachments and saved indexing set', async () => {
    const r2 = (await visitor.get('/api/plans/lead-screw-finger-joint-indexer/revisions/2').expect(200))
      .body as RevisionDetailDto;
    expect(r2.indexing).toMatchObject({
      name: '12 mm fingers across a 156 mm board, 6 mm bit',
      inputs: { width: 156, pin: 12 },
    });
    expect(r2.attachments.map((attachment) => [attachment.name, attachment.mediaType]).sort()).toEqual([
      ['finger-indexer.ino', 'text/x-c++src'],
      ['finger_joint_steps.h', 'text/x-chdr'],
    ]);
    const header = await visitor.get(r2.attachments[1]!.downloadUrl).expect(200);
    expect(header.text).toContain('#');
  });

  it('finds the demo plans in the library', async () => {
    const found = await visitor.get('/api/plans?q=finger+joint&category=indexing-jig').expect(200);
    expect(found.body.items.map((card: { slug: string }) => card.slug)).toContain('lead-screw-finger-joint-indexer');
  });

  it('changes nothing on a second run, neither rows nor files', async () => {
    const rows = await snapshot();
    const files = await objectKeys(app, 'plans/');
    await seedDemoData(app, SEED_DIR);
    expect(await snapshot()).toBe(rows);
    expect(await objectKeys(app, 'plans/')).toEqual(files);
  });
});
