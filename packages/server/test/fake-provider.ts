/** The fake GitHub's control routes (infra/fake-github/server.ts), for what happens on the provider's side. */
function providerOrigin(): string {
  const authorize = process.env.GITHUB_AUTHORIZE_URL;
  if (!authorize) throw new Error('GITHUB_AUTHORIZE_URL is not set: run the e2e specs through `npm test`.');
  return new URL(authorize).origin;
}

async function control(path: string, body: object): Promise<void> {
  const response = await fetch(`${providerOrigin()}${path}`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`The fake provider answered ${response.status} to ${path}`);
}

export interface ProviderAccount {
  githubId: number;
  login: string;
  name: string;
  email: string;
}

/** A new account at the provider, unknown to Jigwright until it signs in; unique across spec files. */
export async function createProviderAccount(prefix: string, { emailVerified = true } = {}): Promise<ProviderAccount> {
  const githubId = 100_000_000 + Math.floor(Math.random() * 800_000_000);
  const login = `${prefix}-${githubId.toString(36)}`;
  const account = { githubId, login, name: `Test ${prefix}`, email: `${login}@example.com` };
  await control('/_fake/accounts', { ...account, emailVerified });
  return account;
}

/** The provider's next authorize, token or profile step fails once. */
export async function failNextProviderStep(step: 'authorize' | 'token' | 'user'): Promise<void> {
  await control('/_fake/fail-next', { step });
}
