import fc from 'fast-check';
import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { activationEnergyFromKelvinQ, rateFactor } from './arrhenius';
import { cureStatus } from './cure-model';
import { equivalentAge } from './equivalent-age';
import { dayNightShopTemperature, learnedShopTemperature } from './shop-temperature';
import { demoDeepPour } from './test-fixtures';

const q5000 = activationEnergyFromKelvinQ(5000);
const hour = 3_600_000;

function dayNight(zone = 'America/Los_Angeles') {
  const shop = dayNightShopTemperature({ dayTempC: 22, nightTempC: 14, dayStartHour: 8, nightStartHour: 20, zone });
  if (!shop.ok) throw new Error(shop.error.message);
  return shop.value;
}

describe("the shop's day and night", () => {
  it('changes at the local hours of the shop’s zone', () => {
    const shop = dayNight();
    // 2026-06-10 12:00 in Los Angeles is PDT (UTC−7), so 19:00Z; night starts 20:00 local = 03:00Z next day.
    const noon = Date.UTC(2026, 5, 10, 19);
    expect(shop.at(noon)).toBe(22);
    expect(shop.nextChange(noon)).toBe(Date.UTC(2026, 5, 11, 3));
    expect(shop.at(Date.UTC(2026, 5, 11, 3))).toBe(14);
    expect(shop.nextChange(Date.UTC(2026, 5, 11, 3))).toBe(Date.UTC(2026, 5, 11, 15));
  });

  it('keeps its local hours across both daylight-saving changes (IANA tz: Los Angeles, 2026-03-08 and 2026-11-01)', () => {
    const shop = dayNight();
    // Spring forward: the night of 7–8 March is an hour shorter; day still starts at 08:00 local (now PDT, 15:00Z).
    const springNight = Date.UTC(2026, 2, 8, 4); // 20:00 PST on 7 March
    expect(shop.at(springNight)).toBe(14);
    expect(shop.nextChange(springNight)).toBe(DateTime.fromISO('2026-03-08T08:00', { zone: 'America/Los_Angeles' }).toMillis());
    expect((shop.nextChange(springNight) - springNight) / hour).toBe(11);
    // Fall back: the night of 31 October – 1 November is an hour longer.
    const fallNight = Date.UTC(2026, 10, 1, 3); // 20:00 PDT on 31 October
    expect((shop.nextChange(fallNight) - fallNight) / hour).toBe(13);
  });

  it('works east of UTC too (Auckland, UTC+13 in December)', () => {
    const shop = dayNight('Pacific/Auckland');
    // 08:00 NZDT on 5 December 2026 is 19:00Z on 4 December.
    expect(shop.at(Date.UTC(2026, 11, 4, 19))).toBe(22);
    expect(shop.at(Date.UTC(2026, 11, 4, 18, 59))).toBe(14);
  });

  it('refuses hours that are not whole hours of the day, and a zone it does not know', () => {
    expect(dayNightShopTemperature({ dayTempC: 22, nightTempC: 14, dayStartHour: 24, nightStartHour: 20, zone: 'utc' }).ok).toBe(false);
    expect(dayNightShopTemperature({ dayTempC: 22, nightTempC: 14, dayStartHour: 8, nightStartHour: 8, zone: 'utc' }).ok).toBe(false);
    const zone = dayNightShopTemperature({ dayTempC: 22, nightTempC: 14, dayStartHour: 8, nightStartHour: 20, zone: 'Mars/Olympus' });
    expect(zone.ok || zone.error.code).toBe('zone_unknown');
  });

  it('sums the equivalent age over two days and nights as the definition does (ASTM C1074)', () => {
    // No readings: 48 h from 08:00 local, so 24 h at 22 °C and 24 h at 14 °C. By hand with Q = 5000 K and a 20 °C
    // reference: te = 24·exp(−5000(1/295.15 − 1/293.15)) + 24·exp(−5000(1/287.15 − 1/293.15)).
    const shop = dayNight('utc');
    const from = Date.UTC(2026, 11, 1, 8);
    const age = equivalentAge({
      readings: [],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      window: { from: new Date(from).toISOString(), to: new Date(from + 48 * hour).toISOString() },
      assumedTempC: shop,
    });
    expect(age.ok).toBe(true);
    if (!age.ok) return;
    const byHand = 24 * Math.exp(-5000 * (1 / 295.15 - 1 / 293.15)) + 24 * Math.exp(-5000 * (1 / 287.15 - 1 / 293.15));
    expect(age.value.equivalentHoursAtRef).toBeCloseTo(byHand, 10);
    expect(age.value.spans.map((s) => s.tempC)).toEqual([22, 14, 22, 14]);
  });

  it('lets a gap follow the night down, and the forecast dip at night', () => {
    const shop = dayNight('utc');
    // A reading of 20 °C at 08:00, nothing after: 2 h carried, then the gap follows min(20, day 22) = 20 until 20:00,
    // then the night's 14.
    const readings = [{ at: '2026-12-01T08:00:00Z', tempC: 20 }];
    const status = cureStatus({
      product: { ...demoDeepPour, referenceTempC: 20, minWorkTempC: 5, activationEnergyKJPerMol: q5000 },
      readings,
      pouredAt: '2026-12-01T08:00:00Z',
      asOf: '2026-12-02T08:00:00Z',
      assumedTempC: shop,
    });
    expect(status.ok).toBe(true);
    if (!status.ok) return;
    expect(status.value.age.spans.map((s) => [s.source, s.tempC, (s.toMs - s.fromMs) / hour])).toEqual([
      ['carried', 20, 2],
      ['gap', 20, 10],
      ['gap', 14, 12],
    ]);
    // Ahead, the shop's pattern lowered by what the last reading fell short of the day's 22 °C (2 K): 20 by day, 12 by night.
    expect(status.value.ahead.slice(0, 2).map((p) => [p.tempC, (p.toMs - p.fromMs) / hour])).toEqual([
      [20, 12],
      [12, 12],
    ]);
    const k = (t: number) => rateFactor(t, 20, q5000);
    expect(status.value.age.equivalentHoursAtRef).toBeCloseTo(12 * k(20) + 12 * k(14), 10);
  });

  it('learns each hour of the day from the last week of readings', () => {
    const now = Date.UTC(2026, 11, 8, 0);
    const readings = Array.from({ length: 7 * 24 }, (_, i) => {
      const ms = now - (i + 1) * hour;
      const h = new Date(ms).getUTCHours();
      return { ms, tempC: h >= 8 && h < 20 ? 21 : 15 };
    });
    const learned = learnedShopTemperature(readings, 'utc', now);
    expect(learned.ok).toBe(true);
    if (!learned.ok) return;
    expect(learned.value.at(Date.UTC(2026, 11, 9, 12))).toBe(21);
    expect(learned.value.at(Date.UTC(2026, 11, 9, 3))).toBe(15);
    expect(learned.value.nextChange(Date.UTC(2026, 11, 9, 3, 30))).toBe(Date.UTC(2026, 11, 9, 4));
    expect(learnedShopTemperature([], 'utc', now).ok).toBe(false);
  });
});

