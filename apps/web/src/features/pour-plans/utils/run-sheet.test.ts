import { describe, expect, it } from 'vitest';
import { savedTrayPlan } from './plan-fixture';
import { runSheetBatches } from './run-sheet';
import { readSavedPlan } from './saved-plan';

function sheet() {
  const read = readSavedPlan(savedTrayPlan());
  if (!read.ok) throw new Error(read.error.message);
  return { ...read.value, batches: runSheetBatches(read.value.plan, read.value.snapshot) };
}

const sum = (values: number[]) => Math.round(values.reduce((a, v) => a + v, 0) * 100) / 100;

describe('runSheetBatches', () => {
  const { plan, batches } = sheet();

  it('mixes the seal coats first, then the layers from the floor up, numbered in that order', () => {
    expect(batches.map((b) => b.pourLabel)).toEqual(['Seal coat 1', 'Seal coat 2', 'Layer 1', 'Layer 2']);
    expect(batches.map((b) => b.order)).toEqual([1, 2, 3, 4]);
    expect(batches.every((b) => b.of === 4)).toBe(true);
  });

  // Reference: core's plan totals; the sheet must weigh out exactly what the plan adds up to.
  it('weighs out exactly the plan’s totals', () => {
    const seal = batches.filter((b) => b.pourLabel.startsWith('Seal'));
    const layers = batches.filter((b) => b.pourLabel.startsWith('Layer'));
    expect(sum(seal.map((b) => b.totalG))).toBe(plan.sealCoat?.totals.totalGrams);
    expect(sum(layers.map((b) => b.partAG))).toBe(plan.deepPour.totals.partA.grams);
    expect(sum(layers.map((b) => b.partBG))).toBe(plan.deepPour.totals.partB.grams);
    expect(sum(layers.map((b) => b.pigmentG))).toBe(plan.deepPour.totals.pigment.grams);
  });

  it('names each cup’s product, ratio, pigment and pot life at the shop temperature', () => {
    const [firstSeal, , firstLayer] = batches;
    expect(firstSeal).toMatchObject({ product: { name: 'Bench Seal 3', mixRatio: { a: 100, b: 45, basis: 'weight' } }, pigmentName: null, shopTempC: 20 });
    expect(firstLayer).toMatchObject({ product: { name: 'Bench Deep 20' }, pigmentName: 'Bench Teal', batchInPour: 1, batchesInPour: 1 });
    expect(firstLayer?.potLifeMin).toBe(plan.shopTimes.deepPour.potLifeMin);
    // Common practice (Q10 ≈ 2): two degrees below the 22 °C reference the pot life is a little longer, not shorter.
    expect(firstLayer!.potLifeMin).toBeGreaterThan(40);
  });
});
