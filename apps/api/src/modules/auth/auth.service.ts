import { createHash, randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { Membership, PasswordReset, Shop, User, hashPassword, verifyAgainstNothing, verifyPassword } from '@gelpoint/db';
import type { LoginRequest, PasswordResetConfirm, RegisterRequest, SessionResponse } from '@gelpoint/contracts';
import { AppError } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { passwordResetMail } from '../mail/mail-templates';
import { queueMail } from '@gelpoint/db';
import { checkNewPassword } from './password-policy';
import { openSession, revokeSessions, type SessionSettings } from './session.service';

export interface AuthSettings extends SessionSettings {
  publicUrl: string;
  mailDomain: string;
  resetMinutes: number;
}

export const newToken = () => randomBytes(32).toString('base64url');
export const tokenHash = (token: string) => createHash('sha256').update(token).digest('hex');

const isUniqueViolation = (err: unknown) => (err as { code?: string }).code === '23505';

export async function register(ds: DataSource, s: AuthSettings, input: RegisterRequest, userAgent: string): Promise<SessionResponse> {
  checkNewPassword(input.password, input);
  const passwordHash = await hashPassword(input.password);
  try {
    return await ds.transaction(async (m) => {
      const shop = await m.save(m.create(Shop, { name: input.shopName, ...(input.timeZone ? { timeZone: input.timeZone } : {}) }));
      const user = await m.save(m.create(User, { email: input.email, name: input.name, passwordHash }));
      await m.save(m.create(Membership, { userId: user.id, shopId: shop.id, role: 'lead', status: 'active' }));
      await recordAudit(m, {
        shopId: shop.id,
        actor: { userId: user.id, userName: user.name },
        action: 'shop.create',
        objectType: 'shop',
        objectId: shop.id,
        detail: { name: shop.name },
      });
      return openSession(m, s, user, shop.id, userAgent);
    });
  } catch (err) {
    if (isUniqueViolation(err)) {
      throw new AppError('conflict', 'email_taken', 'an account with this e-mail already exists; sign in instead, or use another e-mail', {
        email: 'an account with this e-mail already exists',
      });
    }
    throw err;
  }
}

const badCredentials = () => new AppError('unauthorized', 'invalid_credentials', 'that e-mail and password do not match an account');

export async function login(ds: DataSource, s: AuthSettings, input: LoginRequest, userAgent: string): Promise<SessionResponse> {
  const user = await ds.getRepository(User).findOneBy({ email: input.email });
  if (!user) throw (await verifyAgainstNothing(input.password), badCredentials());
  if (!(await verifyPassword(input.password, user.passwordHash))) throw badCredentials();
  return ds.transaction(async (m) => {
    let shopId = input.shopId;
    if (!shopId) {
      const first = await m.findOne(Membership, { where: { userId: user.id, status: 'active' }, order: { createdAt: 'ASC' } });
      if (!first) throw new AppError('forbidden', 'no_active_shop', 'your account is not an active member of any shop; ask a lead for a new invitation');
      shopId = first.shopId;
    }
    const session = await openSession(m, s, user, shopId, userAgent);
    await recordAudit(m, { shopId, actor: { userId: user.id, userName: user.name }, action: 'session.open', objectType: 'user', objectId: user.id });
    return session;
  });
}

/** Always answers the same way, so the endpoint does not tell who has an account. */
export async function requestPasswordReset(ds: DataSource, s: AuthSettings, email: string): Promise<void> {
  await ds.transaction(async (m) => {
    const user = await m.findOneBy(User, { email });
    if (!user) return;
    const token = newToken();
    const expiresAt = new Date(Date.now() + s.resetMinutes * 60_000);
    const reset = await m.save(m.create(PasswordReset, { userId: user.id, tokenHash: tokenHash(token), expiresAt }));
    const mail = passwordResetMail({ name: user.name, link: `${s.publicUrl}/reset-password?token=${token}`, minutes: s.resetMinutes });
    await queueMail(m, { shopId: null, dedupeKey: `password-reset:${reset.id}`, to: user.email, ...mail }, s.mailDomain);
  });
}

export async function confirmPasswordReset(ds: DataSource, input: PasswordResetConfirm): Promise<void> {
  const passwordHash = await hashPassword(input.password);
  await ds.transaction(async (m) => {
    const reset = await m.findOne(PasswordReset, {
      where: { tokenHash: tokenHash(input.token) },
      relations: { user: true },
      lock: { mode: 'pessimistic_write', tables: ['password_resets'] },
    });
    if (!reset) throw new AppError('not_found', 'reset_not_found', 'this reset link is not valid; ask for a new one');
    checkNewPassword(input.password, reset.user!);
    if (reset.usedAt) throw new AppError('gone', 'reset_used', 'this reset link was already used; ask for a new one');
    if (reset.expiresAt.getTime() <= Date.now()) throw new AppError('gone', 'reset_expired', 'this reset link has expired; ask for a new one');
    await m.update(PasswordReset, { id: reset.id }, { usedAt: new Date() });
    await m
      .createQueryBuilder()
      .update(PasswordReset)
      .set({ usedAt: () => 'now()' })
      .where('user_id = :u AND used_at IS NULL', { u: reset.userId })
      .execute();
    await m.update(User, { id: reset.userId }, { passwordHash, passwordChangedAt: new Date() });
    // A new password ends every session: whoever knew the old one is signed out everywhere.
    await revokeSessions(m, { userId: reset.userId });
    await recordAudit(m, { shopId: null, actor: null, action: 'password.reset', objectType: 'user', objectId: reset.userId });
  });
}
