import type pg from 'pg';
import { makeDueReminders, outboxOf } from './database';
import { mustBeMailedOnce, waitForAllSent } from './delivery';
import { must } from './verdict';
import type { FaultStack } from './stack';

const POURS = 30;

/** Two workers from the start over the same 30 due reminders: each reminder mailed once, no row sent twice. */
export async function twoWorkers(stack: FaultStack, pool: pg.Pool): Promise<string> {
  await stack.startSink();
  const due = await makeDueReminders(pool, POURS, 'two workers');
  const settings = { cron: '*/2 * * * * *' };
  const sentBy = [0, 0];
  const counter = (i: number) => (line: string) => {
    if (line.includes('"mail sent"')) sentBy[i]!++;
  };
  const workers = await Promise.all([stack.startWorker(settings, counter(0)), stack.startWorker(settings, counter(1))]);
  await waitForAllSent(pool, due, 40_000);
  const tally = await mustBeMailedOnce(stack, pool, due);
  const twice = (await outboxOf(pool, due.reminderIds)).filter((r) => r.attempts !== 1);
  must(twice.length === 0, `${twice.length} mails were claimed more than once although no worker died`);
  must(
    workers.every((w) => w.running),
    'both workers should still be running',
  );
  return `${POURS} reminders, ${tally.mails} mails, each sent once (worker 1 sent ${sentBy[0]}, worker 2 sent ${sentBy[1]})`;
}
