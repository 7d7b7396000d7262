import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { mixBatch, mixedDensity, type MixInput } from './mix';
import { parseRatioParts } from './mix-ratio';

// From memory of typical data sheets: liquid epoxy resin (part A) is about 1.16 g/mL and amine
// hardeners (part B) about 0.92–1.05 g/mL. The examples use 1.16 and 0.97.
const resinDensity = 1.16;
const hardenerDensity = 0.97;

function mixed(input: Partial<MixInput> & Pick<MixInput, 'target'>) {
  const result = mixBatch({ ratio: '2:1', basis: 'volume', densityAGPerMl: resinDensity, densityBGPerMl: hardenerDensity, ...input });
  if (!result.ok) throw new Error(result.error.message);
  return result.value;
}

describe('mixBatch worked examples (arithmetic written out)', () => {
  it('300 mL at 2:1 by volume', () => {
    // 300 mL × 2/3 = 200 mL of A = 232 g; 300 mL × 1/3 = 100 mL of B = 97 g; density 329 g / 300 mL.
    const mix = mixed({ target: { volumeMl: 300 } });
    expect(mix.partA.ml).toBeCloseTo(200, 10);
    expect(mix.partA.grams).toBeCloseTo(232, 10);
    expect(mix.partB.ml).toBeCloseTo(100, 10);
    expect(mix.partB.grams).toBeCloseTo(97, 10);
    expect(mix.totalGrams).toBeCloseTo(329, 10);
    expect(mix.mixedDensityGPerMl).toBeCloseTo(329 / 300, 12);
  });

  it('2:1 by volume is not 2:1 by weight', () => {
    // By weight the same cup is 2 × 1.16 : 1 × 0.97 = 2.392 : 1, not 2 : 1.
    const byVolume = mixed({ target: { volumeMl: 300 } });
    expect(byVolume.partA.grams / byVolume.partB.grams).toBeCloseTo(2.392, 3);
    const byWeight = mixed({ target: { volumeMl: 300 }, basis: 'weight' });
    expect(byWeight.partA.grams / byWeight.partB.grams).toBeCloseTo(2, 12);
    expect(byWeight.partA.ml / byWeight.partB.ml).toBeCloseTo(2 / 1.16 / (1 / 0.97), 12);
    expect(byWeight.partA.grams).not.toBeCloseTo(byVolume.partA.grams, 0);
  });

  it('500 g at 100:45 by weight', () => {
    // 500 × 100/145 = 344.827… g of A, 500 × 45/145 = 155.172… g of B.
    const mix = mixed({ target: { massG: 500 }, ratio: '100:45', basis: 'weight' });
    expect(mix.partA.grams).toBeCloseTo(344.8276, 4);
    expect(mix.partB.grams).toBeCloseTo(155.1724, 4);
    expect(mix.partA.ml).toBeCloseTo(344.8276 / 1.16, 3);
    // Volumes add: 500 g over (297.265 + 159.972) mL.
    expect(mix.mixedDensityGPerMl).toBeCloseTo(500 / (344.82759 / 1.16 + 155.17241 / 0.97), 6);
  });

  it('by weight toward a volume: grams per part = V / (a/ρA + b/ρB)', () => {
    // 1:1 by weight, 1000 mL: k = 1000 / (1/1.16 + 1/0.97) = 528.2… g each.
    const k = 1000 / (1 / 1.16 + 1 / 0.97);
    const mix = mixed({ target: { volumeMl: 1000 }, ratio: '1:1', basis: 'weight' });
    expect(mix.partA.grams).toBeCloseTo(k, 9);
    expect(mix.partA.ml + mix.partB.ml).toBeCloseTo(1000, 9);
  });

  it('by volume toward a mass, with pigment on top of the resin mass', () => {
    // 2.5:1 by volume, 700 g of A+B: mL per part = 700 / (2.5·1.16 + 0.97) = 180.878…
    const perPart = 700 / (2.5 * 1.16 + 0.97);
    const mix = mixed({ target: { massG: 700 }, ratio: '2.5:1', pigmentPct: 3 });
    expect(mix.partA.ml).toBeCloseTo(2.5 * perPart, 9);
    expect(mix.partB.ml).toBeCloseTo(perPart, 9);
    // Pigment: 3 % of 700 g = 21 g; totalGrams includes it.
    expect(mix.pigment.grams).toBeCloseTo(21, 10);
    expect(mix.totalGrams).toBeCloseTo(721, 10);
    // Mixed density stays A+B over A+B volume.
    expect(mix.mixedDensityGPerMl).toBeCloseTo(700 / (3.5 * perPart), 10);
  });

  it('mixedDensity matches the density of any mixed batch', () => {
    const mix = mixed({ target: { volumeMl: 123 }, ratio: '100:45', basis: 'weight' });
    expect(mixedDensity({ a: 100, b: 45, basis: 'weight' }, resinDensity, hardenerDensity)).toBeCloseTo(mix.mixedDensityGPerMl, 12);
  });
});

