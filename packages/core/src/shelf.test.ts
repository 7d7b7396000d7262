import { describe, expect, it } from 'vitest';
import { activationEnergyForDoublingPer10K } from './arrhenius';
import { activationEnergyOf, pigmentPricePerG, readyToMachineHOf, resinPricePerG, validatePigment, validateResinSystem, type Pigment } from './shelf';
import { demoDeepPour } from './test-fixtures';

describe('shelf entries', () => {
  it('derives the activation energy from doubling per 10 K when the data sheet has none', () => {
    expect(activationEnergyOf(demoDeepPour)).toBe(activationEnergyForDoublingPer10K(22));
    expect(activationEnergyOf({ ...demoDeepPour, activationEnergyKJPerMol: 60 })).toBe(60);
  });

  it('ready to machine is full cure unless the product says otherwise', () => {
    expect(readyToMachineHOf(demoDeepPour)).toBe(168);
    expect(readyToMachineHOf({ ...demoDeepPour, readyToMachineH: 96 })).toBe(96);
  });

  it('prices per gram', () => {
    // 180 per 6000 g kit = 0.03 per g; a 50 g pack at 12.50 = 0.25 per g.
    expect(resinPricePerG(demoDeepPour)).toBeCloseTo(0.03, 12);
    expect(pigmentPricePerG({ price: { pricePerPack: 12.5, packSizeG: 50 } })).toBeCloseTo(0.25, 12);
    expect(pigmentPricePerG({ price: { pricePerG: 0.4 } })).toBe(0.4);
  });

  it('validates a data-sheet entry and lists every bad field', () => {
    expect(validateResinSystem(demoDeepPour).ok).toBe(true);
    const bad = validateResinSystem({ ...demoDeepPour, densityAGPerMl: 0, recoatWindow: { earliestH: 30, latestH: 20 }, minWorkTempC: 35 });
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.error.code).toBe('resin_system_invalid');
      expect(bad.error.issues?.map((i) => i.field)).toEqual(['densityAGPerMl', 'recoatWindow', 'minWorkTempC']);
      expect(bad.error.message).toContain('Correct these from the data sheet.');
    }
  });

  it('validates a pigment', () => {
    const pigment: Pigment = { name: 'Demo Blue', kind: 'paste', recommendedPct: 2, maxPct: 6, price: { pricePerG: 0.4 } };
    expect(validatePigment(pigment).ok).toBe(true);
    const bad = validatePigment({ ...pigment, recommendedPct: 9 });
    expect(bad.ok || bad.error.issues?.[0]?.field).toBe('recommendedPct');
  });
});
