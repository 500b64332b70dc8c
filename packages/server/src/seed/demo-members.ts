import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { MEMBER_ROLES, type MemberRole } from '../members/entities/member.entity';
import type { GithubIdentity } from '../members/members.service';

export interface DemoMember extends GithubIdentity {
  role: MemberRole;
}

interface DemoMemberFile {
  members: Array<{ githubId: number; login: string; name: string; email: string; role: string }>;
}

/**
 * Reads plans-seed/members.json, the demo accounts that the local sign-in provider also offers, or
 * a file of the same shape (designers.json: members who never sign in).
 */
export function readDemoMembers(seedDir: string, avatarBaseUrl?: string, fileName = 'members.json'): DemoMember[] {
  const file = JSON.parse(readFileSync(join(seedDir, fileName), 'utf8')) as DemoMemberFile;
  return file.members.map((entry) => {
    if (!MEMBER_ROLES.includes(entry.role as MemberRole)) {
      throw new Error(`${fileName}: ${entry.login} has an unknown role "${entry.role}"`);
    }
    return {
      githubId: entry.githubId,
      login: entry.login,
      displayName: entry.name,
      email: entry.email,
      avatarUrl: avatarBaseUrl ? `${avatarBaseUrl}/avatars/${entry.login}.svg` : null,
      role: entry.role as MemberRole,
    };
  });
}
