import fc from 'fast-check';
import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { zoneOffsets } from './zone-offsets';

// Zones with whole-hour, half-hour and 45-minute offsets, daylight saving north and south, a 30-minute daylight
// saving (Lord Howe), a zone whose summer time pauses for Ramadan (Casablanca), and zones without daylight saving.
const zones = [
  'America/Vancouver',
  'America/St_Johns',
  'Europe/Berlin',
  'Pacific/Auckland',
  'Pacific/Chatham',
  'Australia/Lord_Howe',
  'Africa/Casablanca',
  'Asia/Kathmandu',
  'Asia/Kolkata',
  'utc',
  'UTC+3',
];
const from2000 = Date.UTC(2000, 0, 1);
const to2100 = Date.UTC(2100, 0, 1);

describe("a zone's remembered offsets", () => {
  it('match luxon (the IANA tz database through Intl) at any instant, 2000–2100', () => {
    fc.assert(
      fc.property(fc.constantFrom(...zones), fc.integer({ min: from2000, max: to2100 }), (zone, ms) => {
        expect(zoneOffsets(zone).offsetMinutes(ms)).toBe(DateTime.fromMillis(ms, { zone }).offset);
      }),
      { numRuns: 3000 },
    );
  });

  it('put each daylight-saving change on the millisecond luxon puts it (Vancouver and Auckland, 2026)', () => {
    // From the tz database, as luxon reads it: Vancouver springs forward at 10:00Z on 8 March 2026 and falls back at
    // 09:00Z on 1 November; Auckland falls back at 14:00Z on 4 April 2026 and springs forward at 14:00Z on 26 September.
    const changes: [string, number][] = [
      ['America/Vancouver', Date.UTC(2026, 2, 8, 10)],
      ['America/Vancouver', Date.UTC(2026, 10, 1, 9)],
      ['Pacific/Auckland', Date.UTC(2026, 3, 4, 14)],
      ['Pacific/Auckland', Date.UTC(2026, 8, 26, 14)],
    ];
    for (const [zone, at] of changes) {
      const offsets = zoneOffsets(zone);
      expect(offsets.offsetMinutes(at - 1)).toBe(DateTime.fromMillis(at - 1, { zone }).offset);
      expect(offsets.offsetMinutes(at)).toBe(DateTime.fromMillis(at, { zone }).offset);
      expect(offsets.offsetMinutes(at)).not.toBe(offsets.offsetMinutes(at - 1));
      expect(offsets.changesBetween(at - 1, at)).toBe(true);
      expect(offsets.changesBetween(at, at + 3_600_000)).toBe(false);
      expect(offsets.changesBetween(at - 3_600_000, at - 1)).toBe(false);
    }
  });

  it('find no change in a zone without daylight saving', () => {
    expect(zoneOffsets('Asia/Kolkata').changesBetween(Date.UTC(2026, 0, 1), Date.UTC(2027, 0, 1))).toBe(false);
    expect(zoneOffsets('utc').changesBetween(Date.UTC(2026, 0, 1), Date.UTC(2027, 0, 1))).toBe(false);
  });
});
