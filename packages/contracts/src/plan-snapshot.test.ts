import { describe, expect, it } from 'vitest';
import { PlanProductSnapshot } from './plan-snapshot';

// A snapshot as the first saved plans hold it: a deep-pour resin and a pigment with none of the fields added since
// (no hardness, no forecast settings, no pigment density). Test data, not a computation.
const firstResin = {
  id: '7d0f3c2e-1b5a-4c6d-9e8f-0a1b2c3d4e5f',
  name: 'Slow deep pour',
  use: 'deep_pour',
  mixRatio: { a: 2, b: 1, basis: 'volume' },
  densityAGPerMl: 1.15,
  densityBGPerMl: 1.0,
  potLifeMin: 60,
  gelTimeH: 12,
  recoatWindow: { earliestH: 12, latestH: 24 },
  tackFreeH: 24,
  demoldH: 72,
  fullCureH: 168,
  referenceTempC: 24,
  minWorkTempC: 18,
  maxWorkTempC: 30,
  maxLayerMm: 50,
  maxBatchG: 10_000,
  pricePerKit: 120,
  kitSizeG: 5_000,
  shelfLifeMonths: 12,
};
const firstRow = {
  deepPour: firstResin,
  pigment: {
    id: 'a1b2c3d4-e5f6-4a7b-8c9d-0e1f2a3b4c5d',
    name: 'Blue mica',
    kind: 'powder',
    recommendedPct: 2,
    maxPct: 6,
    price: { pricePerPack: 10, packSizeG: 50 },
  },
  sealCoat: null,
  scaleResolutionG: 0.1,
};

describe('PlanProductSnapshot', () => {
  it('reads a snapshot written before the optional product fields existed, as it was stored', () => {
    expect(PlanProductSnapshot.parse(firstRow)).toEqual(firstRow);
  });

  it('keeps the fields added since when a snapshot holds them', () => {
    const row = { ...firstRow, sealCoat: { ...firstResin, use: 'coating', hardnessShoreD: 80, reactionHeatJPerG: 400, acceptedPeakC: 60 } };
    expect(PlanProductSnapshot.parse(row).sealCoat).toMatchObject({ hardnessShoreD: 80, reactionHeatJPerG: 400, acceptedPeakC: 60 });
  });

  it('refuses a snapshot that lacks a data-sheet time the cure is worked out from', () => {
    const { fullCureH: _gone, ...resin } = firstResin;
    const parsed = PlanProductSnapshot.safeParse({ ...firstRow, deepPour: resin });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.path).toEqual(['deepPour', 'fullCureH']);
  });
});
