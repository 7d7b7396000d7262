import { rateFactor } from './arrhenius';
import { caution, type Caution } from './cautions';
import { defaultReadingCarryH, historyPieces, type CureSpanSource, type TimedReading } from './cure-history';
import type { CureReading } from './cure-readings';
import { checkZone, formatIsoInstant, msPerHour, parseIsoInstant } from './iso-time';
import { fail, ok, type Result } from './result';
import { shopTemperatureOf, type AssumedTemperature } from './shop-temperature';

export interface EquivalentAgeInput {
  readings: CureReading[];
  refTempC: number;
  activationEnergyKJPerMol: number;
  /**
   * The product's minimum working temperature. Below it the cure is still counted at the Arrhenius
   * rate (slowly, never not at all), but flagged: the data sheet promises nothing there.
   */
  minTempC?: number;
  /**
   * The stretch of time to add up (pour to now). Absent: from the first reading to the last.
   */
  window?: { from: string; to: string };
  /**
   * The planned shop temperature, one constant or the shop's day and night: counted where no reading exists, and
   * the ceiling of every gap.
   */
  assumedTempC?: AssumedTemperature;
  /** How long a reading speaks for on either side of it, in hours (a shop setting; 2 h by default). */
  readingCarryH?: number;
  /** IANA zone for the times this returns (default UTC). */
  zone?: string;
}

export interface CureSpan {
  from: string;
  to: string;
  fromMs: number;
  toMs: number;
  /** The temperature the sum counts for the span: a logged interval's average, otherwise held flat. */
  tempC: number;
  /** Temperatures at the span's ends, for drawing it (equal unless the span is logged). */
  startTempC: number;
  endTempC: number;
  source: CureSpanSource;
  /** Below the product's minimum temperature: counted at the Arrhenius rate, but not dependable. */
  belowMinimum: boolean;
  /** Equivalent hours at the reference temperature gained per wall-clock hour in this span. */
  rate: number;
  equivalentHoursAtRef: number;
}

export interface CureGap {
  from: string;
  to: string;
  hours: number;
  /** The temperature the gap was counted at. */
  tempC: number;
}

export interface EquivalentAge {
  equivalentHoursAtRef: number;
  elapsedHours: number;
  /** Wall-clock hours spent below the product's minimum temperature. */
  belowMinimumHours: number;
  /** Wall-clock hours with no reading near enough to speak for them (gaps and assumed stretches). */
  assumedHours: number;
  /** The cure gained on logged and carried spans: what the readings themselves show. */
  loggedEquivalentHours: number;
  /** The cure gained on gaps and assumed stretches, each counted at its conservative temperature. */
  assumedEquivalentHours: number;
  readingCarryH: number;
  gaps: CureGap[];
  readings: number;
  firstTime: string | null;
  lastTime: string | null;
  spans: CureSpan[];
  cautions: Caution[];
}

export function readTimedReadings(readings: CureReading[]): Result<TimedReading[]> {
  const timed: TimedReading[] = [];
  for (let i = 0; i < readings.length; i++) {
    const reading = readings[i]!;
    const ms = parseIsoInstant(reading.at);
    if (!ms.ok) return fail(ms.error.code, `Reading ${i + 1}: ${ms.error.message}`);
    if (!Number.isFinite(reading.tempC))
      return fail('temperature_invalid', `Reading ${i + 1}: the temperature must be a number in °C, got ${String(reading.tempC)}.`);
    // At or below 0 K (−273.15 °C, SI Brochure 2019) the Arrhenius factor is undefined or infinite.
    if (reading.tempC <= -273.15)
      return fail('temperature_invalid', `Reading ${i + 1}: ${reading.tempC} °C is at or below absolute zero (−273.15 °C); check that the log is in °C.`);
    const before = timed[i - 1];
    if (before && ms.value <= before.ms) {
      return fail(
        'readings_out_of_order',
        `Reading ${i + 1} (${reading.at}) is not later than the reading before it; give readings in time order, each time once.`,
      );
    }
    timed.push({ ms: ms.value, tempC: reading.tempC });
  }
  return ok(timed);
}

export function checkReadingCarry(carryH: number | undefined): Result<number> {
  const value = carryH ?? defaultReadingCarryH;
  if (!Number.isFinite(value) || value < 0 || value > 48) {
    return fail('reading_carry_invalid', `How long a reading speaks for must be between 0 and 48 hours, got ${String(carryH)}; 2 h is the usual setting.`);
  }
  return ok(value);
}

function hours(fromMs: number, toMs: number): number {
  return (toMs - fromMs) / msPerHour;
}

function formatHoursShort(h: number): string {
  return h >= 10 ? h.toFixed(0) : h.toFixed(1);
}

/**
 * Equivalent age at the reference temperature, as the maturity method of ASTM C1074 defines it:
 * te = Σ exp(−Q(1/Ta − 1/Tr))·Δt with Q = Ea/R, where Ta is the average temperature of each
 * interval between readings. Stretches the readings do not cover are counted conservatively (see
 * cure-history.ts), and the answer says how much of the cure rests on them.
 */
