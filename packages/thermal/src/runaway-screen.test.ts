import { describe, expect, it } from 'vitest';
import { ambientOf } from './ambient';
import { buildColumnGrid, uniformCells } from './column-grid';
import { runColumn } from './column-run';
import type { RateLaw } from './kinetics';

/**
 * Frank-Kamenetskii's runaway screen for a slab (critical δ ≈ 0.88 for the infinite slab, with
 * 2 for the cylinder and 3.32 for the sphere; Boddington, Gray & Harvey, Phil. Trans. R. Soc. A,
 * "Thermal explosions and the disappearance of criticality at small activation energies: exact
 * results for the slab"). δ = (E/RT0²)·q(T0)·a²/k for a slab of half-width a whose faces are held at
 * T0 and whose heat source q does not deplete. Below criticality the steady centre excess θm solves
 * the exact planar solution e^(θm/2) = cosh(√(δ·e^θm / 2)) (Frank-Kamenetskii's closed form).
 * A layer with an insulated base is the half of such a slab; a zero-order law (m = n = 0) with
 * very little conversion over the run stands for "no depletion".
 */
const t0C = 20;
const t0K = t0C + 273.15;
const activationTempK = 53_000 / 8.314462618;
const thetaPerK = activationTempK / (t0K * t0K);
const halfWidthM = 0.01;
const material = { conductivityWPerMK: 0.2, volumetricHeatJPerM3K: 1100 * 1500 };
const rateAtT0 = 1e-7;
const law: RateLaw = { kinetics: { m: 0, n: 0, k1OverK2: 1, gelConversion: 0.5 }, k2RefPerS: rateAtT0 / 2, refTempK: t0K, activationTempK };

function centreExcess(delta: number): { theta: number; maxConversion: number } {
  const heat = (delta * material.conductivityWPerMK) / (thetaPerK * rateAtT0 * halfWidthM ** 2);
  const grid = buildColumnGrid('slab', [{ material, thicknessM: halfWidthM, reacting: true, cellsM: uniformCells(halfWidthM, 40) }]);
  const conductionTimeS = halfWidthM ** 2 / (material.conductivityWPerMK / material.volumetricHeatJPerM3K);
  const run = runColumn({
    grid,
    law,
    reactionHeatJPerM3: heat,
    surfaceH: () => 1e7,
    ambient: ambientOf(t0C),
    initialTempC: () => t0C,
    initialConversion: 0,
    stepKelvin: 0.1,
    stepConversion: 0.01,
    maxStepS: 20,
    endS: 20 * conductionTimeS,
    until: 'fixed',
    record: false,
    stopAboveC: t0C + 6 / thetaPerK,
  });
  return { theta: (run.peakC - t0C) * thetaPerK, maxConversion: Math.max(...run.finalConversion) };
}

function exactCentreExcess(delta: number): number {
  // Lower (stable) branch: θm between 0 and the critical 1.1868 of the slab.
  let lo = 0;
  let hi = 1.1868;
  const f = (t: number) => Math.exp(t / 2) - Math.cosh(Math.sqrt((delta * Math.exp(t)) / 2));
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (f(mid) > 0) hi = mid;
    else lo = mid;
  }
  return (lo + hi) / 2;
}

describe('Frank-Kamenetskii runaway screen (slab, δc ≈ 0.88)', () => {
  it('below δc the layer settles at the steady excess of the exact slab solution', () => {
    for (const delta of [0.4, 0.75]) {
      const run = centreExcess(delta);
      expect(run.maxConversion).toBeLessThan(0.02);
      // The model keeps the full Arrhenius law where Frank-Kamenetskii linearises its exponent: a few per cent apart.
      expect(Math.abs(run.theta - exactCentreExcess(delta)) / exactCentreExcess(delta)).toBeLessThan(0.06);
    }
  });

  it('above δc it runs away', () => {
    const run = centreExcess(1.05);
    expect(run.theta).toBeGreaterThan(6);
  });
});
