import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { renderAppAt } from '../../testing/render-app';
import { afterEach, describe, expect, it, vi } from 'vitest';

const member = (login: string, role: string, extra: object = {}) => ({
  id: login.length,
  login,
  displayName: `Name of ${login}`,
  avatarUrl: null,
  email: `${login}@example.com`,
  role,
  suspended: false,
  units: 'mm',
  memberSince: '2026-11-02T10:00:00.000Z',
  suspendedAt: null,
  lastSignInAt: null,
  ...extra,
});

/** Answers like the server for one signed-in member, and records the changes the page sends. */
function serveApi(me: object, routes: Record<string, (init?: RequestInit) => Response> = {}) {
  const sent: Array<{ method: string; url: string; body?: unknown }> = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = String(input);
      const method = init?.method ?? 'GET';
      if (method !== 'GET') sent.push({ method, url, body: init?.body ? JSON.parse(String(init.body)) : undefined });
      if (url === '/api/me') return Response.json(me);
      const route = routes[`${method} ${url}`];
      return route
        ? route(init)
        : Response.json({ statusCode: 404, code: 'not_found', message: 'No' }, { status: 404 });
    }),
  );
  return sent;
}

describe('accounts screens', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('asks an admin to confirm before making a member a moderator, then sends the change', async () => {
    const builder = member('demo-builder', 'member');
    const sent = serveApi(member('demo-admin', 'admin'), {
      'GET /api/admin/members?page=1&pageSize=20': () =>
        Response.json({ items: [builder], total: 1, page: 1, pageSize: 20 }),
      'GET /api/admin/audit?pageSize=10': () => Response.json({ items: [], total: 0, page: 1, pageSize: 10 }),
      'POST /api/admin/members/demo-builder/moderator': () => Response.json({ ...builder, role: 'moderator' }),
    });
    renderAppAt('/members');
    fireEvent.click(await screen.findByRole('button', { name: 'Make Name of demo-builder a moderator' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(sent).toEqual([]);
    expect(within(dialog).getByText('Make Name of demo-builder a moderator?')).toBeTruthy();
    fireEvent.click(within(dialog).getByRole('button', { name: 'Make moderator' }));
    expect((await screen.findByRole('status')).textContent).toBe('Name of demo-builder is now a moderator.');
    expect(sent).toEqual([{ method: 'POST', url: '/api/admin/members/demo-builder/moderator', body: undefined }]);
  });

  it('keeps the Members page from a moderator', async () => {
    serveApi(member('demo-moderator', 'moderator'));
    renderAppAt('/members');
    expect(await screen.findByRole('heading', { name: 'Not open to you' })).toBeTruthy();
    expect(screen.getByRole('alert').textContent).toContain('The Members page is for admins.');
  });

  it('saves settings as one PATCH of what the form holds', async () => {
    const settings = {
      displayName: 'Name of demo-designer',
      units: 'mm',
      notifications: { revisionDecided: true, buildReported: true, planAdapted: true, flagResolved: true },
    };
    const sent = serveApi(member('demo-designer', 'member'), {
      'GET /api/members/demo-designer/settings': () => Response.json(settings),
      'PATCH /api/members/demo-designer/settings': (init) => Response.json(JSON.parse(String(init?.body))),
    });
    renderAppAt('/settings');
    const name = await screen.findByLabelText('Display name');
    fireEvent.change(name, { target: { value: '  Shop of Ash ' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save settings' }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0]).toEqual({
      method: 'PATCH',
      url: '/api/members/demo-designer/settings',
      body: { ...settings, displayName: 'Shop of Ash' },
    });
    expect((await screen.findByRole('status')).textContent).toBe('Settings saved.');
  });

  it('tells a suspended member that their settings are read-only', async () => {
    serveApi(member('demo-builder', 'member', { suspended: true }), {
      'GET /api/members/demo-builder/settings': () =>
        Response.json({
          displayName: 'x',
          units: 'in',
          notifications: { revisionDecided: true, buildReported: false, planAdapted: true, flagResolved: true },
        }),
    });
    renderAppAt('/settings');
    expect((await screen.findByRole('status')).textContent).toContain('Your account is suspended');
    expect((screen.getByRole('button', { name: 'Save settings' }) as HTMLButtonElement).disabled).toBe(true);
  });

  it('shows another member’s profile with honest empty sections and no settings link', async () => {
    serveApi(member('demo-admin', 'admin'), {
      'GET /api/members/demo-designer': () => Response.json(member('demo-designer', 'member')),
    });
    renderAppAt('/members/demo-designer');
    expect(await screen.findByRole('heading', { name: 'Name of demo-designer', level: 1 })).toBeTruthy();
    expect(screen.getByText('No published plans yet')).toBeTruthy();
    expect(screen.getByText('No build reports yet')).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Edit settings' })).toBeNull();
  });
});

describe('the shop profile', () => {
  afterEach(() => vi.unstubAllGlobals());

  const settings = {
    displayName: 'Name of demo-builder',
    units: 'in',
    notifications: { revisionDecided: true, buildReported: true, planAdapted: true, flagResolved: true },
  };
  const defaults = {
    kerf: 3.2,
    edgeTrim: 0,
    sheets: [{ length: 2440, width: 1220 }],
    barLengths: [2400],
    solidAllowance: { length: 25, width: 6, thickness: 3 },
    currency: 'EUR',
    prices: [],
    saved: false,
    updatedAt: null,
  };

  it('is edited in the member’s units and saved whole, with a retyped fraction in millimetres', async () => {
    const sent = serveApi(member('demo-builder', 'member', { units: 'in' }), {
      'GET /api/members/demo-builder/settings': () => Response.json(settings),
      'GET /api/members/demo-builder/shop-profile': () => Response.json(defaults),
      'PUT /api/members/demo-builder/shop-profile': (init) =>
        Response.json({ ...JSON.parse(String(init?.body)), saved: true, updatedAt: '2026-12-02T01:00:00.000Z' }),
    });
    renderAppAt('/settings');
    const form = await screen.findByRole('form', { name: 'Shop profile' }, { timeout: 10_000 });
    const kerf = within(form).getByLabelText('Blade kerf') as HTMLInputElement;
    expect(kerf.value).toBe('1/8');
    fireEvent.change(kerf, { target: { value: '3/32' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add a price' }));
    const price = within(form).getByRole('group', { name: 'Price 1' });
    fireEvent.change(within(price).getByLabelText('Material'), { target: { value: 'Baltic birch plywood' } });
    fireEvent.change(within(price).getByLabelText('Price (EUR)'), { target: { value: '58.50' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save shop profile' }));
    await screen.findByText('Shop profile saved.');
    expect(sent).toHaveLength(1);
    const body = sent[0]!.body as typeof defaults;
    // 3/32 in × 25.4 mm/in (NIST SP 811, B.8); the untouched sheet stays exactly 2440 × 1220 mm.
    expect(body.kerf).toBeCloseTo(2.38125, 9);
    expect(body.sheets).toEqual([{ length: 2440, width: 1220 }]);
    expect(body.prices).toEqual([{ material: 'Baltic birch plywood', per: 'sheet', amount: 58.5 }]);
  });

  it('marks a wrong value beside its field and sends nothing', async () => {
    const sent = serveApi(member('demo-builder', 'member'), {
      'GET /api/members/demo-builder/settings': () => Response.json({ ...settings, units: 'mm' }),
      'GET /api/members/demo-builder/shop-profile': () => Response.json(defaults),
    });
    renderAppAt('/settings');
    const form = await screen.findByRole('form', { name: 'Shop profile' }, { timeout: 10_000 });
    fireEvent.change(within(form).getByLabelText('Sheet 1 width'), { target: { value: '40' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save shop profile' }));
    expect(await within(form).findByText('Between 100 mm and 6000 mm.')).toBeTruthy();
    expect(sent).toEqual([]);
  });
});
