import { buildPourPlan, rectangleCavity, type PourPlan, type ResinSystem } from '@gelpoint/core';

// Invented shelf entries for the tests, shaped like data sheets; they describe no real product.
export const testDeepPour: ResinSystem = {
  name: 'Test Deep 40',
  use: 'deep_pour',
  mixRatio: { a: 2, b: 1, basis: 'volume' },
  densityAGPerMl: 1.16,
  densityBGPerMl: 0.98,
  potLifeMin: 40,
  gelTimeH: 8,
  recoatWindow: { earliestH: 12, latestH: 30 },
  tackFreeH: 16,
  demoldH: 48,
  fullCureH: 168,
  referenceTempC: 22,
  minWorkTempC: 16,
  maxWorkTempC: 30,
  maxLayerMm: 20,
  maxBatchG: 1500,
  pricePerKit: 150,
  kitSizeG: 4500,
  shelfLifeMonths: 12,
};

export const testSealCoat: ResinSystem = {
  ...testDeepPour,
  name: 'Test Seal 5',
  use: 'seal',
  mixRatio: { a: 100, b: 45, basis: 'weight' },
  potLifeMin: 20,
  fullCureH: 72,
  tackFreeH: 10,
  demoldH: 12,
  maxBatchG: 400,
};

/** A 300 × 200 × 30 mm pocket with a seal coat and pigment: 2 layers of 15 mm, several cups each. */
export function testPlan(): { result: PourPlan; productSnapshot: Record<string, unknown> } {
  const shape = rectangleCavity({ lengthMm: 300, widthMm: 200, depthMm: 30 });
  if (!shape.ok) throw new Error(shape.error.message);
  const pigment = { name: 'Test Blue', kind: 'paste' as const, recommendedPct: 2, maxPct: 6, price: { pricePerPack: 10, packSizeG: 50 } };
  const plan = buildPourPlan({
    cavity: { curve: shape.value.curve, wettedAreaMm2: shape.value.wettedAreaMm2 },
    fillLevelMm: 30,
    deepPour: { product: testDeepPour, pigment: { pigment, pct: 2 } },
    sealCoat: { product: testSealCoat, filmThicknessMm: 0.2, coats: 1, absorptionFactor: 1.2 },
    overPourPct: 5,
    cupWaste: { massG: 5 },
    scaleResolutionG: 1,
    shopTempC: 21,
  });
  if (!plan.ok) throw new Error(plan.error.message);
  return {
    result: plan.value,
    productSnapshot: {
      deepPour: { id: '00000000-0000-4000-8000-00000000000a', ...testDeepPour },
      sealCoat: { id: '00000000-0000-4000-8000-00000000000b', ...testSealCoat },
      pigment: { id: '00000000-0000-4000-8000-00000000000c', ...pigment },
      scaleResolutionG: 1,
    },
  };
}
