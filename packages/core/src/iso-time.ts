import { DateTime } from 'luxon';
import { readTimeCell } from './reading-cells';
import { fail, ok, type Result } from './result';

// How the database and Date#toISOString write instants; logs are full of them, and a board reads thousands.
const canonicalUtc = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2})(?:\.(\d{1,3}))?Z$/;

/** The canonical UTC form without luxon; a day that does not exist (02-30) or hour 24 goes to luxon. */
function canonicalUtcMs(text: string): number | undefined {
  const m = canonicalUtc.exec(text);
  if (!m) return undefined;
  const [year, month, day, hour, minute, second] = [m[1], m[2], m[3], m[4], m[5], m[6]].map(Number) as [number, number, number, number, number, number];
  if (month < 1 || month > 12 || day < 1 || hour > 23 || minute > 59 || second > 59) return undefined;
  // Day 0 of the next month is the last day of this one (ECMAScript Date.UTC).
  if (day > new Date(Date.UTC(year, month, 0)).getUTCDate()) return undefined;
  const ms = m[7] ? Number(m[7].padEnd(3, '0')) : 0;
  const at = Date.UTC(year, month - 1, day, hour, minute, second, ms);
  // Date.UTC reads years 0–99 as 1900–1999.
  return year < 100 ? undefined : at;
}

/**
 * Epoch milliseconds of an ISO 8601 date-time that carries Z or an offset. The one reader of times
 * in logs and cure sums: the grammar of reading-cells.ts (which also takes the lower-case t and z
 * RFC 3339 §5.6 allows), with a fast path for the canonical UTC form.
 */
export function parseIsoInstant(text: string): Result<number> {
  const trimmed = text.trim();
  const fast = canonicalUtcMs(trimmed);
  if (fast !== undefined) return ok(fast);
  return readTimeCell(trimmed);
}

export const msPerHour = 3_600_000;

// Zones already found valid: every cure view checks its zone, and luxon's check builds a DateTime.
const knownZones = new Set<string>();

export function checkZone(zone: string): Result<string> {
  if (!knownZones.has(zone)) {
    if (!DateTime.now().setZone(zone).isValid) {
      return fail('zone_unknown', `"${zone}" is not a time zone Gelpoint knows; use an IANA name such as Europe/Berlin, or utc.`);
    }
    knownZones.add(zone);
  }
  return ok(zone);
}

const year1000Ms = Date.UTC(1000, 0, 1);
const year10000Ms = Date.UTC(10000, 0, 1);

/** An instant as ISO 8601 in an IANA zone already accepted by checkZone (UTC by default). */
export function formatIsoInstant(epochMs: number, zone = 'utc'): string {
  // UTC in four-digit years is what Date#toISOString writes; a cure log formats one per reading interval.
  if (zone.toLowerCase() === 'utc' && Number.isInteger(epochMs) && epochMs >= year1000Ms && epochMs < year10000Ms) {
    const iso = new Date(epochMs).toISOString();
    return iso.endsWith('.000Z') ? `${iso.slice(0, 19)}Z` : iso;
  }
  return DateTime.fromMillis(epochMs, { zone }).toISO({ suppressMilliseconds: true }) ?? new Date(epochMs).toISOString();
}
