import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Page, PlanCard } from '../../features/plans/api/types';
import '../../features/plans/test-pointer-events';
import { demoPlan, demoRevision } from '../../features/plans/test-revision';
import { renderAppAt } from '../../testing/render-app';

const sled = demoPlan('five-cut-crosscut-sled', [1, 2]);
const revisions = {
  1: demoRevision('five-cut-crosscut-sled', 1, 'sled.dxf'),
  2: demoRevision('five-cut-crosscut-sled', 2, 'sled.dxf'),
};
const card: PlanCard = { ...sled };

/** A stand-in for the API; records the library queries it was asked. */
function serve({ library }: { library: (query: URLSearchParams) => Page<PlanCard> }) {
  const asked: URLSearchParams[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL) => {
      const url = new URL(String(input), 'http://localhost');
      if (url.pathname === '/api/plans') {
        asked.push(url.searchParams);
        return Response.json(library(url.searchParams));
      }
      if (url.pathname === '/api/plans/five-cut-crosscut-sled') return Response.json(sled);
      const revision = /^\/api\/plans\/five-cut-crosscut-sled\/revisions\/(\d)$/.exec(url.pathname);
      if (revision) return Response.json(revisions[Number(revision[1]) as 1 | 2]);
      return Response.json({ statusCode: 401, code: 'not_signed_in', message: 'Sign in first.' }, { status: 401 });
    }),
  );
  return asked;
}

const findLibrary = () => screen.findByRole('heading', { name: 'Plan library' }, { timeout: 10_000 });

describe('the library', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('lists the plans the API finds, each card linking to its plan page', async () => {
    serve({ library: () => ({ items: [card], total: 1, page: 1, pageSize: 12 }) });
    renderAppAt('/');
    await findLibrary();
    const link = await screen.findByRole('link', { name: 'Five-cut crosscut sled' });
    expect(link.getAttribute('href')).toBe('/plans/five-cut-crosscut-sled');
    expect(screen.getByText('1 plan')).toBeTruthy();
  });

  it('says honestly when nothing is published yet, and otherwise that the filters found nothing', async () => {
    serve({ library: () => ({ items: [], total: 0, page: 1, pageSize: 12 }) });
    renderAppAt('/');
    expect(await screen.findByRole('heading', { name: 'No plans have been published yet' })).toBeTruthy();
    renderAppAt('/?category=sled');
    expect(await screen.findByRole('heading', { name: 'No plans match these filters' })).toBeTruthy();
  });

  it('puts the search, filters and sort in the URL, and the back button undoes them', async () => {
    const user = userEvent.setup();
    const asked = serve({ library: () => ({ items: [card], total: 30, page: 1, pageSize: 12 }) });
    const router = renderAppAt('/');
    await findLibrary();
    // Each change waits until the page shows it: the router commits a navigation in a transition.
    const category = screen.getByRole('combobox', { name: 'Category' }) as HTMLSelectElement;
    await user.selectOptions(category, 'sled');
    await waitFor(() => expect(category.value).toBe('sled'));
    const sort = screen.getByRole('combobox', { name: 'Sort by' }) as HTMLSelectElement;
    await user.selectOptions(sort, 'built');
    await waitFor(() => expect(sort.value).toBe('built'));
    const saw = screen.getByRole('checkbox', { name: 'table saw' }) as HTMLInputElement;
    await user.click(saw);
    await waitFor(() => expect(saw.checked).toBe(true));
    const built = screen.getByRole('checkbox', { name: 'Has build reports' }) as HTMLInputElement;
    await user.click(built);
    await waitFor(() => expect(built.checked).toBe(true));
    await user.type(screen.getByRole('searchbox', { name: 'Search plans' }), 'sled{Enter}');
    await waitFor(() =>
      expect(router.state.location.search).toBe('?q=sled&category=sled&tools=table-saw&built=yes&sort=built'),
    );
    await waitFor(() => expect(asked.at(-1)?.get('hasBuilds')).toBe('true'));
    expect(Object.fromEntries(asked.at(-1)!)).toMatchObject({
      q: 'sled',
      category: 'sled',
      tools: 'table-saw',
      sort: 'built',
    });
    const next = await screen.findByRole('link', { name: 'Next page' });
    await waitFor(() => expect(next.getAttribute('href')).toContain('q=sled'));
    await user.click(next);
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('page')).toBe('2'));
    await router.navigate(-1);
    await waitFor(() =>
      expect(router.state.location.search).toBe('?q=sled&category=sled&tools=table-saw&built=yes&sort=built'),
    );
    await router.navigate(-1);
    await waitFor(() =>
      expect(router.state.location.search).toBe('?category=sled&tools=table-saw&built=yes&sort=built'),
    );
    await waitFor(() =>
      expect((screen.getByRole('searchbox', { name: 'Search plans' }) as HTMLInputElement).value).toBe(''),
    );
    await router.navigate(-1);
    await waitFor(() =>
      expect((screen.getByRole('checkbox', { name: 'Has build reports' }) as HTMLInputElement).checked).toBe(false),
    );
    expect(router.state.location.search).toBe('?category=sled&tools=table-saw&sort=built');
  });
});

const findPlan = () => screen.findByRole('heading', { name: 'Five-cut crosscut sled', level: 1 }, { timeout: 10_000 });

