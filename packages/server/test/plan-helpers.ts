import { ListObjectsV2Command } from '@aws-sdk/client-s3';
import type { INestApplication } from '@nestjs/common';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { CreatePlanDto } from '../src/plans/dto/plan.dto';
import type { RevisionDetailDto } from '../src/plans/dto/revision.dto';
import { StorageService } from '../src/storage/storage.service';
import { CSRF, type CookieJar } from './sign-in-flow';

export const SEED_DIR = join(__dirname, '../../../plans-seed');

/** The demo crosscut sled's r1 drawing: four parts, one of them twice (plans-seed/plans/five-cut-crosscut-sled/plan.json). */
export const SLED_DXF = readFileSync(join(SEED_DIR, 'plans/five-cut-crosscut-sled/r1/sled.dxf'));

/** One rectangle 100 × 40 drawing units with a label and no $INSUNITS, on a layer without a thickness. */
export function rectangleDxf({
  width = 100,
  label = 'Panel',
  units,
}: { width?: number; label?: string; units?: number } = {}): Buffer {
  const header =
    units === undefined ? [] : ['0', 'SECTION', '2', 'HEADER', '9', '$INSUNITS', '70', String(units), '0', 'ENDSEC'];
  const rows = [
    ...header,
    ...['0', 'SECTION', '2', 'ENTITIES'],
    ...['0', 'LWPOLYLINE', '8', 'PARTS', '90', '4', '70', '1'],
    ...['10', '0', '20', '0', '10', String(width), '20', '0', '10', String(width), '20', '40', '10', '0', '20', '40'],
    ...['0', 'TEXT', '8', 'PARTS', '10', '10', '20', '10', '40', '5', '1', label],
    ...['0', 'ENDSEC', '0', 'EOF'],
  ];
  return Buffer.from(`${rows.join('\n')}\n`);
}

export const PLAN: CreatePlanDto = {
  title: 'Test taper jig',
  summary: 'A hinged taper jig made for the end-to-end specs.',
  category: 'taper-jig',
  tags: ['taper', 'legs'],
  toolsNeeded: ['table-saw'],
  licence: 'CC-BY-4.0',
  motorised: false,
};

/** Requests as one browser: its cookies and the CSRF header on every call. */
export function client(server: App, jar?: CookieJar) {
  const withSession = (call: request.Test) => {
    call.set(CSRF);
    return jar ? call.set('Cookie', jar.header()) : call;
  };
  return {
    get: (path: string) => withSession(request(server).get(path)),
    post: (path: string) => withSession(request(server).post(path)),
    patch: (path: string) => withSession(request(server).patch(path)),
    delete: (path: string) => withSession(request(server).delete(path)),
  };
}
export type Client = ReturnType<typeof client>;

/** Polls the revision until no drawing is waiting for or in analysis; the pool runs beside the request. */
export async function settledRevision(api: Client, slug: string, number: number): Promise<RevisionDetailDto> {
  for (let attempt = 0; attempt < 300; attempt++) {
    const revision = (await api.get(`/api/plans/${slug}/revisions/${number}`).expect(200)).body as RevisionDetailDto;
    if (revision.drawings.every((drawing) => drawing.status === 'done' || drawing.status === 'failed')) return revision;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`The drawings of ${slug} r${number} were never analysed`);
}

/** Keys in the bucket under a prefix. */
export async function objectKeys(app: INestApplication, prefix: string): Promise<string[]> {
  const storage = app.get(StorageService);
  const listed = await storage.client.send(new ListObjectsV2Command({ Bucket: storage.bucket, Prefix: prefix }));
  return (listed.Contents ?? []).map((object) => object.Key ?? '');
}

/** Rows of a table that belong to a revision. */
export async function rowCount(
  app: INestApplication,
  table: 'drawings' | 'attachments' | 'parts',
  revisionId: number,
): Promise<number> {
  const rows = (await app
    .get(DataSource)
    .query(`SELECT COUNT(*) AS n FROM \`${table}\` WHERE revision_id = ?`, [revisionId])) as Array<{
    n: string;
  }>;
  return Number(rows[0]!.n);
}

export async function revisionIdOf(app: INestApplication, slug: string, number: number): Promise<number> {
  const rows = (await app
    .get(DataSource)
    .query('SELECT r.id FROM revisions r JOIN plans p ON p.id = r.plan_id WHERE p.slug = ? AND r.number = ?', [
      slug,
      number,
    ])) as Array<{
    id: number;
  }>;
  return rows[0]!.id;
}

export async function planIdOf(app: INestApplication, slug: string): Promise<number> {
  const rows = (await app.get(DataSource).query('SELECT id FROM plans WHERE slug = ?', [slug])) as Array<{
    id: number;
  }>;
  return rows[0]!.id;
}
