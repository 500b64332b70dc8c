import { CSV_COLUMNS } from '@jigwright/core';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderAppAt } from '../../testing/render-app';
import { catchDownloads, readBlob } from '../../testing/downloads';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';

const passRects = (board: 'A' | 'B') => document.querySelectorAll(`svg[data-board="${board}"] rect[data-pass]`).length;

// The route module is loaded lazily; the first test to open it waits for the import.
const findPage = () => screen.findByRole('heading', { name: 'Finger joints' }, { timeout: 10_000 });

const tableRows = () =>
  within(screen.getByRole('table', { name: 'Cut table' }))
    .getAllByRole('row')
    .slice(1);

// Each test renders the whole page in jsdom several times; on a busy machine that takes a while.
describe('the finger joint calculator', { timeout: 30_000 }, () => {
  beforeEach(() => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Response.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 })),
    );
  });
  afterEach(() => vi.unstubAllGlobals());

  it('is listed on the Calculators page', async () => {
    renderAppAt('/calculators');
    const link = await screen.findByRole('link', { name: 'Finger joints' });
    expect(link.getAttribute('href')).toBe('/calculators/finger-joints');
  });

  it('draws the joint of the link it was opened with, one pass rectangle per table row', async () => {
    renderAppAt('/calculators/finger-joints?units=mm&start=pin&width=100&pin=10&kerf=3.2');
    expect(await findPage()).toBeTruthy();
    expect((screen.getByRole('textbox', { name: 'Board width' }) as HTMLInputElement).value).toBe('100');
    const rows = tableRows();
    expect(rows.length).toBe(passRects('A') + passRects('B'));
    expect(rows.filter((row) => row.textContent?.startsWith('A')).length).toBe(passRects('A'));
    // No lead in the link: positions only, no step table.
    expect(screen.getByText(/Give the screw lead/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Download C header' }).hasAttribute('disabled')).toBe(true);
    expect(screen.getByRole('region', { name: 'Caution: powered saw or router' }).textContent).toContain(
      "tool maker's instructions come first",
    );
  });

  it('gives every control an accessible name', async () => {
    renderAppAt('/calculators/finger-joints');
    await findPage();
    const boxes = [
      'Board width',
      'Pin width',
      'Slot width',
      'Kerf (cutter width)',
      'Lead',
      'Steps per revolution',
      'Microstepping',
      'Backlash',
      'Controller step rate',
      'Root diameter',
      'Length between bearings',
    ];
    const selects = ['Screw given as', 'Motor given as', 'End fixity'];
    boxes.forEach((name) => expect(screen.getByRole('textbox', { name })).toBeTruthy());
    selects.forEach((name) => expect(screen.getByRole('combobox', { name })).toBeTruthy());
    expect(screen.getAllByRole('textbox')).toHaveLength(boxes.length);
    expect(screen.getAllByRole('combobox')).toHaveLength(selects.length);
    expect(screen.getAllByRole('radiogroup').map((group) => group.getAttribute('aria-labelledby'))).not.toContain(null);
    expect(screen.getByRole('radiogroup', { name: 'Board A starts with' })).toBeTruthy();
    for (const button of screen.getAllByRole('button')) expect(button.textContent?.trim()).not.toBe('');
  });

  it('keeps the URL in step as you type, replacing the entry', async () => {
    const user = userEvent.setup();
    const router = renderAppAt('/calculators/finger-joints');
    await findPage();
    const pin = await screen.findByRole('textbox', { name: 'Pin width' });
    const before = router.state.historyAction;
    await user.tripleClick(pin);
    await user.paste('20');
    const search = new URLSearchParams(router.state.location.search);
    expect(search.get('pin')).toBe('20');
    expect(router.state.historyAction).toBe('REPLACE');
    expect(before).not.toBe('PUSH');
    expect(screen.getByRole('link', { name: 'Link to these inputs' }).getAttribute('href')).toContain('pin=20');
  });

  it('shows the core’s message beside a bad box and keeps the last picture', async () => {
    const user = userEvent.setup();
    renderAppAt('/calculators/finger-joints?units=mm&width=100&pin=10&kerf=3.2');
    await findPage();
    const kerf = await screen.findByRole('textbox', { name: 'Kerf (cutter width)' });
    const rowsBefore = tableRows().length;
    await user.tripleClick(kerf);
    await user.paste('25');
    expect(kerf.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText(/wider than board A's slots/)).toBeTruthy();
    expect(screen.getByRole('status').textContent).toContain('last inputs that worked');
    expect(tableRows().length).toBe(rowsBefore);
    expect(passRects('A') + passRects('B')).toBe(rowsBefore);
    expect(screen.getByRole('button', { name: 'Download CSV' }).hasAttribute('disabled')).toBe(true);
  });

  it('switches to inches without changing the joint', async () => {
    const user = userEvent.setup();
    const router = renderAppAt('/calculators/finger-joints?units=mm&width=127&pin=12.7&kerf=3.175');
    await findPage();
    const firstRows = tableRows().map((row) => row.textContent);
    await user.click(within(screen.getByRole('radiogroup', { name: 'Units' })).getByRole('radio', { name: 'in' }));
    // 127 mm = 5 in and 12.7 mm = 1/2 in exactly (1 in = 25.4 mm, NBS 1959).
    // The segment group reports its change after the click's event handler has returned.
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('units')).toBe('in'), {
      timeout: 10_000,
    });
    expect((screen.getByRole('textbox', { name: 'Board width' }) as HTMLInputElement).value).toBe('5');
    expect((screen.getByRole('textbox', { name: 'Pin width' }) as HTMLInputElement).value).toBe('0.5');
    expect(new URLSearchParams(router.state.location.search).get('units')).toBe('in');
    expect(tableRows().map((row) => row.textContent)).toEqual(firstRows);
  });

  it('builds the CSV download from the core’s export', async () => {
    const user = userEvent.setup();
    const { files: created, clicks: click } = catchDownloads();
    renderAppAt('/calculators/finger-joints?units=mm&width=100&pin=10&kerf=3.2');
    await findPage();
    await user.click(screen.getByRole('button', { name: 'Download CSV' }));
    expect(click).toHaveBeenCalledTimes(1);
    const blob = created[0];
    if (blob === undefined) throw new Error('no file was made');
    const text = await readBlob(blob);
    expect(text.split('\r\n')[0]).toBe(CSV_COLUMNS.join(','));
    expect(text.trimEnd().split('\r\n')).toHaveLength(tableRows().length + 1);
    vi.restoreAllMocks();
  });
});