describe('the plan page', () => {
  beforeEach(() => serve({ library: () => ({ items: [], total: 0, page: 1, pageSize: 12 }) }));
  afterEach(() => vi.unstubAllGlobals());

  it('shows the latest revision’s overview, drawing, cut list, hardware, notes without raw HTML and attachments', async () => {
    renderAppAt('/plans/five-cut-crosscut-sled');
    await findPlan();
    expect(await screen.findByRole('img', { name: 'Drawing sled.dxf, r2' })).toBeTruthy();
    expect(screen.getByText('Dana Designer')).toBeTruthy();
    // The 3D preview waits behind its button, so three.js is only fetched when asked for.
    expect(screen.getByRole('button', { name: 'Show in 3D' })).toBeTruthy();
    expect(screen.queryByTestId('preview-3d-canvas')).toBeNull();
    expect(screen.getAllByText(/^r2, /)).toHaveLength(2);
    expect(screen.getAllByRole('table').length).toBeGreaterThan(2);
    expect(
      within(screen.getByRole('table', { name: 'Hardware list' })).getByText('4 × 30 mm countersunk'),
    ).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Building it' })).toBeTruthy();
    expect(document.querySelector('script:not([src])')?.textContent ?? '').not.toContain('alert(1)');
    expect(screen.queryByText(/alert\(1\)/)).toBeNull();
    expect(screen.getByRole('link', { name: 'Download step-table.h' }).getAttribute('href')).toBe(
      '/api/plans/five-cut-crosscut-sled/revisions/2/attachments/7',
    );
  });

  it('always shows the safety notes with the power-tool cautions', async () => {
    renderAppAt('/plans/five-cut-crosscut-sled');
    await findPlan();
    const safety = await screen.findByRole('region', { name: 'Safety notes' });
    expect(safety.textContent).toContain('Keep the blade guard on.');
    expect(within(safety).getByRole('list', { name: 'Usual cautions' }).textContent).toContain(
      'Local codes, licensed practice',
    );
  });

  it('switches every measurement to inches and keeps it in the URL', async () => {
    const user = userEvent.setup();
    const router = renderAppAt('/plans/five-cut-crosscut-sled');
    await findPlan();
    await screen.findByRole('img', { name: 'Drawing sled.dxf, r2' });
    expect(screen.getAllByText(/ mm$/).length).toBeGreaterThan(0);
    await user.click(screen.getByRole('button', { name: 'Inches' }));
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('units')).toBe('in'));
    const cutList = screen.getByRole('region', { name: 'Cut list' });
    await waitFor(() => expect(within(cutList).queryAllByText(/\d mm$/)).toHaveLength(0));
    expect(within(cutList).getAllByText(/ in$/).length).toBeGreaterThan(0);
  });

  it('selects a part in the cut list from the drawing', async () => {
    const user = userEvent.setup();
    renderAppAt('/plans/five-cut-crosscut-sled');
    await findPlan();
    const name = revisions[2].parts[0]!.name;
    const drawn = await screen.findByRole('button', { name: new RegExp(`^${name}: `) });
    await user.click(drawn);
    expect(screen.getByRole('button', { name, pressed: true })).toBeTruthy();
  });

  it('shows an older revision from the history and compares two revisions part by part', async () => {
    const user = userEvent.setup();
    const router = renderAppAt('/plans/five-cut-crosscut-sled');
    await findPlan();
    const compare = await screen.findByRole('table', { name: 'Parts of r1 and r2' });
    expect(within(compare).getAllByRole('row').length).toBeGreaterThan(1);
    expect(screen.getByText(/parts differ between r1 and r2/)).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Show r1' }));
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('r')).toBe('1'));
    expect(await screen.findByRole('img', { name: 'Drawing sled.dxf, r1' })).toBeTruthy();
  });
});

describe('an indexing jig’s saved set on its plan page', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows the cut sequence worked out from the saved inputs, with the files and a link to the calculator', async () => {
    const inputs = {
      units: 'mm' as const,
      start: 'pin' as const,
      width: 100,
      pin: 10,
      kerf: 3.2,
      lead: 8,
      stepsPerRev: 200,
      microsteps: 16,
    };
    revisions[2] = { ...revisions[2], indexing: { name: '10 mm fingers', inputs } };
    try {
      serve({ library: () => ({ items: [], total: 0, page: 1, pageSize: 12 }) });
      renderAppAt('/plans/five-cut-crosscut-sled');
      await findPlan();
      const section = await screen.findByRole('region', { name: 'Cut sequence' });
      expect(section.textContent).toContain('10 mm fingers');
      expect(within(section).getByRole('table', { name: 'Cut table' })).toBeTruthy();
      expect(within(section).getAllByRole('button', { name: /^Download G-code, board [AB]$/ })).toHaveLength(2);
      expect(within(section).getByRole('button', { name: 'Download C header' })).toBeTruthy();
      const link = within(section).getByRole('link', { name: 'Open it in the finger-joint calculator' });
      expect(link.getAttribute('href')).toContain('/calculators/finger-joints?units=mm&start=pin');
      expect(link.getAttribute('href')).toContain('width=100');
    } finally {
      revisions[2] = { ...revisions[2], indexing: null };
    }
  });
});
