import { exothermSettingsOf } from '@gelpoint/core';
import { LotUpdate, PigmentInput, ResinSystemInput, type LotView, type PigmentView, type ResinSystemView } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { lotEditValuesOf, pigmentInputOf, resinSystemInputOf } from './form-defaults';

// Invented values shaped like a data sheet, for the tests only.
const resinSystem: ResinSystemView = {
  id: '7c0a3a52-6f0e-4d55-9a57-2f5c9d1e0b11',
  name: 'Bench Deep 40',
  maker: 'Test Works',
  use: 'deep_pour',
  mixRatio: { a: 2, b: 1, basis: 'volume' },
  densityAGPerMl: 1.16,
  densityBGPerMl: 0.97,
  potLifeMin: 45,
  gelTimeH: 8,
  tackFreeH: 14,
  recoatWindow: { earliestH: 10, latestH: 24 },
  demoldH: 48,
  fullCureH: 168,
  readyToMachineH: null,
  referenceTempC: 22,
  minWorkTempC: 18,
  maxWorkTempC: 30,
  maxLayerMm: 40,
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

describe('form values from saved entries', () => {
  // Reference: the API's own strict zod contracts, which refuse any key they do not know.
  it('gives back exactly what the replace request accepts', () => {
    const input = ResinSystemInput.safeParse(resinSystemInputOf(resinSystem));
    expect(input.success).toBe(true);
    expect(input.data).toMatchObject({ name: 'Bench Deep 40', activationEnergyKJPerMol: null, mixRatio: { a: 2, b: 1, basis: 'volume' } });
    const pigment: PigmentView = {
      id: resinSystem.id,
      name: 'Test Teal',
      kind: 'paste',
      densityGPerMl: 1.3,
      recommendedPct: 2,
      maxPct: 6,
      pricePerPack: 12.5,
      packSizeG: 50,
      archived: true,
      updatedAt: resinSystem.updatedAt,
    };
    expect(PigmentInput.safeParse(pigmentInputOf(pigment)).success).toBe(true);
  });

  it('edits a lot with the fields a correction may change', () => {
    const lot: LotView = {
      id: resinSystem.id,
      part: 'A',
      resinSystemId: resinSystem.id,
      pigmentId: null,
      productName: 'Bench Deep 40',
      lotNumber: 'A-2211',
      quantityG: 4000,
      remainingG: 250,
      receivedOn: '2026-01-10',
      expiresOn: null,
      notes: '',
      expired: false,
      low: true,
    };
    expect(LotUpdate.safeParse(lotEditValuesOf(lot)).success).toBe(true);
  });
});
