import { AuditListQuery } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { readAuditQuery } from './audit-cursor';

describe('readAuditQuery', () => {
  it('passes an ISO 8601 time with offset through', () => {
    const query = readAuditQuery(new URLSearchParams({ before: '2025-03-14T09:26:53.589Z' }));
    expect(query.before).toBe('2025-03-14T09:26:53.589Z');
  });

  it.each(['yesterday', '2025-13-01T00:00:00Z', '1700000000'])('drops %s instead of sending it', (before) => {
    expect(readAuditQuery(new URLSearchParams({ before })).before).toBeUndefined();
  });

  it('only ever asks for what the API contract accepts', () => {
    for (const before of ['2025-03-14T09:26:53Z', '2025-03-14T10:26:53+01:00', 'nonsense', '']) {
      expect(AuditListQuery.safeParse(readAuditQuery(new URLSearchParams({ before }))).success).toBe(true);
    }
  });
});
