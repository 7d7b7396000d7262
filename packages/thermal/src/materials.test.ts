import { describe, expect, it } from 'vitest';
import { checkResinThermal, dgebaAmineDefaults } from './resin-thermal';
import { radiationWPerM2K, upwardPlateConvectionWPerM2K } from './surface';
import { sugarMaple12Pct, woodConductivityWPerMK, woodHeatCapacityJPerGK } from './wood';

describe('wood under the cavity', () => {
  it('heat capacity follows the Wood Handbook equations', () => {
    // Worked example of the chemics library's cp_wood (Wood Handbook 2010 eqs. 4-16 to 4-18): 12 % at 340 K → 1.91 kJ/(kg·K).
    expect(woodHeatCapacityJPerGK(12, 340 - 273.15)).toBeCloseTo(1.91, 2);
    // Dry wood at 20 °C: 0.1031 + 0.003867 × 293.15 = 1.2367.
    expect(woodHeatCapacityJPerGK(0, 20)).toBeCloseTo(1.2367, 4);
  });

  it("conductivity follows eq. 4-15 and lands within the Handbook's 20 % of its tabulated sugar maple", () => {
    // 0.63 × (0.1941 + 0.004064 × 12) + 0.01864 = 0.17165 W/(m·K); Table 4-7 lists 0.18 for sugar maple at 12 %.
    expect(woodConductivityWPerMK(0.63, 12)).toBeCloseTo(0.17165, 5);
    expect(Math.abs(woodConductivityWPerMK(0.63, 12) - sugarMaple12Pct.conductivityWPerMK) / 0.18).toBeLessThan(0.2);
    expect(sugarMaple12Pct.densityGPerMl).toBeCloseTo(0.7056, 4);
  });
});

describe('surface heat transfer', () => {
  it("natural convection from a hot plate facing up, Incropera's correlations", () => {
    // 40 °C surface, 20 °C air, L = 0.05 m, air at 300 K: Ra = 9.80665 × (1/303.15) × 20 × 0.05³ /
    // (15.89e−6 × 22.5e−6) = 2.2620e5 → Nu = 0.54 Ra^¼ = 11.777 → h = 11.777 × 0.0263 / 0.05 = 6.194 W/(m²·K).
    expect(upwardPlateConvectionWPerM2K(40, 20, 0.05)).toBeCloseTo(6.194, 2);
    // Size-free form: h = 0.15 × 0.0263 × (Ra/L³)^⅓ = 0.003945 × (1.8096e9)^⅓ = 4.807 W/(m²·K).
    expect(upwardPlateConvectionWPerM2K(40, 20)).toBeCloseTo(4.807, 2);
    expect(upwardPlateConvectionWPerM2K(20, 20, 0.05)).toBe(0);
  });

  it('radiation coefficient, Incropera eq. 1.9', () => {
    // 0.9 × 5.670374419e−8 × (323.15 + 293.15) × (323.15² + 293.15²) = 5.987 W/(m²·K).
    expect(radiationWPerM2K(50, 20)).toBeCloseTo(5.987, 2);
  });
});

describe('resin system values', () => {
  it('defaults carry the published values', () => {
    // 486 J/g: DGEBA/TETA-based system by DSC (Polímeros, SciELO); Ea inside Barral et al. (1995) 44–57 kJ/mol.
    expect(dgebaAmineDefaults.reactionHeatJPerG).toBe(486);
    expect(dgebaAmineDefaults.activationEnergyKJPerMol).toBeGreaterThanOrEqual(44);
    expect(dgebaAmineDefaults.activationEnergyKJPerMol).toBeLessThanOrEqual(57);
    // Barral et al.: m + n between 2.5 and 3. Flory's gel point for A4 + B2 at stoichiometry: 1/√3.
    expect(dgebaAmineDefaults.kinetics.m + dgebaAmineDefaults.kinetics.n).toBeGreaterThanOrEqual(2.5);
    expect(dgebaAmineDefaults.kinetics.m + dgebaAmineDefaults.kinetics.n).toBeLessThanOrEqual(3);
    expect(dgebaAmineDefaults.kinetics.gelConversion).toBeCloseTo(0.5774, 4);
  });

  it('names every wrong field in a sentence', () => {
    const r = checkResinThermal({ ...dgebaAmineDefaults, gelTimeMin: 0, refTempC: 22, densityGPerMl: Number.NaN });
    if (r.ok) throw new Error('accepted a zero gel time');
    expect(r.error.issues?.map((i) => i.field)).toEqual(['gelTimeMin', 'densityGPerMl']);
    expect(r.error.message).toMatch(/The gel time must be a number above 0/);
  });
});
