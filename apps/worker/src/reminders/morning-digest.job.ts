import type { Logger } from 'pino';
import type { DataSource, EntityManager } from 'typeorm';
import { digestMomentOn, quietStretchAt, shopLocalDate, type ShopHours } from '@gelpoint/core';
import { mailDomainOf, queueMail } from '@gelpoint/db';
import { digestMail, type DigestItem } from './digest-mail';

interface ShopRow {
  id: string;
  name: string;
  time_zone: string;
  day_start_hour: number;
  quiet_from_hour: number;
  digest_on: string | null;
}

const hoursOf = (s: ShopRow): ShopHours => ({ zone: s.time_zone, dayStartHour: s.day_start_hour, quietFromHour: s.quiet_from_hour });

/**
 * Whether the shop's digest for its local day is due: its day has started, it has not had today's, and it is not in
 * quiet hours again (a worker down all day leaves the night's reminders to the next morning's digest, not to 23:00).
 */
export function digestDue(s: ShopRow, nowMs: number): string | null {
  const today = shopLocalDate(nowMs, s.time_zone);
  if (s.digest_on !== null && s.digest_on >= today) return null;
  if (shopLocalDate(digestMomentOn(nowMs, hoursOf(s)), s.time_zone) !== today) return null;
  if (quietStretchAt(nowMs, hoursOf(s)) !== null) return null;
  return today;
}

/**
 * Sends each shop its morning digest once per local day: one mail per active member with something due, listing
 * what came due in the night (held reminders, which the digest sends) and what comes due in the next 24 hours.
 * The shop row is locked while its digest is written and its day is recorded in the same transaction, and each mail
 * has the dedupe key digest:{shop}:{member}:{date}, so a restart or a second worker never sends one twice.
 */
export async function sendMorningDigests(
  ds: DataSource,
  publicUrl: string,
  logger: Logger,
  options: { now?: () => Date; shopIds?: string[] } = {},
): Promise<number> {
  const domain = mailDomainOf(publicUrl);
  const now = options.now ?? (() => new Date());
  // A first look without locks (the zone arithmetic is luxon's, the same as everywhere else); each due shop is then
  // locked and looked at again, as another worker may have sent its digest in between.
  // shopIds narrows the pass to some shops (an operator re-running one, a test among others).
  const shops: ShopRow[] = await ds.query(
    `SELECT id, name, time_zone, day_start_hour, quiet_from_hour, to_char(digest_on, 'YYYY-MM-DD') AS digest_on FROM shops WHERE $1::uuid[] IS NULL OR id = ANY($1)`,
    [options.shopIds ?? null],
  );
  const due = shops.filter((s) => digestDue(s, now().getTime()) !== null);
  let sent = 0;
  for (const { id } of due) {
    sent += await ds.transaction(async (m) => {
      const rows: ShopRow[] = await m.query(
        `SELECT id, name, time_zone, day_start_hour, quiet_from_hour, to_char(digest_on, 'YYYY-MM-DD') AS digest_on FROM shops WHERE id = $1 FOR UPDATE SKIP LOCKED`,
        [id],
      );
      const shop = rows[0];
      const nowMs = now().getTime();
      const today = shop ? digestDue(shop, nowMs) : null;
      if (!shop || !today) return 0;
      const n = await writeDigest(m, shop, today, nowMs, publicUrl, domain);
      await m.query(`UPDATE shops SET digest_on = $2 WHERE id = $1`, [shop.id, today]);
      logger.info({ shopId: shop.id, day: today, mails: n }, 'morning digest queued');
      return n;
    });
  }
  return sent;
}

async function writeDigest(m: EntityManager, shop: ShopRow, today: string, nowMs: number, publicUrl: string, domain: string): Promise<number> {
  const now = new Date(nowMs);
  const items: (DigestItem & { people: string[] })[] = await m.query(
    `SELECT r.id, r.title, r.kind, r.event_at, r.due_at, r.lead_min, r.assumed, r.pour_id, pc.name AS piece_name,
            (r.via_digest AND r.due_at <= $2) AS held, COALESCE(r.recipient_user_ids, p.notify_user_ids) AS people
       FROM reminders r
       JOIN pours p ON p.id = r.pour_id
       JOIN pieces pc ON pc.id = p.piece_id
      WHERE r.shop_id = $1 AND r.status = 'pending' AND r.done_at IS NULL
        AND ((r.via_digest AND r.due_at <= $2) OR (r.event_at >= $2 AND r.event_at < $2 + interval '24 hours'))
      ORDER BY r.event_at`,
    [shop.id, now],
  );
  const members: { id: string; email: string }[] = await m.query(
    `SELECT u.id, u.email FROM users u JOIN memberships ms ON ms.user_id = u.id WHERE ms.shop_id = $1 AND ms.status = 'active' ORDER BY u.email`,
    [shop.id],
  );
  let n = 0;
  for (const member of members) {
    const mine = items.filter((i) => i.people.includes(member.id));
    if (mine.length === 0) continue; // nothing due: no mail, rather than a daily "nothing to do"
    const mail = digestMail({ shopName: shop.name, zone: shop.time_zone, nowMs, items: mine, publicUrl });
    if (await queueMail(m, { shopId: shop.id, dedupeKey: `digest:${shop.id}:${member.id}:${today}`, to: member.email, ...mail }, domain)) n++;
  }
  const held = items.filter((i) => i.held).map((i) => i.id);
  if (held.length > 0) await m.query(`UPDATE reminders SET status = 'sent', sent_at = now(), updated_at = now() WHERE id = ANY($1)`, [held]);
  return n;
}
