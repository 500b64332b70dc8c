import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { EditorPart, EditorRevision, OwnPlan } from '../../features/publishing/api/types';
import { renderAppAt } from '../../testing/render-app';

const designer = {
  id: 3,
  login: 'demo-designer',
  displayName: 'Ida Planer',
  avatarUrl: null,
  email: 'demo-designer@example.com',
  role: 'member',
  suspended: false,
  units: 'mm',
};

const plan: OwnPlan = {
  slug: 'bench-hook',
  title: 'Bench hook',
  summary: 'A bench hook for crosscuts with a hand saw.',
  category: 'other',
  licence: 'CC-BY-4.0',
  motorised: false,
  tags: ['hand tools'],
  tools: ['hand-saw'],
  viewerIsOwner: true,
  latestRevision: null,
  revisions: [{ number: 1, state: 'draft', changelog: '', publishedAt: null, updatedAt: '2026-12-01T10:00:00.000Z' }],
  updatedAt: '2026-12-01T10:00:00.000Z',
};

const fence: EditorPart = {
  id: 11,
  drawingId: 5,
  name: 'Fence',
  quantity: 1,
  quantityOverride: null,
  length: 300,
  width: 40,
  thickness: 18,
  material: 'beech',
  stock: 'solid',
  grain: 'length',
  updatedAt: '2026-12-01T10:00:01.000Z',
};

const draft: EditorRevision = {
  planSlug: 'bench-hook',
  number: 1,
  state: 'draft',
  editable: true,
  changelog: '',
  notes: '',
  safetyNotes: '',
  hardware: [],
  publishedAt: null,
  updatedAt: '2026-12-01T10:00:00.000Z',
  drawings: [
    {
      id: 5,
      originalName: 'bench-hook.dxf',
      size: 2048,
      units: 'mm',
      needsUnits: false,
      status: 'done',
      error: null,
      entityCount: 12,
      analysis: null,
    },
  ],
  parts: [fence],
  attachments: [],
};

type Handler = (body: unknown) => Response;

/** Answers like the server for the signed-in designer; each route may answer differently on each call. */
function serveApi(routes: Record<string, Handler | Handler[]>) {
  const sent: Array<{ method: string; url: string; body?: unknown }> = [];
  const calls = new Map<string, number>();
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = String(input);
      const method = init?.method ?? 'GET';
      const body = init?.body ? JSON.parse(String(init.body)) : undefined;
      if (method !== 'GET') sent.push({ method, url, body });
      if (url === '/api/me') return Response.json(designer);
      const key = `${method} ${url}`;
      const route = routes[key];
      if (!route) return Response.json({ statusCode: 404, code: 'not_found', message: 'No' }, { status: 404 });
      const n = calls.get(key) ?? 0;
      calls.set(key, n + 1);
      const handler = Array.isArray(route) ? route[Math.min(n, route.length - 1)]! : route;
      return handler(body);
    }),
  );
  return sent;
}

const json =
  (value: unknown, status = 200) =>
  () =>
    Response.json(value, { status });
const field = (name: string) => screen.getByRole('textbox', { name: new RegExp(`^${name}`) }) as HTMLInputElement;

