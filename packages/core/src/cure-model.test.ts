import { describe, expect, it } from 'vitest';
import { activationEnergyForDoublingPer10K, activationEnergyFromKelvinQ, rateFactor } from './arrhenius';
import { cureProgress, cureStages, cureStatus, nextLayerWindow, predictStages, stageReached, timesAtTemperature } from './cure-model';
import { demoDeepPour } from './test-fixtures';

describe('cure stages', () => {
  it('lists the stages in the order the cure reaches them', () => {
    expect(cureStages(demoDeepPour).map((s) => [s.key, s.equivalentHoursAtRef])).toEqual([
      ['gel', 8],
      ['next_layer_opens', 10],
      ['tack_free', 14],
      ['next_layer_closes', 24],
      ['demold', 48],
      ['full_cure', 168],
      ['ready_to_machine', 168],
    ]);
  });

  it('gives progress, the stage reached and the next-layer window', () => {
    expect(cureProgress(84, demoDeepPour)).toBe(0.5);
    expect(cureProgress(500, demoDeepPour)).toBe(1);
    expect(stageReached(5, demoDeepPour)).toBeNull();
    expect(stageReached(15, demoDeepPour)).toBe('tack_free');
    expect(stageReached(168, demoDeepPour)).toBe('ready_to_machine');
    expect(stageReached(100, { ...demoDeepPour, readyToMachineH: 96 })).toBe('ready_to_machine');
    expect(nextLayerWindow(9, demoDeepPour)).toBe('not_open');
    expect(nextLayerWindow(12, demoDeepPour)).toBe('open');
    expect(nextLayerWindow(30, demoDeepPour)).toBe('closed');
  });
});

describe('data-sheet times at the shop temperature (Arrhenius)', () => {
  it('halves every time 10 K above the reference with the doubling-per-10 K default (common practice)', () => {
    const warm = timesAtTemperature(demoDeepPour, 32);
    expect(warm.rateFactor).toBeCloseTo(2, 12);
    expect(warm.demoldH).toBeCloseTo(24, 10);
    expect(warm.potLifeMin).toBeCloseTo(22.5, 10);
    expect(warm.belowMinimum).toBe(false);
  });

  it('uses a stated activation energy: 10 °C vs 20 °C with Q = 5000 K stretches times by 1/0.54750', () => {
    // ASTM C1074 arithmetic: exp(−5000 × (1/283.15 − 1/293.15)) = 0.54750.
    const product = { ...demoDeepPour, referenceTempC: 20, minWorkTempC: 5, activationEnergyKJPerMol: activationEnergyFromKelvinQ(5000) };
    expect(timesAtTemperature(product, 10).demoldH).toBeCloseTo(48 / 0.5475, 1);
  });
});

describe('predicted stage times', () => {
  it('predicts each future stage from the equivalent age now and an assumed temperature', () => {
    const prediction = predictStages({ product: demoDeepPour, equivalentHoursAtRef: 12, asOf: '2025-02-01T10:00:00Z', assumedTempC: 22 });
    expect(prediction.ok).toBe(true);
    if (!prediction.ok) return;
    const byKey = Object.fromEntries(prediction.value.map((s) => [s.key, s]));
    expect(byKey.gel?.reached).toBe(true);
    expect(byKey.gel?.predictedAt).toBeNull();
    // At the reference temperature the wall clock runs at equivalent age: tack-free 14 − 12 = 2 h on.
    expect(byKey.tack_free?.predictedAt).toBe('2025-02-01T12:00:00Z');
    // Demold: 48 − 12 = 36 h on.
    expect(byKey.demold?.predictedAt).toBe('2025-02-02T22:00:00Z');
  });

  it('runs twice as long 10 K below the reference, and slowly (never "never") below the minimum temperature', () => {
    const product = { ...demoDeepPour, minWorkTempC: 5, activationEnergyKJPerMol: activationEnergyForDoublingPer10K(12) };
    // With Ea chosen to double from 12 °C to 22 °C, 2 equivalent hours take 4 h at 12 °C.
    const slow = predictStages({ product, equivalentHoursAtRef: 12, asOf: '2025-02-01T10:00:00Z', assumedTempC: 12 });
    expect(slow.ok && slow.value.find((s) => s.key === 'tack_free')?.predictedAt).toBe('2025-02-01T14:00:00Z');
    // Below the 18 °C minimum the rate still follows Arrhenius: 2 equivalent hours at 10 °C take 2 / k(10 °C) hours.
    const cold = predictStages({ product: demoDeepPour, equivalentHoursAtRef: 12, asOf: '2025-02-01T10:00:00Z', assumedTempC: 10 });
    const k10 = rateFactor(10, 22, activationEnergyForDoublingPer10K(22));
    expect(cold.ok && Date.parse(cold.value.find((s) => s.key === 'tack_free')!.predictedAt!)).toBe(
      Date.parse('2025-02-01T10:00:00Z') + Math.round((2 / k10) * 3_600_000),
    );
  });

  it('has no cliff at the minimum temperature: demold at 17.99 °C comes just after demold at 18.00 °C', () => {
    const at = (tempC: number) => {
      const p = predictStages({ product: demoDeepPour, equivalentHoursAtRef: 0, asOf: '2025-02-01T00:00:00Z', assumedTempC: tempC });
      return p.ok ? Date.parse(p.value.find((s) => s.key === 'demold')!.predictedAt!) : Number.NaN;
    };
    const hours = (ms: number) => (ms - Date.parse('2025-02-01T00:00:00Z')) / 3_600_000;
    expect(hours(at(18))).toBeCloseTo(48 / rateFactor(18, 22, activationEnergyForDoublingPer10K(22)), 3);
    // 0.01 K changes the rate by about 0.07 % (d ln k / dT = Ea / RT²): a few minutes on 64 h, not "never".
    expect(hours(at(17.99)) - hours(at(18))).toBeGreaterThan(0);
    expect(hours(at(17.99)) - hours(at(18))).toBeLessThan(0.1);
  });

  it('writes times in the shop zone when asked', () => {
    const prediction = predictStages({
      product: demoDeepPour,
      equivalentHoursAtRef: 12,
      asOf: '2025-02-01T10:00:00Z',
      assumedTempC: 22,
      zone: 'Europe/Berlin',
    });
    expect(prediction.ok && prediction.value.find((s) => s.key === 'tack_free')?.predictedAt).toBe('2025-02-01T13:00:00+01:00');
    const badZone = predictStages({ product: demoDeepPour, equivalentHoursAtRef: 12, asOf: '2025-02-01T10:00:00Z', assumedTempC: 22, zone: 'Mars/Olympus' });
    expect(badZone.ok || badZone.error.code).toBe('zone_unknown');
  });
});

