import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { RevisionDetail } from '../../features/plans/api/types';
import { renderWithTheme } from '../../features/plans/test-render';
import '../../features/plans/test-pointer-events';
import { demoPlan, demoRevision } from '../../features/plans/test-revision';
import type { ReviewDecision, Submission } from '../../features/review/api/types';
import { ReviewDecisions } from '../../features/review/components/review-decisions';
import { renderAppAt } from '../../testing/render-app';

const SLUG = 'five-cut-crosscut-sled';

const me = (role: 'member' | 'moderator' | 'admin') => ({
  id: 3,
  login: `demo-${role}`,
  displayName: 'Odile Rennick',
  avatarUrl: null,
  email: `demo-${role}@example.com`,
  role,
  suspended: false,
  units: 'mm',
});

const submission = (changes: Partial<Submission> = {}): Submission => ({
  plan: {
    slug: SLUG,
    title: 'Five-cut crosscut sled',
    designer: { id: 2, login: 'demo-designer', displayName: 'Dana Designer', avatarUrl: null },
    category: 'sled',
    motorised: false,
    tools: ['table-saw'],
    licence: 'CC-BY-4.0',
  },
  number: 2,
  state: 'submitted',
  submittedAt: '2026-12-01T09:30:00.000Z',
  changelog: 'Wider fence.',
  ownPlan: false,
  checklist: [
    { check: 'drawing', label: 'Drawing analysed', ok: true, summary: '1 drawing, 4 parts', problems: [] },
    {
      check: 'cut-list',
      label: 'Cut list sane',
      ok: false,
      summary: '5 pieces in 2 materials',
      problems: ['Fence has no material.'],
    },
    { check: 'safety-notes', label: 'Safety notes', ok: true, summary: 'Present', problems: [] },
    { check: 'licence', label: 'Licence stated', ok: true, summary: 'CC-BY-4.0', problems: [] },
  ],
  ...changes,
});

interface Sent {
  method: string;
  path: string;
  body?: unknown;
}

/** A stand-in for the API: the signed-in member, the desk's routes and the plan's; records what is sent. */
function serve({
  role = 'moderator',
  own = false,
  queue = [submission()],
  decisions = [],
  revision = { ...demoRevision(SLUG, 2, 'sled.dxf'), state: 'submitted' as const },
  answer = (decision: string) => ({
    mail: 'sent',
    decision,
    state: decision === 'publish' ? 'published' : 'sent-back',
  }),
}: {
  role?: 'member' | 'moderator' | 'admin';
  own?: boolean;
  queue?: Submission[];
  decisions?: ReviewDecision[];
  revision?: RevisionDetail;
  answer?: (decision: string) => { mail: string; decision: string; state: string };
} = {}) {
  const sent: Sent[] = [];
  let current = revision;
  const plan = () => ({
    ...demoPlan(SLUG, [1, 2]),
    revisions: [1, 2].map((number) => ({
      number,
      state: number === 2 ? current.state : 'published',
      changelog: '',
      publishedAt: null,
      updatedAt: '2026-12-01T09:30:00.000Z',
    })),
  });
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = new URL(String(input), 'http://localhost');
      const method = init?.method ?? 'GET';
      const body = init?.body ? (JSON.parse(String(init.body)) as unknown) : undefined;
      sent.push({ method, path: url.pathname + url.search, body });
      const path = url.pathname;
      if (path === '/api/me') return Response.json(me(role));
      if (path === '/api/review/revisions')
        return Response.json({ items: queue, total: queue.length, page: 1, pageSize: 20 });
      if (path === `/api/review/revisions/${SLUG}/2`)
        return Response.json(submission({ state: current.state, ownPlan: own }));
      if (path === `/api/plans/${SLUG}`) return Response.json(plan());
      if (path === `/api/plans/${SLUG}/revisions/2`) return Response.json(current);
      if (path === `/api/plans/${SLUG}/revisions/1`) return Response.json(demoRevision(SLUG, 1, 'sled.dxf'));
      if (path === `/api/plans/${SLUG}/revisions/2/decisions`) return Response.json(decisions);
      const decided = /^\/api\/plans\/[^/]+\/revisions\/2\/(publish|send-back|decline|hide|unhide)$/.exec(path);
      if (decided && method === 'POST') {
        const result = answer(decided[1]!);
        current = { ...current, state: result.state as RevisionDetail['state'] };
        return Response.json({
          decision: { id: 1, decision: result.decision, notes: '', moderator: null, at: '2026-12-02T00:00:00.000Z' },
          revision: { number: 2, state: result.state, changelog: '', publishedAt: null, updatedAt: '' },
          mail: result.mail,
        });
      }
      return Response.json({ statusCode: 404, code: 'not_found', message: 'No' }, { status: 404 });
    }),
  );
  return sent;
}

