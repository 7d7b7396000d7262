import { describe, expect, it } from 'vitest';
import { activationEnergyUsed } from './activation-energy';

// CODATA 2018: the molar gas constant is exact since the 2019 SI redefinition.
const gasConstant = 8.314462618;
// Arrhenius: k(T2)/k(T1) = exp(−Ea/R · (1/T2 − 1/T1)), temperatures in kelvin.
const rateRatio = (eaKJPerMol: number, fromC: number, toC: number) =>
  Math.exp((-(eaKJPerMol * 1000) / gasConstant) * (1 / (toC + 273.15) - 1 / (fromC + 273.15)));

describe('activationEnergyUsed', () => {
  it('uses the data sheet value when there is one', () => {
    expect(activationEnergyUsed(62.5, 22)).toEqual({ valueKJPerMol: 62.5, fromDataSheet: true });
  });

  // Common practice: the cure rate roughly doubles for every 10 °C warmer (Q10 ≈ 2).
  it('falls back to the rate doubling per 10 °C at the reference temperature', () => {
    for (const referenceTempC of [15, 22, 25]) {
      const used = activationEnergyUsed(null, referenceTempC);
      expect(used?.fromDataSheet).toBe(false);
      expect(rateRatio(used!.valueKJPerMol, referenceTempC, referenceTempC + 10)).toBeCloseTo(2, 9);
    }
  });

  it('waits for a reference temperature before it says anything', () => {
    expect(activationEnergyUsed(null, Number.NaN)).toBeNull();
  });
});
