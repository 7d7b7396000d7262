import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundCupOnRatio } from './cup-rounding';
import { offRatioPct } from './off-ratio';

describe('cups rounded to the scale on the product ratio', () => {
  it('keeps a small 100:45 seal-coat cup near its ratio on a 1 g scale', () => {
    // Exact 16.6 g A and 7.47 g B (100:45 by weight). Rounding each on its own shows 17 / 7: 17/7 ÷ (100/45) − 1 = +9.3 %.
    expect((17 / 7 / (100 / 45) - 1) * 100).toBeCloseTo(9.29, 2);
    const cup = roundCupOnRatio(16.6, 16.6 * 0.45, 0, 1);
    // B to 8 g and A = 8 × 100/45 = 17.8 → 18 g: 18/8 ÷ (100/45) − 1 = +1.25 %, nearer than 7 g B with 16 g A (+2.9 %).
    expect([cup.aG, cup.bG]).toEqual([18, 8]);
    expect(cup.ratioErrorPct).toBeCloseTo((18 / 8 / (100 / 45) - 1) * 100, 10);
    expect(cup.ratioErrorPct).toBeCloseTo(1.25, 10);
  });

  it('on many random cups, errs no more than half a step of the larger part, and never leaves a part empty (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 3000, noNaN: true }),
        fc.double({ min: 0.05, max: 20, noNaN: true }),
        fc.constantFrom(0.1 as const, 1 as const),
        fc.double({ min: 0, max: 6, noNaN: true }),
        (bG, ratio, step, pigmentPct) => {
          const aG = bG * ratio;
          const cup = roundCupOnRatio(aG, bG, pigmentPct, step);
          const onGrid = (x: number) => Math.abs(x / step - Math.round(x / step)) < 1e-9;
          expect([cup.aG, cup.bG, cup.pigmentG].every(onGrid)).toBe(true);
          expect(cup.aG).toBeGreaterThan(0);
          expect(cup.bG).toBeGreaterThan(0);
          // Definition of the error: shown A:B over the product's A:B, less one.
          expect(cup.ratioErrorPct).toBeCloseTo((cup.aG / cup.bG / ratio - 1) * 100, 9);
          // The larger part is the smaller shown part times the ratio, rounded to the nearest step.
          const larger = Math.max(cup.aG, cup.bG);
          expect(Math.abs(cup.ratioErrorPct)).toBeLessThanOrEqual((100 * (step / 2)) / (larger - step / 2) + 1e-9);
          // The smaller part is within one step of its exact mass (or one step, when smaller than that).
          const smallerExact = Math.min(aG, bG);
          expect(Math.abs(Math.min(cup.aG, cup.bG) - smallerExact)).toBeLessThanOrEqual(Math.max(step, step - smallerExact) + 1e-9);
        },
      ),
      { numRuns: 2000 },
    );
  });

  it("signs a weighed cup's error against the product ratio, not the rounded targets", () => {
    // 17 g A with 7 g B for a 100:45 product is 9.3 % A-rich, though those are the amounts a naive rounding prints.
    expect(offRatioPct(17, 7, 100 / 45)).toBeCloseTo(9.29, 2);
    expect(offRatioPct(100, 45, 100 / 45)).toBeCloseTo(0, 12);
    expect(offRatioPct(90, 45, 100 / 45)).toBeCloseTo(-10, 10);
  });
});
