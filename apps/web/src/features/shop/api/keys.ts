export interface AuditListQuery {
  limit: number;
  before?: string;
}

export const shopKeys = {
  all: ['shop'] as const,
  detail: () => [...shopKeys.all, 'detail'] as const,
  audit: () => [...shopKeys.all, 'audit'] as const,
  auditList: (query: AuditListQuery) => [...shopKeys.audit(), 'list', query] as const,
};
