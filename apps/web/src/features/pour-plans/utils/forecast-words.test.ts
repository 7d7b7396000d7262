import type { PlanForecast } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { forecastCurveGeometry, forecastWords } from './forecast-words';
import { livePourPlan } from './live-plan';
import { newPlannerValues } from './planner-values';
import { checkPlanner } from './planner-validation';
import { benchDeep, testPieceId } from './test-fixtures';

// The bench product with a 55 °C accepted peak (invented, like the rest of the bench shelf).
const product = { ...benchDeep, maxBatchG: 100_000, acceptedPeakC: 55 };

function livePlan(shopTempC: number) {
  const values = newPlannerValues('Channel, 600 × 150');
  values.cavity.shape = { ...values.cavity.shape, kind: 'rectangle', lengthMm: 600, widthMm: 150, depthMm: 60 };
  values.fillLevelMm = 60;
  values.deepPour.resinSystemId = product.id;
  values.cupWaste = { unit: 'g', amount: 0 };
  values.shopTempC = shopTempC;
  const checked = checkPlanner(values, testPieceId);
  if (!checked.ok) throw new Error(JSON.stringify(checked.fieldErrors));
  const live = livePourPlan(checked.input, { resinSystems: [product], pigments: [], scaleResolutionG: 1 });
  if (!live.ok) throw new Error(live.error.message);
  return live.value.plan;
}

describe('the planner’s live heat forecast', () => {
  it('thins the layers of a warm shop below the data sheet’s and says why, every layer under the limit', () => {
    const cool = livePlan(22);
    const warm = livePlan(30);
    // Data sheet alone: ceil(60 / 20) = 3 layers (arithmetic); the forecast only ever adds layers.
    expect(cool.fill.layerCount).toBeGreaterThanOrEqual(3);
    expect(warm.fill.layerCount).toBeGreaterThan(cool.fill.layerCount);
    if (!warm.forecast.available) throw new Error(warm.forecast.reason);
    const words = forecastWords(warm.forecast, 'metric');
    expect(words.basis).toMatch(/^At 30.0 °C the forecast keeps a single layer under 55.0 °C only up to .* thinner than the data sheet's 20\.0 mm/);
    expect(words.warnings).toEqual([]);
    expect(words.layers).toHaveLength(warm.fill.layerCount);
    expect(words.calibration).toMatch(/^An estimate\. Calibrated so a 20 mm layer poured at 22 °C peaks at 55 °C/);
    expect(words.defaults).toMatch(/heat of reaction/);
  });

  it('says in plain words which layer crosses the limit, and when one runs away', () => {
    const layer = { thicknessMm: 30, timeToPeakMin: 300, peakDepthMm: 12, curve: [] };
    const forecast: Extract<PlanForecast, { available: true }> = {
      version: 1,
      available: true,
      model: 'test',
      calibratedTo: 'Calibrated so …',
      calibration: { maxLayerMm: 30, tempC: 22, heatScale: 1 },
      limitC: 55,
      shopTempC: 28,
      maxLayerMm: 30,
      limitedBy: 'data_sheet',
      defaultsUsed: [],
      layers: [
        { ...layer, index: 0, peakC: 50, overLimit: false, runaway: false },
        { ...layer, index: 1, peakC: 61.5, overLimit: true, runaway: false, hottest: { xMm: 120, yMm: 40 } },
        { ...layer, index: 2, peakC: 180, overLimit: true, runaway: true },
      ],
    };
    const words = forecastWords(forecast, 'metric', (x, y) => `at x ${x} mm, y ${y} mm`);
    expect(words.warnings).toEqual([
      'Layer 2 is forecast to reach 61.5 °C, over the 55.0 °C the shop accepts: pour it thinner or when the shop is cooler.',
      'Layer 3 is forecast to run away: it would heat until it smokes. Pour it thinner, in a cooler shop, or with a slower product.',
    ]);
    expect(words.layers[1]!.sentence).toBe('Layer 2: peaks at 61.5 °C about 5 h after mixing, 12.0 mm below the surface, hottest at x 120 mm, y 40 mm.');
    expect(words.defaults).toBeNull();
  });

  it('draws the curve with its peak highest and the limit line where the limit is', () => {
    const curve = [
      { timeMin: 0, tempC: 22 },
      { timeMin: 200, tempC: 40 },
      { timeMin: 300, tempC: 50 },
      { timeMin: 600, tempC: 30 },
    ];
    const g = forecastCurveGeometry(curve, 55, 200, 100)!;
    // Scaled from 20 °C (22 − 2) to 57 °C (55 + 2) over 100 px, y downwards: 50 °C at 100 − 30/37·100.
    expect(g.peak.x).toBeCloseTo(100, 9);
    expect(g.peak.y).toBeCloseTo(100 - (30 / 37) * 100, 9);
    expect(g.limitY).toBeCloseTo(100 - (35 / 37) * 100, 9);
    expect(g.points.split(' ')).toHaveLength(4);
    expect(forecastCurveGeometry([{ timeMin: 0, tempC: 22 }], 55, 200, 100)).toBeNull();
  });
});
