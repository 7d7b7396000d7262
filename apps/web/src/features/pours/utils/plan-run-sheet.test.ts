import { describe, expect, it } from 'vitest';
import { hasStepAfter, productOfStep, runSheetOf } from './plan-run-sheet';
import { testPlan } from './test-plan';

describe('runSheetOf', () => {
  const saved = testPlan();
  const sheet = runSheetOf(saved);
  if (!sheet.ok) throw new Error(sheet.error.message);
  const cups = sheet.value.cups;

  it('lists every cup of the plan once, in the plan’s batch order', () => {
    const planned = [...(saved.result.sealCoat?.coats.flatMap((c) => c.batches) ?? []), ...saved.result.layers.flatMap((l) => l.batches)];
    expect(cups.map((c) => c.index)).toEqual(planned.map((b) => b.index).sort((a, b) => a - b));
    expect(cups.map((c) => c.order)).toEqual(cups.map((_, i) => i + 1));
  });

  it('puts the seal coat first, then the layers from the floor up', () => {
    expect(cups[0]?.pourLabel).toBe('Seal coat 1');
    expect(cups[0]?.product.name).toBe('Test Seal 5');
    const layerLabels = cups.filter((c) => c.kind === 'layer').map((c) => c.pourLabel);
    expect(layerLabels[0]).toBe('Layer 1');
    expect(layerLabels[layerLabels.length - 1]).toBe('Layer 2');
  });

  it('keeps the plan’s grams, which hold the data sheet’s ratio to within one scale step', () => {
    const seal = cups[0]!;
    // Seal coat ratio 100:45 by weight, as its (invented) data sheet states it; a 1 g scale.
    expect(Math.abs(seal.targetAG * 45 - seal.targetBG * 100)).toBeLessThanOrEqual(100 + 45);
    expect(seal.targetPigmentG).toBe(0);
    expect(seal.pigment).toBeNull();
    const layerCup = cups.find((c) => c.kind === 'layer')!;
    expect(layerCup.pigment?.name).toBe('Test Blue');
    // 2 % pigment of the A+B mass, from the plan's own loading.
    expect(Math.abs(layerCup.targetPigmentG - 0.02 * (layerCup.targetAG + layerCup.targetBG))).toBeLessThanOrEqual(1);
    expect(layerCup.totalG).toBe(layerCup.targetAG + layerCup.targetBG + layerCup.targetPigmentG);
  });

  it('names each cup’s step in the form the API stores with a logged cup: seal_coat:<coat> or layer:<layer>, counted from 1', () => {
    // The form is the stored one (packages/contracts/src/shelf.ts, LotUse.step: "layer:2 or seal_coat:1"); the
    // numbers come from what the sheet shows the person mixing, its "Seal coat 2" or "Layer 1".
    expect(cups.length).toBeGreaterThan(0);
    for (const cup of cups) {
      const [, kind, n] = /^(Seal coat|Layer) (\d+)$/.exec(cup.pourLabel) ?? [];
      expect(cup.stepKey).toBe(`${kind === 'Seal coat' ? 'seal_coat' : 'layer'}:${n}`);
    }
    expect(new Set(cups.filter((c) => c.kind === 'seal_coat').map((c) => c.stepKey))).toEqual(new Set(['seal_coat:1']));
    expect(cups.some((c) => c.stepKey === 'layer:2')).toBe(true);
  });

  it('numbers cups within their pour', () => {
    const layer1 = cups.filter((c) => c.pourLabel === 'Layer 1');
    expect(layer1.map((c) => c.batchInPour)).toEqual(layer1.map((_, i) => i + 1));
    expect(layer1.every((c) => c.batchesInPour === layer1.length)).toBe(true);
  });

  it('attaches the plan’s own cautions about a cup to that cup', () => {
    const batchCautions = saved.result.cautions.filter((c) => c.appliesTo.kind === 'batch');
    expect(batchCautions.length).toBeGreaterThan(0);
    for (const caution of batchCautions) {
      expect(cups.find((c) => c.index === caution.appliesTo.index)?.cautions.map((c) => c.code)).toContain(caution.code);
    }
  });

  it('cures a seal-coat step as the seal-coat product and every other step as the deep pour', () => {
    expect(productOfStep(sheet.value, 'seal_coat:1').name).toBe('Test Seal 5');
    expect(productOfStep(sheet.value, 'layer:2').name).toBe('Test Deep 40');
    expect(productOfStep(sheet.value, null).name).toBe('Test Deep 40');
  });

  it('knows whether a later step is still to pour', () => {
    expect(hasStepAfter(sheet.value, 'seal_coat:1')).toBe(true);
    expect(hasStepAfter(sheet.value, 'layer:1')).toBe(true);
    expect(hasStepAfter(sheet.value, 'layer:2')).toBe(false);
    expect(hasStepAfter(sheet.value, 'layer:9')).toBe(false);
  });

  it('refuses a stored result it cannot read', () => {
    const broken = runSheetOf({ result: { layers: 'none' }, productSnapshot: saved.productSnapshot });
    expect(broken.ok).toBe(false);
    if (!broken.ok) expect(broken.error.code).toBe('plan_unreadable');
  });
});