describe('cureStatus', () => {
  it('puts the logged history and the prediction together', () => {
    // Logged at the 22 °C reference for 12 h: equivalent age 12 h; gel reached 8 h after the pour.
    const status = cureStatus({
      product: demoDeepPour,
      readings: [
        { at: '2025-02-01T00:00:00Z', tempC: 22 },
        { at: '2025-02-01T12:00:00Z', tempC: 22 },
      ],
      pouredAt: '2025-02-01T00:00:00Z',
      asOf: '2025-02-01T12:00:00Z',
      assumedTempC: 22,
    });
    expect(status.ok).toBe(true);
    if (!status.ok) return;
    expect(status.value.age.equivalentHoursAtRef).toBeCloseTo(12, 10);
    expect(status.value.stageReached).toBe('next_layer_opens');
    expect(status.value.nextLayerWindow).toBe('open');
    expect(status.value.progress).toBeCloseTo(12 / 168, 12);
    const gel = status.value.stages.find((s) => s.key === 'gel');
    expect(gel?.reachedAt).toBe('2025-02-01T08:00:00Z');
    expect(status.value.stages.find((s) => s.key === 'tack_free')?.predictedAt).toBe('2025-02-01T14:00:00Z');
  });

  it('says when the recoat window has closed', () => {
    const status = cureStatus({
      product: demoDeepPour,
      readings: Array.from({ length: 31 }, (_, h) => ({ at: new Date(Date.UTC(2025, 1, 1, h)).toISOString(), tempC: 22 })),
      pouredAt: '2025-02-01T00:00:00Z',
      asOf: '2025-02-02T06:00:00Z',
      assumedTempC: 22,
    });
    // 30 h at the reference temperature is past the 24 h end of the recoat window.
    expect(status.ok && status.value.nextLayerWindow).toBe('closed');
    expect(status.ok && status.value.cautions.map((c) => c.code)).toEqual(['next_layer_window_closed']);
  });

  it('counts a cold pour slowly and says the data sheet does not promise a cure there', () => {
    const status = cureStatus({
      product: demoDeepPour,
      readings: [],
      pouredAt: '2025-02-01T00:00:00Z',
      asOf: '2025-02-02T06:00:00Z',
      assumedTempC: 10,
    });
    expect(status.ok).toBe(true);
    if (!status.ok) return;
    // 30 h at 10 °C, below the 18 °C minimum: the Arrhenius rate, not nothing.
    expect(status.value.age.equivalentHoursAtRef).toBeCloseTo(30 * rateFactor(10, 22, activationEnergyForDoublingPer10K(22)), 9);
    expect(status.value.cautions.map((c) => c.code)).toEqual(['cure_below_minimum', 'cure_temp_assumed', 'cure_slow_ahead']);
    expect(status.value.stages.find((s) => s.key === 'demold')?.predictedAt).not.toBeNull();
  });

  it('forecasts from the latest reading, never warmer than the plan once it stops speaking', () => {
    // Logged 14 °C for 4 h; the plan assumed 22 °C. From the last reading on, the forecast runs at 14 °C.
    const readings = Array.from({ length: 5 }, (_, h) => ({ at: new Date(Date.UTC(2025, 1, 1, h)).toISOString(), tempC: 14 }));
    const status = cureStatus({ product: demoDeepPour, readings, pouredAt: '2025-02-01T00:00:00Z', asOf: '2025-02-01T04:00:00Z', assumedTempC: 22 });
    expect(status.ok).toBe(true);
    if (!status.ok) return;
    expect(status.value.ahead.map((p) => p.tempC)).toEqual([14, 14]);
    const k14 = rateFactor(14, 22, activationEnergyForDoublingPer10K(22));
    const gel = status.value.stages.find((s) => s.key === 'gel')!;
    expect(Date.parse(gel.predictedAt!)).toBe(Date.parse('2025-02-01T04:00:00Z') + Math.round(((8 - 4 * k14) / k14) * 3_600_000));
    // A warm log with a cooler plan: the reading carries 2 h, then the plan's 22 °C caps the forecast.
    const warm = cureStatus({
      product: demoDeepPour,
      readings: readings.map((r) => ({ ...r, tempC: 30 })),
      pouredAt: '2025-02-01T00:00:00Z',
      asOf: '2025-02-01T04:00:00Z',
      assumedTempC: 22,
    });
    expect(warm.ok && warm.value.ahead.map((p) => [p.tempC, (p.toMs - p.fromMs) / 3_600_000])).toEqual([
      [30, 2],
      [22, Infinity],
    ]);
  });
});