describe('creating a plan', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows what is missing beside each field before sending anything', async () => {
    const sent = serveApi({});
    renderAppAt('/workshop/new-plan');
    fireEvent.click(await screen.findByRole('button', { name: 'Create the plan' }, { timeout: 10_000 }));
    expect(await screen.findByText('The title needs 3 to 120 characters.')).toBeTruthy();
    expect(screen.getByText('The summary needs 10 to 500 characters.')).toBeTruthy();
    expect(screen.getByText('Choose a category from the list.')).toBeTruthy();
    expect(screen.getByText('Choose one of the open licences.')).toBeTruthy();
    expect(sent).toEqual([]);
    // The message sits in the title's own field, and goes once the title is long enough.
    fireEvent.change(field('Title'), { target: { value: 'Bench hook' } });
    await waitFor(() => expect(screen.queryByText('The title needs 3 to 120 characters.')).toBeNull());
    expect(screen.getByText('The summary needs 10 to 500 characters.')).toBeTruthy();
  });

  it("puts the server's validation details beside their fields, then opens the new draft in the editor", async () => {
    const sent = serveApi({
      'POST /api/plans': [
        json(
          {
            statusCode: 400,
            code: 'validation_failed',
            message: 'The request is not valid.',
            details: ['Each tag needs 1 to 30 characters.'],
          },
          400,
        ),
        json(plan, 201),
      ],
      'GET /api/plans/bench-hook': json(plan),
      'GET /api/plans/bench-hook/revisions/1': json(draft),
    });
    const router = renderAppAt('/workshop/new-plan');
    fireEvent.change(await screen.findByRole('textbox', { name: /^Title/ }, { timeout: 10_000 }), {
      target: { value: 'Bench hook' },
    });
    fireEvent.change(field('Summary'), { target: { value: 'A bench hook for crosscuts with a hand saw.' } });
    fireEvent.change(screen.getByRole('combobox', { name: /^Category/ }), { target: { value: 'other' } });
    fireEvent.change(screen.getByRole('combobox', { name: /^Licence/ }), { target: { value: 'CC-BY-4.0' } });
    fireEvent.change(field('Tags'), { target: { value: 'Hand Tools, hand tools' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create the plan' }));
    // Lower-cased, the two tags are one tag twice: the form says so itself.
    expect(await screen.findByText('Each tag once.')).toBeTruthy();
    expect(sent).toEqual([]);

    fireEvent.change(field('Tags'), { target: { value: 'hand tools' } });
    fireEvent.click(screen.getByRole('checkbox', { name: 'hand saw' }));
    fireEvent.click(screen.getByRole('button', { name: 'Create the plan' }));
    expect(await screen.findByText('Each tag needs 1 to 30 characters.')).toBeTruthy();
    expect(sent[0]).toEqual({
      method: 'POST',
      url: '/api/plans',
      body: {
        title: 'Bench hook',
        summary: 'A bench hook for crosscuts with a hand saw.',
        category: 'other',
        tags: ['hand tools'],
        toolsNeeded: ['hand-saw'],
        licence: 'CC-BY-4.0',
        motorised: false,
      },
    });

    fireEvent.click(screen.getByRole('button', { name: 'Create the plan' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/plans/bench-hook/r/1/edit'));
    expect(await screen.findByRole('region', { name: 'Drawings' })).toBeTruthy();
  });
});

describe('the revision editor', () => {
  afterEach(() => vi.unstubAllGlobals());

  const openEditor = async () => {
    renderAppAt('/plans/bench-hook/r/1/edit');
    return (await screen.findByRole('textbox', { name: 'Build notes' }, { timeout: 10_000 })) as HTMLTextAreaElement;
  };

  it('saves the text with the updatedAt it loaded, and after a 409 keeps what was typed and saves it over the newer one', async () => {
    const newer = { ...draft, notes: 'Written in another tab', updatedAt: '2026-12-01T10:05:00.000Z' };
    const sent = serveApi({
      'GET /api/plans/bench-hook': json(plan),
      'GET /api/plans/bench-hook/revisions/1': [json(draft), json(newer)],
      'PATCH /api/plans/bench-hook/revisions/1': [
        json(
          {
            statusCode: 409,
            code: 'revision_changed',
            message: 'This draft was saved somewhere else (another tab or window) after you opened it.',
          },
          409,
        ),
        (body) => Response.json({ ...newer, ...(body as object), updatedAt: '2026-12-01T10:06:00.000Z' }),
      ],
    });
    const notes = await openEditor();
    fireEvent.change(notes, { target: { value: '# Build\nSaw the fence square.' } });
    expect(screen.getByText('Unsaved changes')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));

    const alert = await screen.findByText('This draft was saved in another tab or window after you opened it.');
    expect(alert).toBeTruthy();
    expect(notes.value).toBe('# Build\nSaw the fence square.');
    expect(sent[0]).toMatchObject({
      body: { expectedUpdatedAt: draft.updatedAt, notes: '# Build\nSaw the fence square.' },
    });

    fireEvent.click(screen.getByRole('button', { name: 'Reload, keep my text' }));
    await waitFor(() =>
      expect(screen.queryByText('This draft was saved in another tab or window after you opened it.')).toBeNull(),
    );
    expect(notes.value).toBe('# Build\nSaw the fence square.');
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('All changes saved')).toBeTruthy();
    expect(sent[1]).toMatchObject({
      body: { expectedUpdatedAt: newer.updatedAt, notes: '# Build\nSaw the fence square.' },
    });
  });

  it('saves the plan details with the plan’s updatedAt, and after a 409 loads the saved copy keeping what was typed', async () => {
    const newer = { ...plan, summary: 'Changed in another tab.', updatedAt: '2026-12-01T10:07:00.000Z' };
    const sent = serveApi({
      'GET /api/plans/bench-hook': [json(plan), json(newer)],
      'GET /api/plans/bench-hook/revisions/1': json(draft),
      'PATCH /api/plans/bench-hook': [
        json({ statusCode: 409, code: 'plan_changed', message: 'This plan’s details were saved somewhere else.' }, 409),
        (body) => Response.json({ ...newer, ...(body as object), updatedAt: '2026-12-01T10:08:00.000Z' }),
      ],
    });
    await openEditor();
    const details = screen.getByRole('region', { name: 'Plan details' });
    const title = within(details).getByRole('textbox', { name: /^Title/ }) as HTMLInputElement;
    fireEvent.change(title, { target: { value: 'Bench hook with a fence' } });
    fireEvent.click(within(details).getByRole('button', { name: 'Save details' }));
    expect(await within(details).findByText('This plan’s details were saved somewhere else.')).toBeTruthy();
    expect(sent[0]).toMatchObject({
      method: 'PATCH',
      body: { expectedUpdatedAt: plan.updatedAt, title: 'Bench hook with a fence' },
    });
    fireEvent.click(within(details).getByRole('button', { name: 'Load the saved details, keep what I typed' }));
    await waitFor(() =>
      expect(within(details).queryByText('This plan’s details were saved somewhere else.')).toBeNull(),
    );
    expect(title.value).toBe('Bench hook with a fence');
    fireEvent.click(within(details).getByRole('button', { name: 'Save details' }));
    expect(await within(details).findByText('Details saved.')).toBeTruthy();
    // Only the title was typed here: the summary saved in the other tab stays.
    expect(sent[1]).toMatchObject({
      body: {
        expectedUpdatedAt: newer.updatedAt,
        title: 'Bench hook with a fence',
        summary: 'Changed in another tab.',
      },
    });
  });

  it('shows the preview through the plan page’s Markdown, with no raw HTML', async () => {
    serveApi({ 'GET /api/plans/bench-hook': json(plan), 'GET /api/plans/bench-hook/revisions/1': json(draft) });
    const notes = await openEditor();
    fireEvent.change(notes, { target: { value: '## Glue-up\n\n<b>raw</b> and **bold**' } });
    const section = screen.getByRole('region', { name: 'Build notes' });
    fireEvent.click(within(section).getByRole('tab', { name: 'Preview' }));
    // The plan page shifts a designer's h2 below its own section headings.
    expect(await within(section).findByRole('heading', { level: 4, name: 'Glue-up' })).toBeTruthy();
    expect(within(section).getByText('bold').tagName).toBe('STRONG');
    expect(section.querySelector('b')).toBeNull();
  });

  it('lists what is missing when the server finds the revision incomplete', async () => {
    const details = ['Upload a drawing and let it be analysed.', 'Wait until every drawing is analysed.'];
    serveApi({
      'GET /api/plans/bench-hook': json(plan),
      'GET /api/plans/bench-hook/revisions/1': json(draft),
      'POST /api/plans/bench-hook/revisions/1/submit': json(
        { statusCode: 400, code: 'revision_incomplete', message: 'This revision is not complete yet.', details },
        400,
      ),
    });
    await openEditor();
    fireEvent.click(screen.getByRole('button', { name: 'Submit for review' }));
    const checklist = await screen.findByRole('list', { name: 'What is missing' });
    expect(
      within(checklist)
        .getAllByRole('listitem')
        .map((item) => item.textContent?.replace('☐', '')),
    ).toEqual(details);
  });

  it('saves a part with its own updatedAt, and on a 409 keeps the typed values and says what happened', async () => {
    const sent = serveApi({
      'GET /api/plans/bench-hook': json(plan),
      'GET /api/plans/bench-hook/revisions/1': json(draft),
      'PATCH /api/plans/bench-hook/revisions/1/parts/11': json(
        { statusCode: 409, code: 'part_changed', message: 'The part “Fence” was saved somewhere else.' },
        409,
      ),
    });
    await openEditor();
    const material = screen.getByRole('textbox', { name: 'Material of Fence' }) as HTMLInputElement;
    fireEvent.change(material, { target: { value: 'maple' } });
    fireEvent.change(screen.getByRole('textbox', { name: 'Thickness (mm) of Fence' }), { target: { value: '19' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save Fence' }));
    expect(await screen.findByText(/“Fence” was changed in another tab or window/)).toBeTruthy();
    expect(material.value).toBe('maple');
    expect(sent).toEqual([
      {
        method: 'PATCH',
        url: '/api/plans/bench-hook/revisions/1/parts/11',
        body: {
          expectedUpdatedAt: fence.updatedAt,
          name: 'Fence',
          material: 'maple',
          thickness: 19,
          stock: 'solid',
          grain: 'length',
          quantityOverride: null,
        },
      },
    ]);
  });

  it('withdraws a submitted revision back to an editable draft', async () => {
    const submitted = { ...draft, state: 'submitted' as const, editable: false };
    const withdrawn = { ...draft, updatedAt: '2026-12-01T11:00:00.000Z' };
    const sent = serveApi({
      'GET /api/plans/bench-hook': json({ ...plan, revisions: [{ ...plan.revisions[0]!, state: 'submitted' }] }),
      'GET /api/plans/bench-hook/revisions/1': [json(submitted), json(withdrawn)],
      'POST /api/plans/bench-hook/revisions/1/withdraw': json(withdrawn),
    });
    renderAppAt('/plans/bench-hook/r/1/edit');
    expect(await screen.findByText('r1 · Waiting for review', {}, { timeout: 10_000 })).toBeTruthy();
    // Read-only: the notes are shown, not offered for writing.
    expect(screen.queryByRole('textbox', { name: 'Build notes' })).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Withdraw to edit' }));
    expect(await screen.findByRole('textbox', { name: 'Build notes' })).toBeTruthy();
    expect(screen.getByText('r1 · Draft')).toBeTruthy();
    expect(sent).toEqual([{ method: 'POST', url: '/api/plans/bench-hook/revisions/1/withdraw', body: undefined }]);
  });

  it('starts the next revision from a published one and opens it', async () => {
    const published = {
      ...draft,
      state: 'published' as const,
      editable: false,
      publishedAt: '2026-12-01T12:00:00.000Z',
    };
    const publishedPlan = {
      ...plan,
      revisions: [{ ...plan.revisions[0]!, state: 'published' as const, publishedAt: published.publishedAt }],
    };
    const r2 = { ...draft, number: 2 };
    const sent = serveApi({
      'GET /api/plans/bench-hook': json(publishedPlan),
      'GET /api/plans/bench-hook/revisions/1': json(published),
      'GET /api/plans/bench-hook/revisions/2': json(r2),
      'POST /api/plans/bench-hook/revisions': json(r2, 201),
    });
    const router = renderAppAt('/plans/bench-hook/r/1/edit');
    fireEvent.click(await screen.findByRole('button', { name: 'Start a new revision' }, { timeout: 10_000 }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/plans/bench-hook/r/2/edit'));
    expect(sent).toEqual([{ method: 'POST', url: '/api/plans/bench-hook/revisions', body: undefined }]);
  });

  it('asks before leaving with unsaved text', async () => {
    serveApi({ 'GET /api/plans/bench-hook': json(plan), 'GET /api/plans/bench-hook/revisions/1': json(draft) });
    const notes = await openEditor();
    fireEvent.change(notes, { target: { value: 'Half a thought' } });
    fireEvent.click(screen.getAllByRole('link', { name: 'My workshop' })[0]!);
    const dialog = await screen.findByRole('alertdialog');
    expect(within(dialog).getByText('Leave without saving?')).toBeTruthy();
    fireEvent.click(within(dialog).getByRole('button', { name: 'Stay here' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).toBeNull());
    expect(notes.value).toBe('Half a thought');
  });
});
