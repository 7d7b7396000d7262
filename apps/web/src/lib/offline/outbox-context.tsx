import { createContext, useContext, useSyncExternalStore, type ReactNode } from 'react';
import type { Outbox } from './outbox';
import type { OutboxEntry } from './outbox-entry';

const OutboxContext = createContext<Outbox | null>(null);

export function OutboxProvider({ outbox, children }: { outbox: Outbox; children: ReactNode }) {
  return <OutboxContext.Provider value={outbox}>{children}</OutboxContext.Provider>;
}

export function useOutbox(): Outbox {
  const outbox = useContext(OutboxContext);
  if (!outbox) throw new Error('useOutbox needs OutboxProvider above it in the tree.');
  return outbox;
}

/** The signed-in person's entries that have not reached the server, oldest first; re-renders as they change. */
export function useOutboxEntries(): OutboxEntry[] {
  const outbox = useOutbox();
  useSyncExternalStore(outbox.subscribe, outbox.snapshot);
  return outbox.mine();
}
