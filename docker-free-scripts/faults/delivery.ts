import type pg from 'pg';
import { outboxOf, reminderStatuses, type DueReminders } from './database';
import { waitUntil } from './processes';
import type { FaultStack } from './stack';
import { must } from './verdict';

/** Waits until every mail of these reminders is marked sent in the outbox. */
export async function waitForAllSent(pool: pg.Pool, due: DueReminders, timeoutMs: number): Promise<void> {
  const expected = due.reminderIds.length * due.recipients.length;
  await waitUntil(
    `all ${expected} reminder mails being sent`,
    timeoutMs,
    async () => {
      const rows = await outboxOf(pool, due.reminderIds);
      return (rows.length === expected && rows.every((r) => r.status === 'sent')) || undefined;
    },
    250,
  );
}

export interface DeliveryTally {
  mails: number;
  /** Rows claimed more than once (a worker died holding them): resent under the same Message-ID. */
  resent: number;
}

/**
 * Every reminder turned into exactly one mail per recipient, each row sent, and the sink holding each
 * of those Message-IDs exactly once, with nothing else under these reminders' subjects.
 */
export async function mustBeMailedOnce(stack: FaultStack, pool: pg.Pool, due: DueReminders): Promise<DeliveryTally> {
  const expected = due.reminderIds.length * due.recipients.length;
  const statuses = await reminderStatuses(pool, due.reminderIds);
  must(
    statuses.get('sent') === due.reminderIds.length,
    `every reminder should be marked sent; the database has ${JSON.stringify(Object.fromEntries(statuses))}`,
  );

  const rows = await outboxOf(pool, due.reminderIds);
  must(
    rows.length === expected,
    `the outbox should hold ${expected} reminder mails (${due.reminderIds.length} reminders × ${due.recipients.length} people); it holds ${rows.length}`,
  );
  const perPerson = new Set(rows.map((r) => `${r.reminder_id}|${r.to_address}`));
  must(perPerson.size === expected, `each reminder should have one mail per person; ${expected - perPerson.size} were doubled`);
  const unsent = rows.filter((r) => r.status !== 'sent');
  must(unsent.length === 0, `${unsent.length} outbox rows are not sent (${[...new Set(unsent.map((r) => r.status))].join(', ')})`);

  const mine = (await stack.sinkMail()).filter((m) => m.subject.startsWith(due.subjectPrefix));
  must(mine.length === expected, `the mail sink should have received ${expected} reminder mails; it holds ${mine.length}`);
  const received = new Map<string, number>();
  for (const m of mine) received.set(m.messageId ?? '', (received.get(m.messageId ?? '') ?? 0) + 1);
  const missing = rows.filter((r) => received.get(r.message_id) !== 1);
  must(missing.length === 0, `${missing.length} outbox Message-IDs are not in the sink exactly once`);
  return { mails: expected, resent: rows.filter((r) => r.attempts > 1).length };
}
