import { describe, expect, it } from 'vitest';
import { potLifeMinAt } from './pot-life';
import { buildPourPlan, type PourPlan, type PourPlanInput } from './pour-plan';
import { rectangleCavity } from './quick-shapes';
import type { ResinSystem } from './shelf';
import { demoDeepPour } from './test-fixtures';

// An invented deep-pour product (demo numbers): 40 mm at 22 °C on its data sheet, a 55 °C accepted peak.
const product: ResinSystem = { ...demoDeepPour, maxBatchG: 100_000, acceptedPeakC: 55, thinFilmGelMin: 600 };

function trayPlan(depthMm: number, shopTempC: number, over: Partial<PourPlanInput> = {}, p: ResinSystem = product): PourPlan {
  const shape = rectangleCavity({ lengthMm: 400, widthMm: 200, depthMm });
  if (!shape.ok) throw new Error(shape.error.message);
  const plan = buildPourPlan({
    cavity: { curve: shape.value.curve, wettedAreaMm2: shape.value.wettedAreaMm2 },
    fillLevelMm: depthMm,
    deepPour: { product: p },
    overPourPct: 0,
    cupWaste: { massG: 0 },
    scaleResolutionG: 1,
    shopTempC,
    ...over,
  });
  if (!plan.ok) throw new Error(plan.error.message);
  return plan.value;
}

function available(plan: PourPlan) {
  if (!plan.forecast.available) throw new Error(plan.forecast.reason);
  return plan.forecast;
}

