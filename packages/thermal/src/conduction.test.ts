import { erf } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { ambientOf } from './ambient';
import { buildColumnGrid, uniformCells, type Geometry } from './column-grid';
import { runColumn } from './column-run';
import { dgebaAmineKinetics, rateLawFromGelTime } from './kinetics';

// Cured epoxy as an inert solid: 0.2 W/(m·K), 1100 kg/m³ × 1500 J/(kg·K).
const material = { conductivityWPerMK: 0.2, volumetricHeatJPerM3K: 1100 * 1500 };
const kappa = material.conductivityWPerMK / material.volumetricHeatJPerM3K;
const law = rateLawFromGelTime(60, 22, 53, dgebaAmineKinetics);

function conduct(geometry: Geometry, thicknessM: number, cells: number, hWPerM2K: number, airC: number, startC: number, endS: number) {
  const grid = buildColumnGrid(geometry, [{ material, thicknessM, reacting: true, cellsM: uniformCells(thicknessM, cells) }]);
  const run = runColumn({
    grid,
    law,
    reactionHeatJPerM3: 0,
    surfaceH: () => hWPerM2K,
    ambient: ambientOf(airC),
    initialTempC: () => startC,
    initialConversion: 0,
    stepKelvin: 0.1,
    stepConversion: 1,
    maxStepS: 5,
    endS,
    until: 'fixed',
    record: false,
  });
  return { grid, temp: run.finalTempC };
}

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (Math.sign(f(mid)) === Math.sign(f(lo))) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe('conduction alone against analytic solutions', () => {
  it('a semi-infinite solid after a step in surface temperature follows the erf solution', () => {
    // Carslaw & Jaeger §2.5 / Incropera eq. 5.57: (T − Ts)/(Ti − Ts) = erf(x / 2√(κt)); a 150 mm slab
    // is semi-infinite for 30 min (4√(κt) ≈ 59 mm) and h = 10⁷ W/(m²·K) holds the surface at the air's temperature.
    const t = 1800;
    const { grid, temp } = conduct('slab', 0.15, 300, 1e7, 80, 20, t);
    for (const depthMm of [2, 5, 10, 20, 30]) {
      const i = Math.round(depthMm * 2);
      expect(grid.depthM[i]).toBeCloseTo(depthMm / 1000, 12);
      const exact = 80 + (20 - 80) * erf(grid.depthM[i]! / (2 * Math.sqrt(kappa * t)));
      expect(temp[i]).toBeCloseTo(exact, 1);
    }
  });

  it("a plane wall with a convective surface follows Incropera's series solution (Bi = 1)", () => {
    // Incropera §5.5.1, eqs. 5.39–5.42: θ* = Σ Cn·exp(−ζn²·Fo)·cos(ζn·x*), ζn·tan ζn = Bi,
    // Cn = 4 sin ζn / (2ζn + sin 2ζn). The insulated base of the layer is the wall's midplane.
    const L = 0.02;
    const h = 0.2 / L;
    const zetas = [0, 1, 2, 3, 4, 5].map((n) => bisect((z) => z * Math.tan(z) - 1, n * Math.PI + 1e-9, n * Math.PI + Math.PI / 2 - 1e-9));
    // Incropera Table 5.1 for Bi = 1.0 (from memory): ζ1 = 0.8603 rad, C1 = 1.1191.
    expect(zetas[0]).toBeCloseTo(0.8603, 4);
    expect((4 * Math.sin(zetas[0]!)) / (2 * zetas[0]! + Math.sin(2 * zetas[0]!))).toBeCloseTo(1.1191, 4);
    const fo = 0.3;
    const t = (fo * L * L) / kappa;
    const { grid, temp } = conduct('slab', L, 80, h, 80, 20, t);
    for (const i of [0, 20, 40, 60, 80]) {
      const xStar = (L - grid.depthM[i]!) / L;
      const theta = zetas.reduce((s, z) => s + ((4 * Math.sin(z)) / (2 * z + Math.sin(2 * z))) * Math.exp(-z * z * fo) * Math.cos(z * xStar), 0);
      expect(temp[i]).toBeCloseTo(80 + (20 - 80) * theta, 1);
    }
  });

  it("a sphere with a convective surface follows Incropera's series solution (Bi = 1)", () => {
    // Incropera eqs. 5.50–5.52: θ* = Σ Cn·exp(−ζn²·Fo)·sin(ζn r*)/(ζn r*), 1 − ζn cot ζn = Bi,
    // Cn = 4[sin ζn − ζn cos ζn]/(2ζn − sin 2ζn). For Bi = 1, ζ1 = π/2 and C1 = 4/π (Table 5.1: 1.5708, 1.2732).
    const R = 0.03;
    const h = 0.2 / R;
    const zetas = [0, 1, 2, 3, 4, 5].map((n) => bisect((z) => 1 - z / Math.tan(z) - 1, n * Math.PI + 1e-6, (n + 1) * Math.PI - 1e-6));
    expect(zetas[0]).toBeCloseTo(Math.PI / 2, 9);
    const fo = 0.2;
    const t = (fo * R * R) / kappa;
    const { grid, temp } = conduct('sphere', R, 120, h, 80, 20, t);
    for (const i of [0, 30, 60, 90, 120]) {
      const rStar = (R - grid.depthM[i]!) / R;
      const theta = zetas.reduce((s, z) => {
        const c = (4 * (Math.sin(z) - z * Math.cos(z))) / (2 * z - Math.sin(2 * z));
        const shape = rStar === 0 ? 1 : Math.sin(z * rStar) / (z * rStar);
        return s + c * Math.exp(-z * z * fo) * shape;
      }, 0);
      expect(temp[i]).toBeCloseTo(80 + (20 - 80) * theta, 1);
    }
  });
});
