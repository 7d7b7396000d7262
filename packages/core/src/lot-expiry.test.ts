import { describe, expect, it } from 'vitest';
import { lotExpired } from './lot-expiry';

// America/Vancouver keeps Pacific Standard Time, UTC−8, in winter and Pacific Daylight Time, UTC−7, in summer
// (IANA time zone database), so its calendar day runs 8 (7) hours behind UTC's.
const zone = 'America/Vancouver';
const at = (iso: string) => Date.parse(iso);

describe('a lot past its date, by the shop’s calendar', () => {
  it('keeps a lot good through the whole of its last day in a shop west of UTC', () => {
    // 03:00 UTC on 4 Dec is 19:00 PST on 3 Dec: the shop is still on the lot's last day, though UTC is not.
    expect(lotExpired('2026-12-03', at('2026-12-04T03:00:00Z'), zone)).toBe(false);
    // 07:59 UTC is 23:59 PST, the last minute of 3 Dec in the shop.
    expect(lotExpired('2026-12-03', at('2026-12-04T07:59:00Z'), zone)).toBe(false);
  });

  it('makes it expired at the shop’s midnight, not UTC’s', () => {
    // 08:00 UTC on 4 Dec is 00:00 PST on 4 Dec.
    expect(lotExpired('2026-12-03', at('2026-12-04T08:00:00Z'), zone)).toBe(true);
    // In summer the boundary moves an hour: 07:00 UTC on 4 Jul is 00:00 PDT.
    expect(lotExpired('2026-07-03', at('2026-07-04T06:59:00Z'), zone)).toBe(false);
    expect(lotExpired('2026-07-03', at('2026-07-04T07:00:00Z'), zone)).toBe(true);
  });

  it('reads the same instant by each shop’s own date', () => {
    // 12:00 UTC on 4 Dec is already 4 Dec in Vancouver and in UTC.
    expect(lotExpired('2026-12-03', at('2026-12-04T12:00:00Z'), zone)).toBe(true);
    expect(lotExpired('2026-12-03', at('2026-12-04T03:00:00Z'), 'UTC')).toBe(true);
  });

  it('never expires a lot without a date, and keeps a lot good on its own date', () => {
    expect(lotExpired(null, at('2030-01-01T00:00:00Z'), zone)).toBe(false);
    expect(lotExpired('2026-12-04', at('2026-12-04T20:00:00Z'), zone)).toBe(false);
  });
});
