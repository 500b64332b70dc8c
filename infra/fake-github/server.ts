import { randomBytes } from 'node:crypto';
import type { Server } from 'node:http';
import express, { type Request, type Response } from 'express';
import { assertPortFree } from '../process.ts';
import { loadFakeAccounts, type FakeAccount } from './accounts.ts';

export interface FakeGithubOptions {
  host: string;
  port: number;
  clientId: string;
  clientSecret: string;
}

interface Grant {
  login: string;
  clientId: string;
  redirectUri: string;
  expiresAt: number;
}

const CODE_LIFETIME_MS = 10 * 60 * 1000;

/** The provider step that the control route `POST /_fake/fail-next` makes fail once. */
const FAILING_STEPS = ['authorize', 'token', 'user'] as const;
type FailingStep = (typeof FAILING_STEPS)[number];

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function initials(name: string): string {
  return name
    .split(/[\s-]+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((word) => word[0]!.toUpperCase())
    .join('');
}

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(title)}</title>
<meta name="viewport" content="width=device-width, initial-scale=1">
<style>
body{font-family:system-ui,sans-serif;background:#F5EEE2;color:#2B2B2B;margin:0;padding:3rem 1rem}
main{max-width:30rem;margin:0 auto;background:#fff;border:1px solid #d8cfc0;border-radius:8px;padding:2rem}
h1{font-size:1.3rem;color:#6B4329;margin-top:0}
p.note{font-size:.9rem;color:#4a4a4a}
form{margin:0}
button{display:flex;gap:.75rem;align-items:center;width:100%;text-align:left;padding:.7rem;margin:.4rem 0;
border:1px solid #cfc6b6;border-radius:6px;background:#fff;font:inherit;cursor:pointer}
button:hover,button:focus{border-color:#2F5D7C;outline:2px solid #2F5D7C33}
button img{width:36px;height:36px;border-radius:50%}
.login{font-size:.85rem;color:#4a4a4a}
.cancel{justify-content:center;color:#A63D2F;border-color:#e2c3be}
</style></head><body><main>${body}</main></body></html>`;
}

/**
 * A local stand-in for GitHub's OAuth app flow: the authorize page (an account picker), the token
 * endpoint and the user API that passport-github2 calls. The real service replaces it through the
 * GITHUB_* settings alone.
 */
export function createFakeGithubApp(options: FakeGithubOptions & { publicUrl: string }) {
  const accounts = loadFakeAccounts();
  const byLogin = new Map(accounts.map((account) => [account.login, account]));
  const grants = new Map<string, Grant>();
  const tokens = new Map<string, string>();
  const failNext = new Set<FailingStep>();
  const failsNow = (step: FailingStep) => failNext.delete(step);
  const app = express();
  app.disable('x-powered-by');
  app.use(express.urlencoded({ extended: false }));
  app.use(express.json());

  const avatarUrl = (account: FakeAccount) => `${options.publicUrl}/avatars/${account.login}.svg`;

  app.get('/login/oauth/authorize', (req: Request, res: Response) => {
    const clientId = String(req.query.client_id ?? '');
    const redirectUri = String(req.query.redirect_uri ?? '');
    const state = String(req.query.state ?? '');
    if (clientId !== options.clientId || !redirectUri) {
      res
        .status(400)
        .send(
          page(
            'Unknown application',
            '<h1>Unknown application</h1><p>The client id or redirect address is missing or not registered with this provider.</p>',
          ),
        );
      return;
    }
    const hidden = (name: string, value: string) => `<input type="hidden" name="${name}" value="${escapeHtml(value)}">`;
    const fields = hidden('client_id', clientId) + hidden('redirect_uri', redirectUri) + hidden('state', state);
    const buttons = accounts
      .filter((account) => !account.unlisted)
      .map(
        (account) => `<form method="post" action="/login/oauth/authorize">${fields}${hidden('login', account.login)}
<button type="submit" aria-label="Sign in as ${escapeHtml(account.login)}"><img src="${avatarUrl(account)}" alt="">
<span><strong>${escapeHtml(account.name)}</strong><br><span class="login">${escapeHtml(account.login)}${account.emailVerified ? '' : ' · e-mail not verified'}</span></span></button></form>`,
      )
      .join('');
    res.send(
      page(
        'Choose a demo account',
        `<h1>Choose a demo account</h1><p class="note">This is the local sign-in provider that stands in for GitHub during development and tests. Pick the account to sign in with.</p>
${buttons}<form method="post" action="/login/oauth/authorize">${fields}${hidden('deny', '1')}<button class="cancel" type="submit">Cancel sign-in</button></form>`,
      ),
    );
  });

  app.post('/login/oauth/authorize', (req: Request, res: Response) => {
    const {
      client_id: clientId,
      redirect_uri: redirectUri,
      state,
      login,
      deny,
    } = req.body as Record<string, string | undefined>;
    if (clientId !== options.clientId || !redirectUri) {
      res.status(400).send(page('Unknown application', '<h1>Unknown application</h1>'));
      return;
    }
    const target = new URL(redirectUri);
    if (state) target.searchParams.set('state', state);
    if (deny || !login || !byLogin.has(login)) {
      target.searchParams.set('error', 'access_denied');
      target.searchParams.set('error_description', 'The user cancelled the sign-in.');
      res.redirect(target.toString());
      return;
    }
    if (failsNow('authorize')) {
      target.searchParams.set('error', 'temporarily_unavailable');
      target.searchParams.set('error_description', 'The provider could not complete the authorisation.');
      res.redirect(target.toString());
      return;
    }
    const code = randomBytes(16).toString('hex');
    grants.set(code, { login, clientId, redirectUri, expiresAt: Date.now() + CODE_LIFETIME_MS });
    target.searchParams.set('code', code);
    res.redirect(target.toString());
  });

  app.post('/login/oauth/access_token', (req: Request, res: Response) => {
    if (failsNow('token')) {
      res.status(503).send('Service unavailable');
      return;
    }
    const { client_id: clientId, client_secret: clientSecret, code } = req.body as Record<string, string | undefined>;
    if (clientId !== options.clientId || clientSecret !== options.clientSecret) {
      res.json({
        error: 'incorrect_client_credentials',
        error_description: 'The client_id and/or client_secret passed are incorrect.',
      });
      return;
    }
    const grant = code ? grants.get(code) : undefined;
    if (code) grants.delete(code);
    if (!grant || grant.expiresAt < Date.now() || grant.clientId !== clientId) {
      res.json({ error: 'bad_verification_code', error_description: 'The code passed is incorrect or expired.' });
      return;
    }
    const token = `fake_${randomBytes(20).toString('hex')}`;
    tokens.set(token, grant.login);
    res.json({ access_token: token, token_type: 'bearer', scope: 'read:user,user:email' });
  });

  const accountFor = (req: Request): FakeAccount | undefined => {
    const match = /^(?:Bearer|token)\s+(\S+)$/i.exec(req.get('authorization') ?? '');
    const login = match ? tokens.get(match[1]!) : undefined;
    return login ? byLogin.get(login) : undefined;
  };

  app.get('/user', (req: Request, res: Response) => {
    const account = failsNow('user') ? undefined : accountFor(req);
    if (!account) {
      res.status(401).json({ message: 'Bad credentials' });
      return;
    }
    res.json({
      id: account.githubId,
      login: account.login,
      name: account.name,
      email: account.emailVerified ? account.email : null,
      avatar_url: avatarUrl(account),
      html_url: `${options.publicUrl}/${account.login}`,
      type: 'User',
    });
  });

  app.get('/user/emails', (req: Request, res: Response) => {
    const account = accountFor(req);
    if (!account) {
      res.status(401).json({ message: 'Bad credentials' });
      return;
    }
    res.json([
      { email: account.email, primary: true, verified: account.emailVerified === true, visibility: 'private' },
    ]);
  });

  app.get('/avatars/:file', (req: Request, res: Response) => {
    const login = String(req.params.file).replace(/\.svg$/, '');
    const account = byLogin.get(login);
    if (!account) {
      res.status(404).end();
      return;
    }
    const hue = [...login].reduce((sum, c) => sum + c.charCodeAt(0), 0) % 360;
    res
      .type('image/svg+xml')
      .send(
        `<svg xmlns="http://www.w3.org/2000/svg" width="96" height="96" viewBox="0 0 96 96"><rect width="96" height="96" fill="hsl(${hue} 30% 38%)"/><text x="48" y="58" font-family="sans-serif" font-size="34" fill="#fff" text-anchor="middle">${initials(account.name)}</text></svg>`,
      );
  });

  // Control routes for tests: they stand for what happens on the real service's side (an account
  // created there, an outage, a token withdrawn between issue and use).
  app.post('/_fake/accounts', (req: Request, res: Response) => {
    const { githubId, login, name, email, emailVerified = true } = req.body as Partial<FakeAccount>;
    if (typeof githubId !== 'number' || !login || !name || !email) {
      res.status(400).json({ message: 'githubId (number), login, name and email are required' });
      return;
    }
    const existing = byLogin.get(login);
    if (existing && existing.githubId !== githubId) {
      res.status(409).json({ message: `${login} is taken by another account` });
      return;
    }
    const account: FakeAccount = { githubId, login, name, email, emailVerified, unlisted: true };
    if (!existing) accounts.push(account);
    byLogin.set(login, account);
    res.status(201).json(account);
  });

  app.post('/_fake/fail-next', (req: Request, res: Response) => {
    const { step } = req.body as { step?: string };
    if (!FAILING_STEPS.includes(step as FailingStep)) {
      res.status(400).json({ message: `step must be one of ${FAILING_STEPS.join(', ')}` });
      return;
    }
    failNext.add(step as FailingStep);
    res.status(204).end();
  });

  return app;
}

export async function startFakeGithub(options: FakeGithubOptions): Promise<{ url: string; stop(): Promise<void> }> {
  await assertPortFree(options.host, options.port, 'GITHUB_FAKE_PORT');
  const url = `http://${options.host}:${options.port}`;
  const app = createFakeGithubApp({ ...options, publicUrl: url });
  const server: Server = await new Promise((resolve, reject) => {
    const listening = app.listen(options.port, options.host, (error?: Error) =>
      error ? reject(error) : resolve(listening),
    );
  });
  return {
    url,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
