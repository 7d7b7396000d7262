import { plausibleRange, readingTimeRefusal, temperatureConcerns, type CureReading, type LogConcern, type ResinSystem } from '@gelpoint/core';
import { AppError } from '../../http/errors';

/**
 * Unusual values are logged only when the request says the person confirmed them: otherwise a 422 whose sentence
 * says what is unusual and how to log it anyway (send confirmUnusual: true).
 */
export function requireConfirmation(concerns: LogConcern[], confirmed: boolean): void {
  if (concerns.length === 0 || confirmed) return;
  const fields = Object.fromEntries(concerns.slice(0, 200).map((c) => [c.field, c.message]));
  // A long log says its first few questions in the sentence; the fields hold the rest.
  const shown = concerns.slice(0, 3).map((c) => c.message);
  const more = concerns.length > 3 ? ` ${concerns.length - 3} more values are questioned the same way.` : '';
  throw new AppError('unprocessable', 'confirmation_needed', `${shown.join(' ')}${more} To log it as it is, confirm it (send confirmUnusual: true).`, fields);
}

/** Times a log cannot hold: more than 10 minutes ahead, or before the pour started. Refused outright. */
export function refuseImpossibleTimes(times: { field: string; atMs: number }[], pourStartedMs: number, nowMs: number): void {
  const refused = times.flatMap((t) => {
    const why = readingTimeRefusal(t.atMs, { pourStartedMs, nowMs });
    return why ? [{ field: t.field, why }] : [];
  });
  if (refused.length === 0) return;
  const first = refused[0]!;
  const more = refused.length > 1 ? ` (and ${refused.length - 1} more like it)` : '';
  throw new AppError('unprocessable', 'reading_time_impossible', `${first.why}${more}`, Object.fromEntries(refused.slice(0, 200).map((r) => [r.field, r.why])));
}

/** Readings outside the plausible range of the pour's product (its working range widened), as questions. */
export function readingConcerns(readings: CureReading[], product: Pick<ResinSystem, 'minWorkTempC' | 'maxWorkTempC'>): LogConcern[] {
  const range = plausibleRange(product);
  return readings.flatMap((r, i) => temperatureConcerns(r.tempC, range, `readings.${i}.tempC`));
}
