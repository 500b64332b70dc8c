import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, createMemoryRouter, type RouteObject } from 'react-router';
import { paths } from '../config/paths';
import { AppShell } from './routes/app-shell';
import { RouteErrorBoundary } from './routes/route-error';

type LoaderFactory = (queryClient: QueryClient) => RouteObject['loader'];

interface RouteModule {
  default: React.ComponentType;
  clientLoader?: LoaderFactory;
}

/** A lazily loaded route module whose loader prefetches through the one query client. */
function lazyRoute(load: () => Promise<RouteModule>, queryClient: QueryClient): RouteObject['lazy'] {
  return async () => {
    const { default: Component, clientLoader } = await load();
    return { Component, ...(clientLoader ? { loader: clientLoader(queryClient) } : {}) };
  };
}

export function appRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: '/',
      element: <AppShell />,
      errorElement: <RouteErrorBoundary />,
      children: [
        {
          errorElement: <RouteErrorBoundary />,
          children: [
            { index: true, lazy: lazyRoute(() => import('./routes/library'), queryClient) },
            { path: paths.plan.path, lazy: lazyRoute(() => import('./routes/plan'), queryClient) },
            { path: paths.calculators.path, lazy: lazyRoute(() => import('./routes/calculators'), queryClient) },
            { path: paths.fingerJoints.path, lazy: lazyRoute(() => import('./routes/finger-joints'), queryClient) },
            { path: paths.reviewDesk.path, lazy: lazyRoute(() => import('./routes/review-desk'), queryClient) },
            {
              path: paths.reviewSubmission.path,
              lazy: lazyRoute(() => import('./routes/review-submission'), queryClient),
            },
            { path: paths.workshop.path, lazy: lazyRoute(() => import('./routes/workshop'), queryClient) },
            { path: paths.newPlan.path, lazy: lazyRoute(() => import('./routes/new-plan'), queryClient) },
            {
              path: paths.revisionEditor.path,
              lazy: lazyRoute(() => import('./routes/revision-editor'), queryClient),
            },
            { path: paths.settings.path, lazy: lazyRoute(() => import('./routes/settings'), queryClient) },
            { path: paths.members.path, lazy: lazyRoute(() => import('./routes/members'), queryClient) },
            {
              path: paths.memberProfile.path,
              lazy: lazyRoute(() => import('./routes/member-profile'), queryClient),
            },
            { path: paths.signIn.path, lazy: lazyRoute(() => import('./routes/sign-in'), queryClient) },
            { path: '*', lazy: lazyRoute(() => import('./routes/not-found'), queryClient) },
          ],
        },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(appRoutes(queryClient));
}

/** The same routes in memory, for route-level tests. */
export function createTestRouter(queryClient: QueryClient, initialPath: string) {
  return createMemoryRouter(appRoutes(queryClient), { initialEntries: [initialPath] });
}
