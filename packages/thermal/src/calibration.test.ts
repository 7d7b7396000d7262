import { describe, expect, it } from 'vitest';
import { calibrateToDataSheet, proposeLayers } from './calibration';
import { forecastLayer } from './layer-forecast';
import { dgebaAmineDefaults, type ResinThermal } from './resin-thermal';

// An invented deep-pour product for these checks: 50 mm at most per layer at 22 °C, 10 h gel.
const product: ResinThermal = { ...dgebaAmineDefaults, gelTimeMin: 600, refTempC: 22, acceptedPeakC: 60 };
const sheet = { maxLayerMm: 50, tempC: 22 };

function calibrated(): ResinThermal {
  const c = calibrateToDataSheet(product, sheet);
  if (!c.ok) throw new Error(c.error.message);
  return c.value.resin;
}

describe('calibration to the data sheet', () => {
  const resin = calibrated();

  it('reproduces its own point: the maximum layer at the data sheet temperature peaks at the accepted peak', () => {
    const f = forecastLayer(resin, { ambient: 22 }, 50);
    if (!f.ok) throw new Error(f.error.message);
    expect(f.value.peakC).toBeLessThanOrEqual(60);
    expect(f.value.peakC).toBeGreaterThan(60 - 0.01);
    expect(resin.heatScale).toBeGreaterThan(0);
  });

  it('says what it was calibrated to', () => {
    const c = calibrateToDataSheet(product, sheet);
    if (!c.ok) throw new Error(c.error.message);
    expect(c.value.sentence).toMatch(/^Calibrated so a 50 mm layer poured at 22 °C peaks at 60 °C, the data sheet's maximum thickness/);
  });

  it('needs the accepted peak and a reachable point', () => {
    const { acceptedPeakC: _, ...noPeak } = product;
    const missing = calibrateToDataSheet(noPeak, sheet);
    expect(missing.ok).toBe(false);
    const cold = calibrateToDataSheet({ ...product, acceptedPeakC: 20 }, sheet);
    if (cold.ok) throw new Error('calibrated to a peak under the pouring temperature');
    expect(cold.error.code).toBe('accepted_peak_not_above_sheet');
  });

  it('never proposes a layer thicker than the data sheet, even in a cold shop', () => {
    const p = proposeLayers(resin, sheet, { ambient: 12 }, 130);
    if (!p.ok) throw new Error(p.error.message);
    expect(p.value.maxLayerMm).toBe(50);
    expect(p.value.limitedBy).toBe('data_sheet');
    expect(p.value.layers).toHaveLength(3);
    for (const l of p.value.layers) expect(l.thicknessMm).toBeLessThanOrEqual(50);
  });

  it('proposes thinner layers in a warmer shop, each forecast under the limit', () => {
    const at22 = proposeLayers(resin, sheet, { ambient: 22 }, 100);
    const at28 = proposeLayers(resin, sheet, { ambient: 28 }, 100);
    if (!at22.ok || !at28.ok) throw new Error('no proposal');
    expect(at22.value.maxLayerMm).toBe(50);
    expect(at28.value.limitedBy).toBe('forecast');
    expect(at28.value.maxLayerMm).toBeLessThan(50);
    expect(at28.value.layers.length).toBeGreaterThan(at22.value.layers.length);
    for (const l of at28.value.layers) expect(l.peakC).toBeLessThanOrEqual(60);
    const total = at28.value.layers.reduce((s, l) => s + l.thicknessMm, 0);
    expect(total).toBeCloseTo(100, 9);
  });
});
