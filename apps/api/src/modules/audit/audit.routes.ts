import type { DataSource } from 'typeorm';
import { AuditExportQuery, AuditList, AuditListQuery } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { writeAuditCsv } from './audit-export';
import { namedEvents } from './audit-names';
import { auditQuery, olderThan, pageOf } from './audit-query';

export function auditRoutes(api: RouteRegistry, ds: DataSource): void {
  api.add(
    {
      method: 'get',
      path: '/audit',
      tag: 'audit',
      summary: 'Audit events of the shop, newest first, with names and links; filter by person, kind and dates, page with next',
      access: ['lead'],
      query: AuditListQuery,
      response: AuditList,
    },
    async ({ auth, query }) => {
      const qb = auditQuery(ds, auth.shopId, query);
      if (query.before) olderThan(qb, query.before, query.beforeId);
      const page = await pageOf(qb, query.limit);
      return { items: await namedEvents(ds.manager, auth.shopId, page.rows), next: page.rows.length === query.limit ? page.last : null };
    },
  );
  api.add(
    { method: 'get', path: '/audit/export', tag: 'audit', summary: 'The audit as CSV (text/csv), with the same filters as the list', access: ['lead'], query: AuditExportQuery },
    async ({ auth, query, res }) => {
      await writeAuditCsv(ds, auth.shopId, query, res);
      return undefined;
    },
  );
}
