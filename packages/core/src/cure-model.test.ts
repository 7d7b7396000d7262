import { describe, expect, it } from 'vitest';
import { activationEnergyForDoublingPer10K, activationEnergyFromKelvinQ } from './arrhenius';
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

  it('runs twice as long 10 K below the reference, and never below the minimum temperature', () => {
    const product = { ...demoDeepPour, minWorkTempC: 5, activationEnergyKJPerMol: activationEnergyForDoublingPer10K(12) };
    // With Ea chosen to double from 12 °C to 22 °C, 2 equivalent hours take 4 h at 12 °C.
    const slow = predictStages({ product, equivalentHoursAtRef: 12, asOf: '2025-02-01T10:00:00Z', assumedTempC: 12 });
    expect(slow.ok && slow.value.find((s) => s.key === 'tack_free')?.predictedAt).toBe('2025-02-01T14:00:00Z');
    const cold = predictStages({ product: demoDeepPour, equivalentHoursAtRef: 12, asOf: '2025-02-01T10:00:00Z', assumedTempC: 10 });
    expect(cold.ok && cold.value.find((s) => s.key === 'tack_free')?.predictedAt).toBeNull();
  });

  it('writes times in the shop zone when asked', () => {
    const prediction = predictStages({ product: demoDeepPour, equivalentHoursAtRef: 12, asOf: '2025-02-01T10:00:00Z', assumedTempC: 22, zone: 'Europe/Berlin' });
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
      readings: [
        { at: '2025-02-01T00:00:00Z', tempC: 22 },
        { at: '2025-02-02T06:00:00Z', tempC: 22 },
      ],
      pouredAt: '2025-02-01T00:00:00Z',
      asOf: '2025-02-02T06:00:00Z',
      assumedTempC: 22,
    });
    // 30 h at the reference temperature is past the 24 h end of the recoat window.
    expect(status.ok && status.value.nextLayerWindow).toBe('closed');
    expect(status.ok && status.value.cautions.map((c) => c.code)).toEqual(['next_layer_window_closed']);
  });

  it('says when the cold stalls the cure', () => {
    const status = cureStatus({
      product: demoDeepPour,
      readings: [],
      pouredAt: '2025-02-01T00:00:00Z',
      asOf: '2025-02-02T06:00:00Z',
      assumedTempC: 10,
    });
    expect(status.ok).toBe(true);
    if (!status.ok) return;
    // 30 h at 10 °C, below the 18 °C minimum: no cure at all.
    expect(status.value.age.equivalentHoursAtRef).toBe(0);
    expect(status.value.cautions.map((c) => c.code)).toEqual(['cure_stalled', 'cure_temp_assumed', 'cure_will_stall']);
  });
});
