import { describe, expect, it } from 'vitest';
import { ApiError } from '../api-error';
import type { OutboxEntry } from './outbox-entry';
import { sendInOrder, verdictOf } from './send-in-order';

const entry = (id: string, seq: number, state: OutboxEntry['state'] = 'waiting'): OutboxEntry => ({
  id,
  seq,
  kind: 'reading',
  owner: { userId: 'u', shopId: 's' },
  pourId: 'p',
  label: id,
  request: { type: 'json', path: `/x/${id}`, body: {} },
  createdAt: '2026-01-01T00:00:00.000Z',
  state,
  refusal: null,
  lastProblem: null,
});

function recorder(answers: Record<string, unknown>) {
  const log: string[] = [];
  return {
    log,
    handlers: {
      send: async (e: OutboxEntry) => {
        log.push(`send ${e.id}`);
        const a = answers[e.id];
        if (a instanceof Error) throw a;
        return a;
      },
      sent: async (e: OutboxEntry) => void log.push(`sent ${e.id}`),
      refused: async (e: OutboxEntry, r: { code: string }) => void log.push(`refused ${e.id} ${r.code}`),
      waiting: async (e: OutboxEntry, problem: string) => void log.push(`waiting ${e.id}: ${problem}`),
    },
  };
}

describe('verdictOf', () => {
  // RFC 9110 §15.5: a 4xx says the request itself is wrong, except 401 (credentials), 408 (timeout) and 429
  // (RFC 6585, too many requests), which are about the moment; §15.6: a 5xx is the server's, to try again.
  it.each([400, 403, 404, 409, 410, 413, 422])('keeps a %i for the person to resolve', (status) => {
    expect(verdictOf(new ApiError(status, 'c', 'why')).kind).toBe('refused');
  });
  it.each([0, 401, 408, 429, 500, 502, 503])('waits after a %i', (status) => {
    expect(verdictOf(new ApiError(status, 'c', 'why')).kind).toBe('wait');
  });
});

describe('sendInOrder', () => {
  it('sends the oldest first, whatever order it is given', async () => {
    const r = recorder({ a: 1, b: 2, c: 3 });
    const summary = await sendInOrder([entry('c', 3), entry('a', 1), entry('b', 2)], r.handlers);
    expect(r.log).toEqual(['send a', 'sent a', 'send b', 'sent b', 'send c', 'sent c']);
    expect(summary).toEqual({ sent: 3, refused: 0, stopped: false });
  });

  it('keeps a refused entry and goes on with the next', async () => {
    const r = recorder({ a: new ApiError(409, 'batch_already_logged', 'cup 1 is already logged'), b: 2 });
    const summary = await sendInOrder([entry('a', 1), entry('b', 2)], r.handlers);
    expect(r.log).toEqual(['send a', 'refused a batch_already_logged', 'send b', 'sent b']);
    expect(summary).toEqual({ sent: 1, refused: 1, stopped: false });
  });

  it('stops at the first entry that finds no connection, so nothing after it overtakes it', async () => {
    const r = recorder({ a: 1, b: new ApiError(0, 'network_unreachable', 'offline'), c: 3 });
    const summary = await sendInOrder([entry('a', 1), entry('b', 2), entry('c', 3)], r.handlers);
    expect(r.log).toEqual(['send a', 'sent a', 'send b', 'waiting b: No connection to the server.']);
    expect(summary.stopped).toBe(true);
  });

  it('leaves refused entries alone until the person sends them again', async () => {
    const r = recorder({ b: 2 });
    await sendInOrder([entry('a', 1, 'refused'), entry('b', 2)], r.handlers);
    expect(r.log).toEqual(['send b', 'sent b']);
  });
});
