import { AuditEvent as AuditEventRow } from '@gelpoint/db';
import { AuditList, AuditListQuery, type AuditEvent } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import type { DataSource } from 'typeorm';

function toView(e: AuditEventRow): AuditEvent {
  return {
    id: e.id,
    at: e.createdAt.toISOString(),
    actor: e.actorUserId ? { id: e.actorUserId, name: e.actorName ?? '' } : null,
    action: e.action,
    objectType: e.objectType,
    objectId: e.objectId,
    detail: e.detail,
  };
}

export function auditRoutes(api: RouteRegistry, ds: DataSource): void {
  api.add(
    { method: 'get', path: '/audit', tag: 'audit', summary: 'Recent audit events of the shop, newest first', access: ['lead'], query: AuditListQuery, response: AuditList },
    async ({ auth, query }) => {
      const qb = ds
        .getRepository(AuditEventRow)
        .createQueryBuilder('e')
        .where('e.shop_id = :shopId', { shopId: auth.shopId })
        .orderBy('e.created_at', 'DESC')
        .limit(query.limit);
      if (query.objectType) qb.andWhere('e.object_type = :t', { t: query.objectType });
      if (query.objectId) qb.andWhere('e.object_id = :o', { o: query.objectId });
      if (query.before) qb.andWhere('e.created_at < :b', { b: query.before });
      return { items: (await qb.getMany()).map(toView) };
    },
  );
}
