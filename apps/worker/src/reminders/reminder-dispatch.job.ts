import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { mailDomainOf, queueMail } from '@gelpoint/db';
import { reminderMail, type DueReminder } from './reminder-mail';

/**
 * Turns due reminders into queued mail. Claiming (SKIP LOCKED), queueing and marking sent happen in
 * one transaction, so any number of workers can run and each reminder becomes mail exactly once;
 * the mail queue then delivers it once (its Message-ID was fixed when it was queued). Reminders held for the
 * morning digest (due in the shop's quiet hours) are the digest's to send.
 */
export async function dispatchDueReminders(ds: DataSource, publicUrl: string, logger: Logger, batch = 50, stop?: AbortSignal): Promise<number> {
  const domain = mailDomainOf(publicUrl);
  let total = 0;
  for (;;) {
    const n = await ds.transaction(async (m) => {
      const due: (DueReminder & { notify_user_ids: string[] })[] = await m.query(
        `SELECT r.id, r.title, r.kind, r.due_at, r.event_at, r.lead_min, r.assumed, r.pour_id, r.shop_id, COALESCE(r.recipient_user_ids, p.notify_user_ids) AS notify_user_ids, pc.name AS piece_name, pp.name AS plan_name,
                s.time_zone, s.day_start_hour, s.quiet_from_hour
           FROM reminders r
           JOIN shops s ON s.id = r.shop_id
           JOIN pours p ON p.id = r.pour_id
           JOIN pieces pc ON pc.id = p.piece_id
           JOIN pour_plans pp ON pp.id = p.pour_plan_id
          WHERE r.status = 'pending' AND r.done_at IS NULL AND NOT r.via_digest AND r.due_at <= now()
          ORDER BY r.due_at
          LIMIT $1
          FOR UPDATE OF r SKIP LOCKED`,
        [batch],
      );
      for (const r of due) {
        const people: { id: string; email: string }[] = await m.query(
          `SELECT u.id, u.email FROM users u JOIN memberships ms ON ms.user_id = u.id AND ms.shop_id = $1 AND ms.status = 'active' WHERE u.id = ANY($2)`,
          [r.shop_id, r.notify_user_ids],
        );
        const mail = reminderMail(r, publicUrl);
        for (const person of people) {
          await queueMail(m, { shopId: r.shop_id, dedupeKey: `reminder:${r.id}:${person.id}`, to: person.email, ...mail }, domain);
        }
        await m.query(`UPDATE reminders SET status = 'sent', sent_at = now(), updated_at = now() WHERE id = $1`, [r.id]);
        logger.info({ reminderId: r.id, kind: r.kind, recipients: people.length }, 'reminder due: mail queued');
      }
      return due.length;
    });
    total += n;
    if (n < batch || stop?.aborted) return total;
  }
}
