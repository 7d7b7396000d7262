import { describe, expect, it } from 'vitest';
import {
  activationEnergyForDoublingPer10K,
  activationEnergyFromKelvinQ,
  gasConstantJPerMolK,
  hoursAtTemperature,
  kelvinQFromActivationEnergy,
  rateFactor,
} from './arrhenius';

describe('Arrhenius rate factor', () => {
  it('uses the exact SI molar gas constant', () => {
    // 2019 SI: R = N_A·k = 6.022 140 76e23 × 1.380 649e-23 J/K.
    expect(gasConstantJPerMolK).toBeCloseTo(6.02214076e23 * 1.380649e-23, 9);
  });

  it('k(T)/k(Tref) = exp(−(Ea/R)(1/T − 1/Tref)), written out for 50 kJ/mol, 15 °C vs 25 °C', () => {
    // Ea/R = 50000 / 8.314462618 = 6013.618 K; 1/288.15 − 1/298.15 = 1.163983e-4 K⁻¹; exp(−0.699975) = 0.496598.
    expect(rateFactor(15, 25, 50)).toBeCloseTo(0.496598, 6);
    expect(rateFactor(25, 25, 50)).toBe(1);
  });

  it('the default activation energy doubles the rate over 10 K at the reference temperature', () => {
    // Common practice: cure rate roughly doubles per 10 °C (Q10 ≈ 2), no single source.
    for (const refTempC of [20, 23, 25]) {
      const ea = activationEnergyForDoublingPer10K(refTempC);
      expect(rateFactor(refTempC + 10, refTempC, ea)).toBeCloseTo(2, 12);
    }
    // From memory: "doubling per 10 K near room temperature" corresponds to roughly 50–55 kJ/mol.
    // Written out at 25 °C: 8.314462618 × ln 2 / (1/298.15 − 1/308.15) = 52.95 kJ/mol.
    expect(activationEnergyForDoublingPer10K(25)).toBeCloseTo(52.95, 2);
  });

  it('scales data-sheet times by the inverse factor', () => {
    // 24 h at 25 °C becomes 48 h at 15 °C when the rate halves per 10 K.
    const ea = activationEnergyForDoublingPer10K(15);
    expect(hoursAtTemperature(24, 15, 25, ea)).toBeCloseTo(48, 10);
  });

  it('converts between Ea (kJ/mol) and the maturity method Q (K)', () => {
    // ASTM C1074 writes Q = E/R: 5000 K × 8.314462618 J/(mol·K) = 41.572 kJ/mol.
    expect(activationEnergyFromKelvinQ(5000)).toBeCloseTo(41.5723, 4);
    expect(kelvinQFromActivationEnergy(activationEnergyFromKelvinQ(5000))).toBeCloseTo(5000, 9);
  });
});