describe('the plan’s exotherm forecast', () => {
  it('only ever makes layers thinner than the data sheet allows, at any shop temperature', () => {
    for (const shopTempC of [12, 18, 22, 26, 30]) {
      const plan = trayPlan(120, shopTempC);
      // The data sheet alone: ceil(120 / 40) = 3 layers of 40 mm (arithmetic).
      expect(plan.fill.layerCount, `${shopTempC} °C`).toBeGreaterThanOrEqual(3);
      for (const layer of plan.layers) expect(layer.thicknessMm).toBeLessThanOrEqual(product.maxLayerMm + 1e-9);
      expect(available(plan).maxLayerMm).toBeLessThanOrEqual(product.maxLayerMm);
    }
  });

  it('splits a warm shop’s pour into more, thinner layers, each forecast under the accepted peak', () => {
    const cool = trayPlan(120, 22);
    const warm = trayPlan(120, 30);
    // Arrhenius: a warmer start cures faster, so the same depth runs hotter (Kamal & Sourour kinetics with one activation energy).
    expect(warm.fill.layerCount).toBeGreaterThan(cool.fill.layerCount);
    const f = available(warm);
    expect(f.limitedBy).toBe('forecast');
    for (const layer of f.layers) {
      expect(layer.overLimit).toBe(false);
      expect(layer.peakC).toBeLessThanOrEqual(f.limitC);
    }
  });

  it('reproduces its own data-sheet point: a maximum layer at the reference temperature peaks at the accepted peak', () => {
    // The data sheet's statement (40 mm at 22 °C) with the shop's accepted peak is the calibration point.
    const plan = trayPlan(40, 22);
    const f = available(plan);
    expect(plan.fill.layerCount).toBe(1);
    expect(f.limitedBy).toBe('data_sheet');
    expect(f.layers[0]!.peakC).toBeGreaterThan(55 - 0.1);
    expect(f.layers[0]!.peakC).toBeLessThanOrEqual(55);
    expect(f.calibratedTo).toMatch(/40 mm layer poured at 22 °C peaks at 55 °C/);
  });

  it('reports each layer’s peak, time, depth and a curve that holds the peak', () => {
    const f = available(trayPlan(60, 22));
    for (const layer of f.layers) {
      expect(layer.peakC).toBeGreaterThan(22);
      expect(layer.timeToPeakMin).toBeGreaterThan(0);
      expect(layer.peakDepthMm).toBeGreaterThanOrEqual(0);
      expect(layer.peakDepthMm).toBeLessThanOrEqual(layer.thicknessMm);
      expect(Math.max(...layer.curve.map((p) => p.tempC))).toBeCloseTo(layer.peakC, 1);
      // Times increase along the curve, starting at the shop's temperature.
      expect(layer.curve[0]!.tempC).toBeCloseTo(22, 0);
      for (let k = 1; k < layer.curve.length; k++) expect(layer.curve[k]!.timeMin).toBeGreaterThan(layer.curve[k - 1]!.timeMin);
    }
    // The empty shelf settings are named, so the screen can say they are defaults.
    expect(f.defaultsUsed).toEqual(expect.arrayContaining(['reactionHeatJPerG', 'heatCapacityJPerGK', 'conductivityWPerMK', 'activationEnergyKJPerMol']));
    expect(f.defaultsUsed).not.toContain('acceptedPeakC');
  });

  it('finds a mould’s hottest spot in its deepest pocket, in the mould’s frame', () => {
    // A 30 mm deep tray, 40 × 20 columns of 5 mm from (100, 50), with a 50 mm pocket at columns 30..33 × 8..11.
    const nx = 40;
    const ny = 20;
    const depthsMm = new Array<number>(nx * ny).fill(30);
    for (let j = 8; j < 12; j++) for (let i = 30; i < 34; i++) depthsMm[j * nx + i] = 50;
    const shape = rectangleCavity({ lengthMm: 200, widthMm: 100, depthMm: 50 });
    if (!shape.ok) throw new Error(shape.error.message);
    const plan = buildPourPlan({
      cavity: {
        curve: shape.value.curve,
        wettedAreaMm2: shape.value.wettedAreaMm2,
        maxDepthMm: 50,
        depthMap: { originMm: [100, 50], cellMm: [5, 5], nx, ny, depthsMm },
      },
      fillLevelMm: 50,
      deepPour: { product },
      overPourPct: 0,
      cupWaste: { massG: 0 },
      scaleResolutionG: 1,
      shopTempC: 22,
    });
    if (!plan.ok) throw new Error(plan.error.message);
    const first = available(plan.value).layers[0]!;
    // Column centres of the pocket: x = 100 + (30..33 + 0.5)·5 = 252.5..267.5, y = 50 + (8..11 + 0.5)·5 = 92.5..107.5.
    expect(first.hottest!.xMm).toBeGreaterThanOrEqual(252.5);
    expect(first.hottest!.xMm).toBeLessThanOrEqual(267.5);
    expect(first.hottest!.yMm).toBeGreaterThanOrEqual(92.5);
    expect(first.hottest!.yMm).toBeLessThanOrEqual(107.5);
  });

  it('keeps the plan when no forecast can be made, saying why', () => {
    // A shop at 40 °C over a 35 °C accepted peak: no layer can stay under it.
    const plan = trayPlan(60, 40, {}, { ...product, acceptedPeakC: 35, maxWorkTempC: 45 });
    expect(plan.forecast.available).toBe(false);
    if (!plan.forecast.available) expect(plan.forecast.reason).toMatch(/35 °C/);
    // The data sheet's own split stands: ceil(60 / 40) = 2 layers.
    expect(plan.fill.layerCount).toBe(2);
  });

  it('gives every cup its own pot life: a heavy cup less than the data sheet’s, a light one no more', () => {
    // An invented fast casting product (demo numbers): 30 min pot life, 1 h gel, 6 mm layers, at 22 °C.
    const fast: ResinSystem = {
      ...product,
      potLifeMin: 30,
      gelTimeH: 1,
      thinFilmGelMin: 60,
      tackFreeH: 3,
      recoatWindow: { earliestH: 3, latestH: 8 },
      demoldH: 12,
      maxLayerMm: 6,
      acceptedPeakC: 60,
    };
    const heavy = trayPlan(6, 22, {}, { ...fast, maxBatchG: 500 });
    const light = trayPlan(6, 22, {}, { ...fast, maxBatchG: 60 });
    // At the data sheet's own temperature the Arrhenius move is nil: its pot life stands at 30 min.
    const sheet = potLifeMinAt(fast, 22);
    expect(sheet).toBeCloseTo(30, 9);
    const heavyCup = heavy.layers[0]!.batches[0]!;
    const lightCup = light.layers[0]!.batches[0]!;
    expect(heavyCup.cupPotLifeMin!).toBeLessThanOrEqual(sheet);
    expect(lightCup.cupPotLifeMin!).toBeLessThanOrEqual(sheet);
    // A bigger mass keeps its heat longer (sphere of the cup's volume, Churchill's free convection): it gels sooner.
    expect(heavyCup.cupPotLifeMin!).toBeLessThan(lightCup.cupPotLifeMin!);
    expect(heavyCup.cupPotLifeLimitedBy).toBe('cup_heating');
    // One pot life per cup: equal cups of one layer share it.
    for (const b of heavy.layers[0]!.batches) expect(b.cupPotLifeMin).toBe(heavyCup.cupPotLifeMin);
  });
});
