import type { Outbox } from './outbox';
import { forgetPersistedQueries } from './query-persistence';

// Workbox names its precache "workbox-precache-v2-<scope>": the app's own files, nothing of the shop's.
const isAppShell = (cacheName: string) => cacheName.startsWith('workbox-precache');

/** The service worker's runtime caches (cure-check photos): the shop's data, so they go on sign-out. */
export async function forgetRuntimeCaches(): Promise<void> {
  if (typeof caches === 'undefined') return;
  const names = await caches.keys();
  await Promise.all(names.filter((name) => !isAppShell(name)).map((name) => caches.delete(name)));
}

/**
 * Everything of the shop this device keeps for offline use: the stored copy of the pages, the photos the service
 * worker cached and, on a deliberate sign-out, what was logged and not sent (the person was told and agreed).
 */
export async function forgetDeviceData(outbox: Outbox, { unsent }: { unsent: boolean }): Promise<void> {
  await Promise.all([
    forgetPersistedQueries().catch(() => undefined),
    forgetRuntimeCaches().catch(() => undefined),
    unsent ? outbox.clear() : Promise.resolve(),
  ]);
}
