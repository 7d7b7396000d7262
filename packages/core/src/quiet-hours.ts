import { DateTime } from 'luxon';
import { closingReminderKinds } from './pour-cure';

/** The shop's working clock: its zone, the hour its day starts (the digest goes out) and the hour quiet hours start. */
export interface ShopHours {
  zone: string;
  dayStartHour: number;
  quietFromHour: number;
}

/**
 * The last instant at or before ms at which the shop's wall clock showed hour:00. Across a daylight-saving gap the
 * missing hour counts as the first instant after it, as the clock on the wall does.
 */
export function lastLocalHour(ms: number, hour: number, zone: string): number {
  const local = DateTime.fromMillis(ms, { zone });
  for (let day = 0; day >= -2; day--) {
    const candidate = local.startOf('day').plus({ days: day }).set({ hour }).toMillis();
    if (candidate <= ms) return candidate;
  }
  return -Infinity;
}

/** The first instant after ms at which the shop's wall clock shows hour:00. */
export function nextLocalHour(ms: number, hour: number, zone: string): number {
  const local = DateTime.fromMillis(ms, { zone });
  for (let day = 0; day <= 2; day++) {
    const candidate = local.startOf('day').plus({ days: day }).set({ hour }).toMillis();
    if (candidate > ms) return candidate;
  }
  return Infinity;
}

/** A shop whose quiet hours start when its day starts has none. */
export function hasQuietHours(hours: ShopHours): boolean {
  return hours.dayStartHour !== hours.quietFromHour;
}

/** The quiet stretch an instant falls in, [from, to), or null in working hours. */
export function quietStretchAt(ms: number, hours: ShopHours): { fromMs: number; toMs: number } | null {
  if (!hasQuietHours(hours)) return null;
  const quietFrom = lastLocalHour(ms, hours.quietFromHour, hours.zone);
  const dayStart = lastLocalHour(ms, hours.dayStartHour, hours.zone);
  if (quietFrom <= dayStart) return null;
  return { fromMs: quietFrom, toMs: nextLocalHour(ms, hours.dayStartHour, hours.zone) };
}

export interface ReminderTiming {
  kind: string;
  dueAt: Date;
  eventAt: Date;
  leadMin: number;
}

/**
 * When a reminder goes out, given the shop's quiet hours:
 * - due in working hours: at its own time;
 * - a window that closes during the night: the evening before, as quiet hours start, so nobody wakes to a closed
 *   window (its lead grows to the time left until it closes);
 * - anything else due in quiet hours: held for the morning digest;
 * - due in a night already over (a cup logged late, a reading that moved the forecast): at once, as it is overdue.
 */
export function deliveryOf<T extends ReminderTiming>(reminder: T, hours: ShopHours, nowMs: number): T & { viaDigest: boolean } {
  const stretch = quietStretchAt(reminder.dueAt.getTime(), hours);
  if (!stretch || stretch.toMs <= nowMs) return { ...reminder, viaDigest: false };
  if (closingReminderKinds.has(reminder.kind) && reminder.eventAt.getTime() < stretch.toMs) {
    const dueAt = new Date(Math.min(reminder.dueAt.getTime(), stretch.fromMs));
    return { ...reminder, dueAt, leadMin: Math.round((reminder.eventAt.getTime() - dueAt.getTime()) / 60_000), viaDigest: false };
  }
  return { ...reminder, viaDigest: true };
}

/** The morning digest's moment on the shop's calendar day that contains ms (the day starts at dayStartHour). */
export function digestMomentOn(ms: number, hours: ShopHours): number {
  return lastLocalHour(ms, hours.dayStartHour, hours.zone);
}
