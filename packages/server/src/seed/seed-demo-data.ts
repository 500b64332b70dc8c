import type { INestApplicationContext } from '@nestjs/common';
import { MembersService } from '../members/members.service';
import { readDemoMembers } from './demo-members';

/**
 * Loads the demo data through the same services the API uses. Idempotent: members are matched by
 * GitHub id and only missing ones are created, so a second run changes nothing — not even a role
 * an admin has changed since.
 */
export async function seedDemoData(app: INestApplicationContext, seedDir: string, avatarBase?: string): Promise<void> {
  const members = app.get(MembersService);
  for (const { role, ...identity } of readDemoMembers(seedDir, avatarBase)) {
    if (await members.findByGithubId(identity.githubId)) continue;
    await members.setRoleFromConfiguration(await members.upsertFromGithub(identity), role);
  }
}
