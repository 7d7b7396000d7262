import { describe, expect, it } from 'vitest';
import { deliveryOf, lastLocalHour, quietStretchAt, type ShopHours } from './quiet-hours';
import { shopLocalDate, shopTimeWords, zoneAbbreviation } from './shop-time';

const hour = 3_600_000;
const pacific: ShopHours = { zone: 'America/Vancouver', dayStartHour: 7, quietFromHour: 21 };
const iso = (text: string) => new Date(text);

// Offsets and daylight-saving dates below are those of the IANA tz database (tzdata 2025), checked by hand:
// Vancouver is UTC−8 in winter (PST) and UTC−7 in summer (PDT), changing on 2026-03-08 and 2026-11-01;
// Kolkata is UTC+5:30 all year; Berlin is UTC+1 (CET) / UTC+2 (CEST), changing on 2026-03-29 and 2026-10-25.
describe("the shop's quiet hours", () => {
  it('covers the night from the quiet hour to the start of the day, west of UTC', () => {
    // 22:30 PST on 3 December is 06:30Z on the 4th; quiet began 21:00 PST (05:00Z) and ends 07:00 PST (15:00Z).
    expect(quietStretchAt(Date.parse('2026-12-04T06:30:00Z'), pacific)).toEqual({
      fromMs: Date.parse('2026-12-04T05:00:00Z'),
      toMs: Date.parse('2026-12-04T15:00:00Z'),
    });
    expect(quietStretchAt(Date.parse('2026-12-04T04:59:00Z'), pacific)).toBeNull(); // 20:59 PST
    expect(quietStretchAt(Date.parse('2026-12-04T15:00:00Z'), pacific)).toBeNull(); // 07:00 PST, the day has started
  });

  it('covers the night east of UTC too (Kolkata, UTC+5:30)', () => {
    const kolkata: ShopHours = { zone: 'Asia/Kolkata', dayStartHour: 7, quietFromHour: 21 };
    // 23:00 IST on 4 December is 17:30Z; quiet from 21:00 IST (15:30Z) to 07:00 IST on the 5th (01:30Z).
    expect(quietStretchAt(Date.parse('2026-12-04T17:30:00Z'), kolkata)).toEqual({
      fromMs: Date.parse('2026-12-04T15:30:00Z'),
      toMs: Date.parse('2026-12-05T01:30:00Z'),
    });
  });

  it('is an hour shorter the night clocks spring forward and an hour longer the night they fall back', () => {
    const spring = quietStretchAt(Date.parse('2026-03-08T09:00:00Z'), pacific); // 01:00 PST on 8 March
    expect(spring).toEqual({ fromMs: Date.parse('2026-03-08T05:00:00Z'), toMs: Date.parse('2026-03-08T14:00:00Z') }); // 21:00 PST → 07:00 PDT
    expect(spring && (spring.toMs - spring.fromMs) / hour).toBe(9);
    const fall = quietStretchAt(Date.parse('2026-11-01T09:00:00Z'), pacific); // 01:00 PDT on 1 November (the first one)
    expect(fall).toEqual({ fromMs: Date.parse('2026-11-01T04:00:00Z'), toMs: Date.parse('2026-11-01T15:00:00Z') }); // 21:00 PDT → 07:00 PST
    expect(fall && (fall.toMs - fall.fromMs) / hour).toBe(11);
    // Berlin: the night of 24–25 October 2026 gains its hour too (21:00 CEST = 19:00Z, 07:00 CET = 06:00Z).
    const berlin = quietStretchAt(Date.parse('2026-10-25T01:30:00Z'), { zone: 'Europe/Berlin', dayStartHour: 7, quietFromHour: 21 });
    expect(berlin && (berlin.toMs - berlin.fromMs) / hour).toBe(11);
  });

  it('takes an hour the clocks skip as the first moment after it, and an hour they repeat at its first showing', () => {
    // 02:00 does not happen in Vancouver on 8 March 2026; the wall clock goes from 01:59 PST to 03:00 PDT (10:00Z).
    expect(lastLocalHour(Date.parse('2026-03-08T11:00:00Z'), 2, 'America/Vancouver')).toBe(Date.parse('2026-03-08T10:00:00Z'));
    // 01:00 happens twice on 1 November 2026; the first is 01:00 PDT (08:00Z).
    expect(lastLocalHour(Date.parse('2026-11-01T09:30:00Z'), 1, 'America/Vancouver')).toBe(Date.parse('2026-11-01T08:00:00Z'));
  });

  it('handles quiet hours that start after midnight, and none at all when they start with the day', () => {
    const earlyQuiet: ShopHours = { zone: 'America/Vancouver', dayStartHour: 6, quietFromHour: 0 };
    expect(quietStretchAt(Date.parse('2026-12-04T10:00:00Z'), earlyQuiet)).not.toBeNull(); // 02:00 PST
    expect(quietStretchAt(Date.parse('2026-12-04T07:30:00Z'), earlyQuiet)).toBeNull(); // 23:30 PST
    const never: ShopHours = { zone: 'America/Vancouver', dayStartHour: 7, quietFromHour: 7 };
    expect(quietStretchAt(Date.parse('2026-12-04T10:00:00Z'), never)).toBeNull();
  });
});

