import { call, must } from './api-client';
import type { BenchStack } from './bench-stack';
import { DEMO_PASSWORD, signIn } from './bench-scenario';

export interface Finding {
  what: string;
  ok: boolean;
  detail: string;
}

/** A session opened on one instance works on the other, and signing out on one ends it on both. */
export async function sessionsAcrossInstances(apis: string[]): Promise<Finding[]> {
  const [a, b] = [apis[0]!, apis[1]!];
  const token = await signIn(b, 'apprentice@gelpoint.test');
  const onA = await call(a, 'GET', '/me', { token });
  const out = await call(a, 'POST', '/auth/logout', { token });
  const afterOnB = await call<{ error?: { code: string } }>(b, 'GET', '/me', { token });
  const afterOnA = await call(a, 'GET', '/me', { token });
  return [
    { what: 'a session opened on instance 2 is accepted on instance 1', ok: onA.status === 200, detail: `GET /api/me on 1: ${onA.status}` },
    {
      what: 'signing out on instance 1 ends the session on instance 2',
      ok: out.status === 204 && afterOnB.status === 401 && afterOnA.status === 401,
      detail: `logout on 1: ${out.status}; then GET /api/me on 2: ${afterOnB.status} ${afterOnB.body.error?.code ?? ''}, on 1: ${afterOnA.status}`,
    },
  ];
}

/**
 * Sign-in attempts for one account, `limit` of them on instance 1, then one more on instance 2: a
 * shared count refuses it (429); a count kept in each process lets it through.
 */
export async function rateLimitAcrossInstances(apis: string[], limit: number): Promise<Finding[]> {
  const [a, b] = [apis[0]!, apis[1]!];
  const attempt = (base: string) => call(base, 'POST', '/auth/login', { json: { email: 'rate-probe@gelpoint.test', password: `not-${DEMO_PASSWORD}` } });
  const first: number[] = [];
  for (let i = 0; i < limit; i++) first.push((await attempt(a)).status);
  const onB = (await attempt(b)).status;
  const onA = (await attempt(a)).status;
  const counted = first.filter((s) => s === 429).length;
  return [
    {
      what: `instance 1 refuses sign-in attempt ${limit + 1} for one account (limit ${limit} per 15 min)`,
      ok: onA === 429 && counted === 0,
      detail: `attempts 1–${limit} on 1: ${[...new Set(first)].join('/')}; attempt ${limit + 2} on 1: ${onA}`,
    },
    {
      what: `instance 2 sees the attempts counted on instance 1`,
      ok: onB === 429,
      detail: `attempt ${limit + 1}, on 2: ${onB}${onB === 429 ? '' : ' (the count is kept in each process, not in the database)'}`,
    },
  ];
}

/**
 * Both instances give the same answer: whatever one keeps in memory, the other rebuilds from the
 * database. `stable` picks what does not move with the clock (cure progress is computed as of now).
 */
export async function sameAnswerOnBoth(
  apis: string[],
  token: string,
  path: string,
  stable: (body: Record<string, unknown>) => unknown = (b) => b,
): Promise<Finding> {
  const [x, y] = (await Promise.all(apis.map((u) => must(200, u, 'GET', path, { token })))).map((b) => JSON.stringify(stable(b)));
  return { what: `both instances answer GET /api${path.split('?')[0]} alike`, ok: x === y, detail: `${x!.length} bytes compared` };
}

/** What a pour view holds that does not move with the clock: its log and its reminders' states. */
export const pourLog = (p: Record<string, unknown>) => ({
  status: p.status,
  batches: p.batches,
  readings: p.readings,
  checks: p.checks,
  reminders: (p.reminders as { id: string; kind: string; status: string }[]).map((r) => [r.id, r.kind, r.status]),
});

interface SinkMessage {
  messageId: string | null;
  to: string[];
  subject: string;
}

interface PourReminders {
  reminders: { kind: string; status: string; title: string; dueAt: string }[];
  notify: { id: string; name: string }[];
}

/**
 * The reminders that came due while both workers ticked: each is sent once, to each person named on
 * the pour once, and no message reaches the sink twice.
 */
export async function remindersOnce(stack: BenchStack, api: string, token: string, pourId: string, timeoutMs: number): Promise<Finding[]> {
  const deadline = Date.now() + timeoutMs;
  let pour: PourReminders;
  let due: PourReminders['reminders'];
  for (;;) {
    pour = await must<PourReminders>(200, api, 'GET', `/pours/${pourId}`, { token });
    due = pour.reminders.filter((r) => new Date(r.dueAt).getTime() <= Date.now() && r.status !== 'cancelled');
    if (due.length > 0 && due.every((r) => r.status === 'sent')) break;
    if (Date.now() > deadline) break;
    await new Promise((r) => setTimeout(r, 500));
  }
  const people = pour.notify.length;
  const want = due.length * people;
  let mine: SinkMessage[] = [];
  let all: SinkMessage[] = [];
  while (Date.now() <= deadline + 5_000) {
    all = (await (await fetch(`${stack.mailUrl}/api/messages`)).json()) as SinkMessage[];
    mine = all.filter((m) => due.some((r) => r.title === m.subject));
    if (mine.length >= want) break;
    await new Promise((r) => setTimeout(r, 500));
  }
  const pairs = mine.map((m) => `${m.to.join(',')}|${m.subject}`);
  const ids = all.map((m) => m.messageId).filter((x): x is string => x !== null);
  const byWorker = ['worker 1', 'worker 2'].map((w) => stack.logLines(w, 'reminder due: mail queued').length);
  const sentByWorker = ['worker 1', 'worker 2'].map((w) => stack.logLines(w, 'mail sent').length);
  return [
    {
      what: 'reminders made due are mailed exactly once with two workers',
      ok: due.length > 0 && due.every((r) => r.status === 'sent') && mine.length === want && new Set(pairs).size === pairs.length,
      detail: `${due.length} due reminder(s) × ${people} people = ${want} mails expected, ${mine.length} arrived, ${pairs.length - new Set(pairs).size} duplicate(s)`,
    },
    {
      what: 'no message reached the sink twice',
      ok: new Set(ids).size === ids.length,
      detail: `${all.length} messages in the sink; reminders claimed by worker 1/2: ${byWorker.join('/')}; mails sent by worker 1/2: ${sentByWorker.join('/')}`,
    },
  ];
}
