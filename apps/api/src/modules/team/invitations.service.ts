import type { DataSource, EntityManager } from 'typeorm';
import { Invitation, Membership, Shop, User, hashPassword, verifyPassword } from '@gelpoint/db';
import type { AcceptInvitationRequest, CreateInvitationRequest, Invitation as InvitationView, InvitationPreview, SessionResponse } from '@gelpoint/contracts';
import type { AuthContext } from '../../http/auth-context';
import { AppError, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { newToken, tokenHash, type AuthSettings } from '../auth/auth.service';
import { checkNewPassword } from '../auth/password-policy';
import { openSession } from '../auth/session.service';
import { invitationMail } from '../mail/mail-templates';
import { queueMail } from '@gelpoint/db';

export interface InvitationSettings extends AuthSettings {
  invitationDays: number;
}

function statusOf(i: Invitation): InvitationView['status'] {
  if (i.acceptedAt) return 'accepted';
  if (i.revokedAt) return 'revoked';
  if (i.expiresAt.getTime() <= Date.now()) return 'expired';
  return 'pending';
}

export function invitationView(i: Invitation): InvitationView {
  return {
    id: i.id,
    email: i.email,
    role: i.role,
    status: statusOf(i),
    invitedBy: i.invitedBy ? { id: i.invitedBy.id, name: i.invitedBy.name } : null,
    createdAt: i.createdAt.toISOString(),
    expiresAt: i.expiresAt.toISOString(),
  };
}

export async function listInvitations(ds: DataSource, shopId: string): Promise<InvitationView[]> {
  const rows = await ds.getRepository(Invitation).find({ where: { shopId }, relations: { invitedBy: true }, order: { createdAt: 'DESC' }, take: 200 });
  return rows.map(invitationView);
}

export async function createInvitation(ds: DataSource, s: InvitationSettings, auth: AuthContext, input: CreateInvitationRequest): Promise<InvitationView> {
  return ds.transaction(async (m) => {
    const shop = await m.findOneOrFail(Shop, { where: { id: auth.shopId }, lock: { mode: 'pessimistic_write' } });
    const member: { status: string }[] = await m.query(
      `SELECT m.status FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.shop_id = $1 AND u.email = $2`,
      [auth.shopId, input.email],
    );
    if (member[0]?.status === 'active') {
      throw new AppError('conflict', 'already_member', `${input.email} is already a member of this shop`, { email: 'already a member' });
    }
    // A new invitation replaces any earlier pending one for the same address: only the newest link works.
    await m
      .createQueryBuilder()
      .update(Invitation)
      .set({ revokedAt: () => 'now()' })
      .where('shop_id = :shop AND email = :email AND accepted_at IS NULL AND revoked_at IS NULL', { shop: auth.shopId, email: input.email })
      .execute();
    const token = newToken();
    const expiresAt = new Date(Date.now() + s.invitationDays * 86_400_000);
    const inv = await m.save(
      m.create(Invitation, {
        shopId: auth.shopId,
        email: input.email,
        role: input.role,
        tokenHash: tokenHash(token),
        invitedById: auth.userId,
        expiresAt,
        acceptedAt: null,
        revokedAt: null,
      }),
    );
    const mail = invitationMail({
      shopName: shop.name,
      inviterName: auth.userName,
      role: input.role,
      link: `${s.publicUrl}/invitations/${token}`,
      expiresAt,
      timeZone: shop.timeZone,
    });
    await queueMail(m, { shopId: auth.shopId, dedupeKey: `invitation:${inv.id}`, to: input.email, ...mail }, s.mailDomain);
    await recordAudit(m, {
      shopId: auth.shopId,
      actor: auth,
      action: 'invitation.create',
      objectType: 'invitation',
      objectId: inv.id,
      detail: { email: input.email, role: input.role },
    });
    inv.invitedBy = await m.findOneBy(User, { id: auth.userId });
    return invitationView(inv);
  });
}

export async function revokeInvitation(ds: DataSource, auth: AuthContext, id: string): Promise<void> {
  await ds.transaction(async (m) => {
    const inv = await m.findOne(Invitation, { where: { id, shopId: auth.shopId }, lock: { mode: 'pessimistic_write' } });
    if (!inv) throw notFound('invitation');
    if (inv.acceptedAt) throw new AppError('conflict', 'invitation_accepted', 'this invitation was already accepted; disable the member instead');
    if (!inv.revokedAt) await m.update(Invitation, { id }, { revokedAt: new Date() });
    await recordAudit(m, {
      shopId: auth.shopId,
      actor: auth,
      action: 'invitation.revoke',
      objectType: 'invitation',
      objectId: id,
      detail: { email: inv.email },
    });
  });
}

async function usableInvitation(m: EntityManager, token: string, lock: boolean): Promise<Invitation> {
  const inv = await m.findOne(Invitation, {
    where: { tokenHash: tokenHash(token) },
    relations: { shop: true },
    ...(lock ? { lock: { mode: 'pessimistic_write', tables: ['invitations'] } } : {}),
  });
  if (!inv) throw new AppError('not_found', 'invitation_not_found', 'this invitation link is not valid; ask the shop lead for a new one');
  const status = statusOf(inv);
  if (status === 'accepted') throw new AppError('gone', 'invitation_used', 'this invitation was already accepted; sign in instead');
  if (status === 'revoked') throw new AppError('gone', 'invitation_revoked', 'this invitation was withdrawn; ask the shop lead for a new one');
  if (status === 'expired') throw new AppError('gone', 'invitation_expired', 'this invitation has expired; ask the shop lead for a new one');
  return inv;
}

export async function previewInvitation(ds: DataSource, token: string): Promise<InvitationPreview> {
  const inv = await usableInvitation(ds.manager, token, false);
  const accountExists = (await ds.getRepository(User).countBy({ email: inv.email })) > 0;
  return { shopName: inv.shop!.name, email: inv.email, role: inv.role, expiresAt: inv.expiresAt.toISOString(), accountExists };
}

export async function acceptInvitation(
  ds: DataSource,
  s: InvitationSettings,
  token: string,
  input: AcceptInvitationRequest,
  userAgent: string,
): Promise<SessionResponse> {
  const newHash = await hashPassword(input.password);
  return ds.transaction(async (m) => {
    const inv = await usableInvitation(m, token, true);
    let user = await m.findOneBy(User, { email: inv.email });
    if (user) {
      if (!(await verifyPassword(input.password, user.passwordHash))) {
        throw new AppError('unauthorized', 'invalid_credentials', `an account for ${inv.email} exists: enter its current password to join`, {
          password: 'not the password of this account',
        });
      }
    } else {
      if (!input.name) throw new AppError('bad_request', 'invalid_input', 'your name is required to create the account', { name: 'your name is required' });
      checkNewPassword(input.password, { email: inv.email, name: input.name });
      user = await m.save(m.create(User, { email: inv.email, name: input.name, passwordHash: newHash }));
    }
    const existing = await m.findOneBy(Membership, { userId: user.id, shopId: inv.shopId });
    if (existing) await m.update(Membership, { id: existing.id }, { role: inv.role, status: 'active' });
    else await m.save(m.create(Membership, { userId: user.id, shopId: inv.shopId, role: inv.role, status: 'active' }));
    await m.update(Invitation, { id: inv.id }, { acceptedAt: new Date() });
    await recordAudit(m, {
      shopId: inv.shopId,
      actor: { userId: user.id, userName: user.name },
      action: 'invitation.accept',
      objectType: 'invitation',
      objectId: inv.id,
      detail: { role: inv.role },
    });
    return openSession(m, s, user, inv.shopId, userAgent);
  });
}
