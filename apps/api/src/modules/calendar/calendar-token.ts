import { createHash, createHmac, randomBytes } from 'node:crypto';
import type { EntityManager } from 'typeorm';

/**
 * A member's feed token is an HMAC of a random salt under the server's secret: the URL can be shown again from the
 * salt without the token being stored, and the database keeps only the token's sha256 to find the feed by.
 */
export function feedToken(secret: string, membershipId: string, salt: string): string {
  return createHmac('sha256', secret).update(`calendar:${membershipId}:${salt}`).digest('base64url');
}

export const feedTokenHash = (token: string) => createHash('sha256').update(token).digest('hex');

export const feedUrl = (publicUrl: string, token: string) => `${publicUrl}/api/calendar/${token}.ics`;

/** The member's feed URL, made on first use. */
export async function calendarUrlOf(m: EntityManager, userId: string, shopId: string, secret: string, publicUrl: string): Promise<string> {
  const rows: { id: string; calendar_token_salt: string | null }[] = await m.query(
    'SELECT id, calendar_token_salt FROM memberships WHERE user_id = $1 AND shop_id = $2',
    [userId, shopId],
  );
  const row = rows[0];
  if (!row) throw new Error('the member has no membership in this shop');
  if (row.calendar_token_salt) return feedUrl(publicUrl, feedToken(secret, row.id, row.calendar_token_salt));
  return rotateCalendarToken(m, row.id, secret, publicUrl);
}

/** A new salt: the old URL stops working at once, and the new one is returned. */
export async function rotateCalendarToken(m: EntityManager, membershipId: string, secret: string, publicUrl: string): Promise<string> {
  const salt = randomBytes(18).toString('base64url');
  const token = feedToken(secret, membershipId, salt);
  await m.query('UPDATE memberships SET calendar_token_salt = $2, calendar_token_hash = $3 WHERE id = $1', [membershipId, salt, feedTokenHash(token)]);
  return feedUrl(publicUrl, token);
}

/** The id of the member's membership in the shop, locked for the rest of the transaction. */
export async function lockedMembershipId(m: EntityManager, userId: string, shopId: string): Promise<string | null> {
  const rows: { id: string }[] = await m.query('SELECT id FROM memberships WHERE user_id = $1 AND shop_id = $2 FOR UPDATE', [userId, shopId]);
  return rows[0]?.id ?? null;
}
