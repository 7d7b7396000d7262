import type { EntityManager } from 'typeorm';
import type { WantedReminder } from '@gelpoint/core';

/**
 * Brings a pour's reminder rows in line with what it should have: pending ones move with the new
 * prediction, ones no longer wanted are cancelled, and sent ones are never touched (never resent).
 */
export async function syncReminders(m: EntityManager, shopId: string, pourId: string, wanted: WantedReminder[]): Promise<void> {
  for (const w of wanted) {
    await m.query(
      `INSERT INTO reminders (shop_id, pour_id, kind, step, due_at, event_at, lead_min, assumed, title)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9)
       ON CONFLICT (pour_id, kind, step) DO UPDATE
          SET due_at = EXCLUDED.due_at, event_at = EXCLUDED.event_at, lead_min = EXCLUDED.lead_min, assumed = EXCLUDED.assumed,
              title = EXCLUDED.title, status = 'pending', updated_at = now()
        WHERE reminders.status <> 'sent'`,
      [shopId, pourId, w.kind, w.step, w.dueAt, w.eventAt, w.leadMin, w.assumed, w.title],
    );
  }
  const keep = wanted.map((w) => `${w.kind}|${w.step}`);
  await m.query(
    `UPDATE reminders SET status = 'cancelled', updated_at = now()
      WHERE pour_id = $1 AND status = 'pending' AND NOT (kind || '|' || step = ANY($2::text[]))`,
    [pourId, keep],
  );
}
