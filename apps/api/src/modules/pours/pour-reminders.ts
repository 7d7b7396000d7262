import type { EntityManager } from 'typeorm';
import { cureReminderKinds, deliveryOf, type NoticeKind, type ShopHours, type WantedReminder } from '@gelpoint/core';

/**
 * Brings a pour's cure reminders in line with what it should have:
 * - wanted ones are written (a pending one moves with the new prediction; a sent one keeps its times and is never
 *   resent); a wanted one whose step is already logged (a demold check with its check) is done;
 * - ones no longer wanted are done by the log when they were sent (the layer they announced is poured, the piece is
 *   released), and cancelled when they were still pending.
 * A reminder a member marked done stays done. Notices (release, machining) are not the cure model's and are left alone.
 * Each goes out when the shop's quiet hours allow (deliveryOf): held for the morning digest, or, for a window closing
 * in the night, the evening before.
 */
export async function syncReminders(
  m: EntityManager,
  shopId: string,
  pourId: string,
  hours: ShopHours,
  now: Date,
  wantedNow: (WantedReminder & { done: boolean })[],
): Promise<void> {
  const wanted = wantedNow.map((w) => deliveryOf(w, hours, now.getTime()));
  for (const w of wanted) {
    await m.query(
      `INSERT INTO reminders (shop_id, pour_id, kind, step, due_at, event_at, lead_min, assumed, title, via_digest, status, done_at, done_how)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $11, CASE WHEN $10 THEN 'cancelled' ELSE 'pending' END, CASE WHEN $10 THEN now() END, CASE WHEN $10 THEN 'logged' END)
       ON CONFLICT (pour_id, kind, step) DO UPDATE SET
          due_at = CASE WHEN reminders.status = 'sent' THEN reminders.due_at ELSE EXCLUDED.due_at END,
          event_at = CASE WHEN reminders.status = 'sent' THEN reminders.event_at ELSE EXCLUDED.event_at END,
          lead_min = CASE WHEN reminders.status = 'sent' THEN reminders.lead_min ELSE EXCLUDED.lead_min END,
          assumed = CASE WHEN reminders.status = 'sent' THEN reminders.assumed ELSE EXCLUDED.assumed END,
          title = CASE WHEN reminders.status = 'sent' THEN reminders.title ELSE EXCLUDED.title END,
          via_digest = CASE WHEN reminders.status = 'sent' THEN reminders.via_digest ELSE EXCLUDED.via_digest END,
          status = CASE WHEN reminders.status = 'sent' THEN 'sent' WHEN $10 OR reminders.done_how = 'marked' THEN 'cancelled' ELSE 'pending' END,
          done_at = CASE WHEN reminders.done_how = 'marked' THEN reminders.done_at WHEN $10 THEN COALESCE(reminders.done_at, now()) END,
          done_how = CASE WHEN reminders.done_how = 'marked' THEN 'marked' WHEN $10 THEN 'logged' END,
          updated_at = now()`,
      [shopId, pourId, w.kind, w.step, w.dueAt, w.eventAt, w.leadMin, w.assumed, w.title, w.done, w.viaDigest],
    );
  }
  const keep = wanted.map((w) => `${w.kind}|${w.step}`);
  await m.query(
    `UPDATE reminders
        SET done_at = CASE WHEN status = 'sent' THEN now() ELSE done_at END,
            done_how = CASE WHEN status = 'sent' THEN 'logged' ELSE done_how END,
            status = CASE WHEN status = 'pending' THEN 'cancelled' ELSE status END,
            updated_at = now()
      WHERE pour_id = $1 AND kind = ANY($3::text[]) AND NOT (kind || '|' || step = ANY($2::text[]))
        AND (status = 'pending' OR (status = 'sent' AND done_at IS NULL))`,
    [pourId, keep, [...cureReminderKinds]],
  );
}

/**
 * A notice of something done to a pour, mailed once by the worker to the people named, and shown on Today. One done in
 * the shop's quiet hours waits for the morning digest.
 */
export async function queueNotice(
  m: EntityManager,
  shopId: string,
  pourId: string,
  hours: ShopHours,
  kind: NoticeKind,
  title: string,
  recipients: string[],
  at: Date,
): Promise<void> {
  const { viaDigest } = deliveryOf({ kind, dueAt: at, eventAt: at, leadMin: 0 }, hours, at.getTime());
  await m.query(
    `INSERT INTO reminders (shop_id, pour_id, kind, step, due_at, event_at, lead_min, assumed, title, recipient_user_ids, via_digest)
     VALUES ($1, $2, $3, 'notice', $4, $4, 0, false, $5, $6, $7)
     ON CONFLICT (pour_id, kind, step) DO NOTHING`,
    [shopId, pourId, kind, at, title, recipients, viaDigest],
  );
}

/** A member marks a reminder done: it leaves Today and is not sent any more. */
export async function markReminderDone(m: EntityManager, shopId: string, reminderId: string, userId: string): Promise<boolean> {
  const found: unknown[] = await m.query('SELECT id FROM reminders WHERE id = $1 AND shop_id = $2 FOR UPDATE', [reminderId, shopId]);
  if (found.length === 0) return false;
  await m.query(
    `UPDATE reminders SET done_at = COALESCE(done_at, now()), done_by_id = COALESCE(done_by_id, $2), done_how = COALESCE(done_how, 'marked'),
            status = CASE WHEN status = 'pending' THEN 'cancelled' ELSE status END, updated_at = now()
      WHERE id = $1`,
    [reminderId, userId],
  );
  return true;
}
