import type { DataSource } from 'typeorm';
import { auditRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { writeAuditCsv } from './audit-export';
import { namedEvents } from './audit-names';
import { auditQuery, olderThan, pageOf } from './audit-query';

export function auditRoutes(api: RouteRegistry, ds: DataSource): void {
  api.implement(routes, {
    listAudit: async ({ auth, query }) => {
      const qb = auditQuery(ds, auth.shopId, query);
      if (query.before) olderThan(qb, query.before, query.beforeId);
      const page = await pageOf(qb, query.limit);
      return { items: await namedEvents(ds.manager, auth.shopId, page.rows), next: page.rows.length === query.limit ? page.last : null };
    },
    exportAudit: async ({ auth, query, res }) => {
      await writeAuditCsv(ds, auth.shopId, query, res);
      return undefined;
    },
  });
}
