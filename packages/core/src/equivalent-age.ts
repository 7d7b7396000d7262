import { rateFactor } from './arrhenius';
import { caution, type Caution } from './cautions';
import type { CureReading } from './cure-readings';
import { checkZone, formatIsoInstant, msPerHour, parseIsoInstant } from './iso-time';
import { fail, ok, type Result } from './result';

export interface EquivalentAgeInput {
  readings: CureReading[];
  refTempC: number;
  activationEnergyKJPerMol: number;
  /** Below this nothing cures (the product's minimum temperature); absent means no floor. */
  minTempC?: number;
  /**
   * The stretch of time to add up (pour to now). Absent: from the first reading to the last, so
   * the last reading holds for zero time.
   */
  window?: { from: string; to: string };
  /** Used wherever no reading covers the window: before the first reading and after the last. */
  assumedTempC?: number;
  /** IANA zone for the times this returns (default UTC). */
  zone?: string;
}

export interface CureSpan {
  from: string;
  to: string;
  fromMs: number;
  toMs: number;
  tempC: number;
  source: 'reading' | 'assumed';
  /** Below the minimum temperature: counted in wall time, adds nothing to the cure. */
  stalled: boolean;
  /** Equivalent hours at the reference temperature gained per wall-clock hour in this span. */
  rate: number;
  equivalentHoursAtRef: number;
}

export interface EquivalentAge {
  equivalentHoursAtRef: number;
  elapsedHours: number;
  stalledHours: number;
  assumedHours: number;
  readings: number;
  firstTime: string | null;
  lastTime: string | null;
  spans: CureSpan[];
  cautions: Caution[];
}

interface TimedReading {
  ms: number;
  tempC: number;
}

function readTimes(readings: CureReading[]): Result<TimedReading[]> {
  const timed: TimedReading[] = [];
  for (let i = 0; i < readings.length; i++) {
    const reading = readings[i]!;
    const ms = parseIsoInstant(reading.at);
    if (!ms.ok) return fail(ms.error.code, `Reading ${i + 1}: ${ms.error.message}`);
    if (!Number.isFinite(reading.tempC)) return fail('temperature_invalid', `Reading ${i + 1}: the temperature must be a number in °C, got ${String(reading.tempC)}.`);
    // At or below 0 K (−273.15 °C, SI Brochure 2019) the Arrhenius factor is undefined or infinite.
    if (reading.tempC <= -273.15) return fail('temperature_invalid', `Reading ${i + 1}: ${reading.tempC} °C is at or below absolute zero (−273.15 °C); check that the log is in °C.`);
    const before = timed[i - 1];
    if (before && ms.value <= before.ms) {
      return fail('readings_out_of_order', `Reading ${i + 1} (${reading.at}) is not later than the reading before it; give readings in time order, each time once.`);
    }
    timed.push({ ms: ms.value, tempC: reading.tempC });
  }
  return ok(timed);
}

/**
 * Equivalent age at the reference temperature, as in the maturity method of ASTM C1074:
 * te = Σ exp(−Q(1/Ta − 1/Tr))·Δt with Q = Ea/R, each reading holding until the next.
 */
