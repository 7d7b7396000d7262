import type pg from 'pg';
import { call, describe, isApiError, signIn, type Answer } from './api-client';
import { makeDueReminders, postgres } from './database';
import { mustBeMailedOnce, waitForAllSent } from './delivery';
import { must } from './verdict';
import { sleep, waitUntil } from './processes';
import type { FaultStack } from './stack';

const LEAD = 'lead@gelpoint.test';
// A request that meets a stopped database must answer at once, not wait out a timeout.
const OUTAGE_ANSWER_MS = 3_000;

async function listening(pool: pg.Pool): Promise<boolean> {
  const rows = (await pool.query(`SELECT 1 FROM pg_stat_activity WHERE application_name = 'gelpoint-worker-listen' AND query LIKE 'LISTEN %'`)).rows;
  return rows.length > 0;
}

function mustBeUnavailable(what: string, a: Answer): void {
  must(a.status === 503, `${what} should answer 503 while the database is down; got ${describe(a)}`);
  must(a.ms < OUTAGE_ANSWER_MS, `${what} should answer within ${OUTAGE_ANSWER_MS} ms while the database is down; it took ${a.ms.toFixed(0)} ms`);
}

function mustSayDatabaseDown(what: string, a: Answer): void {
  mustBeUnavailable(what, a);
  must(isApiError(a.body) && a.body.error.code === 'database_unavailable', `${what} should answer with the database_unavailable error; got ${describe(a)}`);
  must(
    /database/.test(a.body.error.message) && a.body.error.message.length > 20,
    `${what}'s error should say in a sentence that the database is away; got "${a.body.error.message}"`,
  );
}

/**
 * PostgreSQL stops and starts again under a running API and worker: meanwhile requests fail at once
 * with a 503 that says so and health reports the database down; afterwards the same processes sign
 * people in, mail a reminder that came due, and the worker listens for new work again.
 */
export async function databaseRestart(stack: FaultStack, pool: pg.Pool): Promise<string> {
  const [, api, worker] = await Promise.all([stack.startSink(), stack.startApi(), stack.startWorker({ cron: '*/3 * * * * *' })]);
  const pids = { api: api.pid, worker: worker.pid };

  const before = await signIn(stack.baseUrl, LEAD);
  must(before.token, `signing in before the outage should work; got ${describe(before.answer)}`);
  await waitUntil('the worker listening for new work', 15_000, async () => (await listening(pool)) || undefined);

  postgres('stop');
  let slowest: number;
  try {
    const health = await call(stack.baseUrl, 'GET', '/api/health', { timeoutMs: 10_000 });
    mustBeUnavailable('/api/health', health);
    must((health.body as { database?: string }).database === 'down', `/api/health should report the database down; got ${describe(health)}`);
    const { answer: login } = await signIn(stack.baseUrl, LEAD);
    mustSayDatabaseDown('signing in', login);
    const board = await call(stack.baseUrl, 'GET', '/api/pours', { token: before.token, timeoutMs: 10_000 });
    mustSayDatabaseDown('the cure board (signed in)', board);
    const reset = await call(stack.baseUrl, 'POST', '/api/auth/password-reset', { json: { email: LEAD }, timeoutMs: 10_000 });
    mustSayDatabaseDown('a password reset', reset);
    slowest = Math.max(health.ms, login.ms, board.ms, reset.ms);
    // Long enough for a failed worker tick and a failed reconnect of the wake-up connection.
    await sleep(4_000);
    must(api.running && worker.running, `the API and the worker should ride out the outage; ${api.running ? 'the worker' : 'the API'} exited`);
  } finally {
    postgres('start');
  }

  const health = await waitUntil(
    '/api/health reporting the database up again',
    20_000,
    async () => {
      const h = await call(stack.baseUrl, 'GET', '/api/health', { timeoutMs: 5_000 });
      return h.status === 200 ? h : undefined;
    },
    250,
  );
  must((health.body as { database?: string }).database === 'up', `/api/health should report the database up; got ${describe(health)}`);
  const after = await signIn(stack.baseUrl, LEAD);
  must(after.token, `signing in after the restart should work without restarting the API; got ${describe(after.answer)}`);
  const board = await call(stack.baseUrl, 'GET', '/api/pours', { token: before.token });
  must(board.status === 200, `a session from before the outage should work again; got ${describe(board)}`);

  await waitUntil('the worker listening for new work again', 15_000, async () => (await listening(pool)) || undefined, 250);
  const due = await makeDueReminders(pool, 1, 'database restart');
  await waitForAllSent(pool, due, 20_000);
  await mustBeMailedOnce(stack, pool, due);

  const asked = Date.now();
  const reset = await call(stack.baseUrl, 'POST', '/api/auth/password-reset', { json: { email: LEAD } });
  must(reset.status === 202, `a password reset after the restart should be accepted; got ${describe(reset)}`);
  await waitUntil(
    'the reset mail after the restart',
    15_000,
    async () => ((await stack.sinkMail()).some((m) => m.to.includes(LEAD) && /password/i.test(m.subject)) ? true : undefined),
    100,
  );
  const resetS = (Date.now() - asked) / 1000;

  must(api.running && worker.running && api.pid === pids.api && worker.pid === pids.worker, 'the same API and worker processes should serve after the restart');
  return `outage answers 503 in ≤ ${slowest.toFixed(0)} ms, health said down; after the restart the same API and worker signed in, mailed a due reminder, and sent a reset mail in ${resetS.toFixed(1)} s`;
}
