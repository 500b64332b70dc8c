import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export interface FakeAccount {
  githubId: number;
  login: string;
  name: string;
  email: string;
  /** An account whose only e-mail address is unverified, for testing that sign-in refuses it. */
  emailVerified?: boolean;
  /** Accounts the tests add through the control routes are not offered on the account picker. */
  unlisted?: boolean;
}

const membersFile = fileURLToPath(new URL('../../plans-seed/members.json', import.meta.url));

export function loadFakeAccounts(): FakeAccount[] {
  const { members } = JSON.parse(readFileSync(membersFile, 'utf8')) as { members: FakeAccount[] };
  return [
    ...members.map(({ githubId, login, name, email }) => ({ githubId, login, name, email, emailVerified: true })),
    // Not a demo member: lets the tests and curious developers see a refused sign-in.
    {
      githubId: 919999,
      login: 'unverified-visitor',
      name: 'Unverified Visitor',
      email: 'unverified@example.com',
      emailVerified: false,
    },
  ];
}
