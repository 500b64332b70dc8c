import { screen } from '@testing-library/react';
import { renderAppAt } from '../../testing/render-app';
import { afterEach, describe, expect, it, vi } from 'vitest';

/** Answers the API client's requests the way the server would, for one member or a visitor. */
function serveApi(me: object | null) {
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL) => {
      const url = String(input);
      if (url === '/api/me') {
        return me ? Response.json(me) : Response.json({ statusCode: 401, message: 'Unauthorized' }, { status: 401 });
      }
      return Response.json({ statusCode: 404, message: 'Not found' }, { status: 404 });
    }),
  );
}

const member = (role: string) => ({
  id: 1,
  login: `demo-${role}`,
  displayName: `Demo ${role}`,
  avatarUrl: null,
  email: `demo-${role}@example.com`,
  role,
  suspended: false,
});

describe('the app shell', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('offers a visitor the library, the calculators and sign-in, and nothing for members', async () => {
    serveApi(null);
    renderAppAt('/');
    expect(await screen.findByRole('link', { name: 'Sign in' })).toBeTruthy();
    const nav = screen.getByRole('navigation', { name: 'Main' });
    expect(nav.textContent).toContain('Library');
    expect(nav.textContent).toContain('Calculators');
    expect(nav.textContent).not.toContain('My workshop');
    expect(nav.textContent).not.toContain('Review desk');
  });

  it('shows a moderator the review desk and their name', async () => {
    serveApi(member('moderator'));
    renderAppAt('/');
    expect(await screen.findByText('Demo moderator')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Review desk' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'My workshop' })).toBeTruthy();
  });

  it('keeps the review desk from a member who is no moderator', async () => {
    serveApi(member('member'));
    renderAppAt('/review');
    expect(await screen.findByRole('heading', { name: 'Not open to you' })).toBeTruthy();
    expect(screen.getByRole('alert').textContent).toContain('The review desk is for moderators.');
    expect(screen.queryByRole('link', { name: 'Review desk' })).toBeNull();
  });

  it('sends a visitor who opens My workshop to sign-in, keeping the way back', async () => {
    serveApi(null);
    const router = renderAppAt('/workshop');
    expect(await screen.findByRole('heading', { name: 'Sign in to Jigwright' })).toBeTruthy();
    expect(router.state.location.pathname + router.state.location.search).toBe('/sign-in?returnTo=%2Fworkshop');
    const start = screen.getByRole('link', { name: 'Continue with GitHub' });
    expect(start.getAttribute('href')).toBe('/api/auth/github?returnTo=%2Fworkshop');
  });

  it('explains a failed sign-in by its code', async () => {
    serveApi(null);
    renderAppAt('/sign-in?error=no_verified_email');
    expect((await screen.findByRole('alert')).textContent).toContain('no verified e-mail address');
  });

  it('shows the not-found page for an unknown address', async () => {
    serveApi(null);
    renderAppAt('/plans/no-such-plan/extra');
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeTruthy();
  });
});
