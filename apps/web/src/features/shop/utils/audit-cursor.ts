import { z } from 'zod';
import { auditPageSize } from '../api/get-audit-events';
import type { AuditListQuery } from '../api/keys';

const Before = z.iso.datetime({ offset: true });

/** The audit list pages backwards in time: `?before=` holds the time of the oldest event already shown. */
export function readAuditQuery(search: URLSearchParams): AuditListQuery {
  const before = Before.safeParse(search.get('before'));
  return before.success ? { limit: auditPageSize, before: before.data } : { limit: auditPageSize };
}
