import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { activationEnergyFromKelvinQ } from './arrhenius';
import { equivalentAge } from './equivalent-age';

// ASTM C1074 writes the exponent as Q = E/R in kelvin; core takes Ea in kJ/mol.
const q5000 = activationEnergyFromKelvinQ(5000);
const hour = 3_600_000;
const iso = (ms: number) => new Date(ms).toISOString();
const t0 = Date.UTC(2025, 0, 10);

/** Readings every `stepH` hours of a temperature history given as a function of hours. */
function sampled(history: (h: number) => number, hours: number, stepH: number) {
  const out: { at: string; tempC: number }[] = [];
  for (let h = 0; h <= hours + 1e-9; h += stepH) out.push({ at: iso(t0 + h * hour), tempC: history(h) });
  return out;
}

/**
 * The definition itself, integrated independently: ∫ exp(−(Ea/R)(1/T(t) − 1/Tr)) dt with the
 * temperature a straight line between readings (the history a logger's samples describe), by the
 * composite midpoint rule on 2,000 steps per interval. R = 8.314462618 J/(mol·K) (CODATA 2018).
 */
function exactIntegral(readings: { at: string; tempC: number }[], refTempC: number, eaKJPerMol: number): number {
  const q = (eaKJPerMol * 1000) / 8.314462618;
  const rate = (tempC: number) => Math.exp(-q * (1 / (tempC + 273.15) - 1 / (refTempC + 273.15)));
  let sum = 0;
  for (let i = 0; i + 1 < readings.length; i++) {
    const a = readings[i]!;
    const b = readings[i + 1]!;
    const hours = (Date.parse(b.at) - Date.parse(a.at)) / hour;
    const n = 2000;
    for (let k = 0; k < n; k++) sum += rate(a.tempC + ((b.tempC - a.tempC) * (k + 0.5)) / n) * (hours / n);
  }
  return sum;
}

