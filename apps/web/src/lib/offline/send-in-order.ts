import { isApiError } from '../api-error';
import type { OutboxEntry, Refusal } from './outbox-entry';

/** What one failed send means for the queue. */
export type FailureVerdict =
  /** Try again later, and send nothing after it now: no connection, the server down or busy, the session gone. */
  | { kind: 'wait'; problem: string }
  /** The server read it and said no: keep it for the person to resolve, and go on with the next. */
  | { kind: 'refused'; refusal: Refusal };

/**
 * RFC 9110 §15: a 4xx says this request is wrong as it stands and sending it unchanged gets the same answer, except
 * 401 (sign in again), 408 (too slow) and 429 (too many at once), which are about the moment. A 5xx or no answer at
 * all is about the moment too.
 */
export function verdictOf(error: unknown): FailureVerdict {
  if (!isApiError(error))
    return { kind: 'refused', refusal: { status: 0, code: 'unreadable_answer', message: error instanceof Error ? error.message : String(error) } };
  if (error.status === 0) return { kind: 'wait', problem: 'No connection to the server.' };
  if (error.status === 401) return { kind: 'wait', problem: 'The session has ended: sign in again to send it.' };
  if (error.status === 408 || error.status === 429 || error.status >= 500) return { kind: 'wait', problem: error.message };
  return { kind: 'refused', refusal: { status: error.status, code: error.code, message: error.message } };
}

export interface SendHandlers {
  send: (entry: OutboxEntry) => Promise<unknown>;
  sent: (entry: OutboxEntry, answer: unknown) => Promise<void>;
  refused: (entry: OutboxEntry, refusal: Refusal) => Promise<void>;
  waiting: (entry: OutboxEntry, problem: string) => Promise<void>;
}

export interface SendSummary {
  sent: number;
  refused: number;
  /** True when a failure about the moment stopped the run: what is left waits for the next one. */
  stopped: boolean;
}

/**
 * Sends the waiting entries oldest first, one at a time, so the server receives them in the order they were logged.
 * A refused entry does not hold up the rest; a failure about the moment stops the run, so nothing is sent out of order.
 */
export async function sendInOrder(entries: readonly OutboxEntry[], handlers: SendHandlers): Promise<SendSummary> {
  const summary: SendSummary = { sent: 0, refused: 0, stopped: false };
  for (const entry of [...entries].sort((a, b) => a.seq - b.seq)) {
    if (entry.state !== 'waiting') continue;
    let answer: unknown;
    try {
      answer = await handlers.send(entry);
    } catch (error) {
      const verdict = verdictOf(error);
      if (verdict.kind === 'wait') {
        await handlers.waiting(entry, verdict.problem);
        summary.stopped = true;
        return summary;
      }
      await handlers.refused(entry, verdict.refusal);
      summary.refused += 1;
      continue;
    }
    await handlers.sent(entry, answer);
    summary.sent += 1;
  }
  return summary;
}
