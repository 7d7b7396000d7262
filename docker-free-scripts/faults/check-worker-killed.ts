import type pg from 'pg';
import { makeDueReminders, outboxOf } from './database';
import { mustBeMailedOnce, waitForAllSent } from './delivery';
import { must } from './verdict';
import { within } from './processes';
import type { FaultStack, WorkerSettings } from './stack';

// A short lease so the second worker takes over what the killed one held within seconds, and a
// two-second tick so it looks again soon after the lease runs out.
export const takeoverWorker: WorkerSettings = { cron: '*/2 * * * * *', mailLeaseS: 5 };

const POURS = 30;
const KILL_AFTER_SENT = 10;

/** SIGKILLs the worker in the middle of sending 30 pours' reminders, starts another: each mailed once. */
export async function workerKilledMidWork(stack: FaultStack, pool: pg.Pool): Promise<string> {
  await stack.startSink();
  const due = await makeDueReminders(pool, POURS, 'killed worker');
  const expected = due.reminderIds.length * due.recipients.length;

  let sentSeen = 0;
  let markKilled: () => void = () => undefined;
  const killed = new Promise<void>((resolve) => (markKilled = resolve));
  // Killed from inside the output handler, the moment the tenth "mail sent" line arrives.
  const first = await stack.startWorker(takeoverWorker, (line, self) => {
    if (line.includes('"mail sent"') && ++sentSeen === KILL_AFTER_SENT) void self.kill().then(markKilled);
  });
  await within('the first worker sending its first mails', 30_000, killed);
  must(!first.running, 'the first worker should be dead after SIGKILL');

  const atKill = await outboxOf(pool, due.reminderIds);
  const sentAtKill = atKill.filter((r) => r.status === 'sent').length;
  const heldAtKill = atKill.filter((r) => r.status === 'sending').length;
  must(sentAtKill < expected, `the worker was meant to die mid-work, but all ${expected} mails were already sent`);

  const second = await stack.startWorker(takeoverWorker);
  await waitForAllSent(pool, due, 40_000);
  must(second.running, 'the second worker should still be running');
  const tally = await mustBeMailedOnce(stack, pool, due);
  return `${POURS} reminders, ${tally.mails} mails: killed with ${sentAtKill} sent and ${heldAtKill} claimed; the next worker sent the rest, each once (${tally.resent} re-claimed after the lease)`;
}
