import { DateTime } from 'luxon';
import { checkZone, msPerHour } from './iso-time';
import { fail, ok, type Result } from './result';
import { zoneOffsets } from './zone-offsets';

const msPerDay = 24 * msPerHour;

/**
 * The shop's temperature over time where nothing is logged: one constant, day and night, or each hour of the day as
 * the last week's readings showed it. Piecewise constant, so a cure sum over it stays exact piece by piece.
 */
export interface ShopTemperature {
  /** The temperature in effect at an instant (epoch ms), °C. */
  at(ms: number): number;
  /** The first instant after ms at which the temperature changes; Infinity when it never does. */
  nextChange(ms: number): number;
  /** In words, for the sentences that say what was assumed. */
  words: string;
}

export function constantShopTemperature(tempC: number): ShopTemperature {
  return { at: () => tempC, nextChange: () => Infinity, words: `${round1(tempC)} °C (the plan's shop temperature)` };
}

export type AssumedTemperature = number | ShopTemperature;

export function shopTemperatureOf(assumed: AssumedTemperature): ShopTemperature {
  return typeof assumed === 'number' ? constantShopTemperature(assumed) : assumed;
}

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}

function checkHour(hour: number, label: string): Result<number> {
  if (!Number.isInteger(hour) || hour < 0 || hour > 23) return fail('hour_invalid', `${label} must be a whole hour from 0 to 23, got ${String(hour)}.`);
  return ok(hour);
}

/** The hour of the day (0–23) the shop's clock shows at an instant. */
function localHourAt(ms: number, zone: string): number {
  const localMs = ms + zoneOffsets(zone).offsetMinutes(ms) * 60_000;
  return Math.floor(localMs / msPerHour) - Math.floor(localMs / msPerDay) * 24;
}

/**
 * The next instant after ms at which the local clock in the zone shows one of the given whole hours. Where the
 * offset holds from ms to that hour, local time runs with UTC and the hour is found by counting; across a change of
 * offset, luxon resolves the wall-clock hour (see wallClockNextHour).
 */
function nextLocalHour(ms: number, hours: readonly boolean[], zone: string): number {
  const offsets = zoneOffsets(zone);
  const offsetMs = offsets.offsetMinutes(ms) * 60_000;
  const hourNow = Math.floor((ms + offsetMs) / msPerHour);
  for (let h = hourNow + 1; h <= hourNow + 25; h++) {
    if (!hours[h - Math.floor(h / 24) * 24]) continue;
    const candidate = h * msPerHour - offsetMs;
    return offsets.changesBetween(ms, candidate) ? wallClockNextHour(ms, hours, zone) : candidate;
  }
  return Infinity;
}

/** The same answer from luxon's wall-clock arithmetic, for the stretches where the offset changes. */
function wallClockNextHour(ms: number, hours: readonly boolean[], zone: string): number {
  const local = DateTime.fromMillis(ms, { zone });
  let best = Infinity;
  for (let day = 0; day <= 2; day++) {
    for (let hour = 0; hour < 24; hour++) {
      if (!hours[hour]) continue;
      // Across a daylight-saving gap luxon moves a missing local hour forward, as the clock on the wall does.
      const candidate = local.startOf('day').plus({ days: day }).set({ hour }).toMillis();
      if (candidate > ms && candidate < best) best = candidate;
    }
  }
  return best;
}

function hourSet(hours: readonly number[]): boolean[] {
  const set = new Array<boolean>(24).fill(false);
  for (const h of hours) set[h] = true;
  return set;
}

export interface DayNightInput {
  dayTempC: number;
  nightTempC: number;
  /** Local hour the day temperature starts, 0–23. */
  dayStartHour: number;
  /** Local hour the night temperature starts, 0–23. */
  nightStartHour: number;
  /** IANA zone of the shop. */
  zone: string;
}

