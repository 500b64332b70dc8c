/**
 * Query keys under the plans feature's own `['plans', 'detail', slug]`, so that invalidating a plan
 * refreshes its page as well as these screens.
 */
export const ownPlanKey = (slug: string) => ['plans', 'detail', slug] as const;
export const editorRevisionKey = (slug: string, number: number) =>
  ['plans', 'detail', slug, 'revisions', number, 'editor'] as const;
export const myPlansKey = ['me', 'plans'] as const;

export const planPath = (slug: string) => `/plans/${encodeURIComponent(slug)}`;
export const revisionPath = (slug: string, number: number) => `${planPath(slug)}/revisions/${number}`;
