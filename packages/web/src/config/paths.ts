/** Every route of the app, with the function that builds its address. */
export const paths = {
  library: { path: '/', getHref: () => '/' },
  plan: { path: '/plans/:slug', getHref: (slug: string) => `/plans/${encodeURIComponent(slug)}` },
  calculators: { path: '/calculators', getHref: () => '/calculators' },
  fingerJoints: { path: '/calculators/finger-joints', getHref: () => '/calculators/finger-joints' },
  reviewDesk: { path: '/review', getHref: () => '/review' },
  reviewSubmission: {
    path: '/review/:slug/:number',
    getHref: (slug: string, number: number) => `/review/${encodeURIComponent(slug)}/${number}`,
  },
  workshop: { path: '/workshop', getHref: () => '/workshop' },
  newPlan: { path: '/workshop/new-plan', getHref: () => '/workshop/new-plan' },
  revisionEditor: {
    path: '/plans/:slug/r/:number/edit',
    getHref: (slug: string, number: number) => `/plans/${encodeURIComponent(slug)}/r/${number}/edit`,
  },
  settings: { path: '/settings', getHref: () => '/settings' },
  members: {
    path: '/members',
    getHref: ({ q, page }: { q?: string; page?: number } = {}) => {
      const query = new URLSearchParams({ ...(q ? { q } : {}), ...(page && page > 1 ? { page: String(page) } : {}) });
      return query.size ? `/members?${query}` : '/members';
    },
  },
  memberProfile: { path: '/members/:login', getHref: (login: string) => `/members/${encodeURIComponent(login)}` },
  signIn: {
    path: '/sign-in',
    getHref: (returnTo?: string) =>
      returnTo && returnTo !== '/' ? `/sign-in?returnTo=${encodeURIComponent(returnTo)}` : '/sign-in',
  },
} as const;

/** The server route that starts a sign-in with the provider. */
export function signInStartHref(returnTo = '/'): string {
  return `/api/auth/github?returnTo=${encodeURIComponent(returnTo)}`;
}
