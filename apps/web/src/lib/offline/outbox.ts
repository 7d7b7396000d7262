import { onlineManager } from '@tanstack/react-query';
import { ApiError, isApiError } from '../api-error';
import { newIdempotencyKey } from '../idempotency-key';
import type { UploadProgress } from '../upload-with-progress';
import { sameOwner, type OutboxDraft, type OutboxEntry, type OutboxRequest } from './outbox-entry';
import { deleteAllEntries, deleteEntry, readEntries, saveEntry } from './outbox-store';
import { sendEntry } from './send-entry';
import { sendInOrder } from './send-in-order';

/** The answer to a write: sent now (with the server's answer), or kept on the phone to be sent later. */
export type Submitted = { queued: false; answer: unknown } | { queued: true; entry: OutboxEntry };

export interface OutboxHooks {
  /** Who is signed in now; only their entries are sent. */
  currentOwner: () => OutboxEntry['owner'] | null;
  /** After the server took an entry: refresh what shows it. */
  onSent: (entry: OutboxEntry, answer: unknown) => void;
}

const retryEveryMs = 20_000;

/**
 * The writes made on this phone that the server has not answered yet. Kept in IndexedDB, so a reload or a closed tab
 * loses nothing; sent in the order they were made when the connection returns, each with its own Idempotency-Key,
 * so an entry the server had already received is not logged twice.
 */
export class Outbox {
  private entries: OutboxEntry[] = [];
  private readonly listeners = new Set<() => void>();
  private running: Promise<void> | null = null;
  private again = false;
  private lastSeq = 0;
  private ready: Promise<void>;
  private timer: ReturnType<typeof setInterval> | undefined;

  constructor(private readonly hooks: OutboxHooks) {
    this.ready = readEntries()
      .then((stored) => {
        this.entries = stored;
        this.lastSeq = Math.max(0, ...stored.map((e) => e.seq));
        this.changed();
      })
      .catch(() => undefined);
  }

  /** Sends what waits whenever the connection comes back, and every little while in case an event was missed. */
  start(): () => void {
    const unsubscribe = onlineManager.subscribe((online) => {
      if (online) void this.flush();
    });
    this.timer = setInterval(() => {
      if (this.waitingCount() > 0) void this.flush();
    }, retryEveryMs);
    void this.ready.then(() => this.flush());
    return () => {
      unsubscribe();
      clearInterval(this.timer);
    };
  }

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  /** The entries of whoever is signed in, oldest first (a stable array between changes, for useSyncExternalStore). */
  snapshot = (): readonly OutboxEntry[] => this.entries;

  mine(): OutboxEntry[] {
    const owner = this.hooks.currentOwner();
    return this.entries.filter((e) => sameOwner(e.owner, owner));
  }

  waitingCount(): number {
    return this.mine().filter((e) => e.state === 'waiting').length;
  }

  /**
   * Sends a write now when the phone is online and nothing older waits (or keeps it, when the send finds no
   * connection); otherwise keeps it behind the older ones. A refusal of a write sent now is thrown to the form that
   * made it, which can show it beside its fields.
   */
  async submit(draft: OutboxDraft, onProgress?: (progress: UploadProgress) => void): Promise<Submitted> {
    await this.ready;
    const entry = this.create(draft);
    if (!onlineManager.isOnline() || this.waitingCount() > 0) {
      await this.keep(entry);
      void this.flush();
      return { queued: true, entry };
    }
    try {
      return { queued: false, answer: await sendEntry(entry, onProgress) };
    } catch (error) {
      if (isApiError(error) && error.status === 0) {
        await this.keep(entry);
        return { queued: true, entry };
      }
      throw error;
    }
  }

  /** Runs one pass over what waits; a call during a pass runs one more after it. */
  flush(): Promise<void> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = (async () => {
      do {
        this.again = false;
        if (!onlineManager.isOnline()) break;
        await sendInOrder(this.mine(), {
          send: (entry) => sendEntry(entry),
          sent: async (entry, answer) => {
            await this.remove(entry.id);
            this.hooks.onSent(entry, answer);
          },
          refused: (entry, refusal) => this.update({ ...entry, state: 'refused', refusal, lastProblem: null }),
          waiting: (entry, problem) => this.update({ ...entry, lastProblem: problem }),
        });
      } while (this.again);
    })().finally(() => {
      this.running = null;
    });
    return this.running;
  }

  /** Sends a refused entry again as it is (the cause may be gone: a lot received, a cup voided). */
  async retry(id: string): Promise<void> {
    const entry = this.entries.find((e) => e.id === id);
    if (!entry) return;
    await this.update({ ...entry, state: 'waiting', refusal: null, lastProblem: null });
    await this.flush();
  }

  /** Sends a changed entry; it is another request, so it gets another key. */
  async replace(id: string, request: OutboxRequest, label?: string): Promise<void> {
    const entry = this.entries.find((e) => e.id === id);
    if (!entry) return;
    await this.remove(id);
    await this.keep({ ...entry, id: newIdempotencyKey(), request, label: label ?? entry.label, state: 'waiting', refusal: null, lastProblem: null });
    await this.flush();
  }

  async discard(id: string): Promise<void> {
    await this.remove(id);
  }

  /** Sign-out: what was not sent is deleted with the rest of the shop's data on the device. */
  async clear(): Promise<void> {
    this.entries = [];
    this.changed();
    await deleteAllEntries().catch(() => undefined);
  }

  private create(draft: OutboxDraft): OutboxEntry {
    const owner = this.hooks.currentOwner();
    if (!owner) throw new ApiError(401, 'signed_out', 'You are not signed in any more. Sign in again, then log it once more.');
    this.lastSeq = Math.max(this.lastSeq + 1, Date.now());
    return {
      ...draft,
      owner,
      id: newIdempotencyKey(),
      seq: this.lastSeq,
      createdAt: new Date().toISOString(),
      state: 'waiting',
      refusal: null,
      lastProblem: null,
    };
  }

  private async keep(entry: OutboxEntry): Promise<void> {
    await saveEntry(entry);
    this.entries = [...this.entries.filter((e) => e.id !== entry.id), entry].sort((a, b) => a.seq - b.seq);
    this.changed();
  }

  private async update(entry: OutboxEntry): Promise<void> {
    await saveEntry(entry);
    this.entries = this.entries.map((e) => (e.id === entry.id ? entry : e));
    this.changed();
  }

  private async remove(id: string): Promise<void> {
    await deleteEntry(id);
    this.entries = this.entries.filter((e) => e.id !== id);
    this.changed();
  }

  private changed(): void {
    for (const listener of this.listeners) listener();
  }
}
