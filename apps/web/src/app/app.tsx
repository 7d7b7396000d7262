import type { ReactElement } from 'react';
import { RouterProvider } from 'react-router';
import { createQueryClient } from '../lib/query-client';
import { AppProviders } from './providers';
import { createAppRouter, type AppRouter } from './router';
import { createSessionControl } from './session-control';

/** Wires the query cache, the router and the session handling together, once per page load. */
export function createApp(): ReactElement {
  let router: AppRouter | undefined;
  const queryClient = createQueryClient({ onSessionExpired: () => sessionControl.expired() });
  const sessionControl = createSessionControl(queryClient, () => {
    if (!router) throw new Error('The router is used before it exists; create it right after the query client.');
    return router;
  });
  router = createAppRouter(queryClient);

  return (
    <AppProviders queryClient={queryClient} sessionControl={sessionControl}>
      <RouterProvider router={router} />
    </AppProviders>
  );
}
