import { AuditExportQuery, AuditList, AuditListQuery } from '../audit';
import { route } from './route';

export const auditRoutes = {
  listAudit: route({
    method: 'get',
    path: '/audit',
    tag: 'audit',
    summary: 'Audit events of the shop, newest first, with names and links; filter by person, kind and dates, page with next',
    access: 'audit:read',
    query: AuditListQuery,
    response: AuditList,
  }),
  exportAudit: route({
    method: 'get',
    path: '/audit/export',
    tag: 'audit',
    summary: 'The audit as CSV (text/csv), with the same filters as the list',
    access: 'audit:read',
    query: AuditExportQuery,
    raw: true,
  }),
};
