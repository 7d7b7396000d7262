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

  it('weighs out the resin the tray holds, at the data sheets’ ratios and densities', () => {
    const seal = batches.filter((b) => b.pourLabel.startsWith('Seal'));
    const layers = batches.filter((b) => b.pourLabel.startsWith('Layer'));
    // CRC Concise Encyclopedia of Mathematics, right prism: 300 × 200 × 30 mm³ = 1 800 mL, and 5 % over-pour makes
    // 1 890 mL to deliver. Mass = volume × density, volumes adding up (common practice for a resin mix): the resin is
    // 2 : 1 by volume (A 1.16, B 0.97 g/mL, so (2·1.16 + 0.97) / 3 g/mL), and the pigment, 2 % of the resin's mass at
    // 1.3 g/mL, takes its share of the volume. Each cup also holds 5 g of resin left in a scraped cup.
    const resinGPerMl = (2 * 1.16 + 0.97) / 3;
    const deliveredResinG = 1890 / (1 / resinGPerMl + 0.02 / 1.3);
    const resinG = deliveredResinG + 5 * layers.length;
    const deepA = sum(layers.map((b) => b.partAG));
    const deepB = sum(layers.map((b) => b.partBG));
    // Each cup is weighed to the 0.1 g scale and rounded on ratio, which moves a cup by a few tenths of a gram.
    expect(Math.abs(deepA - (resinG * 2 * 1.16) / 3 / resinGPerMl)).toBeLessThan(0.5);
    expect(Math.abs(deepB - (resinG * 0.97) / 3 / resinGPerMl)).toBeLessThan(0.5);
    expect(Math.abs(sum(layers.map((b) => b.pigmentG)) - 0.02 * resinG)).toBeLessThan(0.5);
    // The seal coat is mixed 100 : 45 by weight (its data sheet): every cup in proportion within the scale's step.
    for (const cup of seal) expect(Math.abs(cup.partBG - cup.partAG * 0.45)).toBeLessThanOrEqual(0.1 + 1e-9);
    for (const cup of batches) expect(cup.totalG).toBeCloseTo(cup.partAG + cup.partBG + cup.pigmentG, 6);
  });

  it('names each cup’s product, ratio, pigment and pot life at the shop temperature', () => {
    const [firstSeal, , firstLayer] = batches;
    expect(firstSeal).toMatchObject({ product: { name: 'Bench Seal 3', mixRatio: { a: 100, b: 45, basis: 'weight' } }, pigmentName: null, shopTempC: 20 });
    expect(firstLayer).toMatchObject({ product: { name: 'Bench Deep 20' }, pigmentName: 'Bench Teal', batchInPour: 1, batchesInPour: 1 });
    // One pot life per cup: the plan's own for that cup, its heat counted, never longer than the data sheet's at the shop temperature.
    expect(firstLayer?.potLifeMin).toBe(plan.layers[0]!.batches[0]!.cupPotLifeMin);
    expect(firstLayer!.potLifeMin).toBeLessThanOrEqual(plan.shopTimes.deepPour.potLifeMin);
    expect(firstLayer!.forecastPeakC).toBe(plan.forecast.available ? plan.forecast.layers[0]!.peakC : null);
    expect(firstSeal!.forecastPeakC).toBeNull();
  });

  // CRC Concise Encyclopedia of Mathematics: a right prism fills evenly, so the tray's 30 mm split into n equal
  // layers stands at 30·k/n mm from the floor after layer k.
  it('gives each layer the level its resin stands at, from the cavity floor; seal coats have none', () => {
    const layers = batches.filter((b) => b.pourLabel.startsWith('Layer'));
    const count = plan.layers.length;
    expect(layers.map((b) => b.targetLevelMm)).toEqual(plan.layers.flatMap((layer) => layer.batches.map(() => layer.toLevelMm)));
    layers.forEach((b) => {
      const k = Number(b.pourLabel.split(' ')[1]);
      expect(b.targetLevelMm).toBeCloseTo((30 * k) / count, 9);
    });
    expect(batches.filter((b) => b.pourLabel.startsWith('Seal')).every((b) => b.targetLevelMm === null)).toBe(true);
  });

  it('times each pour from the one before it: coat on coat and the first layer by the seal coat’s window, later layers by the deep pour’s', () => {
    const [coat1, coat2, layer1, layer2] = batches;
    const seal = plan.shopTimes.sealCoat!;
    const deep = plan.shopTimes.deepPour;
    expect(coat1!.window).toBeNull();
    expect(coat2!.window).toEqual({ afterLabel: 'Seal coat 1', opensH: seal.nextLayerOpensH, closesH: seal.nextLayerClosesH });
    expect(layer1!.window).toEqual({ afterLabel: 'Seal coat 2', opensH: seal.nextLayerOpensH, closesH: seal.nextLayerClosesH });
    expect(layer2!.window).toEqual({ afterLabel: 'Layer 1', opensH: deep.nextLayerOpensH, closesH: deep.nextLayerClosesH });
    // Arrhenius scaling stretches both ends alike, so the window keeps the data sheet's 10 h : 24 h proportion; and
    // 2 °C below its 22 °C reference (common practice: Q10 ≈ 2, so about 2^0.2 ≈ 1.15 × longer) it opens after
    // a little more than the sheet's 10 h.
    expect(layer2!.window!.closesH / layer2!.window!.opensH).toBeCloseTo(24 / 10, 9);
    expect(layer2!.window!.opensH).toBeGreaterThan(10.5);
    expect(layer2!.window!.opensH).toBeLessThan(12.5);
  });

  it('names no pigment on a cup without one', () => {
    for (const b of batches) expect(b.pigmentName === null).toBe(b.pigmentG === 0);
    expect(batches.filter((b) => b.pigmentName === null).length).toBeGreaterThan(0);
  });
});
