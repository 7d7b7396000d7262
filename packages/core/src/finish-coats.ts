import { checkZone, formatIsoInstant, msPerHour, parseIsoInstant } from './iso-time';
import { fail, ok, type Result } from './result';

export interface FinishCoatInput {
  /** When machining is done and the first finish coat may go on. */
  machinedAt: string;
  coats: number;
  hoursBetweenCoats: number;
  zone?: string;
}

export interface FinishCoatDue {
  /** 1-based, as the maker counts coats. */
  coat: number;
  dueAt: string;
}

/** The first coat is due when machining is done, each further one the set interval after the one before. */
export function finishCoatSchedule(input: FinishCoatInput): Result<FinishCoatDue[]> {
  const start = parseIsoInstant(input.machinedAt);
  if (!start.ok) return fail(start.error.code, `The machining time: ${start.error.message}`);
  const zone = checkZone(input.zone ?? 'utc');
  if (!zone.ok) return zone;
  if (!Number.isInteger(input.coats) || input.coats < 1) {
    return fail('coats_not_whole', `The number of finish coats must be a whole number of at least 1, got ${String(input.coats)}.`);
  }
  if (!Number.isFinite(input.hoursBetweenCoats) || input.hoursBetweenCoats <= 0) {
    return fail(
      'interval_not_positive',
      `The hours between finish coats must be above zero, got ${String(input.hoursBetweenCoats)}; take them from the finish's data sheet.`,
    );
  }
  return ok(
    Array.from({ length: input.coats }, (_, i) => ({
      coat: i + 1,
      dueAt: formatIsoInstant(start.value + i * input.hoursBetweenCoats * msPerHour, zone.value),
    })),
  );
}
