import 'reflect-metadata';
import { resolve } from 'node:path';
import { NestFactory } from '@nestjs/core';
import { AppModule } from '../app.module';
import { MembersService } from '../members/members.service';
import { readDemoMembers } from './demo-members';

/**
 * Loads the demo data through the same services the API uses. Idempotent: members are matched by
 * GitHub id, so a second run changes nothing.
 */
async function seed(): Promise<void> {
  const seedDir = resolve(process.env.SEED_DIR ?? 'plans-seed');
  const avatarBase = process.env.GITHUB_AUTHORIZE_URL ? new URL(process.env.GITHUB_AUTHORIZE_URL).origin : undefined;
  const app = await NestFactory.createApplicationContext(AppModule, { logger: ['error', 'warn'] });
  try {
    const members = app.get(MembersService);
    for (const { role, ...identity } of readDemoMembers(seedDir, avatarBase)) {
      await members.setRoleFromConfiguration(await members.upsertFromGithub(identity), role);
    }
    process.stdout.write('Demo data is in place.\n');
  } finally {
    await app.close();
  }
}

seed().catch((error: unknown) => {
  process.stderr.write(`Seeding failed: ${error instanceof Error ? error.stack : String(error)}\n`);
  process.exit(1);
});
