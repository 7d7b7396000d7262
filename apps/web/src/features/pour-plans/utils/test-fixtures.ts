import { exothermSettingsOf } from '@gelpoint/core';
import type { PigmentView, ResinSystemView } from '@gelpoint/contracts';

// Invented shelf entries for the tests, shaped like data sheets; the densities are typical values from memory
// (liquid epoxy resin about 1.16 g/mL, amine hardener about 0.97 g/mL).
export const benchDeep: ResinSystemView = {
  id: '8b0d1c3e-2f4a-4b6c-8d9e-0a1b2c3d4e5f',
  name: 'Bench Deep 20',
  maker: '',
  use: 'deep_pour',
  mixRatio: { a: 2, b: 1, basis: 'volume' },
  densityAGPerMl: 1.16,
  densityBGPerMl: 0.97,
  potLifeMin: 40,
  gelTimeH: 8,
  tackFreeH: 14,
  recoatWindow: { earliestH: 10, latestH: 24 },
  demoldH: 48,
  fullCureH: 168,
  readyToMachineH: null,
  referenceTempC: 22,
  minWorkTempC: 18,
  maxWorkTempC: 30,
  maxLayerMm: 20,
  maxBatchG: 4000,
  activationEnergyKJPerMol: null,
  hardnessShoreD: null,
  reactionHeatJPerG: null,
  thinFilmGelMin: null,
  heatCapacityJPerGK: null,
  conductivityWPerMK: null,
  acceptedPeakC: null,
  exothermSettings: exothermSettingsOf({
    mixRatio: { a: 2, b: 1, basis: 'volume' },
    densityAGPerMl: 1.16,
    densityBGPerMl: 0.97,
    gelTimeH: 8,
    referenceTempC: 22,
    maxLayerMm: 20,
  }).settings,
  effectiveActivationEnergyKJPerMol: 51.6,
  pricePerKit: 180,
  kitSizeG: 6000,
  shelfLifeMonths: 12,
  archived: false,
  updatedAt: '2026-03-01T10:00:00.000Z',
};

export const benchSeal: ResinSystemView = {
  ...benchDeep,
  id: '9c1e2d4f-3a5b-4c7d-9e0f-1b2c3d4e5f60',
  name: 'Bench Seal 3',
  use: 'seal',
  mixRatio: { a: 100, b: 45, basis: 'weight' },
  densityAGPerMl: 1.15,
  densityBGPerMl: 1.0,
  potLifeMin: 25,
  maxLayerMm: 3,
  maxBatchG: 500,
  pricePerKit: 60,
  kitSizeG: 1450,
};

export const benchTeal: PigmentView = {
  id: 'ad2f3e50-4b6c-4d8e-8f10-2c3d4e5f6071',
  name: 'Bench Teal',
  kind: 'paste',
  densityGPerMl: 1.3,
  recommendedPct: 2,
  maxPct: 6,
  pricePerPack: 12.5,
  packSizeG: 50,
  archived: false,
  updatedAt: '2026-03-01T10:00:00.000Z',
};

export const testPieceId = 'be3a4f61-5c7d-4e9f-9a21-3d4e5f607182';
