import type { PersistedClient, Persister } from '@tanstack/query-persist-client-core';
import type { Query } from '@tanstack/react-query';
import { createStore, del, get, set } from 'idb-keyval';

const store = () => createStore('gelpoint-query-cache', 'clients');
const clientKey = 'signed-in';
/** Writes wait for the cache to settle: a page load changes it dozens of times within a second. */
const writeAfterMs = 800;

/**
 * Keeps the query cache in IndexedDB (structured clone, so dates and nested values come back as they were), so a
 * page that was open before the network dropped shows its last data after a reload.
 */
export function createIdbPersister(): Persister {
  let pending: PersistedClient | undefined;
  let timer: ReturnType<typeof setTimeout> | undefined;
  const flush = async () => {
    timer = undefined;
    const client = pending;
    pending = undefined;
    if (client) await set(clientKey, client, store());
  };
  // A page being left (a reload, a tab closed) writes what is pending instead of dropping it.
  if (typeof window !== 'undefined') window.addEventListener('pagehide', () => void flush());
  return {
    persistClient: (client) => {
      pending = client;
      timer ??= setTimeout(() => void flush(), writeAfterMs);
    },
    restoreClient: () => get<PersistedClient>(clientKey, store()),
    removeClient: async () => {
      if (timer) clearTimeout(timer);
      timer = undefined;
      pending = undefined;
      await del(clientKey, store());
    },
  };
}

/** Only answers worth showing offline: finished, and not raw file bytes (a mould file can be many megabytes). */
export function shouldPersistQuery(query: Pick<Query, 'state' | 'meta'>): boolean {
  if (query.state.status !== 'success') return false;
  if (query.meta?.persist === false) return false;
  const data = query.state.data;
  return !(data instanceof ArrayBuffer || ArrayBuffer.isView(data) || (typeof Blob !== 'undefined' && data instanceof Blob));
}
