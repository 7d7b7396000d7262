import { persistQueryClientRestore, persistQueryClientSubscribe } from '@tanstack/query-persist-client-core';
import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { keptForOfflineMs } from '../query-client';
import { createIdbPersister, shouldPersistQuery } from './query-persister';

const persister = createIdbPersister();
const buster = typeof __GELPOINT_BUILD_ID__ === 'string' ? __GELPOINT_BUILD_ID__ : 'source';

/**
 * Puts back what the signed-in pages last showed, then keeps the copy up to date. Awaited before the router starts,
 * so its loaders find the data with the network cut. A storage that fails (private mode, a full disk) only means
 * nothing is kept: the app works as it does online.
 */
export async function startQueryPersistence(queryClient: QueryClient, { askAgain }: { askAgain: readonly QueryKey[] }): Promise<void> {
  try {
    await persistQueryClientRestore({ queryClient, persister, buster, maxAge: keptForOfflineMs });
  } catch {
    // Already discarded by the restore; start empty.
  }
  // Who is signed in is asked again as soon as a page shows it (a sign-out in another tab, a session ended on the
  // server), but the copy stays until the server answers: the browser's online flag can be true with no way out,
  // and a page that waited on the answer would not open at all.
  // A copy that says nobody was signed in shows nothing offline, and may be out of date after a sign-in elsewhere.
  for (const queryKey of askAgain) {
    if (queryClient.getQueryData(queryKey) === null) queryClient.removeQueries({ queryKey, exact: true });
  }
  // Everything put back is as of the last visit: shown at once, and asked again by each page that shows it, so a
  // reload online reads what the server holds now (a member who joined, a cup logged on another phone).
  await queryClient.invalidateQueries({ refetchType: 'none' });
  persistQueryClientSubscribe({ queryClient, persister, buster, dehydrateOptions: { shouldDehydrateQuery: shouldPersistQuery } });
}

/** Forgets the stored copy (sign-out): nothing of the shop stays readable on the device. */
export async function forgetPersistedQueries(): Promise<void> {
  await persister.removeClient();
}
