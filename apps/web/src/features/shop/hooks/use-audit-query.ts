import { useMemo } from 'react';
import { useSearchParams } from 'react-router';
import type { AuditListQuery } from '../api/keys';
import { readAuditQuery } from '../utils/audit-cursor';

export function useAuditQuery(): AuditListQuery {
  const [searchParams] = useSearchParams();
  return useMemo(() => readAuditQuery(searchParams), [searchParams]);
}