describe('when a reminder goes out', () => {
  const before = Date.parse('2026-12-03T18:00:00Z'); // 10:00 PST on the 3rd, when the forecast was made
  it('keeps a reminder due in working hours at its own time', () => {
    const r = { kind: 'next_layer_window_opens', dueAt: iso('2026-12-04T18:00:00Z'), eventAt: iso('2026-12-04T18:00:00Z'), leadMin: 0 };
    expect(deliveryOf(r, pacific, before)).toEqual({ ...r, viaDigest: false });
  });

  it('holds anything due in the night for the morning digest', () => {
    const opens = { kind: 'next_layer_window_opens', dueAt: iso('2026-12-04T10:00:00Z'), eventAt: iso('2026-12-04T10:00:00Z'), leadMin: 0 }; // 02:00 PST
    expect(deliveryOf(opens, pacific, before).viaDigest).toBe(true);
    expect(deliveryOf(opens, pacific, before).dueAt).toEqual(opens.dueAt);
    const ready = { kind: 'ready_to_machine', dueAt: iso('2026-12-04T13:00:00Z'), eventAt: iso('2026-12-04T13:00:00Z'), leadMin: 0 };
    expect(deliveryOf(ready, pacific, before).viaDigest).toBe(true);
  });

  it('sends a window that closes in the night the evening before, as quiet hours start, with the time left', () => {
    // Closes 02:00 PST on the 4th (10:00Z), announced 30 min before: that is 01:30, in quiet hours.
    const closes = { kind: 'next_layer_window_closes', dueAt: iso('2026-12-04T09:30:00Z'), eventAt: iso('2026-12-04T10:00:00Z'), leadMin: 30 };
    const sent = deliveryOf(closes, pacific, before);
    expect(sent.viaDigest).toBe(false);
    expect(sent.dueAt).toEqual(iso('2026-12-04T05:00:00Z')); // 21:00 PST on the 3rd
    expect(sent.leadMin).toBe(300);
    expect(sent.eventAt).toEqual(closes.eventAt);
  });

  it('sends at once what fell due in a night already over (a cup logged the morning after)', () => {
    const opens = { kind: 'next_layer_window_opens', dueAt: iso('2026-12-04T10:00:00Z'), eventAt: iso('2026-12-04T10:00:00Z'), leadMin: 0 };
    expect(deliveryOf(opens, pacific, Date.parse('2026-12-04T17:00:00Z')).viaDigest).toBe(false); // 09:00 PST on the 4th
    expect(deliveryOf(opens, pacific, Date.parse('2026-12-04T14:59:00Z')).viaDigest).toBe(true); // 06:59 PST, still quiet
  });

  it('lets a window that closes after the day starts wait for the digest', () => {
    // Closes 07:15 PST (15:15Z); announced 06:45, in quiet hours, but the window is still open when the day starts.
    const closes = { kind: 'seal_coat_window_closes', dueAt: iso('2026-12-04T14:45:00Z'), eventAt: iso('2026-12-04T15:15:00Z'), leadMin: 30 };
    expect(deliveryOf(closes, pacific, before).viaDigest).toBe(true);
  });
});

describe('times in the shop’s words', () => {
  it('writes a moment in the shop’s zone with its abbreviation, PST in winter and PDT in summer', () => {
    expect(shopTimeWords(Date.parse('2026-12-03T17:15:36Z'), 'America/Vancouver')).toBe('Thu 3 Dec 2026, 09:15 PST');
    expect(shopTimeWords(Date.parse('2026-07-03T17:15:00Z'), 'America/Vancouver')).toBe('Fri 3 Jul 2026, 10:15 PDT');
  });

  it('agrees with the platform’s own formatter (ICU) on the local hour in zones east and west', () => {
    const ms = Date.parse('2026-12-03T23:40:00Z');
    for (const zone of ['America/Vancouver', 'America/New_York', 'Europe/Berlin', 'Asia/Kolkata', 'Australia/Sydney']) {
      const icu = new Intl.DateTimeFormat('en-GB', { timeZone: zone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(ms));
      expect(shopTimeWords(ms, zone)).toContain(`, ${icu} `);
    }
  });

  it('names zones by the letters their people use, and by the offset where there are none', () => {
    const winter = Date.parse('2026-01-15T12:00:00Z');
    expect(zoneAbbreviation(winter, 'Europe/Berlin')).toBe('CET');
    expect(zoneAbbreviation(winter, 'Australia/Sydney')).toBe('AEDT');
    expect(zoneAbbreviation(winter, 'Asia/Tokyo')).toBe('GMT+9');
  });

  it('gives the shop’s calendar date, which differs from UTC’s in the evening west of it', () => {
    expect(shopLocalDate(Date.parse('2026-12-04T06:30:00Z'), 'America/Vancouver')).toBe('2026-12-03');
    expect(shopLocalDate(Date.parse('2026-12-04T20:00:00Z'), 'Asia/Tokyo')).toBe('2026-12-05');
  });
});
