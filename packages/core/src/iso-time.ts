import { DateTime } from 'luxon';
import { fail, ok, type Result } from './result';

// A time without its offset is a different instant in every shop; logs must say which one they mean.
const offsetSuffix = /(?:Z|[+-]\d{2}(?::?\d{2})?)$/i;

/** Epoch milliseconds of an ISO 8601 date-time that carries Z or an offset. */
export function parseIsoInstant(text: string): Result<number> {
  const trimmed = text.trim();
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

/** An instant as ISO 8601 in an IANA zone already accepted by checkZone (UTC by default). */
export function formatIsoInstant(epochMs: number, zone = 'utc'): string {
  return DateTime.fromMillis(epochMs, { zone }).toISO({ suppressMilliseconds: true }) ?? new Date(epochMs).toISOString();
}
