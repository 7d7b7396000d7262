/** What an entry logs; each kind has its own words and its own editor. */
export type OutboxKind = 'batch' | 'reading' | 'check' | 'reminder-done';

export interface JsonRequest {
  type: 'json';
  path: string;
  body: Record<string, unknown>;
}

export interface FormRequest {
  type: 'form';
  path: string;
  fields: Record<string, string>;
  photo: { blob: Blob; name: string } | null;
}

export type OutboxRequest = JsonRequest | FormRequest;

export interface Refusal {
  status: number;
  code: string;
  message: string;
}

/** One write made on the phone and not yet answered by the server, kept in IndexedDB until it is. */
export interface OutboxEntry {
  /** Also the Idempotency-Key: a replay of an entry the server did receive answers its first answer. */
  id: string;
  /** Creation order: entries are sent in it. */
  seq: number;
  kind: OutboxKind;
  /** Who logged it, in which shop: only that session sends it. */
  owner: { userId: string; shopId: string };
  /** The pour it belongs to, so the pour page can show what waits for it. */
  pourId: string | null;
  /** Plain words for the list: "Cup 2 of 4 — Walnut tray". */
  label: string;
  request: OutboxRequest;
  createdAt: string;
  /** waiting: to be sent; refused: the server said no, the person decides (send again, change or discard). */
  state: 'waiting' | 'refused';
  refusal: Refusal | null;
  /** The last transient failure (the server down, a 5xx), shown while the entry waits. */
  lastProblem: string | null;
}

/** What a form hands over; the outbox adds the key, the order and who is signed in. */
export type OutboxDraft = Pick<OutboxEntry, 'kind' | 'pourId' | 'label' | 'request'>;

/** The owner key of a signed-in session; entries of another person or shop stay untouched. */
export const sameOwner = (a: OutboxEntry['owner'], b: OutboxEntry['owner'] | null): boolean => b !== null && a.userId === b.userId && a.shopId === b.shopId;
