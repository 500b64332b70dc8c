import type { INestApplicationContext } from '@nestjs/common';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { MembersService } from '../members/members.service';
import { readDemoMembers } from './demo-members';
import { seedDemoPlans } from './demo-plans';

/**
 * Loads the demo data through the same services the API uses. Idempotent: members are matched by
 * GitHub id and only missing ones are created, so a second run changes nothing — not even a role
 * an admin has changed since. Plans are matched by slug and revision number (demo-plans.ts).
 */
export async function seedDemoData(app: INestApplicationContext, seedDir: string, avatarBase?: string): Promise<void> {
  const members = app.get(MembersService);
  const designers = existsSync(join(seedDir, 'designers.json'))
    ? readDemoMembers(seedDir, avatarBase, 'designers.json')
    : [];
  for (const { role, ...identity } of [...readDemoMembers(seedDir, avatarBase), ...designers]) {
    if (await members.findByGithubId(identity.githubId)) continue;
    await members.setRoleFromConfiguration(await members.upsertFromGithub(identity), role);
  }
  await seedDemoPlans(app, seedDir);
}
