import { describe, expect, it } from 'vitest';
import { cupPotLife } from './cup-pot-life';
import { dgebaAmineDefaults, type ResinThermal } from './resin-thermal';

// An invented coating-speed system: 40 min gel and 25 min pot life at 25 °C.
const resin: ResinThermal = { ...dgebaAmineDefaults, gelTimeMin: 40, refTempC: 25 };

function potLife(massG: number, ambientC = 25) {
  const r = cupPotLife(resin, { massG, ambientC, sheetPotLifeMin: 25 });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('cup pot life', () => {
  it('is never longer than the data sheet at the same temperature', () => {
    for (const m of [5, 50, 200, 1000]) {
      const p = potLife(m);
      expect(p.potLifeMin).toBeLessThanOrEqual(p.sheetPotLifeAtAmbientMin);
      expect(p.sheetPotLifeAtAmbientMin).toBeCloseTo(25, 9);
    }
    // A cup mixed cold in a warm shop warms slower than a thin film: still capped at the data sheet.
    const cold = cupPotLife(resin, { massG: 100, ambientC: 25, mixTempC: 10, sheetPotLifeMin: 25 });
    if (!cold.ok) throw new Error(cold.error.message);
    expect(cold.value.potLifeMin).toBeLessThanOrEqual(25);
  });

  it('shortens as the cup gets bigger and hotter inside', () => {
    const small = potLife(20);
    const big = potLife(1000);
    expect(big.potLifeMin).toBeLessThan(small.potLifeMin);
    // Both centres get far above the air before the cup as a whole runs out.
    expect(big.peakC).toBeGreaterThan(25 + 20);
    expect(small.peakC).toBeGreaterThan(25 + 20);
    expect(big.limitedBy).toBe('cup_heating');
  });

  it('keeps shortening from 100 g to 1000 g, as the share of the mass near the cooled wall falls', () => {
    // Incropera, Fundamentals of Heat and Mass Transfer, ch. 5 (lumped capacitance): the time constant
    // ρcV/(hA) = ρc·r/(3h) of a sphere grows with its radius, r ∝ m^(1/3), so a heavier cup loses a smaller
    // share of its heat in the same time and, on average, runs hotter and cures sooner. The centre alone
    // would not show it: for r ≳ 3 cm the conduction time r²/α (α ≈ 1.2e−7 m²/s for resin) is hours.
    const masses = [20, 100, 300, 1000, 3000];
    const lives = masses.map((m) => potLife(m).potLifeMin);
    for (let k = 1; k < lives.length; k++) expect(lives[k]!, `${masses[k]} g`).toBeLessThan(lives[k - 1]!);
    // Never longer than the data sheet's at the same temperature.
    for (const life of lives) expect(life).toBeLessThanOrEqual(25);
  });

  it('a few grams of a slow system behave like the thin film of the data sheet', () => {
    const slow = cupPotLife({ ...resin, gelTimeMin: 600 }, { massG: 2, ambientC: 25, sheetPotLifeMin: 240 });
    if (!slow.ok) throw new Error(slow.error.message);
    expect(slow.value.potLifeMin).toBeGreaterThan(0.9 * 240);
    expect(slow.value.potLifeMin).toBeLessThanOrEqual(240);
  });

  it('moves the data sheet pot life with temperature by the Arrhenius law', () => {
    // Common practice: pot life halves per 10 K; Ea = 53 kJ/mol gives exp(−(Ea/R)(1/308.15 − 1/298.15)) ≈ 1.998.
    const warm = potLife(5, 35);
    expect(warm.sheetPotLifeAtAmbientMin).toBeCloseTo(25 / Math.exp((53000 / 8.314462618) * (1 / 298.15 - 1 / 308.15)), 6);
    expect(warm.sheetPotLifeAtAmbientMin).toBeGreaterThan(12);
    expect(warm.sheetPotLifeAtAmbientMin).toBeLessThan(13);
  });

  it('heats the middle of a big cup as an adiabatic mass would: ΔT = ΔH·α / cp', () => {
    // First law for a mass that neither gains nor loses heat (Incropera, Fundamentals of Heat and Mass Transfer, ch. 1,
    // energy balance with generation): cp·dT = ΔH·dα, so the rise is ΔH/cp times the conversion reached. The middle
    // of a 20 kg cup is centimetres from its wall; the heat conducted in or out within one pot life is negligible
    // (r²/α of hours for resin, α ≈ 1.2e−7 m²/s).
    const big = cupPotLife(resin, { massG: 20_000, ambientC: 20, sheetPotLifeMin: 25, sheetPotLifeTempC: 25 });
    if (!big.ok) throw new Error(big.error.message);
    const { centreC, centreConversion } = big.value;
    const adiabaticRiseK = resin.reactionHeatJPerG / resin.heatCapacityJPerGK;
    expect(centreConversion).toBeGreaterThan(0.1);
    expect(centreC - 20).toBeCloseTo(adiabaticRiseK * centreConversion, 0);
    expect(Math.abs(centreC - 20 - adiabaticRiseK * centreConversion) / (adiabaticRiseK * centreConversion)).toBeLessThan(0.01);
    // And never past the full adiabatic rise.
    expect(big.value.peakC - 20).toBeLessThanOrEqual(adiabaticRiseK * (1 + 1e-9));
  });

  it('refuses a cup without mass', () => {
    const r = cupPotLife(resin, { massG: 0, ambientC: 25, sheetPotLifeMin: 25 });
    if (r.ok) throw new Error('accepted an empty cup');
    expect(r.error.message).toMatch(/mass in the cup must be above 0/);
  });
});
