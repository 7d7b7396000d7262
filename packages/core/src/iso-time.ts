import { DateTime } from 'luxon';
import { fail, ok, type Result } from './result';

// A time without its offset is a different instant in every shop; logs must say which one they mean.
const offsetSuffix = /(?:Z|[+-]\d{2}(?::?\d{2})?)$/i;

// How the database and Date#toISOString write instants; logs are full of them, and a board reads thousands.
const canonicalUtc = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(?:\.\d{1,3})?Z$/;

/** The canonical UTC form without luxon: Date.parse reads it exactly, and the round trip refuses 02-30 or 24:00. */
function canonicalUtcMs(text: string): number | undefined {
  if (!canonicalUtc.test(text)) return undefined;
  const ms = Date.parse(text);
  if (!Number.isFinite(ms)) return undefined;
  return new Date(ms).toISOString().slice(0, 19) === text.slice(0, 19) ? ms : undefined;
}

/** Epoch milliseconds of an ISO 8601 date-time that carries Z or an offset. */
export function parseIsoInstant(text: string): Result<number> {
  const trimmed = text.trim();
  const fast = canonicalUtcMs(trimmed);
  if (fast !== undefined) return ok(fast);
  const parsed = DateTime.fromISO(trimmed, { setZone: true });
  if (!parsed.isValid || !trimmed.includes('T')) {
    return fail('time_not_iso', `time "${text}" is not an ISO date; write it like 2025-03-01T18:30:00Z.`);
  }
  if (!offsetSuffix.test(trimmed)) {
    return fail('time_without_offset', `time "${text}" has no time zone; add Z or an offset such as +01:00.`);
  }
  return ok(parsed.toMillis());
}

export const msPerHour = 3_600_000;

export function checkZone(zone: string): Result<string> {
  if (!DateTime.now().setZone(zone).isValid) {
    return fail('zone_unknown', `"${zone}" is not a time zone Gelpoint knows; use an IANA name such as Europe/Berlin, or utc.`);
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