/** Day and night temperatures that change at local hours of the shop's zone (daylight saving included). */
export function dayNightShopTemperature(input: DayNightInput): Result<ShopTemperature> {
  const zone = checkZone(input.zone);
  if (!zone.ok) return zone;
  const day = checkHour(input.dayStartHour, 'The hour the day starts');
  if (!day.ok) return day;
  const night = checkHour(input.nightStartHour, 'The hour the night starts');
  if (!night.ok) return night;
  if (day.value === night.value) return fail('hours_equal', 'Day and night must start at different hours.');
  for (const [t, label] of [
    [input.dayTempC, 'The day temperature'],
    [input.nightTempC, 'The night temperature'],
  ] as const) {
    if (!Number.isFinite(t) || t <= -273.15) return fail('temperature_invalid', `${label} must be a number in °C, got ${String(t)}.`);
  }
  const changes = hourSet([day.value, night.value]);
  const isDay = (ms: number) => {
    const hour = localHourAt(ms, zone.value);
    return day.value < night.value ? hour >= day.value && hour < night.value : hour >= day.value || hour < night.value;
  };
  return ok({
    at: (ms) => (isDay(ms) ? input.dayTempC : input.nightTempC),
    nextChange: (ms) => nextLocalHour(ms, changes, zone.value),
    words: `${round1(input.dayTempC)} °C by day from ${day.value}:00 and ${round1(input.nightTempC)} °C by night from ${night.value}:00 (the shop's day and night)`,
  });
}

/** How many days of readings the learned profile reads. */
export const learnedProfileDays = 7;

/**
 * Each local hour of the day at the mean of the readings taken in that hour over the last week; hours without a
 * reading take the mean of all of them. Refused without readings.
 */
export function learnedShopTemperature(readings: { ms: number; tempC: number }[], zone: string, nowMs: number): Result<ShopTemperature> {
  const checked = checkZone(zone);
  if (!checked.ok) return checked;
  const since = nowMs - learnedProfileDays * 86_400_000;
  const recent = readings.filter((r) => r.ms >= since && r.ms <= nowMs && Number.isFinite(r.tempC));
  if (recent.length === 0)
    return fail(
      'profile_no_readings',
      `There are no readings from the last ${learnedProfileDays} days to learn the shop's day and night from; log some, or enter day and night temperatures.`,
    );
  const sums = new Array<number>(24).fill(0);
  const counts = new Array<number>(24).fill(0);
  for (const r of recent) {
    const hour = localHourAt(r.ms, checked.value);
    sums[hour]! += r.tempC;
    counts[hour]! += 1;
  }
  const mean = recent.reduce((a, r) => a + r.tempC, 0) / recent.length;
  const byHour = sums.map((s, h) => (counts[h]! > 0 ? s / counts[h]! : mean));
  const everyHour = new Array<boolean>(24).fill(true);
  return ok({
    at: (ms) => byHour[localHourAt(ms, checked.value)]!,
    nextChange: (ms) => nextLocalHour(ms, everyHour, checked.value),
    words: `the shop's temperature hour by hour as the last ${learnedProfileDays} days of readings showed it (${round1(Math.min(...byHour))} to ${round1(Math.max(...byHour))} °C)`,
  });
}

/**
 * Splits [fromMs, toMs) where the shop temperature changes, handing each stretch's temperature to `piece`. A stretch
 * may end at Infinity: it is cut at `horizonMs`, and the last piece carries on from there.
 */
export function splitByShopTemperature<T>(
  fromMs: number,
  toMs: number,
  shop: ShopTemperature,
  piece: (fromMs: number, toMs: number, tempC: number) => T,
  horizonMs = Infinity,
): T[] {
  const out: T[] = [];
  let at = fromMs;
  while (at < toMs) {
    const change = shop.nextChange(at);
    const end = Math.min(toMs, change);
    if (end >= horizonMs || !Number.isFinite(end)) {
      out.push(piece(at, toMs, shop.at(at)));
      break;
    }
    out.push(piece(at, end, shop.at(at)));
    at = end;
  }
  return out;
}