const posts = (sent: Sent[]) => sent.filter((request) => request.method === 'POST');

describe('the review desk', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('lists each submission with its checklist, marked in words as well as colour', async () => {
    serve();
    renderAppAt('/review');
    const link = await screen.findByRole('link', { name: 'Five-cut crosscut sled, r2' }, { timeout: 10_000 });
    expect(link.getAttribute('href')).toBe(`/review/${SLUG}/2`);
    expect(screen.getByText('1 revision waits for a decision')).toBeTruthy();
    expect(screen.getByText('1 of 4 checks finds a problem')).toBeTruthy();
    const checklist = screen.getByRole('list', { name: 'Checklist of Five-cut crosscut sled, r2' });
    const rows = within(checklist)
      .getAllByRole('listitem')
      .filter((item) => item.dataset.check);
    expect(rows.map((row) => row.textContent)).toEqual([
      'OKDrawing analysed1 drawing, 4 parts',
      'ProblemCut list sane5 pieces in 2 materialsFence has no material.',
      'OKSafety notesPresent',
      'OKLicence statedCC-BY-4.0',
    ]);
    expect(screen.getByText(/By Dana Designer · submitted 1 Dec 2026, 09:30 UTC/)).toBeTruthy();
  });

  it('says so when nothing waits', async () => {
    serve({ queue: [] });
    renderAppAt('/review');
    expect(
      await screen.findByRole('heading', { name: 'Nothing is waiting for review' }, { timeout: 10_000 }),
    ).toBeTruthy();
  });

  it('is not open to a member', async () => {
    serve({ role: 'member' });
    renderAppAt('/review');
    expect(await screen.findByRole('heading', { name: 'Not open to you' }, { timeout: 10_000 })).toBeTruthy();
    expect(screen.getByRole('alert').textContent).toContain('The review desk is for moderators.');
  });

  it('shows a submission in full and sends it back only with notes, then shows the result', async () => {
    const user = userEvent.setup();
    const sent = serve({ answer: () => ({ mail: 'sent', decision: 'send-back', state: 'sent-back' }) });
    renderAppAt(`/review/${SLUG}/2`);
    expect(
      await screen.findByRole('heading', { name: 'Five-cut crosscut sled, r2', level: 1 }, { timeout: 10_000 }),
    ).toBeTruthy();
    // The revision as the plan page shows it: the drawing, the cut list, the safety notes.
    expect(await screen.findByRole('img', { name: 'Drawing sled.dxf, r2' })).toBeTruthy();
    expect(screen.getByRole('region', { name: 'Cut list' })).toBeTruthy();
    expect(screen.getByRole('region', { name: 'Safety notes' })).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Send back' }));
    const dialog = await screen.findByRole('dialog');
    expect(within(dialog).getByText('Send r2 of “Five-cut crosscut sled” back to its designer?')).toBeTruthy();
    await user.click(within(dialog).getByRole('button', { name: 'Send back' }));
    expect(await within(dialog).findByText('Write what the designer should change.')).toBeTruthy();
    expect(posts(sent)).toEqual([]);

    await user.type(within(dialog).getByLabelText(/What to change/), 'The fence needs a material.');
    await user.click(within(dialog).getByRole('button', { name: 'Send back' }));
    expect((await screen.findByRole('status', {}, { timeout: 5_000 })).textContent).toBe(
      'r2 of “Five-cut crosscut sled” is sent back to its designer with your notes. Dana Designer was e-mailed.',
    );
    expect(posts(sent)).toEqual([
      {
        method: 'POST',
        path: `/api/plans/${SLUG}/revisions/2/send-back`,
        body: { notes: 'The fence needs a material.' },
      },
    ]);
    // Read again after the decision: the buttons go, as the revision no longer waits.
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Publish' })).toBeNull());
    await waitFor(() =>
      expect(sent.filter((request) => request.path === `/api/review/revisions/${SLUG}/2`).length).toBeGreaterThan(1),
    );
  });

  it('publishes without notes and says when the designer could not be e-mailed', async () => {
    const user = userEvent.setup();
    const sent = serve({ answer: () => ({ mail: 'failed', decision: 'publish', state: 'published' }) });
    renderAppAt(`/review/${SLUG}/2`);
    await user.click(await screen.findByRole('button', { name: 'Publish' }, { timeout: 10_000 }));
    const dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByRole('button', { name: 'Publish' }));
    expect((await screen.findByRole('status', {}, { timeout: 5_000 })).textContent).toBe(
      'r2 of “Five-cut crosscut sled” is published and in the library. The e-mail to Dana Designer could not be sent; the decision stands.',
    );
    expect(posts(sent)).toEqual([{ method: 'POST', path: `/api/plans/${SLUG}/revisions/2/publish`, body: {} }]);
  });

  it('keeps the decisions from a moderator on their own plan', async () => {
    serve({ own: true });
    renderAppAt(`/review/${SLUG}/2`);
    expect(
      await screen.findByText('This is your own plan: another moderator decides on it.', {}, { timeout: 10_000 }),
    ).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Publish' })).toBeNull();
  });
});

