import type { Response } from 'express';
import type { EntityManager } from 'typeorm';
import { Membership, Session, Shop, User } from '@gelpoint/db';
import type { MeResponse, Role, SessionResponse } from '@gelpoint/contracts';
import { SESSION_COOKIE, signSessionToken } from '../../http/auth-context';
import { AppError } from '../../http/errors';
import { shopView } from '../shop/shop-view';

export interface SessionSettings {
  jwtSecret: string;
  sessionHours: number;
  secureCookies: boolean;
}

export const userView = (u: User) => ({ id: u.id, email: u.email, name: u.name });

/** Opens a session for the user in the shop and returns what sign-in answers with. */
export async function openSession(m: EntityManager, s: SessionSettings, user: User, shopId: string, userAgent: string): Promise<SessionResponse> {
  const membership = await m.findOneBy(Membership, { userId: user.id, shopId, status: 'active' });
  if (!membership) throw new AppError('forbidden', 'not_a_member', 'you are not an active member of that shop');
  const shop = await m.findOneByOrFail(Shop, { id: shopId });
  const expiresAt = new Date(Date.now() + s.sessionHours * 3600_000);
  const session = await m.save(m.create(Session, { userId: user.id, shopId, expiresAt, userAgent: userAgent.slice(0, 300) }));
  const token = signSessionToken(s.jwtSecret, { sub: user.id, sid: session.id }, expiresAt);
  return { token, expiresAt: expiresAt.toISOString(), user: userView(user), shop: shopView(shop), role: membership.role as Role };
}

export function setSessionCookie(res: Response, s: SessionSettings, session: SessionResponse): void {
  res.cookie(SESSION_COOKIE, session.token, {
    httpOnly: true,
    sameSite: 'lax',
    secure: s.secureCookies,
    path: '/',
    expires: new Date(session.expiresAt),
  });
}

export function clearSessionCookie(res: Response, s: SessionSettings): void {
  res.clearCookie(SESSION_COOKIE, { httpOnly: true, sameSite: 'lax', secure: s.secureCookies, path: '/' });
}

export async function revokeSessions(m: EntityManager, where: { userId: string; shopId?: string }): Promise<void> {
  const qb = m
    .createQueryBuilder()
    .update(Session)
    .set({ revokedAt: () => 'now()' })
    .where('user_id = :userId AND revoked_at IS NULL', { userId: where.userId });
  if (where.shopId) qb.andWhere('shop_id = :shopId', { shopId: where.shopId });
  await qb.execute();
}

export async function describeMe(m: EntityManager, userId: string, shopId: string, role: Role, calendarUrl: string): Promise<MeResponse> {
  const user = await m.findOneByOrFail(User, { id: userId });
  const shop = await m.findOneByOrFail(Shop, { id: shopId });
  const shops: { shop_id: string; shop_name: string; role: Role }[] = await m.query(
    `SELECT m.shop_id, s.name AS shop_name, m.role FROM memberships m JOIN shops s ON s.id = m.shop_id
      WHERE m.user_id = $1 AND m.status = 'active' ORDER BY s.name`,
    [userId],
  );
  return {
    user: userView(user),
    shop: shopView(shop),
    role,
    shops: shops.map((r) => ({ shopId: r.shop_id, shopName: r.shop_name, role: r.role })),
    calendarUrl,
  };
}

/** Ends one session for good (sign-out, or a shop switch that replaces it); an ended one stays as it was. */
export async function revokeSession(m: EntityManager, sessionId: string): Promise<void> {
  await m.query('UPDATE sessions SET revoked_at = now() WHERE id = $1 AND revoked_at IS NULL', [sessionId]);
}
