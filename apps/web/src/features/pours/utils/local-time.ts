import { DateTime } from 'luxon';
import { displayTimeZone } from '../../../lib/display-zone';

/** A moment as a datetime-local field shows it: the shop's wall clock, to the minute. */
export function toLocalInput(date: Date): string {
  return DateTime.fromJSDate(date, { zone: displayTimeZone() ?? 'local' }).toFormat("yyyy-LL-dd'T'HH:mm");
}

/**
 * What a datetime-local field holds (no zone) as the instant it means on the shop's wall clock, written with Z as
 * the API requires. Null for anything that is not a full, real date and time (a time skipped by a daylight-saving
 * change is not one).
 */
export function localInputToIso(value: string): string | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2}))?$/.exec(value.trim());
  if (!match) return null;
  const [year, month, day, hour, minute, second] = match.slice(1).map((part) => Number(part ?? 0)) as [number, number, number, number, number, number];
  const local = DateTime.fromObject({ year, month, day, hour, minute, second }, { zone: displayTimeZone() ?? 'local' });
  if (!local.isValid || local.hour !== hour || local.day !== day) return null;
  return local.toUTC().toISO({ suppressMilliseconds: true });
}
