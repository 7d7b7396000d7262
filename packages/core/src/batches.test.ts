import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { batchCount } from './batches';

describe('batchCount', () => {
  it('counts cup waste per cup', () => {
    // 3000 g to deliver, 1000 g limit, 20 g waste per cup: 3 cups would be 1020 g each, so 4 cups of 770 g.
    expect(batchCount({ deliveredResinG: 3000, cupWasteResinG: 20, pigmentPct: 0, maxBatchG: 1000 })).toEqual({ ok: true, value: 4 });
    expect(batchCount({ deliveredResinG: 3000, cupWasteResinG: 0, pigmentPct: 0, maxBatchG: 1000 })).toEqual({ ok: true, value: 3 });
  });

  it('counts pigment in the batch mass', () => {
    // 1900 g + 5 % pigment = 1995 g fits one 2000 g cup; 1920 g + 5 % = 2016 g does not.
    expect(batchCount({ deliveredResinG: 1900, cupWasteResinG: 0, pigmentPct: 5, maxBatchG: 2000 })).toEqual({ ok: true, value: 1 });
    expect(batchCount({ deliveredResinG: 1920, cupWasteResinG: 0, pigmentPct: 5, maxBatchG: 2000 })).toEqual({ ok: true, value: 2 });
  });

  it('refuses a cup waste that fills the whole batch', () => {
    const result = batchCount({ deliveredResinG: 100, cupWasteResinG: 600, pigmentPct: 0, maxBatchG: 500 });
    expect(result.ok || result.error.code).toBe('cup_waste_fills_batch');
  });

  it('is the fewest cups that stay under the limit', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 100_000, noNaN: true }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.double({ min: 0, max: 20, noNaN: true }),
        fc.double({ min: 100, max: 5000, noNaN: true }),
        (delivered, waste, pct, max) => {
          const result = batchCount({ deliveredResinG: delivered, cupWasteResinG: waste, pigmentPct: pct, maxBatchG: max });
          if (!result.ok) return false;
          const n = result.value;
          const mass = (k: number) => (delivered / k + waste) * (1 + pct / 100);
          return mass(n) <= max * (1 + 1e-12) && (n === 1 || mass(n - 1) > max);
        },
      ),
    );
  });
});
