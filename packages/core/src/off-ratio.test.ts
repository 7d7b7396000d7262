import { describe, expect, it } from 'vitest';
import { massRatioAToB } from './mix';
import { offRatioCheck, partBForRatio } from './off-ratio';

describe('a weighed cup against the product ratio', () => {
  it('puts 210 g of A on 100 g of B at 5 % A-rich for a product mixed 2:1 by weight', () => {
    // Worked by hand: the cup holds 210 / 100 = 2.1 parts of A per part of B; the product asks for 2.
    // 2.1 / 2 = 1.05, so the cup carries 5 % more A than the ratio: +5 %.
    const cup = offRatioCheck({ partAG: 210, partBG: 100 }, 2, 3);
    expect(cup?.signedPct).toBeCloseTo(5, 12);
    expect(cup?.pct).toBeCloseTo(5, 12);
    expect(cup?.beyondTolerance).toBe(true);
  });

  it('finds B-rich cups negative and judges a cup at the tolerance as within it', () => {
    // 190 / 100 = 1.9; 1.9 / 2 = 0.95: 5 % short of A, −5 %.
    expect(offRatioCheck({ partAG: 190, partBG: 100 }, 2, 3)?.signedPct).toBeCloseTo(-5, 12);
    // 206 / 100 = 2.06; 2.06 / 2 = 1.03: +3 %, exactly the tolerance. The tolerance is the largest error the shop
    // accepts, so only a larger one is beyond it (the usual reading of "± x %", common practice).
    expect(offRatioCheck({ partAG: 206, partBG: 100 }, 2, 3)?.beyondTolerance).toBe(false);
    expect(offRatioCheck({ partAG: 207, partBG: 100 }, 2, 3)?.beyondTolerance).toBe(true);
  });

  it('catches a 2:1-by-volume product weighed out 2:1 by weight', () => {
    // Densities from memory of typical data sheets: resin about 1.16 g/mL, amine hardener about 0.98 g/mL.
    // By mass the product is 2 × 1.16 : 1 × 0.98 = 2.32 : 0.98, i.e. 2.3673 g of A per g of B.
    // A cup of 400 g : 200 g holds 2 g of A per g of B: 2 / 2.3673 = 0.8448, so 15.52 % short of A.
    const ratio = massRatioAToB({ a: 2, b: 1, basis: 'volume' }, 1.16, 0.98);
    expect(ratio).toBeCloseTo(2.32 / 0.98, 12);
    const cup = offRatioCheck({ partAG: 400, partBG: 200 }, ratio, 3);
    expect(cup?.signedPct).toBeCloseTo(-15.52, 2);
    expect(cup?.beyondTolerance).toBe(true);
    // Weighed to the mass ratio instead (400 g of A on 400 / 2.3673 = 168.97 g of B) it is on ratio.
    expect(offRatioCheck({ partAG: 400, partBG: (400 * 0.98) / 2.32 }, ratio, 3)?.pct).toBeCloseTo(0, 10);
  });

  it('says nothing until both parts are weighed above zero', () => {
    expect(offRatioCheck({ partAG: 210, partBG: 0 }, 2, 3)).toBeNull();
    expect(offRatioCheck({ partAG: Number.NaN, partBG: 100 }, 2, 3)).toBeNull();
    expect(offRatioCheck({ partAG: 210, partBG: 100 }, 0, 3)).toBeNull();
  });

  it('tells the part B that brings the cup back on ratio', () => {
    // 210 g of A at 2 g of A per g of B wants 210 / 2 = 105 g of B.
    expect(partBForRatio(210, 2)).toBeCloseTo(105, 12);
    expect(partBForRatio(0, 2)).toBeNull();
  });
});