describe('mixBatch refuses bad input with a sentence', () => {
  const cases: [string, Partial<MixInput> & Pick<MixInput, 'target'>, string][] = [
    ['zero volume', { target: { volumeMl: 0 } }, 'volume_not_positive'],
    ['negative mass', { target: { massG: -5 } }, 'mass_not_positive'],
    ['zero density', { target: { volumeMl: 100 }, densityBGPerMl: 0 }, 'density_not_positive'],
    ['ratio 2:0', { target: { volumeMl: 100 }, ratio: '2:0' }, 'ratio_zero_part'],
    ['ratio abc', { target: { volumeMl: 100 }, ratio: 'abc' }, 'ratio_unreadable'],
    ['ratio -1:1', { target: { volumeMl: 100 }, ratio: '-1:1' }, 'ratio_unreadable'],
    ['pigment 120 %', { target: { volumeMl: 100 }, pigmentPct: 120 }, 'pigment_pct_out_of_range'],
    ['pigment -1 %', { target: { volumeMl: 100 }, pigmentPct: -1 }, 'pigment_pct_out_of_range'],
    ['pigment over its max', { target: { volumeMl: 100 }, pigmentPct: 8, pigmentMaxPct: 6 }, 'pigment_over_max'],
  ];
  for (const [name, input, code] of cases) {
    it(name, () => {
      const result = mixBatch({ ratio: '2:1', basis: 'volume', densityAGPerMl: resinDensity, densityBGPerMl: hardenerDensity, ...input });
      expect(result.ok).toBe(false);
      if (!result.ok) {
        expect(result.error.code).toBe(code);
        expect(result.error.message).toMatch(/^[A-Z].*\.$/);
      }
    });
  }

  it('accepts the ratio spellings of data sheets', () => {
    expect(parseRatioParts('2:1')).toEqual({ ok: true, value: { a: 2, b: 1 } });
    expect(parseRatioParts('100:45')).toEqual({ ok: true, value: { a: 100, b: 45 } });
    expect(parseRatioParts(' 2.5 : 1 ')).toEqual({ ok: true, value: { a: 2.5, b: 1 } });
    expect(parseRatioParts('1:1')).toEqual({ ok: true, value: { a: 1, b: 1 } });
  });
});

