import { render } from '@testing-library/react';
import { RouterProvider } from 'react-router';
import { AppProvider } from '../app/provider';
import { createTestRouter } from '../app/router';
import { createQueryClient } from '../lib/query-client';

/** Renders the real app, routes and providers included, at a path; returns its router. */
export function renderAppAt(path: string) {
  const queryClient = createQueryClient();
  const router = createTestRouter(queryClient, path);
  render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return router;
}