describe('saving the calculator’s inputs to a plan', { timeout: 30_000 }, () => {
  afterEach(() => vi.unstubAllGlobals());

  const me = {
    id: 1,
    login: 'demo-designer',
    displayName: 'Ilse',
    avatarUrl: null,
    email: 'designer@example.com',
    role: 'member',
    suspended: false,
    units: 'mm',
    memberSince: '2026-11-02T10:00:00.000Z',
  };
  const myPlans = {
    items: [
      { slug: 'sled', title: 'A sled', category: 'sled', revisions: [{ number: 1, state: 'draft' }] },
      {
        slug: 'indexer',
        title: 'Lead-screw indexer',
        category: 'indexing-jig',
        revisions: [
          { number: 1, state: 'published' },
          { number: 2, state: 'draft' },
        ],
      },
    ],
    total: 2,
    page: 1,
    pageSize: 100,
  };

  function serve(patch: (body: unknown) => Response) {
    const sent: unknown[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
        const url = String(input);
        if (url === '/api/me') return Response.json(me);
        if (url === '/api/me/plans?pageSize=100') return Response.json(myPlans);
        if (url === '/api/plans/indexer/revisions/2' && (init?.method ?? 'GET') === 'GET')
          return Response.json({ updatedAt: '2026-12-01T10:00:00.123Z' });
        if (url === '/api/plans/indexer/revisions/2' && init?.method === 'PATCH') {
          const body = JSON.parse(String(init.body));
          sent.push(body);
          return patch(body);
        }
        return Response.json({ statusCode: 404, code: 'not_found', message: 'No' }, { status: 404 });
      }),
    );
    return sent;
  }

  it('offers only drafts of indexing-jig plans and saves the inputs with the draft’s updatedAt', async () => {
    const sent = serve((body) => Response.json(body));
    renderAppAt('/calculators/finger-joints?units=mm&start=pin&width=100&pin=10&kerf=3.2');
    const form = await screen.findByRole('form', { name: 'Save to a plan' }, { timeout: 10_000 });
    const options = within(form)
      .getAllByRole('option')
      .map((option) => option.textContent);
    expect(options).toEqual(['Lead-screw indexer, r2']);
    const name = within(form).getByRole('textbox', { name: 'Name of the set' }) as HTMLInputElement;
    expect(name.value).toBe('10 mm fingers across a 100 mm board, 3.2 mm kerf');
    await userEvent.click(within(form).getByRole('button', { name: 'Save to r2 of Lead-screw indexer' }));
    expect((await within(form).findByRole('status')).textContent).toContain('Saved to Lead-screw indexer, r2.');
    expect(sent).toEqual([
      {
        expectedUpdatedAt: '2026-12-01T10:00:00.123Z',
        indexing: {
          name: '10 mm fingers across a 100 mm board, 3.2 mm kerf',
          inputs: expect.objectContaining({ units: 'mm', start: 'pin', width: 100, pin: 10, kerf: 3.2 }),
        },
      },
    ]);
  });

  it('says plainly when the draft changed in another tab, and overwrites nothing', async () => {
    serve(() =>
      Response.json(
        { statusCode: 409, code: 'revision_changed', message: 'This draft was saved elsewhere.' },
        { status: 409 },
      ),
    );
    renderAppAt('/calculators/finger-joints?units=mm&start=pin&width=100&pin=10&kerf=3.2');
    const form = await screen.findByRole('form', { name: 'Save to a plan' }, { timeout: 10_000 });
    await userEvent.click(within(form).getByRole('button', { name: /^Save to r2/ }));
    expect((await within(form).findByRole('alert')).textContent).toContain('Nothing was overwritten');
  });
});
