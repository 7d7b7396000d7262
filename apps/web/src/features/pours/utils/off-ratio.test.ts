import { massRatioAToB, mixBatch } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { offRatio, partBForRatio } from './off-ratio';

describe('offRatio against the product ratio', () => {
  it('puts 210 g : 100 g of a 2:1-by-weight product at 5 % A-rich', () => {
    // 210/100 = 2.1 parts of A per part of B, where the data sheet asks for 2: 2.1/2 − 1 = 5 %.
    const result = offRatio({ partAG: 210, partBG: 100 }, 2, 2);
    expect(result?.pct).toBeCloseTo(5, 12);
    expect(result?.beyondTolerance).toBe(true);
    expect(offRatio({ partAG: 201, partBG: 100 }, 2, 2)?.beyondTolerance).toBe(false);
  });

  it('checks 17 g : 7 g of a 100:45 product against the product, not against rounded targets of 17 and 7', () => {
    // 17/7 = 2.4286 against 100/45 = 2.2222: 9.3 % off, though those are the grams a rounding of both parts prints.
    expect(offRatio({ partAG: 17, partBG: 7 }, 100 / 45, 3)?.pct).toBeCloseTo(9.29, 2);
  });

  it('finds a cup weighed to the exact grams of a 2:1-by-volume mix on ratio', () => {
    // Densities from memory of typical data sheets: resin about 1.16 g/mL, amine hardener about 0.98 g/mL.
    const mix = mixBatch({ target: { volumeMl: 600 }, ratio: '2:1', basis: 'volume', densityAGPerMl: 1.16, densityBGPerMl: 0.98 });
    if (!mix.ok) throw new Error(mix.error.message);
    const ratio = massRatioAToB({ a: 2, b: 1, basis: 'volume' }, 1.16, 0.98);
    expect(offRatio({ partAG: mix.value.partA.grams, partBG: mix.value.partB.grams }, ratio, 2)?.pct).toBeCloseTo(0, 12);
    // Weighing 2:1 by weight instead of by volume: 2 / (2·1.16/0.98) = 0.8448, 15.5 % short of part A.
    const byWeight = offRatio({ partAG: 400, partBG: 200 }, ratio, 2);
    expect(byWeight?.pct).toBeCloseTo(15.52, 2);
    expect(byWeight?.beyondTolerance).toBe(true);
  });

  it('says nothing until both parts are weighed', () => {
    expect(offRatio({ partAG: 210, partBG: 0 }, 2, 2)).toBeNull();
    expect(offRatio({ partAG: Number.NaN, partBG: 100 }, 2, 2)).toBeNull();
  });

  it('tells how much part B brings the cup back on ratio', () => {
    const b = partBForRatio(210, 2);
    expect(b).toBeCloseTo(105, 12);
    expect(offRatio({ partAG: 210, partBG: b! }, 2, 0.5)?.pct).toBeCloseTo(0, 12);
  });
});
