import { describe, expect, it } from 'vitest';
import { forecastLayer, maxLayerDepth } from './layer-forecast';
import type { PourConditions } from './layer-model';
import { dgebaAmineDefaults, type ResinThermal } from './resin-thermal';

// A deep-pour-like system: the published DGEBA/amine values with a slow 10 h gel at 22 °C and a
// third of the heat (a filled, diluted mix); invented for these checks, not a product.
const slow: ResinThermal = { ...dgebaAmineDefaults, reactionHeatJPerG: 160, gelTimeMin: 600, refTempC: 22 };

function peak(resin: ResinThermal, conditions: PourConditions, depthMm: number, resolution = 1) {
  const r = forecastLayer(resin, conditions, depthMm, { resolution, series: false });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('one layer', () => {
  it('does not heat at all without a heat of reaction', () => {
    const f = peak({ ...slow, reactionHeatJPerG: 0 }, { ambient: 22 }, 50);
    expect(Math.abs(f.peakC - 22)).toBeLessThan(1e-9);
    expect(f.runaway).toBe(false);
  });

  it('a very deep insulated layer approaches the adiabatic rise ΔH/cp', () => {
    // Adiabatic temperature rise = heat of reaction / heat capacity (energy balance): 160/1.5 = 106.7 K.
    const f = peak({ ...slow, gelTimeMin: 30 }, { ambient: 20, base: 'insulated' }, 1000);
    expect(f.adiabaticRiseK).toBeCloseTo(160 / 1.5, 9);
    expect(f.peakC - 20).toBeGreaterThan(0.97 * (160 / 1.5));
    expect(f.peakC - 20).toBeLessThan(1.01 * (160 / 1.5));
    // The hottest point is deep in the layer, far from the air.
    expect(f.peakDepthMm).toBeGreaterThan(500);
  });

  it('a 1 mm film of a slow system barely warms', () => {
    const f = peak({ ...dgebaAmineDefaults, gelTimeMin: 24 * 60, refTempC: 22 }, { ambient: 22 }, 1);
    expect(f.peakC - 22).toBeGreaterThan(0);
    expect(f.peakC - 22).toBeLessThan(1);
  });

  it('peaks hotter the deeper the layer', () => {
    const peaks = [5, 10, 20, 40, 60].map((d) => peak(slow, { ambient: 22 }, d).peakC);
    for (let i = 1; i < peaks.length; i++) expect(peaks[i]).toBeGreaterThan(peaks[i - 1]!);
  });

  it('peaks hotter and sooner the warmer the shop', () => {
    const runs = [15, 20, 25, 30].map((t) => peak(slow, { ambient: t }, 40));
    for (let i = 1; i < runs.length; i++) {
      expect(runs[i]!.peakC - [15, 20, 25, 30][i]!).toBeGreaterThan(runs[i - 1]!.peakC - [15, 20, 25, 30][i - 1]!);
      expect(runs[i]!.timeToPeakMin).toBeLessThan(runs[i - 1]!.timeToPeakMin);
    }
  });

  it('moves the peak by less than 1 % when the grid and the time step are halved', () => {
    for (const depth of [3, 20, 50, 80]) {
      const coarse = peak(slow, { ambient: 22 }, depth, 1);
      const fine = peak(slow, { ambient: 22 }, depth, 2);
      expect(coarse.runaway).toBe(false);
      // 1 % of the temperature rise, stricter than 1 % of the peak in °C.
      expect(Math.abs(fine.peakC - coarse.peakC)).toBeLessThan(0.01 * (fine.peakC - 22));
    }
  });

  it('stays stable through a runaway and stops at the adiabatic ceiling', () => {
    const f = peak({ ...dgebaAmineDefaults, gelTimeMin: 60, refTempC: 22 }, { ambient: 22 }, 60);
    expect(f.runaway).toBe(true);
    expect(f.peakC).toBeGreaterThanOrEqual(22 + 486 / 1.5);
    expect(f.peakC).toBeLessThan(22 + 486 / 1.5 + 5);
    expect(f.model).toMatch(/Kamal & Sourour/);
  });

  it('gives a series in time order with the peak in it', () => {
    const r = forecastLayer(slow, { ambient: 22 }, 40);
    if (!r.ok) throw new Error(r.error.message);
    const s = r.value.series;
    expect(s.length).toBeGreaterThan(10);
    expect(s.length).toBeLessThanOrEqual(201);
    for (let i = 1; i < s.length; i++) {
      expect(s[i]!.timeMin).toBeGreaterThan(s[i - 1]!.timeMin);
      expect(s[i]!.meanConversion).toBeGreaterThanOrEqual(s[i - 1]!.meanConversion);
    }
    expect(Math.max(...s.map((p) => p.hottestC))).toBeCloseTo(r.value.peakC, 0);
  });

  it('the deepest layer under a limit peaks at the limit, and 1 mm more goes over', () => {
    const m = maxLayerDepth(slow, { ambient: 22 }, 45);
    if (!m.ok) throw new Error(m.error.message);
    expect(m.value.maxLayerMm).toBeGreaterThan(5);
    expect(m.value.peakC).toBeLessThanOrEqual(45);
    expect(peak(slow, { ambient: 22 }, m.value.maxLayerMm + 1).peakC).toBeGreaterThan(45);
  });

  it('follows the shop temperature over time', () => {
    // A flat schedule is the same shop as its one temperature.
    const flat = peak(
      slow,
      {
        ambient: [
          { timeMin: 0, tempC: 18 },
          { timeMin: 900, tempC: 18 },
        ],
      },
      30,
    );
    expect(flat.peakC).toBeCloseTo(peak(slow, { ambient: 18 }, 30).peakC, 9);
    // Morning heating from 15 to 28 °C over 4 h: hotter than a shop that stays at 15 °C.
    const warming = peak(
      slow,
      {
        ambient: [
          { timeMin: 0, tempC: 15 },
          { timeMin: 240, tempC: 28 },
        ],
      },
      30,
    );
    expect(warming.peakC).toBeGreaterThan(peak(slow, { ambient: 15 }, 30).peakC);
    const backwards = forecastLayer(
      slow,
      {
        ambient: [
          { timeMin: 60, tempC: 15 },
          { timeMin: 30, tempC: 20 },
        ],
      },
      30,
    );
    if (backwards.ok) throw new Error('accepted readings out of order');
    expect(backwards.error.message).toMatch(/in time order/);
  });

  it('counts the minutes the mix stood in the cup: it keeps curing there and the clock starts at mixing', () => {
    const r = forecastLayer(slow, { ambient: 22, minutesMixedBeforePour: 45 }, 30);
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.series[0]!.timeMin).toBeCloseTo(45, 9);
    expect(r.value.series[0]!.meanConversion).toBeGreaterThan(0);
    const poured = peak(slow, { ambient: 22 }, 30);
    expect(r.value.timeToPeakMin).toBeGreaterThan(45);
    // The cup is held at the mix temperature: the heat it released there is gone, and the head start shows.
    expect(r.value.peakC).toBeLessThan(poured.peakC);
    expect(r.value.timeToPeakMin).toBeLessThan(poured.timeToPeakMin + 45);
  });

  it('refuses bad input with a sentence', () => {
    const neg = forecastLayer(slow, { ambient: 22 }, -5);
    expect(neg.ok).toBe(false);
    if (!neg.ok) expect(neg.error.message).toMatch(/layer depth must be a number of mm above 0/);
    const heat = forecastLayer({ ...slow, reactionHeatJPerG: -1 }, { ambient: 22 }, 10);
    if (heat.ok) throw new Error('accepted a negative heat');
    expect(heat.error.issues?.[0]?.field).toBe('reactionHeatJPerG');
    const base = forecastLayer(slow, { ambient: 22, base: 'stone' as 'wood' }, 10);
    if (base.ok) throw new Error('accepted an unknown base');
    expect(base.error.message).toMatch(/base must be "wood" or "insulated"/);
  });
});
