import type { Pigment, ResinSystem } from './shelf';

// Demo shelf for the tests: invented values shaped like a data sheet, not any real product's.
export const demoDeepPour: ResinSystem = {
  name: 'Demo Deep 50',
  use: 'deep_pour',
  mixRatio: { a: 2, b: 1, basis: 'volume' },
  densityAGPerMl: 1.16,
  densityBGPerMl: 0.97,
  potLifeMin: 45,
  gelTimeH: 8,
  recoatWindow: { earliestH: 10, latestH: 24 },
  tackFreeH: 14,
  demoldH: 48,
  fullCureH: 168,
  referenceTempC: 22,
  minWorkTempC: 18,
  maxWorkTempC: 30,
  maxLayerMm: 40,
  maxBatchG: 4000,
  pricePerKit: 180,
  kitSizeG: 6000,
  shelfLifeMonths: 12,
};

export const demoSealCoat: ResinSystem = {
  name: 'Demo Seal 10',
  use: 'seal',
  mixRatio: { a: 100, b: 45, basis: 'weight' },
  densityAGPerMl: 1.15,
  densityBGPerMl: 1.0,
  potLifeMin: 25,
  gelTimeH: 1.5,
  recoatWindow: { earliestH: 3, latestH: 8 },
  tackFreeH: 4,
  demoldH: 12,
  fullCureH: 72,
  referenceTempC: 22,
  minWorkTempC: 15,
  maxWorkTempC: 32,
  maxLayerMm: 3,
  maxBatchG: 500,
  pricePerKit: 60,
  kitSizeG: 1450,
  shelfLifeMonths: 18,
};

export const demoPigment: Pigment = { name: 'Demo Blue', kind: 'paste', recommendedPct: 2, maxPct: 6, price: { pricePerPack: 12.5, packSizeG: 50 } };