describe('equivalent age (maturity method of ASTM C1074: te = Σ exp(−Q(1/Ta − 1/Tr))·Δt, Ta the interval average)', () => {
  it('24 h at 10 °C with Q = 5000 K is 13.14 h at 20 °C', () => {
    // ASTM C1074 arithmetic: 24 × exp(−5000 × (1/283.15 − 1/293.15)) = 24 × 0.54750 = 13.14 h.
    const age = equivalentAge({ readings: sampled(() => 10, 24, 1), refTempC: 20, activationEnergyKJPerMol: q5000 });
    expect(age.ok).toBe(true);
    if (!age.ok) return;
    expect(age.value.equivalentHoursAtRef).toBeCloseTo(13.14, 2);
    expect(age.value.elapsedHours).toBe(24);
    expect(age.value.readings).toBe(25);
    expect(age.value.gaps).toEqual([]);
    expect(age.value.firstTime).toBe('2025-01-10T00:00:00Z');
  });

  it('counts each interval at the average of its two readings', () => {
    // Two readings 2 h apart at 10 °C and 30 °C: Ta = 20 °C, the reference, so 2 h count as 2 h (ASTM C1074 §A1 form).
    const age = equivalentAge({
      readings: [
        { at: '2025-01-10T00:00:00+01:00', tempC: 10 },
        { at: '2025-01-10T02:00:00+01:00', tempC: 30 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
    });
    expect(age.ok && age.value.equivalentHoursAtRef).toBeCloseTo(2, 12);
    expect(age.ok && age.value.spans.map((s) => [s.source, s.tempC, s.startTempC, s.endTempC])).toEqual([['logged', 20, 10, 30]]);
  });

  it('matches the exact integral on a 15 → 35 °C ramp read every 3 h (Ea 52 kJ/mol, reference 22 °C)', () => {
    // Holding each reading until the next gives 13.35 h here, 16 % short of the integral.
    const readings = sampled((h) => 15 + (20 * h) / 12, 12, 3);
    const exact = exactIntegral(readings, 22, 52);
    expect(exact).toBeCloseTo(15.98, 2);
    const age = equivalentAge({ readings, refTempC: 22, activationEnergyKJPerMol: 52, readingCarryH: 2 });
    expect(age.ok).toBe(true);
    if (!age.ok) return;
    expect(Math.abs(age.value.equivalentHoursAtRef / exact - 1)).toBeLessThan(0.006);
    expect(age.value.gaps).toEqual([]);
  });

  it('does not overstate the cure of a cooling piece', () => {
    const readings = sampled((h) => 35 - (20 * h) / 12, 12, 3);
    const exact = exactIntegral(readings, 22, 52);
    const age = equivalentAge({ readings, refTempC: 22, activationEnergyKJPerMol: 52 });
    // Holding the earlier reading overstated this by 12.6 %; the interval average stays within 0.6 %.
    expect(age.ok && Math.abs(age.value.equivalentHoursAtRef / exact - 1)).toBeLessThan(0.006);
  });

  it('agrees with the integral on histories it has never seen (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 40, noNaN: true }),
        fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 1, maxLength: 39 }),
        fc.array(fc.double({ min: 0.1, max: 4, noNaN: true }), { minLength: 39, maxLength: 39 }),
        fc.double({ min: 40, max: 60, noNaN: true }),
        (start, moves, steps, ea) => {
          const temps = [start];
          for (const move of moves) temps.push(Math.min(40, Math.max(5, temps.at(-1)! + move)));
          let ms = t0;
          const readings = temps.map((tempC, i) => {
            if (i > 0) ms += Math.round(steps[i - 1]! * hour);
            return { at: iso(ms), tempC };
          });
          const age = equivalentAge({ readings, refTempC: 22, activationEnergyKJPerMol: ea });
          expect(age.ok).toBe(true);
          if (!age.ok) return;
          // Between readings at most 4 h apart (within twice the 2 h carry), the sum is the interval-average form
          // exactly. exp is convex, so the average-temperature form never exceeds the integral of the line (Jensen).
          // How far below it can fall: with the exponent near-linear across an interval, the mean of e^x over a span of
          // ±z around the midpoint is sinh(z)/z times its midpoint value (a calculus identity), z = Q·(ΔT/2)/T² taken
          // at the interval's colder end, where the exponent is steepest: 3.6 % for a 10 K step at 5 °C and 60 kJ/mol.
          const exact = exactIntegral(readings, 22, ea);
          let byDefinition = 0;
          const q = (ea * 1000) / 8.314462618;
          for (let i = 0; i + 1 < readings.length; i++) {
            const ta = (readings[i]!.tempC + readings[i + 1]!.tempC) / 2;
            byDefinition += Math.exp(-q * (1 / (ta + 273.15) - 1 / 295.15)) * ((Date.parse(readings[i + 1]!.at) - Date.parse(readings[i]!.at)) / hour);
          }
          expect(age.value.equivalentHoursAtRef).toBeCloseTo(byDefinition, 9);
          expect(age.value.equivalentHoursAtRef).toBeLessThanOrEqual(exact * (1 + 1e-9));
          let widest = 1;
          for (let i = 0; i + 1 < readings.length; i++) {
            const a = readings[i]!.tempC;
            const b = readings[i + 1]!.tempC;
            const z = (q * (Math.abs(b - a) / 2)) / (Math.min(a, b) + 273.15) ** 2;
            if (z > 0) widest = Math.max(widest, Math.sinh(z) / z);
          }
          expect(age.value.equivalentHoursAtRef).toBeGreaterThanOrEqual((exact / widest) * (1 - 1e-9));
        },
      ),
      // The first example is the steepest interval the generator can make: a 10 K rise from 5 °C at 60 kJ/mol.
      { numRuns: 200, examples: [[5, [9.937378938548743], Array.from({ length: 39 }, () => 0.1), 59.99999999999852]] },
    );
  });

  it('lets a reading carry 2 h across a gap and counts the rest of the gap at the lower temperature, flagged', () => {
    // 20 °C at 00:00 and 24 °C at 12:00: 2 h carried at 20, 8 h of gap, 2 h carried at 24. Assumed 18 °C:
    // the gap counts at min(20, 24, 18) = 18 °C.
    const age = equivalentAge({
      readings: [
        { at: '2025-01-10T00:00:00Z', tempC: 20 },
        { at: '2025-01-10T12:00:00Z', tempC: 24 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      assumedTempC: 18,
    });
    expect(age.ok).toBe(true);
    if (!age.ok) return;
    const rate = (t: number) => Math.exp(-5000 * (1 / (t + 273.15) - 1 / 293.15));
    expect(age.value.spans.map((s) => [s.source, s.tempC, (s.toMs - s.fromMs) / hour])).toEqual([
      ['carried', 20, 2],
      ['gap', 18, 8],
      ['carried', 24, 2],
    ]);
    expect(age.value.equivalentHoursAtRef).toBeCloseTo(2 + 8 * rate(18) + 2 * rate(24), 10);
    expect(age.value.gaps).toEqual([{ from: '2025-01-10T02:00:00Z', to: '2025-01-10T10:00:00Z', hours: 8, tempC: 18 }]);
    expect(age.value.assumedHours).toBe(8);
    expect(age.value.cautions.map((c) => c.code)).toEqual(['cure_log_gap']);
    // A longer carry (a shop setting) covers the same gap with the interval average.
    const carried = equivalentAge({
      readings: [
        { at: '2025-01-10T00:00:00Z', tempC: 20 },
        { at: '2025-01-10T12:00:00Z', tempC: 24 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      readingCarryH: 6,
    });
    expect(carried.ok && carried.value.gaps).toEqual([]);
    expect(carried.ok && carried.value.equivalentHoursAtRef).toBeCloseTo(12 * rate(22), 10);
  });

  it('counts the time after the last reading at the lower of that reading and the assumed temperature', () => {
    // Logged 15 °C for 12 h, then the logger stopped; the plan assumed 21 °C. After 2 h of carry the
    // rest of the 90 h is counted at 15 °C, not 21 °C.
    const readings = sampled(() => 15, 12, 1);
    const age = equivalentAge({
      readings,
      refTempC: 21,
      activationEnergyKJPerMol: 52,
      minTempC: 18,
      window: { from: iso(t0), to: iso(t0 + 90 * hour) },
      assumedTempC: 21,
    });
    expect(age.ok).toBe(true);
    if (!age.ok) return;
    expect(age.value.spans.at(-1)).toMatchObject({ source: 'gap', tempC: 15 });
    const rate15 = Math.exp(-((52_000 / 8.314462618) * (1 / 288.15 - 1 / 294.15)));
    expect(age.value.equivalentHoursAtRef).toBeCloseTo(90 * rate15, 9);
    expect(age.value.loggedEquivalentHours).toBeCloseTo(14 * rate15, 9);
    expect(age.value.assumedEquivalentHours).toBeCloseTo(76 * rate15, 9);
    expect(age.value.belowMinimumHours).toBeCloseTo(90, 9);
    expect(age.value.cautions.map((c) => c.code)).toEqual(['cure_below_minimum', 'cure_log_gap']);
  });

  it('keeps the Arrhenius rate below the minimum temperature: no cliff at the data sheet minimum', () => {
    const at = (tempC: number) => equivalentAge({ readings: sampled(() => tempC, 24, 1), refTempC: 22, activationEnergyKJPerMol: 52, minTempC: 18 });
    const just = at(17.99);
    const atMin = at(18);
    expect(just.ok && atMin.ok).toBe(true);
    if (!just.ok || !atMin.ok) return;
    // d(ln k)/dT = Ea/(R T²) ≈ 0.0753 per K at 291 K: 0.01 K moves the rate by 0.075 %.
    expect(Math.abs(just.value.equivalentHoursAtRef / atMin.value.equivalentHoursAtRef - 1)).toBeLessThan(0.001);
    expect(just.value.equivalentHoursAtRef).toBeGreaterThan(0);
    expect(just.value.belowMinimumHours).toBe(24);
    expect(atMin.value.belowMinimumHours).toBe(0);
    expect(just.value.cautions.map((c) => c.code)).toContain('cure_below_minimum');
  });

  it('uses the assumed temperature where no reading exists at all, and says so', () => {
    const age = equivalentAge({
      readings: [],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      window: { from: '2025-01-10T00:00:00Z', to: '2025-01-10T16:00:00Z' },
      assumedTempC: 20,
    });
    expect(age.ok).toBe(true);
    if (!age.ok) return;
    expect(age.value.equivalentHoursAtRef).toBeCloseTo(16, 10);
    expect(age.value.assumedHours).toBe(16);
    expect(age.value.loggedEquivalentHours).toBe(0);
    expect(age.value.spans.map((s) => s.source)).toEqual(['assumed']);
    expect(age.value.cautions.map((c) => c.code)).toEqual(['cure_temp_assumed']);
  });

  it('reads a log time with a lower-case t and z, as RFC 3339 §5.6 allows, like the CSV import', () => {
    const age = equivalentAge({
      readings: [
        { at: '2025-01-10t00:00:00z', tempC: 20 },
        { at: '2025-01-10t01:00:00z', tempC: 20 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
    });
    expect(age.ok && age.value.equivalentHoursAtRef).toBeCloseTo(1, 12);
  });

  it('a reading from before the window speaks into it', () => {
    const age = equivalentAge({
      readings: [
        { at: '2025-01-09T23:00:00Z', tempC: 20 },
        { at: '2025-01-10T01:00:00Z', tempC: 20 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      window: { from: '2025-01-10T00:00:00Z', to: '2025-01-10T01:00:00Z' },
    });
    expect(age.ok && age.value.equivalentHoursAtRef).toBeCloseTo(1, 10);
    expect(age.ok && age.value.assumedHours).toBe(0);
  });

  it('refuses a window without an assumed temperature where no reading exists', () => {
    const age = equivalentAge({
      readings: [],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      window: { from: '2025-01-10T00:00:00Z', to: '2025-01-10T04:00:00Z' },
    });
    expect(age.ok || age.error.code).toBe('assumed_temp_missing');
  });

  it('refuses readings out of time order, and a carry limit outside 0–48 h', () => {
    const age = equivalentAge({
      readings: [
        { at: '2025-01-10T04:00:00Z', tempC: 20 },
        { at: '2025-01-10T02:00:00Z', tempC: 20 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
    });
    expect(age.ok || age.error.code).toBe('readings_out_of_order');
    const carry = equivalentAge({ readings: sampled(() => 20, 2, 1), refTempC: 20, activationEnergyKJPerMol: q5000, readingCarryH: -1 });
    expect(carry.ok || carry.error.code).toBe('reading_carry_invalid');
  });

  it('refuses a reading at or below absolute zero instead of counting it as an endless cure', () => {
    // Zero kelvin is −273.15 °C exactly (SI Brochure, 9th ed., 2019).
    const age = equivalentAge({
      readings: [
        { at: '2025-03-01T18:00:00Z', tempC: -300 },
        { at: '2025-03-01T19:00:00Z', tempC: 20 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
    });
    expect(age.ok || age.error.code).toBe('temperature_invalid');
    expect(age.ok || age.error.message).toMatch(/^Reading 1: -300 °C is at or below absolute zero/);
  });
});
