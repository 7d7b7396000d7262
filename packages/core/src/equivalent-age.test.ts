import { describe, expect, it } from 'vitest';
import { activationEnergyFromKelvinQ } from './arrhenius';
import { equivalentAge } from './equivalent-age';

// ASTM C1074 writes the exponent as Q = E/R in kelvin; core takes Ea in kJ/mol.
const q5000 = activationEnergyFromKelvinQ(5000);

describe('equivalent age (maturity method of ASTM C1074: te = Σ exp(−Q(1/Ta − 1/Tr))·Δt)', () => {
  it('24 h at 10 °C with Q = 5000 K is 13.14 h at 20 °C', () => {
    // ASTM C1074 arithmetic: 24 × exp(−5000 × (1/283.15 − 1/293.15)) = 24 × 0.54750 = 13.14 h.
    const age = equivalentAge({
      readings: [
        { at: '2025-01-10T08:00:00Z', tempC: 10 },
        { at: '2025-01-11T08:00:00Z', tempC: 10 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
    });
    expect(age.ok).toBe(true);
    if (!age.ok) return;
    expect(age.value.equivalentHoursAtRef).toBeCloseTo(13.14, 2);
    expect(age.value.elapsedHours).toBe(24);
    expect(age.value.readings).toBe(2);
    expect(age.value.firstTime).toBe('2025-01-10T08:00:00Z');
    expect(age.value.lastTime).toBe('2025-01-11T08:00:00Z');
  });

  it('each reading holds until the next; the last holds for zero time', () => {
    // 12 h at 10 °C (12 × 0.54750 = 6.570 h) then 12 h at 20 °C (12 h); the 35 °C reading at the end adds nothing.
    const age = equivalentAge({
      readings: [
        { at: '2025-01-10T00:00:00+01:00', tempC: 10 },
        { at: '2025-01-10T12:00:00+01:00', tempC: 20 },
        { at: '2025-01-11T00:00:00+01:00', tempC: 35 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
    });
    expect(age.ok && age.value.equivalentHoursAtRef).toBeCloseTo(12 * 0.5475 + 12, 2);
    expect(age.ok && age.value.spans.map((s) => s.tempC)).toEqual([10, 20]);
  });

  it('gains nothing below the minimum temperature and says the cure stalled', () => {
    // 6 h at 12 °C (below a 15 °C minimum) then 6 h at 20 °C: only the second span counts.
    const age = equivalentAge({
      readings: [
        { at: '2025-01-10T00:00:00Z', tempC: 12 },
        { at: '2025-01-10T06:00:00Z', tempC: 20 },
        { at: '2025-01-10T12:00:00Z', tempC: 20 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      minTempC: 15,
    });
    expect(age.ok).toBe(true);
    if (!age.ok) return;
    expect(age.value.equivalentHoursAtRef).toBeCloseTo(6, 10);
    expect(age.value.stalledHours).toBeCloseTo(6, 10);
    expect(age.value.cautions.map((c) => c.code)).toContain('cure_stalled');
  });

  it('uses the assumed temperature where no reading covers the window, and flags it', () => {
    // Poured 2 h before the first reading, looked at 4 h after the last: 6 h assumed at 20 °C (= 6 h at ref),
    // 10 h logged at 10 °C (= 10 × 0.54750 = 5.475 h).
    const age = equivalentAge({
      readings: [
        { at: '2025-01-10T02:00:00Z', tempC: 10 },
        { at: '2025-01-10T12:00:00Z', tempC: 10 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      window: { from: '2025-01-10T00:00:00Z', to: '2025-01-10T16:00:00Z' },
      assumedTempC: 20,
    });
    expect(age.ok).toBe(true);
    if (!age.ok) return;
    expect(age.value.assumedHours).toBeCloseTo(6, 10);
    expect(age.value.equivalentHoursAtRef).toBeCloseTo(6 + 5.475, 3);
    expect(age.value.spans.map((s) => s.source)).toEqual(['assumed', 'reading', 'assumed']);
    expect(age.value.cautions.map((c) => c.code)).toContain('cure_temp_assumed');
  });

  it('a reading from before the window holds into it', () => {
    const age = equivalentAge({
      readings: [
        { at: '2025-01-09T20:00:00Z', tempC: 20 },
        { at: '2025-01-10T04:00:00Z', tempC: 20 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      window: { from: '2025-01-10T00:00:00Z', to: '2025-01-10T04:00:00Z' },
    });
    expect(age.ok && age.value.equivalentHoursAtRef).toBeCloseTo(4, 10);
    expect(age.ok && age.value.assumedHours).toBe(0);
  });

  it('refuses a window without an assumed temperature where readings are missing', () => {
    const age = equivalentAge({
      readings: [],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
      window: { from: '2025-01-10T00:00:00Z', to: '2025-01-10T04:00:00Z' },
    });
    expect(age.ok || age.error.code).toBe('assumed_temp_missing');
  });

  it('refuses readings out of time order', () => {
    const age = equivalentAge({
      readings: [
        { at: '2025-01-10T04:00:00Z', tempC: 20 },
        { at: '2025-01-10T02:00:00Z', tempC: 20 },
      ],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
    });
    expect(age.ok || age.error.code).toBe('readings_out_of_order');
  });

  it('refuses a reading at or below absolute zero instead of counting it as an endless cure', () => {
    // Zero kelvin is −273.15 °C exactly (SI Brochure, 9th ed., 2019); below it the Arrhenius
    // factor came out as 2e110, so an hour at −300 °C read as a finished cure.
    const age = equivalentAge({
      readings: [{ at: '2025-03-01T18:00:00Z', tempC: -300 }, { at: '2025-03-01T19:00:00Z', tempC: 20 }],
      refTempC: 20,
      activationEnergyKJPerMol: q5000,
    });
    expect(age.ok || age.error.code).toBe('temperature_invalid');
    expect(age.ok || age.error.message).toMatch(/^Reading 1: -300 °C is at or below absolute zero/);
  });
});