describe('mixBatch properties', () => {
  const ratioPart = fc.double({ min: 0.1, max: 200, noNaN: true });
  const density = fc.double({ min: 0.7, max: 1.8, noNaN: true });
  const amount = fc.double({ min: 1, max: 50_000, noNaN: true });
  const pigment = fc.double({ min: 0, max: 100, noNaN: true });

  it('by weight, gA/gB equals the ratio and the target is met', () => {
    fc.assert(
      fc.property(ratioPart, ratioPart, density, density, amount, fc.boolean(), pigment, (a, b, rhoA, rhoB, size, byVolumeTarget, pct) => {
        const result = mixBatch({
          target: byVolumeTarget ? { volumeMl: size } : { massG: size },
          ratio: { a, b },
          basis: 'weight',
          densityAGPerMl: rhoA,
          densityBGPerMl: rhoB,
          pigmentPct: pct,
        });
        if (!result.ok) return false;
        const m = result.value;
        // A volume target holds the pigment too (here as dense as the resin, no density being given).
        const reached = byVolumeTarget ? m.partA.ml + m.partB.ml + m.pigmentMl : m.partA.grams + m.partB.grams;
        return (
          Math.abs(m.pigmentMl - m.pigment.grams / m.mixedDensityGPerMl) <= 1e-9 * (m.pigmentMl + 1) &&
          Math.abs(m.partA.grams / m.partB.grams - a / b) <= 1e-9 * (a / b) &&
          Math.abs(reached - size) <= 1e-9 * size &&
          Math.abs(m.totalGrams - (m.partA.grams + m.partB.grams) * (1 + pct / 100)) <= 1e-9 * m.totalGrams
        );
      }),
    );
  });

  it('by volume, mLA/mLB equals the ratio and masses follow the densities', () => {
    fc.assert(
      fc.property(ratioPart, ratioPart, density, density, amount, fc.boolean(), (a, b, rhoA, rhoB, size, byVolumeTarget) => {
        const result = mixBatch({
          target: byVolumeTarget ? { volumeMl: size } : { massG: size },
          ratio: { a, b },
          basis: 'volume',
          densityAGPerMl: rhoA,
          densityBGPerMl: rhoB,
        });
        if (!result.ok) return false;
        const m = result.value;
        const reached = byVolumeTarget ? m.partA.ml + m.partB.ml : m.partA.grams + m.partB.grams;
        return (
          Math.abs(m.partA.ml / m.partB.ml - a / b) <= 1e-9 * (a / b) &&
          Math.abs(m.partA.grams - m.partA.ml * rhoA) <= 1e-9 * m.partA.grams &&
          Math.abs(reached - size) <= 1e-9 * size
        );
      }),
    );
  });

  it("counts the pigment's own volume in a volume target: 6 % of a liquid colourant takes about 6 % of the cup", () => {
    // Volumes add for these mixtures (the assumption every data sheet's mixed-volume figure makes):
    // V = mA/1.16 + mB/0.97 + 0.06·(mA + mB)/1.0 for 1000 mL of a 2:1-by-volume resin with a 1.0 g/mL colourant.
    const mix = mixBatch({
      target: { volumeMl: 1000 },
      ratio: '2:1',
      basis: 'volume',
      densityAGPerMl: 1.16,
      densityBGPerMl: 0.97,
      pigmentPct: 6,
      pigmentDensityGPerMl: 1.0,
    });
    expect(mix.ok).toBe(true);
    if (!mix.ok) return;
    const m = mix.value;
    expect(m.partA.ml + m.partB.ml + m.pigment.grams / 1.0).toBeCloseTo(1000, 9);
    expect(m.pigmentMl).toBeCloseTo(m.pigment.grams, 12);
    // 6 % by mass of resin at 1.0967 g/mL in a 1.0 g/mL colourant: 6.2 % of the cup's volume.
    expect(m.pigmentMl / 1000).toBeCloseTo((0.06 * 1.096667) / (1 + 0.06 * 1.096667), 5);
    const bad = mixBatch({
      target: { volumeMl: 1000 },
      ratio: '2:1',
      basis: 'volume',
      densityAGPerMl: 1.16,
      densityBGPerMl: 0.97,
      pigmentPct: 6,
      pigmentDensityGPerMl: 0,
    });
    expect(bad.ok || bad.error.code).toBe('density_not_positive');
  });
});
