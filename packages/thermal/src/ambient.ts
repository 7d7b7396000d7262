import { fail, ok, type Result } from './result';

/** One reading of the shop's air temperature, minutes after mixing. */
export interface AmbientPoint {
  timeMin: number;
  tempC: number;
}

/** The shop's air: one temperature, or readings in time order joined by straight lines (held flat before the first and after the last). */
export type AmbientSchedule = number | AmbientPoint[];

export interface Ambient {
  atS(timeS: number): number;
  /** The warmest the air will be from this time on: a forecast may stop only when nothing ahead can heat the resin more. */
  maxFromS(timeS: number): number;
  /** The coldest the air will be, which sets how long the cure can take. */
  minC: number;
}

export function checkAmbient(schedule: AmbientSchedule): Result<AmbientSchedule> {
  if (typeof schedule === 'number') {
    if (!Number.isFinite(schedule) || schedule < -40 || schedule > 80) {
      return fail('ambient_out_of_range', `The shop temperature must be a number of °C between −40 and 80, got ${String(schedule)}.`);
    }
    return ok(schedule);
  }
  if (!Array.isArray(schedule) || schedule.length === 0) {
    return fail('ambient_empty', 'Give the shop temperature as one number of °C or as at least one reading (minutes after mixing, °C).');
  }
  for (let i = 0; i < schedule.length; i++) {
    const p = schedule[i]!;
    if (!Number.isFinite(p.timeMin) || p.timeMin < 0 || !Number.isFinite(p.tempC) || p.tempC < -40 || p.tempC > 80) {
      return fail(
        'ambient_reading_invalid',
        `Shop temperature reading ${i + 1} must have a time of 0 minutes or more and a temperature between −40 and 80 °C.`,
      );
    }
    if (i > 0 && p.timeMin <= schedule[i - 1]!.timeMin) {
      return fail(
        'ambient_not_in_order',
        `Shop temperature readings must be in time order: reading ${i + 1} (${p.timeMin} min) does not come after reading ${i}.`,
      );
    }
  }
  return ok(schedule);
}

/** Assumes a schedule that passed checkAmbient. */
export function ambientOf(schedule: AmbientSchedule): Ambient {
  if (typeof schedule === 'number') return { atS: () => schedule, maxFromS: () => schedule, minC: schedule };
  const times = schedule.map((p) => p.timeMin * 60);
  const temps = schedule.map((p) => p.tempC);
  const last = times.length - 1;
  const atS = (timeS: number): number => {
    if (timeS <= times[0]!) return temps[0]!;
    if (timeS >= times[last]!) return temps[last]!;
    let i = 0;
    while (times[i + 1]! < timeS) i++;
    const f = (timeS - times[i]!) / (times[i + 1]! - times[i]!);
    return temps[i]! + f * (temps[i + 1]! - temps[i]!);
  };
  return {
    atS,
    maxFromS: (timeS) => {
      let max = atS(timeS);
      for (let i = 0; i <= last; i++) if (times[i]! > timeS && temps[i]! > max) max = temps[i]!;
      return max;
    },
    minC: Math.min(...temps),
  };
}
