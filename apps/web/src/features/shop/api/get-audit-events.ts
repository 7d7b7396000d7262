import { AuditList } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { callRoute } from '../../../lib/api-routes';
import { shopKeys, type AuditListQuery } from './keys';

export type AuditPage = z.infer<typeof AuditList>;

export const auditPageSize = 50;

export function getAuditEvents(query: AuditListQuery, signal?: AbortSignal): Promise<AuditPage> {
  return callRoute('listAudit', { query: { ...query } }, signal ? { signal } : {});
}

export const auditEventsQueryOptions = (query: AuditListQuery) =>
  queryOptions({
    queryKey: shopKeys.auditList(query),
    queryFn: ({ signal }) => getAuditEvents(query, signal),
  });

export function useAuditEvents(query: AuditListQuery) {
  return useQuery(auditEventsQueryOptions(query));
}
