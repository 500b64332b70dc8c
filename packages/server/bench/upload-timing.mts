import { readFileSync } from 'node:fs';

const CSRF = { 'X-Requested-With': 'jigwright' };

/** The cookies a response set, as a Cookie header. */
function cookiesOf(response: Response): string {
  return response.headers
    .getSetCookie()
    .map((cookie) => cookie.split(';')[0]!)
    .join('; ');
}

/** Signs in through the fake GitHub as a new account, as a browser would; returns the session cookies. */
export async function signIn(appUrl: string, githubFakeUrl: string, login: string): Promise<string> {
  const account = { githubId: 990_000_000 + Math.floor(Math.random() * 9_000_000), login, name: 'Bench Designer' };
  const created = await fetch(`${githubFakeUrl}/_fake/accounts`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ ...account, email: `${login}@bench.example`, emailVerified: true }),
  });
  if (!created.ok) throw new Error(`The fake provider answered ${created.status} to a new account`);
  const start = await fetch(`${appUrl}/api/auth/github?returnTo=/`, { redirect: 'manual' });
  const authorize = new URL(start.headers.get('location') ?? '');
  const picked = await fetch(new URL('/login/oauth/authorize', authorize), {
    method: 'POST',
    body: new URLSearchParams({
      client_id: authorize.searchParams.get('client_id') ?? '',
      redirect_uri: authorize.searchParams.get('redirect_uri') ?? '',
      state: authorize.searchParams.get('state') ?? '',
      login,
    }),
    redirect: 'manual',
  });
  const callback = new URL(picked.headers.get('location') ?? '');
  const finished = await fetch(`${appUrl}${callback.pathname}${callback.search}`, {
    headers: { Cookie: cookiesOf(start) },
    redirect: 'manual',
  });
  const cookies = cookiesOf(finished);
  if (!cookies.includes('jw_session=')) throw new Error(`No session after signing in as ${login}`);
  return cookies;
}

interface DrawingState {
  id: number;
  status: string;
  error: string | null;
}

/**
 * Creates a plan, uploads the drawing to its r1 and polls the revision until the analysis has
 * finished; returns the seconds from the start of the upload to the parts being there.
 */
export async function uploadToParts(appUrl: string, cookies: string, dxfFile: string, run: number): Promise<number> {
  const headers = { ...CSRF, Cookie: cookies };
  const created = await fetch(`${appUrl}/api/plans`, {
    method: 'POST',
    headers: { ...headers, 'Content-Type': 'application/json' },
    body: JSON.stringify({
      title: `Bench parts rack ${run}`,
      summary: 'A wall rack with many small parts, uploaded by the benchmark.',
      category: 'other',
      tags: ['bench'],
      toolsNeeded: ['table-saw'],
      licence: 'CC-BY-4.0',
      motorised: false,
    }),
  });
  if (created.status !== 201) throw new Error(`Creating a plan answered ${created.status}: ${await created.text()}`);
  const { slug } = (await created.json()) as { slug: string };
  const form = new FormData();
  form.append('file', new Blob([readFileSync(dxfFile)], { type: 'application/dxf' }), 'parts-rack.dxf');
  const started = performance.now();
  const uploaded = await fetch(`${appUrl}/api/plans/${slug}/revisions/1/drawings`, {
    method: 'POST',
    headers,
    body: form,
  });
  if (uploaded.status !== 201) throw new Error(`The upload answered ${uploaded.status}: ${await uploaded.text()}`);
  const { id } = (await uploaded.json()) as DrawingState;
  // Far beyond the core's own 30 s analysis limit: a drawing still waiting then is stuck.
  const deadline = started + 300_000;
  while (performance.now() < deadline) {
    const revision = await fetch(`${appUrl}/api/plans/${slug}/revisions/1`, { headers });
    const { drawings, parts } = (await revision.json()) as { drawings: DrawingState[]; parts: unknown[] };
    const drawing = drawings.find((candidate) => candidate.id === id);
    if (drawing?.status === 'failed') throw new Error(`The analysis failed: ${drawing.error}`);
    if (drawing?.status === 'done') {
      if (parts.length === 0) throw new Error(`The analysis of ${slug}'s drawing finished without parts`);
      return (performance.now() - started) / 1000;
    }
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
  throw new Error(`The drawing of ${slug} was still not analysed after 5 minutes`);
}