describe('moderating on the plan page', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('hides a published revision only with a reason', async () => {
    const user = userEvent.setup();
    const sent = serve({
      revision: demoRevision(SLUG, 2, 'sled.dxf'),
      answer: () => ({ mail: 'sent', decision: 'hide', state: 'hidden' }),
    });
    renderAppAt(`/plans/${SLUG}?r=2`);
    await user.click(await screen.findByRole('button', { name: 'Hide this revision' }, { timeout: 10_000 }));
    const dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByRole('button', { name: 'Hide revision' }));
    expect(await within(dialog).findByText('Give the reason for hiding this revision.')).toBeTruthy();
    expect(posts(sent)).toEqual([]);
    await user.type(within(dialog).getByLabelText(/Reason/), 'The wiring skips the fuse.');
    await user.click(within(dialog).getByRole('button', { name: 'Hide revision' }));
    expect((await screen.findByRole('status', {}, { timeout: 5_000 })).textContent).toContain(
      'r2 of “Five-cut crosscut sled” is hidden: visitors no longer see it.',
    );
    expect(posts(sent)).toEqual([
      { method: 'POST', path: `/api/plans/${SLUG}/revisions/2/hide`, body: { reason: 'The wiring skips the fuse.' } },
    ]);
    // The page reads the revision again and offers to restore it.
    expect(await screen.findByRole('button', { name: 'Restore' }, { timeout: 5_000 })).toBeTruthy();
  });

  it('is not offered to members', async () => {
    serve({ role: 'member', revision: demoRevision(SLUG, 2, 'sled.dxf') });
    renderAppAt(`/plans/${SLUG}?r=2`);
    expect(await screen.findByRole('img', { name: 'Drawing sled.dxf, r2' }, { timeout: 10_000 })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Hide this revision' })).toBeNull();
  });
});

describe('the decision history for the designer', () => {
  afterEach(() => vi.unstubAllGlobals());

  const decision = (id: number, kind: ReviewDecision['decision'], notes: string, at: string): ReviewDecision => ({
    id,
    decision: kind,
    notes,
    moderator: { id: 3, login: 'demo-moderator', displayName: 'Odile Rennick', avatarUrl: null },
    at,
  });

  it('puts the latest send-back notes first and the earlier decisions below', async () => {
    serve({
      decisions: [
        decision(2, 'send-back', 'Give the fence a thickness.', '2026-12-02T08:00:00.000Z'),
        decision(1, 'send-back', 'Name the parts.', '2026-12-01T08:00:00.000Z'),
      ],
    });
    renderWithTheme(
      <QueryClientProvider client={new QueryClient()}>
        <ReviewDecisions slug={SLUG} number={2} />
      </QueryClientProvider>,
    );
    expect(await screen.findByRole('heading', { name: 'What the moderator asks you to change' })).toBeTruthy();
    const region = screen.getByRole('region', { name: 'Review decisions' });
    expect(region.textContent).toContain('Sent back by Odile Rennick on 2 Dec 2026, 08:00 UTC');
    expect(region.textContent?.indexOf('Give the fence a thickness.')).toBeLessThan(
      region.textContent?.indexOf('Name the parts.') ?? 0,
    );
    expect(
      within(screen.getByRole('list', { name: 'Earlier review decisions' })).getByText('Name the parts.'),
    ).toBeTruthy();
  });

  it('shows nothing before any decision', async () => {
    const sent = serve({ decisions: [] });
    const { container } = renderWithTheme(
      <QueryClientProvider client={new QueryClient()}>
        <ReviewDecisions slug={SLUG} number={2} />
      </QueryClientProvider>,
    );
    await waitFor(() => expect(sent.some((request) => request.path.endsWith('/decisions'))).toBe(true));
    await waitFor(() => expect(container.textContent).toBe(''));
  });
});
