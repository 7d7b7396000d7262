import { describe, expect, it } from 'vitest';
import { prepareLayerModel, runLayer } from './layer-model';
import { dgebaAmineKinetics, isothermalTimeToS, rateLawFromGelTime, reducedTimeTo, type CureKinetics } from './kinetics';
import { dgebaAmineDefaults } from './resin-thermal';

/**
 * Closed form of the isothermal Kamal–Sourour law with m = 1, n = 2, by partial fractions:
 *   1/((ε + α)(1 − α)²) = A/(ε + α) + A/(1 − α) + B/(1 − α)², A = 1/(1 + ε)², B = 1/(1 + ε),
 *   k2·t(α) = A·ln((ε + α)/(ε(1 − α))) + B·α/(1 − α).
 */
function closedFormReducedTime(alpha: number, eps: number): number {
  const a = 1 / (1 + eps) ** 2;
  const b = 1 / (1 + eps);
  return a * Math.log((eps + alpha) / (eps * (1 - alpha))) + (b * alpha) / (1 - alpha);
}

describe('cure kinetics held isothermal', () => {
  const kin = dgebaAmineKinetics;

  it('the integral of the rate law matches its closed form (m = 1, n = 2)', () => {
    for (const alpha of [0.05, 0.3, kin.gelConversion, 0.9, 0.99]) {
      const exact = closedFormReducedTime(alpha, kin.k1OverK2);
      expect(Math.abs(reducedTimeTo(alpha, kin) - exact) / exact).toBeLessThan(1e-6);
    }
  });

  it('with another shape, matches an independent trapezoid quadrature of 1/rate (m = 0.7, n = 1.6)', () => {
    const other: CureKinetics = { m: 0.7, n: 1.6, k1OverK2: 0.05, gelConversion: 0.6 };
    const steps = 200_000;
    let sum = 0;
    for (let i = 0; i <= steps; i++) {
      const x = (0.6 * i) / steps;
      const w = i === 0 || i === steps ? 0.5 : 1;
      sum += w / ((0.05 + x ** 0.7) * (1 - x) ** 1.6);
    }
    expect(reducedTimeTo(0.6, other)).toBeCloseTo((sum * 0.6) / steps, 4);
  });

  it('a thin film reaches the gel conversion exactly at the data sheet gel time', () => {
    const law = rateLawFromGelTime(45, 25, 53, kin);
    expect(isothermalTimeToS(law, kin.gelConversion, 25)).toBeCloseTo(45 * 60, 6);
  });

  it('halves the gel time per 10 K at the activation energy of "pot life halves per 10 K"', () => {
    // Common practice: the rate doubles per 10 K; at 25 °C that is Ea = R·ln2/(1/298.15 − 1/308.15) = 52.95 kJ/mol.
    const ea = (8.314462618 * Math.LN2) / (1 / 298.15 - 1 / 308.15) / 1000;
    const law = rateLawFromGelTime(60, 25, ea, kin);
    expect(isothermalTimeToS(law, kin.gelConversion, 35) / 60).toBeCloseTo(30, 6);
  });

  it('the coupled solver, with no heat of reaction, follows the closed form in time and converges as its steps shrink', () => {
    const resin = { ...dgebaAmineDefaults, reactionHeatJPerG: 0, gelTimeMin: 120, refTempC: 22 };
    const model = prepareLayerModel(resin, { ambient: 22 });
    if (!model.ok) throw new Error(model.error.message);
    const k2 = closedFormReducedTime(kin.gelConversion, kin.k1OverK2) / (120 * 60);
    const worstError = (resolution: number) => {
      const rec = runLayer(model.value, 10, { record: true, resolution }).run.record!;
      let worst = 0;
      let checked = 0;
      for (let s = 1; s < rec.timeS.length; s++) {
        const alpha = rec.conversions[s]![0]!;
        if (alpha < 0.05 || alpha > 0.95) continue;
        const expected = closedFormReducedTime(alpha, kin.k1OverK2) / k2;
        worst = Math.max(worst, Math.abs(rec.timeS[s]! - expected) / expected);
        checked++;
      }
      expect(checked).toBeGreaterThan(20);
      return worst;
    };
    const coarse = worstError(1);
    const fine = worstError(2);
    expect(coarse).toBeLessThan(5e-3);
    expect(fine).toBeLessThan(coarse / 2.5);
  });
});