describe("the shop's hours against luxon's wall clock (IANA tz database through Intl)", () => {
  const zones = ['America/Vancouver', 'Europe/Berlin', 'Pacific/Auckland', 'Australia/Lord_Howe', 'America/St_Johns', 'Asia/Kathmandu', 'utc'];
  const minute = 60_000;
  const wallHour = (ms: number, zone: string) => DateTime.fromMillis(ms, { zone }).hour;
  const wallTopOfHour = (ms: number, zone: string) => {
    const t = DateTime.fromMillis(ms, { zone });
    return t.minute === 0 && t.second === 0 && t.millisecond === 0;
  };
  // Every instant in 2026 at which a zone's offset changes, found minute by minute from luxon's offsets.
  const changes = zones.flatMap((zone) => {
    const out: number[] = [];
    for (let day = Date.UTC(2026, 0, 1); day < Date.UTC(2027, 0, 1); day += 24 * hour) {
      if (DateTime.fromMillis(day, { zone }).offset === DateTime.fromMillis(day + 24 * hour, { zone }).offset) continue;
      let t = day;
      while (DateTime.fromMillis(t, { zone }).offset === DateTime.fromMillis(day, { zone }).offset) t += minute;
      out.push(t);
    }
    return out;
  });
  // Any instant of 2026, or one within a day and a half of a change of offset.
  const instant = fc.oneof(
    fc.integer({ min: Date.UTC(2026, 0, 1), max: Date.UTC(2026, 11, 31) }),
    fc.tuple(fc.constantFrom(...changes), fc.integer({ min: -36 * hour, max: 36 * hour })).map(([c, d]) => c + d),
  );

  /** The temperature holds from ms until next, and changes there or a set hour starts there on the wall clock. */
  function holdsUntilNext(shopAt: (ms: number) => number, truth: (ms: number) => number, ms: number, next: number, startsHour: (ms: number) => boolean) {
    expect(next).toBeGreaterThan(ms);
    expect(next - ms).toBeLessThanOrEqual(26 * hour);
    expect(shopAt(ms)).toBe(truth(ms));
    for (let t = Math.ceil(ms / minute) * minute; t < next; t += minute) expect(truth(t)).toBe(truth(ms));
    expect(truth(next) !== truth(next - 1) || startsHour(next)).toBe(true);
  }

  it('day and night: the temperature and its next change, any hours, any zone', () => {
    fc.assert(
      fc.property(fc.constantFrom(...zones), fc.integer({ min: 0, max: 23 }), fc.integer({ min: 0, max: 23 }), instant, (zone, dayStart, nightStart, ms) => {
        fc.pre(dayStart !== nightStart);
        const shop = dayNightShopTemperature({ dayTempC: 22, nightTempC: 14, dayStartHour: dayStart, nightStartHour: nightStart, zone });
        if (!shop.ok) throw new Error(shop.error.message);
        const truth = (t: number) => {
          const h = wallHour(t, zone);
          const isDay = dayStart < nightStart ? h >= dayStart && h < nightStart : h >= dayStart || h < nightStart;
          return isDay ? 22 : 14;
        };
        const startsHour = (t: number) => wallTopOfHour(t, zone) && [dayStart, nightStart].includes(wallHour(t, zone));
        holdsUntilNext(shop.value.at, truth, ms, shop.value.nextChange(ms), startsHour);
      }),
      { numRuns: 300 },
    );
  });

  it('learned hour by hour: the temperature and its next change, any zone', () => {
    fc.assert(
      fc.property(fc.constantFrom(...zones), instant, (zone, ms) => {
        // A week of readings, one each hour, each at 10 °C plus the hour the wall clock showed.
        const readings = Array.from({ length: 7 * 24 }, (_, i) => {
          const at = Date.UTC(2025, 11, 1) + i * hour;
          return { ms: at, tempC: 10 + wallHour(at, zone) };
        });
        const learned = learnedShopTemperature(readings, zone, Date.UTC(2025, 11, 8));
        if (!learned.ok) throw new Error(learned.error.message);
        const truth = (t: number) => 10 + wallHour(t, zone);
        holdsUntilNext(learned.value.at, truth, ms, learned.value.nextChange(ms), (t) => wallTopOfHour(t, zone));
      }),
      { numRuns: 300 },
    );
  });
});