export function equivalentAge(input: EquivalentAgeInput): Result<EquivalentAge> {
  const timed = readTimedReadings(input.readings);
  if (!timed.ok) return timed;
  const zone = checkZone(input.zone ?? 'utc');
  if (!zone.ok) return zone;
  const carry = checkReadingCarry(input.readingCarryH);
  if (!carry.ok) return carry;
  if (!Number.isFinite(input.refTempC))
    return fail('temperature_invalid', `The reference temperature must be a number in °C, got ${String(input.refTempC)}; it is on the data sheet.`);
  if (!Number.isFinite(input.activationEnergyKJPerMol) || input.activationEnergyKJPerMol <= 0) {
    return fail('activation_energy_not_positive', `The activation energy must be above zero (in kJ/mol), got ${String(input.activationEnergyKJPerMol)}.`);
  }
  if (typeof input.assumedTempC === 'number' && !(Number.isFinite(input.assumedTempC) && input.assumedTempC > -273.15)) {
    return fail('temperature_invalid', `The assumed shop temperature must be a number in °C above absolute zero, got ${String(input.assumedTempC)}.`);
  }
  const shop = input.assumedTempC === undefined ? undefined : shopTemperatureOf(input.assumedTempC);
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
    if (readings.length === 0)
      return fail('readings_empty', 'There are no temperature readings to add up; log at least one, or give a window and an assumed temperature.');
    fromMs = readings[0]!.ms;
    toMs = readings[readings.length - 1]!.ms;
  }

  const pieces = historyPieces(readings, fromMs, toMs, carry.value, shop);
  if (pieces.some((p) => !Number.isFinite(p.tempC))) {
    return fail(
      'assumed_temp_missing',
      'Part of the cure window has no temperature readings; give the temperature to assume there (the planned shop temperature).',
    );
  }

  const minTempC = input.minTempC ?? -Infinity;
  const spans: CureSpan[] = pieces.map((p) => {
    const rate = rateFactor(p.tempC, input.refTempC, input.activationEnergyKJPerMol);
    return {
      from: formatIsoInstant(p.fromMs, zone.value),
      to: formatIsoInstant(p.toMs, zone.value),
      fromMs: p.fromMs,
      toMs: p.toMs,
      tempC: p.tempC,
      startTempC: p.startTempC,
      endTempC: p.endTempC,
      source: p.source,
      belowMinimum: p.tempC < minTempC,
      rate,
      equivalentHoursAtRef: rate * hours(p.fromMs, p.toMs),
    };
  });

  const sum = (keep: (s: CureSpan) => boolean, pick: (s: CureSpan) => number) => spans.filter(keep).reduce((acc, s) => acc + pick(s), 0);
  const wall = (s: CureSpan) => hours(s.fromMs, s.toMs);
  const uncovered = (s: CureSpan) => s.source === 'gap' || s.source === 'assumed';
  const belowMinimumHours = sum((s) => s.belowMinimum, wall);
  const assumedHours = sum(uncovered, wall);
  const gaps: CureGap[] = spans.filter((s) => s.source === 'gap').map((s) => ({ from: s.from, to: s.to, hours: wall(s), tempC: s.tempC }));
  const cautions: Caution[] = [];
  if (belowMinimumHours > 0) {
    cautions.push(
      caution(
        'cure_below_minimum',
        'warning',
        `For ${formatHoursShort(belowMinimumHours)} h the temperature was below the product's minimum of ${minTempC} °C. Gelpoint counts that time at the slow rate the chemistry gives, but the data sheet does not promise a full cure there: warm the piece, and check its hardness before machining.`,
        'plan',
      ),
    );
  }
  if (gaps.length > 0) {
    const longest = gaps.reduce((a, g) => (g.hours > a.hours ? g : a));
    cautions.push(
      caution(
        'cure_log_gap',
        'warning',
        `${gaps.length === 1 ? 'One stretch' : `${gaps.length} stretches`} of this cure ${gaps.length === 1 ? 'is' : 'are'} more than ${carry.value} h from any reading (the longest ${formatHoursShort(longest.hours)} h, from ${longest.from}). Gelpoint counts ${gaps.length === 1 ? 'it' : 'them'} at the lower of the readings around ${gaps.length === 1 ? 'it' : 'them'} and the planned shop temperature; log temperatures to make the cure rest on what happened.`,
        'plan',
      ),
    );
  }
  if (spans.some((s) => s.source === 'assumed')) {
    cautions.push(
      caution(
        'cure_temp_assumed',
        'info',
        `No temperature has been logged for this cure, so ${shop?.words ?? "the plan's shop temperature"} was assumed; log temperatures to make the cure rest on what happened.`,
        'plan',
      ),
    );
  }
  return ok({
    equivalentHoursAtRef: sum(
      () => true,
      (s) => s.equivalentHoursAtRef,
    ),
    elapsedHours: hours(fromMs, toMs),
    belowMinimumHours,
    assumedHours,
    loggedEquivalentHours: sum(
      (s) => !uncovered(s),
      (s) => s.equivalentHoursAtRef,
    ),
    assumedEquivalentHours: sum(uncovered, (s) => s.equivalentHoursAtRef),
    readingCarryH: carry.value,
    gaps,
    readings: readings.length,
    firstTime: readings.length > 0 ? formatIsoInstant(readings[0]!.ms, zone.value) : null,
    lastTime: readings.length > 0 ? formatIsoInstant(readings[readings.length - 1]!.ms, zone.value) : null,
    spans,
    cautions,
  });
}
