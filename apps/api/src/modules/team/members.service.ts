import type { DataSource } from 'typeorm';
import { Membership } from '@gelpoint/db';
import type { Member, UpdateMemberRequest } from '@gelpoint/contracts';
import type { AuthContext } from '../../http/auth-context';
import { AppError, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { revokeSessions } from '../auth/session.service';

interface MemberRow {
  id: string;
  user_id: string;
  name: string;
  email: string;
  role: Member['role'];
  status: Member['status'];
  created_at: Date;
}

const memberView = (r: MemberRow): Member => ({
  id: r.id,
  userId: r.user_id,
  name: r.name,
  email: r.email,
  role: r.role,
  status: r.status,
  joinedAt: r.created_at.toISOString(),
});

const SELECT = `SELECT m.id, m.user_id, u.name, u.email, m.role, m.status, m.created_at
                  FROM memberships m JOIN users u ON u.id = m.user_id`;

export async function listMembers(ds: DataSource, shopId: string): Promise<Member[]> {
  const rows: MemberRow[] = await ds.query(`${SELECT} WHERE m.shop_id = $1 ORDER BY m.status, u.name`, [shopId]);
  return rows.map(memberView);
}

export async function updateMember(ds: DataSource, auth: AuthContext, id: string, change: UpdateMemberRequest): Promise<Member> {
  return ds.transaction(async (m) => {
    // Lock the shop's lead rows so two leads demoting each other cannot leave the shop without one.
    await m.query(`SELECT id FROM memberships WHERE shop_id = $1 AND role = 'lead' FOR UPDATE`, [auth.shopId]);
    const target = await m.findOne(Membership, { where: { id, shopId: auth.shopId }, lock: { mode: 'pessimistic_write' } });
    if (!target) throw notFound('member');
    const losesLead = target.role === 'lead' && target.status === 'active' && ((change.role && change.role !== 'lead') || change.status === 'disabled');
    if (losesLead) {
      const leads: { n: number }[] = await m.query(`SELECT count(*)::int AS n FROM memberships WHERE shop_id = $1 AND role = 'lead' AND status = 'active'`, [
        auth.shopId,
      ]);
      if ((leads[0]?.n ?? 0) <= 1) throw new AppError('conflict', 'last_lead', 'the shop needs at least one active lead; make someone else lead first');
    }
    if (target.userId === auth.userId && change.status === 'disabled') {
      throw new AppError('conflict', 'cannot_disable_self', 'you cannot disable yourself; ask another lead');
    }
    await m.update(Membership, { id }, change);
    if (change.status === 'disabled') await revokeSessions(m, { userId: target.userId, shopId: auth.shopId });
    await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'member.update', objectType: 'membership', objectId: id, detail: { ...change } });
    const rows: MemberRow[] = await m.query(`${SELECT} WHERE m.id = $1`, [id]);
    return memberView(rows[0]!);
  });
}
