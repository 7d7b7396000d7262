import { fail, ok, type Result } from './result';

export interface BatchCountInput {
  /** A+B that must reach the mould from this pour (a layer or a seal coat). */
  deliveredResinG: number;
  /** A+B left behind in each cup. */
  cupWasteResinG: number;
  pigmentPct: number;
  /** The product's limit for one mixed cup, pigment and cup waste included. */
  maxBatchG: number;
}

/**
 * The fewest equal batches with (delivered/n + waste) × (1 + pigment) ≤ max batch. Every extra cup
 * adds its own waste, so the count comes from the mass each cup can deliver, not from the total.
 */
export function batchCount(input: BatchCountInput): Result<number> {
  const { deliveredResinG, cupWasteResinG, pigmentPct, maxBatchG } = input;
  if (!Number.isFinite(maxBatchG) || maxBatchG <= 0) {
    return fail('max_batch_not_positive', `The product's maximum batch mass must be above zero (in g), got ${String(maxBatchG)}; take it from the data sheet.`);
  }
  const pigmentShare = 1 + pigmentPct / 100;
  const fits = (n: number) => (deliveredResinG / n + cupWasteResinG) * pigmentShare <= maxBatchG * (1 + 1e-12);
  const deliverablePerCupG = maxBatchG / pigmentShare - cupWasteResinG;
  if (deliverablePerCupG <= 0) {
    return fail(
      'cup_waste_fills_batch',
      `The cup-waste allowance (${cupWasteResinG.toFixed(1)} g of resin per cup) leaves nothing of the ${maxBatchG} g maximum batch to pour; lower the allowance.`,
    );
  }
  if (deliveredResinG <= 0) return ok(1);
  let n = Math.max(1, Math.ceil(deliveredResinG / deliverablePerCupG));
  while (n > 1 && fits(n - 1)) n--;
  while (!fits(n)) n++;
  return ok(n);
}
