import type { INestApplication } from '@nestjs/common';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { MembersService } from '../src/members/members.service';
import { seedDemoData } from '../src/seed/seed-demo-data';
import { createTestApp } from './app-factory';

const SEEDED = [
  {
    githubId: 930001,
    login: 'seed-check-moderator',
    name: 'Seed Check Moderator',
    email: 'seed-mod@example.com',
    role: 'moderator',
  },
  {
    githubId: 930002,
    login: 'seed-check-member',
    name: 'Seed Check Member',
    email: 'seed-member@example.com',
    role: 'member',
  },
];

describe('the demo seed (e2e, MariaDB)', () => {
  let app: INestApplication;
  let dataSource: DataSource;
  let seedDir: string;

  beforeAll(async () => {
    app = await createTestApp();
    dataSource = app.get(DataSource);
    seedDir = mkdtempSync(join(tmpdir(), 'jigwright-seed-'));
    writeFileSync(join(seedDir, 'members.json'), JSON.stringify({ members: SEEDED }));
  });

  afterAll(async () => {
    await app.close();
  });

  const rows = () =>
    dataSource.query(
      'SELECT github_id AS githubId, role FROM members WHERE github_id IN (?, ?) ORDER BY github_id',
      [930001, 930002],
    ) as Promise<Array<{ githubId: string; role: string }>>;
  const auditCount = async () => Number((await dataSource.query('SELECT COUNT(*) AS n FROM audit_log'))[0].n);

  it('creates the members with their roles, and a second run changes nothing', async () => {
    await seedDemoData(app, seedDir);
    expect((await rows()).map((row) => row.role)).toEqual(['moderator', 'member']);
    const audited = await auditCount();

    await seedDemoData(app, seedDir);
    expect((await rows()).map((row) => row.role)).toEqual(['moderator', 'member']);
    expect(await auditCount()).toBe(audited);
  });

  it('keeps a role an admin changed since the first run', async () => {
    const members = app.get(MembersService);
    const moderator = await members.findByGithubId(930001);
    await members.setRoleFromConfiguration(moderator!, 'member');

    await seedDemoData(app, seedDir);
    expect((await rows()).map((row) => row.role)).toEqual(['member', 'member']);
  });
});
