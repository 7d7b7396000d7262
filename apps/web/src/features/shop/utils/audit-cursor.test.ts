import { AuditExportQuery, AuditListQuery } from '@gelpoint/contracts';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { setDisplayTimeZone } from '../../../lib/display-zone';
import { auditApiFilters, localDayStart, readAuditFilters, readAuditQuery } from './audit-cursor';

const id = '0b7d4c1e-2f3a-4b5c-8d6e-7f8091a2b3c4';

describe('readAuditQuery', () => {
  it('passes an ISO 8601 time with offset through, with the id that breaks ties', () => {
    const query = readAuditQuery(new URLSearchParams({ before: '2025-03-14T09:26:53.589123Z', beforeId: id }));
    expect(query).toMatchObject({ before: '2025-03-14T09:26:53.589123Z', beforeId: id });
  });

  it.each(['yesterday', '2025-13-01T00:00:00Z', '1700000000'])('drops %s instead of sending it', (before) => {
    expect(readAuditQuery(new URLSearchParams({ before, beforeId: id })).before).toBeUndefined();
    expect(readAuditQuery(new URLSearchParams({ before, beforeId: id })).beforeId).toBeUndefined();
  });

  it('only ever asks for what the API contract accepts', () => {
    const addresses: Record<string, string>[] = [
      { before: '2025-03-14T09:26:53Z' },
      { before: '2025-03-14T10:26:53+01:00', beforeId: 'not-an-id' },
      { before: 'nonsense', who: 'nobody', kind: 'DROP TABLE', from: '2026-02-30', to: 'soon' },
      { who: id, kind: 'lot', from: '2026-03-01', to: '2026-03-02' },
      { from: '2026-03-05', to: '2026-03-01' },
      { before: '' },
    ];
    for (const address of addresses) {
      const query = readAuditQuery(new URLSearchParams(address));
      expect(AuditListQuery.safeParse(query).error?.issues ?? []).toEqual([]);
      const { limit: _limit, before: _before, beforeId: _beforeId, ...filters } = query;
      expect(AuditExportQuery.safeParse(filters).success).toBe(true);
    }
  });

  it('drops a range that ends before it starts, keeping its start', () => {
    expect(readAuditFilters(new URLSearchParams({ from: '2026-03-05', to: '2026-03-01' }))).toEqual({ from: '2026-03-05' });
  });
});

describe('the shop’s days as instants', () => {
  beforeEach(() => setDisplayTimeZone('America/New_York'));
  afterEach(() => setDisplayTimeZone(undefined));

  // IANA tz database, America/New_York: EST is UTC−5; daylight time (UTC−4) began on Sunday 8 March 2026 at 02:00,
  // the second Sunday of March (US Energy Policy Act of 2005), so that day has 23 hours.
  it('starts a day at local midnight and ends it at the next, across the change to daylight time', () => {
    expect(localDayStart('2026-03-02')).toBe('2026-03-02T05:00:00.000Z');
    expect(auditApiFilters({ from: '2026-03-08', to: '2026-03-08' })).toEqual({ from: '2026-03-08T05:00:00.000Z', to: '2026-03-09T04:00:00.000Z' });
    expect(auditApiFilters({ who: id, kind: 'lot' })).toEqual({ actorId: id, action: 'lot' });
  });
});
