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
