import type pg from 'pg';
import { makeDueReminders, outboxOf, type OutboxRow } from './database';
import { mustBeMailedOnce, waitForAllSent } from './delivery';
import { must } from './verdict';
import { waitUntil } from './processes';
import type { FaultStack } from './stack';

/**
 * The mail sink (the provider) goes away and a reminder comes due meanwhile. Its mail waits in the
 * outbox, retried with backoff, and goes out once the sink is back on the same port.
 */
export async function mailSinkDown(stack: FaultStack, pool: pg.Pool): Promise<string> {
  await stack.startSink();
  // A one-second first retry (doubling) keeps the whole outage inside the check's half minute.
  await stack.startWorker({ cron: '*/2 * * * * *', mailRetryBaseS: 1 });
  await stack.stopSink();

  const due = await makeDueReminders(pool, 1, 'sink down');
  const failing = await waitUntil(
    'the worker trying each mail twice and failing',
    30_000,
    async () => {
      const rows = await outboxOf(pool, due.reminderIds);
      return rows.length === due.recipients.length && rows.every((r) => r.attempts >= 2) ? rows : undefined;
    },
    200,
  );
  const errors = (
    await pool.query<{ last_error: string | null }>(`SELECT last_error FROM outbound_mail WHERE message_id = ANY($1)`, [failing.map((r) => r.message_id)])
  ).rows;
  must(
    failing.every((r: OutboxRow) => r.status === 'pending' || r.status === 'sending'),
    `while the sink is down the mail should wait in the outbox; it is ${[...new Set(failing.map((r) => r.status))].join(', ')}`,
  );
  must(
    errors.every((e) => e.last_error),
    'each waiting outbox row should say why its send failed',
  );

  await stack.startSink();
  const back = Date.now();
  await waitForAllSent(pool, due, 30_000);
  const waitedS = (Date.now() - back) / 1000;
  await mustBeMailedOnce(stack, pool, due);
  const tries = Math.max(...(await outboxOf(pool, due.reminderIds)).map((r) => r.attempts));
  return `${failing.length} reminder mails held through the outage (${errors[0]?.last_error?.slice(0, 50)}), all sent within ${waitedS.toFixed(1)} s of the sink answering again, once each (${tries} tries at most)`;
}
