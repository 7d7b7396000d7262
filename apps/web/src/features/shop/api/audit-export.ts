import { env } from '../../../config/env';
import { buildUrl } from '../../../lib/api-client';
import { auditApiFilters, type AuditFilters } from '../utils/audit-cursor';

/** The address of the audit as CSV with the page's filters: a plain link, the browser downloads it with the session cookie. */
export function auditExportHref(filters: AuditFilters): string {
  return buildUrl(env.apiBasePath, '/audit/export', { ...auditApiFilters(filters) });
}
