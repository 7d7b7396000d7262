import { clear, createStore, del, set, values } from 'idb-keyval';
import type { OutboxEntry } from './outbox-entry';

// One database of its own, so clearing the query copy never touches what waits to be sent (and back).
const store = () => createStore('gelpoint-outbox', 'entries');

/** What waits on this device, oldest first. */
export async function readEntries(): Promise<OutboxEntry[]> {
  const all = await values<OutboxEntry>(store());
  return all.sort((a, b) => a.seq - b.seq);
}

export const saveEntry = (entry: OutboxEntry): Promise<void> => set(entry.id, entry, store());
export const deleteEntry = (id: string): Promise<void> => del(id, store());
export const deleteAllEntries = (): Promise<void> => clear(store());
