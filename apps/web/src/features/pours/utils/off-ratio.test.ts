import { mixBatch } from '@gelpoint/core';
import { fraction } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { offRatio, partBForRatio } from './off-ratio';

// Reference: mathjs exact fractions evaluate the same common-practice definition,
// |(wA/wB) ÷ (tA/tB) − 1| × 100, without floating-point rounding.
function exactOffRatioPct(wA: number, wB: number, tA: number, tB: number): number {
  const ratio = fraction(wA).div(wB).div(fraction(tA).div(tB));
  return ratio.sub(1).abs().mul(100).valueOf();
}

describe('offRatio', () => {
  it('puts 210 g : 100 g against a 200 g : 100 g target at 5 %', () => {
    const result = offRatio({ partAG: 210, partBG: 100 }, { partAG: 200, partBG: 100 }, 2);
    expect(result?.pct).toBeCloseTo(exactOffRatioPct(210, 100, 200, 100), 12);
    expect(result?.pct).toBeCloseTo(5, 12);
    expect(result?.beyondTolerance).toBe(true);
  });

  it('measures short part B the same way as extra part A', () => {
    // 300:140 against 300:150 (a 2:1 kit): (300/140)/(300/150) = 15/14.
    const result = offRatio({ partAG: 300, partBG: 140 }, { partAG: 300, partBG: 150 }, 5);
    expect(result?.pct).toBeCloseTo(exactOffRatioPct(300, 140, 300, 150), 12);
    expect(result?.beyondTolerance).toBe(true);
    expect(offRatio({ partAG: 300, partBG: 148 }, { partAG: 300, partBG: 150 }, 5)?.beyondTolerance).toBe(false);
  });

  it('finds a cup weighed to the exact grams of a 2:1-by-volume mix on ratio', () => {
    // Densities from memory of typical data sheets: resin about 1.16 g/mL, amine hardener about 0.98 g/mL.
    const mix = mixBatch({ target: { volumeMl: 600 }, ratio: '2:1', basis: 'volume', densityAGPerMl: 1.16, densityBGPerMl: 0.98 });
    if (!mix.ok) throw new Error(mix.error.message);
    const target = { partAG: mix.value.partA.grams, partBG: mix.value.partB.grams };
    expect(offRatio(target, target, 2)?.pct).toBeCloseTo(0, 12);
    // Weighing 2:1 by weight instead of by volume is off by 1 − (2/1)/(2·1.16 / 0.98) ≈ 15.5 %.
    const byWeight = offRatio({ partAG: 400, partBG: 200 }, target, 2);
    expect(byWeight?.pct).toBeCloseTo(exactOffRatioPct(2, 1, 2 * 1.16, 0.98), 9);
    expect(byWeight?.beyondTolerance).toBe(true);
  });

  it('says nothing until both parts are weighed', () => {
    expect(offRatio({ partAG: 210, partBG: 0 }, { partAG: 200, partBG: 100 }, 2)).toBeNull();
    expect(offRatio({ partAG: Number.NaN, partBG: 100 }, { partAG: 200, partBG: 100 }, 2)).toBeNull();
  });

  it('tells how much part B brings the cup back on ratio', () => {
    const b = partBForRatio(210, { partAG: 200, partBG: 100 });
    expect(b).toBeCloseTo(105, 12);
    expect(offRatio({ partAG: 210, partBG: b! }, { partAG: 200, partBG: 100 }, 0.5)?.pct).toBeCloseTo(0, 12);
  });
});