export function equivalentAge(input: EquivalentAgeInput): Result<EquivalentAge> {
  const timed = readTimes(input.readings);
  if (!timed.ok) return timed;
  const zone = checkZone(input.zone ?? 'utc');
  if (!zone.ok) return zone;
  if (!Number.isFinite(input.refTempC)) return fail('temperature_invalid', `The reference temperature must be a number in °C, got ${String(input.refTempC)}; it is on the data sheet.`);
  if (!Number.isFinite(input.activationEnergyKJPerMol) || input.activationEnergyKJPerMol <= 0) {
    return fail('activation_energy_not_positive', `The activation energy must be above zero (in kJ/mol), got ${String(input.activationEnergyKJPerMol)}.`);
  }
  const readings = timed.value;
  let fromMs: number;
  let toMs: number;
  if (input.window) {
    const from = parseIsoInstant(input.window.from);
    if (!from.ok) return fail(from.error.code, `The start of the cure window: ${from.error.message}`);
    const to = parseIsoInstant(input.window.to);
    if (!to.ok) return fail(to.error.code, `The end of the cure window: ${to.error.message}`);
    if (to.value < from.value) return fail('window_reversed', 'The cure window ends before it starts; put the pour time first and the later time second.');
    fromMs = from.value;
    toMs = to.value;
  } else {
    if (readings.length === 0) return fail('readings_empty', 'There are no temperature readings to add up; log at least one, or give a window and an assumed temperature.');
    fromMs = readings[0]!.ms;
    toMs = readings[readings.length - 1]!.ms;
  }

  const pieces: { fromMs: number; toMs: number; tempC: number; source: 'reading' | 'assumed' }[] = [];
  const firstMs = readings[0]?.ms ?? toMs;
  const lastMs = readings[readings.length - 1]?.ms ?? toMs;
  if (readings.length === 0) pieces.push({ fromMs, toMs, tempC: NaN, source: 'assumed' });
  else {
    if (fromMs < firstMs) pieces.push({ fromMs, toMs: Math.min(firstMs, toMs), tempC: NaN, source: 'assumed' });
    for (let i = 0; i + 1 < readings.length; i++) {
      const start = Math.max(readings[i]!.ms, fromMs);
      const end = Math.min(readings[i + 1]!.ms, toMs);
      if (end > start) pieces.push({ fromMs: start, toMs: end, tempC: readings[i]!.tempC, source: 'reading' });
    }
    if (toMs > lastMs) pieces.push({ fromMs: Math.max(lastMs, fromMs), toMs, tempC: NaN, source: 'assumed' });
  }
  const needsAssumed = pieces.some((p) => p.source === 'assumed' && p.toMs > p.fromMs);
  if (needsAssumed && (input.assumedTempC === undefined || !Number.isFinite(input.assumedTempC))) {
    return fail('assumed_temp_missing', 'Part of the cure window has no temperature readings; give the temperature to assume there (the planned shop temperature).');
  }

  const minTempC = input.minTempC ?? -Infinity;
  const spans: CureSpan[] = pieces
    .filter((p) => p.toMs > p.fromMs)
    .map((p) => {
      const tempC = p.source === 'assumed' ? input.assumedTempC! : p.tempC;
      const stalled = tempC < minTempC;
      const rate = stalled ? 0 : rateFactor(tempC, input.refTempC, input.activationEnergyKJPerMol);
      const hours = (p.toMs - p.fromMs) / msPerHour;
      return {
        from: formatIsoInstant(p.fromMs, zone.value),
        to: formatIsoInstant(p.toMs, zone.value),
        fromMs: p.fromMs,
        toMs: p.toMs,
        tempC,
        source: p.source,
        stalled,
        rate,
        equivalentHoursAtRef: rate * hours,
      };
    });

  const hoursWhere = (keep: (s: CureSpan) => boolean) => spans.filter(keep).reduce((sum, s) => sum + (s.toMs - s.fromMs) / msPerHour, 0);
  const stalledHours = hoursWhere((s) => s.stalled);
  const assumedHours = hoursWhere((s) => s.source === 'assumed');
  const cautions: Caution[] = [];
  if (stalledHours > 0) {
    cautions.push(
      caution(
        'cure_stalled',
        'warning',
        `For ${stalledHours.toFixed(1)} h the temperature was below the product's minimum of ${minTempC} °C, and the resin gained no cure in that time; warm the piece to keep it curing.`,
        'plan',
      ),
    );
  }
  if (assumedHours > 0) {
    cautions.push(
      caution(
        'cure_temp_assumed',
        'info',
        `${assumedHours.toFixed(1)} h of this cure have no temperature readings, so ${input.assumedTempC} °C was assumed there; log temperatures to make the cure time rest on what happened.`,
        'plan',
      ),
    );
  }
  return ok({
    equivalentHoursAtRef: spans.reduce((sum, s) => sum + s.equivalentHoursAtRef, 0),
    elapsedHours: (toMs - fromMs) / msPerHour,
    stalledHours,
    assumedHours,
    readings: readings.length,
    firstTime: readings.length > 0 ? formatIsoInstant(firstMs, zone.value) : null,
    lastTime: readings.length > 0 ? formatIsoInstant(lastMs, zone.value) : null,
    spans,
    cautions,
  });
}
