export interface AuditListQuery {
  limit: number;
  before?: string;
  beforeId?: string;
  actorId?: string;
  action?: string;
  /** Instants: the start of the reader's first day, and the end of the last. */
  from?: string;
  to?: string;
}

export const shopKeys = {
  all: ['shop'] as const,
  audit: () => [...shopKeys.all, 'audit'] as const,
  auditList: (query: AuditListQuery) => [...shopKeys.audit(), 'list', query] as const,
};
