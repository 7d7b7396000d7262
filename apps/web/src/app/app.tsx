import { onlineManager } from '@tanstack/react-query';
import type { ReactElement } from 'react';
import { RouterProvider } from 'react-router';
import { authKeys } from '../lib/resources/session';
import { refreshAfterSent } from '../features/pours/api/refresh-after-sent';
import type { MeResponse } from '@gelpoint/contracts';
import { forgetDeviceData } from '../lib/offline/device-data';
import { Outbox } from '../lib/offline/outbox';
import { OutboxProvider } from '../lib/offline/outbox-context';
import { startQueryPersistence } from '../lib/offline/query-persistence';
import { createQueryClient } from '../lib/query-client';
import { AppProviders } from './providers';
import { createAppRouter, type AppRouter } from './router';
import { createSessionControl } from './session-control';

/**
 * Wires the query cache, the router, the session handling and the phone's offline keeping together, once per page
 * load. The stored copy of the pages is put back before the router starts, so its loaders find it offline.
 */
export async function createApp(): Promise<ReactElement> {
  let router: AppRouter | undefined;
  const queryClient = createQueryClient({ onSessionExpired: () => sessionControl.expired() });
  // The query library assumes a connection until told otherwise; a page opened offline must know at once.
  if (typeof navigator !== 'undefined') onlineManager.setOnline(navigator.onLine);
  const outbox = new Outbox({
    currentOwner: () => {
      const session = queryClient.getQueryData<MeResponse | null>(authKeys.session());
      return session ? { userId: session.user.id, shopId: session.shop.id } : null;
    },
    onSent: (entry) => void refreshAfterSent(queryClient, entry.pourId),
  });
  const sessionControl = createSessionControl(
    queryClient,
    () => {
      if (!router) throw new Error('The router is used before it exists; create it right after the query client.');
      return router;
    },
    { forget: (options) => forgetDeviceData(outbox, options) },
  );
  await startQueryPersistence(queryClient, { askAgain: [authKeys.session()] });
  outbox.start();
  router = createAppRouter(queryClient);

  return (
    <AppProviders queryClient={queryClient} sessionControl={sessionControl}>
      <OutboxProvider outbox={outbox}>
        <RouterProvider router={router} />
      </OutboxProvider>
    </AppProviders>
  );
}
