import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundGrouped } from './pour-plan-rounding';
import { apportionSteps, roundTree, stepsToAmount } from './rounding';

describe('largest-remainder apportionment', () => {
  it('shares the missing steps by the largest fractions', () => {
    // Hamilton's method, worked by hand: 3.4 + 2.4 + 4.2 = 10 → floors 3, 2, 4 (9), one step left,
    // which goes to the largest fraction (the first 0.4, ties to the earlier part).
    expect(apportionSteps([3.4, 2.4, 4.2], 10)).toEqual([4, 2, 4]);
    expect(apportionSteps([1 / 3, 1 / 3, 1 / 3], 1)).toEqual([1, 0, 0]);
  });

  it('is not thrown off by decimal steps', () => {
    // 0.3 g on a 0.1 g scale is 3 steps, though 0.3 / 0.1 is 2.9999999999999996 in floating point.
    expect(roundTree({ exact: 0.3, children: [{ exact: 0.1 }, { exact: 0.2 }] }, 0.1)).toEqual({
      steps: 3,
      children: [
        { steps: 1, children: [] },
        { steps: 2, children: [] },
      ],
    });
    expect(stepsToAmount(3, 0.1)).toBe(0.3);
  });
});

describe('roundGrouped: shown totals are sums of shown parts, each within one step of exact', () => {
  const amounts = fc.array(fc.array(fc.array(fc.double({ min: 0, max: 5000, noNaN: true }), { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 6 }), {
    minLength: 1,
    maxLength: 8,
  });

  it('holds for random pours', () => {
    fc.assert(
      fc.property(amounts, fc.constantFrom(0.1, 1, 0.01), (groups, step) => {
        const shown = roundGrouped(groups, step);
        const close = (a: number, b: number) => Math.abs(a - b) < 1e-6;
        const within = (rounded: number, exact: number, limit: number) => Math.abs(rounded - exact) < limit * step + 1e-9;
        const exactTotal = groups.flat(2).reduce((a, v) => a + v, 0);
        if (!within(shown.total, exactTotal, 0.5 + 1e-9)) return false;
        if (
          !close(
            shown.total,
            shown.groups.reduce((a, g) => a + g.total, 0),
          )
        )
          return false;
        return shown.groups.every((group, gi) => {
          const exactGroup = groups[gi]!.flat().reduce((a, v) => a + v, 0);
          if (
            !within(group.total, exactGroup, 1) ||
            !close(
              group.total,
              group.batches.reduce((a, b) => a + b.total, 0),
            )
          )
            return false;
          return group.batches.every((batch, bi) => {
            const exactParts = groups[gi]![bi]!;
            const exactBatch = exactParts.reduce((a, v) => a + v, 0);
            return (
              within(batch.total, exactBatch, 1) &&
              close(
                batch.total,
                batch.parts.reduce((a, v) => a + v, 0),
              ) &&
              batch.parts.every((part, pi) => within(part, exactParts[pi]!, 1) && close(part / step, Math.round(part / step)))
            );
          });
        });
      }),
      { numRuns: 300 },
    );
  });
});
