import { describe, expect, it } from 'vitest';
import { notForecast, POUR_PLAN_RESULT_VERSION, PourPlanResult, pourPlanResultVersionOf } from './pour-plan-result';

// A result as the first stored plans hold it (version 1): the shape of core's PourPlan before cups were rounded on
// ratio and before the forecast, with one layer of one unpigmented cup and no seal coat. Test data, not a computation.
const cup = {
  partA: { grams: 200, ml: 172.4 },
  partB: { grams: 100, ml: 100 },
  pigment: { grams: 0 },
  totalGrams: 300,
  mixedDensityGPerMl: 1.1,
  index: 0,
  pour: { kind: 'layer', layer: 0 },
  cost: { resin: 9, pigment: 0, total: 9 },
};
const times = {
  tempC: 20,
  rateFactor: 1,
  belowMinimum: false,
  potLifeMin: 40,
  gelTimeH: 6,
  nextLayerOpensH: 12,
  nextLayerClosesH: 24,
  tackFreeH: 12,
  demoldH: 48,
  fullCureH: 168,
  readyToMachineH: 72,
};
const totals = { partA: { grams: 200, ml: 172.4 }, partB: { grams: 100, ml: 100 }, pigment: { grams: 0 }, totalGrams: 300 };
const versionOneRow = {
  margins: { overPour: { label: 'over-pour', pct: 5, volumeMl: 12 }, cupWaste: { label: 'left in the cup', perBatch: { massG: 5 }, batches: 1, resinG: 5 } },
  resolution: { grams: 1, ml: 1, cost: 0.01 },
  fill: { fillLevelMm: 20, fillVolumeMl: 250, pourVolumeMl: 267, layerCount: 1, layerThicknessMm: 20, deepestResinMm: 20 },
  sealCoat: null,
  layers: [
    {
      index: 0,
      fromLevelMm: 0,
      toLevelMm: 20,
      thicknessMm: 20,
      deepestResinMm: 20,
      fillVolumeMl: 250,
      overPourMl: 12,
      pourVolumeMl: 267,
      batches: [cup],
      totals,
      cost: cup.cost,
    },
  ],
  deepPour: { productName: 'Deep pour', pigmentName: null, pigmentPct: 0, totals, cost: cup.cost },
  cost: { sealCoat: 0, deepPour: 9, wood: null, piece: 9 },
  shopTimes: { deepPour: times, sealCoat: null },
  cautions: [{ code: 'ventilation', severity: 'info', message: 'Ventilate the room.', appliesTo: { kind: 'plan' } }],
};

describe('a stored pour plan result', () => {
  it('tells a version-1 row by what it lacks, and the current version by its forecast', () => {
    expect(pourPlanResultVersionOf(versionOneRow)).toBe(1);
    expect(pourPlanResultVersionOf({ ...versionOneRow, resolution: { ...versionOneRow.resolution, offRatioTolerancePct: 3 } })).toBe(2);
    expect(pourPlanResultVersionOf({ ...versionOneRow, forecast: notForecast })).toBe(POUR_PLAN_RESULT_VERSION);
  });

  it('reads a version-1 row as the current version: no forecast said in words, cups on ratio, the default tolerance', () => {
    const read = PourPlanResult.safeParse(JSON.parse(JSON.stringify(versionOneRow)));
    expect(read.success).toBe(true);
    if (!read.success) return;
    expect(read.data.forecast).toEqual(notForecast);
    expect(read.data.forecast.available).toBe(false);
    expect(read.data.resolution.offRatioTolerancePct).toBe(3);
    const [batch] = read.data.layers[0]!.batches;
    expect(batch!.ratioErrorPct).toBe(0);
    expect(batch!.pigmentMl).toBe(0);
    expect(batch!.cupPotLifeMin).toBeUndefined();
    // What the row did hold comes through untouched.
    expect(batch!.partA).toEqual({ grams: 200, ml: 172.4 });
    expect(read.data.cautions).toEqual(versionOneRow.cautions);
  });

  it('keeps a stored forecast and a stored tolerance instead of the defaults', () => {
    const read = PourPlanResult.parse({
      ...versionOneRow,
      resolution: { ...versionOneRow.resolution, offRatioTolerancePct: 5 },
      forecast: { version: 1, available: false, code: 'no_depth', reason: 'No depth.' },
    });
    expect(read.resolution.offRatioTolerancePct).toBe(5);
    expect(read.forecast).toEqual({ version: 1, available: false, code: 'no_depth', reason: 'No depth.' });
  });

  it('refuses a row that is no version at all, and a forecast of an unknown version', () => {
    expect(PourPlanResult.safeParse({}).success).toBe(false);
    expect(PourPlanResult.safeParse({ ...versionOneRow, layers: 'one' }).success).toBe(false);
    expect(PourPlanResult.safeParse({ ...versionOneRow, forecast: { ...notForecast, version: 3 } }).success).toBe(false);
  });
});
