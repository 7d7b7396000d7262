import { batchCount } from './batches';
import { roundCupOnRatio } from './cup-rounding';
import { defaultOffRatioTolerancePct } from './off-ratio';
import { timesAtTemperature } from './cure-model';
import { woodCost } from './cost';
import { splitIntoLayers, type LayerSlice } from './layers';
import { checkPigmentPct, massRatioAToB, mixBatch, mixedDensity, resinMassForVolume, type MixResult } from './mix';
import { pourPlanCautions } from './pour-plan-cautions';
import { cupPotLifeOf, forecastMaxLayer, forecastPlanLayers, planForecastOf, unavailable, type PlanForecast } from './plan-exotherm';
import { groupedTree, readGroupedTree, roundGrouped, type GroupedAmounts, type RoundedGroups } from './pour-plan-rounding';
import type { CostTotals, CupWaste, LayerPlan, PartTotals, PlannedBatch, PourPlan, PourPlanInput, SealCoatPlan } from './pour-plan-types';
import { fail, ok, type Result } from './result';
import { roundTree, stepsToAmount } from './rounding';
import { sealCoatVolume } from './seal-coat';
import { pigmentPricePerG, resinPricePerG, validatePigment, validateResinSystem, type ResinSystem } from './shelf';
import type { ScaleResolutionG } from './unit-format';
import { mm3ToMl } from './units';

export * from './pour-plan-types';

export const mlStep = 0.1;
export const costStep = 0.01;

interface ExactBatch {
  mix: MixResult;
  pour: PlannedBatch['pour'];
}

function planProduct(product: ResinSystem, label: string): Result<ResinSystem> {
  const checked = validateResinSystem(product);
  if (!checked.ok) return fail(checked.error.code, `${label}: ${checked.error.message}`, checked.error.issues);
  return checked;
}

function cupWasteResinG(cupWaste: CupWaste, densityGPerMl: number): number {
  return 'massG' in cupWaste ? cupWaste.massG : cupWaste.volumeMl * densityGPerMl;
}

/**
 * Splits one pour (a layer or a coat) into its fewest equal batches and mixes each exactly. The
 * pour's volume holds the pigment too, so the resin it needs is less by the pigment's own volume.
 */
function exactBatches(
  product: ResinSystem,
  pourMl: number,
  cupWaste: CupWaste,
  pigment: { pct: number; densityGPerMl?: number | undefined },
  scaleResolutionG: ScaleResolutionG,
  pour: (b: number) => PlannedBatch['pour'],
): Result<ExactBatch[]> {
  const density = mixedDensity(product.mixRatio, product.densityAGPerMl, product.densityBGPerMl);
  const wasteG = cupWasteResinG(cupWaste, density);
  const deliveredResinG = resinMassForVolume(pourMl, density, pigment.pct, pigment.densityGPerMl);
  // Rounding a cup on ratio can add up to about (2 + larger/smaller) scale steps; the cup must stay under the limit as shown.
  const ratio = massRatioAToB(product.mixRatio, product.densityAGPerMl, product.densityBGPerMl);
  const roundingG = scaleResolutionG * (2 + Math.max(ratio, 1 / ratio)) * (1 + pigment.pct / 100);
  const count = batchCount({
    deliveredResinG,
    cupWasteResinG: wasteG,
    pigmentPct: pigment.pct,
    maxBatchG: Math.max(product.maxBatchG - roundingG, product.maxBatchG / 2),
  });
  if (!count.ok) return fail(count.error.code, `${product.name}: ${count.error.message}`);
  const mix = mixBatch({
    target: { massG: deliveredResinG / count.value + wasteG },
    ratio: product.mixRatio,
    basis: product.mixRatio.basis,
    densityAGPerMl: product.densityAGPerMl,
    densityBGPerMl: product.densityBGPerMl,
    pigmentPct: pigment.pct,
    ...(pigment.densityGPerMl === undefined ? {} : { pigmentDensityGPerMl: pigment.densityGPerMl }),
  });
  if (!mix.ok) return mix;
  return ok(Array.from({ length: count.value }, (_, b) => ({ mix: mix.value, pour: pour(b) })));
}

function millilitres(groups: ExactBatch[][]): GroupedAmounts {
  return groups.map((batches) => batches.map(({ mix }) => [mix.partA.ml, mix.partB.ml]));
}

function partTotals(g: { total: number; parts: number[] }, ml: { parts: number[]; total: number }): PartTotals {
  return {
    partA: { grams: g.parts[0]!, ml: ml.parts[0]! },
    partB: { grams: g.parts[1]!, ml: ml.parts[1]! },
    pigment: { grams: g.parts[2]! },
    totalGrams: g.total,
  };
}

/** Totals as sums of the shown amounts one level down, never rounded on their own. */
function addTotals(rows: PartTotals[]): PartTotals {
  const add = (pick: (row: PartTotals) => number) => tidy(rows.reduce((acc, row) => acc + pick(row), 0));
  return {
    partA: { grams: add((r) => r.partA.grams), ml: add((r) => r.partA.ml) },
    partB: { grams: add((r) => r.partB.grams), ml: add((r) => r.partB.ml) },
    pigment: { grams: add((r) => r.pigment.grams) },
    totalGrams: add((r) => r.totalGrams),
  };
}

/**
 * The shown grams and mL of every batch, with group and pour totals that are their sums. Grams are
 * rounded cup by cup on the product's ratio (see cup-rounding.ts); mL share the pour's rounded total.
 */
function shownAmounts(groups: ExactBatch[][], scaleResolutionG: ScaleResolutionG, pigmentPct: (gi: number) => number) {
  const ml = roundGrouped(millilitres(groups), mlStep);
  const shownGroups = groups.map((group, gi) => {
    const batches = group.map(({ mix }, bi) => {
      const cup = roundCupOnRatio(mix.partA.grams, mix.partB.grams, pigmentPct(gi), scaleResolutionG);
      const total = tidy(cup.aG + cup.bG + cup.pigmentG);
      return { ...partTotals({ total, parts: [cup.aG, cup.bG, cup.pigmentG] }, ml.groups[gi]!.batches[bi]!), ratioErrorPct: cup.ratioErrorPct };
    });
    return { batches, totals: addTotals(batches) };
  });
  return { groups: shownGroups, overall: addTotals(shownGroups.map((group) => group.totals)) };
}

// Sums of numbers on a 0.1 grid pick up float tails; shown amounts never have more than two decimals.
function tidy(x: number): number {
  return Math.round(x * 100) / 100;
}

function costOfBatch(batch: PartTotals, resinPerG: number, pigmentPerG: number): number[] {
  return [(batch.partA.grams + batch.partB.grams) * resinPerG, batch.pigment.grams * pigmentPerG];
}

function costTotals(parts: number[]): CostTotals {
  return { resin: parts[0]!, pigment: parts[1] ?? 0, total: tidy(parts.reduce((a, v) => a + v, 0)) };
}

function sumCosts(rows: CostTotals[]): CostTotals {
  return {
    resin: tidy(rows.reduce((a, r) => a + r.resin, 0)),
    pigment: tidy(rows.reduce((a, r) => a + r.pigment, 0)),
    total: tidy(rows.reduce((a, r) => a + r.total, 0)),
  };
}

function groupCosts(rounded: RoundedGroups): { batches: CostTotals[]; group: CostTotals }[] {
  return rounded.groups.map((group) => {
    const batches = group.batches.map((b) => costTotals(b.parts));
    return { batches, group: sumCosts(batches) };
  });
}

// Each extra layer is one more whole-mould forecast; past this many the split stays and the layers say they are over.
const extraLayersTried = 4;

/**
 * The layers: the fewest equal ones no thicker than the data sheet allows nor than the forecast keeps
 * under the accepted peak at the shop's temperature, then one more while any layer (on the cured ones
 * below, at the mould's deepest spot) is forecast over it. The forecast only ever makes layers thinner.
 */
function layersUnderForecast(input: PourPlanInput, deep: ResinSystem): Result<{ slices: Result<LayerSlice[]> & { ok: true }; forecast: PlanForecast }> {
  const split = (maxLayerMm: number) =>
    splitIntoLayers({
      curve: input.cavity.curve,
      fillLevelMm: input.fillLevelMm,
      maxLayerMm,
      ...(input.cavity.maxDepthMm === undefined ? {} : { maxDepthMm: input.cavity.maxDepthMm }),
    });
  const sheetSplit = split(deep.maxLayerMm);
  if (!sheetSplit.ok) return sheetSplit;
  const max = forecastMaxLayer(deep, input.shopTempC);
  if (!max.ok) return ok({ slices: sheetSplit, forecast: unavailable(max.error.code, max.error.message) });
  let slices = max.value.maxLayerMm < deep.maxLayerMm ? split(max.value.maxLayerMm) : sheetSplit;
  if (!slices.ok) return slices;
  for (let extra = 0; ; extra++) {
    const layers = forecastPlanLayers(deep, {
      slices: slices.value,
      fillLevelMm: input.fillLevelMm,
      shopTempC: input.shopTempC,
      depthMap: input.cavity.depthMap,
    });
    if (!layers.ok) return ok({ slices, forecast: unavailable(layers.error.code, layers.error.message) });
    if (!layers.value.layers.some((l) => l.overLimit) || extra >= extraLayersTried) {
      return ok({ slices, forecast: planForecastOf(deep, input.shopTempC, max.value, layers.value) });
    }
    const first = slices.value[0]!;
    const heightMm = slices.value.at(-1)!.toLevelMm - first.fromLevelMm;
    const thinner = split(heightMm / (slices.value.length + 1));
    if (!thinner.ok) return thinner;
    slices = thinner;
  }
}

export function buildPourPlan(input: PourPlanInput): Result<PourPlan> {
  const deepProduct = planProduct(input.deepPour.product, 'Deep-pour product');
  if (!deepProduct.ok) return deepProduct;
  const deep = deepProduct.value;
  const sealProduct = input.sealCoat ? planProduct(input.sealCoat.product, 'Seal-coat product') : null;
  if (sealProduct && !sealProduct.ok) return sealProduct;
  const pigmentChoice = input.deepPour.pigment;
  if (pigmentChoice) {
    const pigment = validatePigment(pigmentChoice.pigment);
    if (!pigment.ok) return pigment;
  }
  const pigmentPct = checkPigmentPct(pigmentChoice?.pct ?? 0);
  if (!pigmentPct.ok) return pigmentPct;
  if (!Number.isFinite(input.overPourPct) || input.overPourPct < 0 || input.overPourPct > 100) {
    return fail(
      'over_pour_out_of_range',
      `The over-pour margin must be between 0 and 100 % of the fill, got ${String(input.overPourPct)}; a few percent is usual.`,
    );
  }
  const wasteAmount = 'massG' in input.cupWaste ? input.cupWaste.massG : input.cupWaste.volumeMl;
  if (!Number.isFinite(wasteAmount) || wasteAmount < 0) {
    return fail('cup_waste_negative', `The cup-waste allowance must be zero or more, got ${String(wasteAmount)}; weigh what a scraped cup still holds.`);
  }
  if (input.scaleResolutionG !== 0.1 && input.scaleResolutionG !== 1) {
    return fail('scale_resolution_unknown', `The scale resolution must be 0.1 g or 1 g, got ${String(input.scaleResolutionG)}.`);
  }
  if (!Number.isFinite(input.shopTempC)) return fail('temperature_invalid', `The shop temperature must be a number in °C, got ${String(input.shopTempC)}.`);

  const layered = layersUnderForecast(input, deep);
  if (!layered.ok) return layered;
  const { slices, forecast } = layered.value;

  // Seal coat: one pour per coat, since each coat is mixed once the one before is tacky.
  const sealGroups: ExactBatch[][] = [];
  let sealVolumeMl = 0;
  let sealPerCoatMl = 0;
  if (input.sealCoat && sealProduct?.ok) {
    const volume = sealCoatVolume({ wettedAreaMm2: input.cavity.wettedAreaMm2, ...input.sealCoat });
    if (!volume.ok) return volume;
    sealVolumeMl = volume.value.totalMl;
    sealPerCoatMl = volume.value.perCoatMl;
    for (let coat = 0; coat < input.sealCoat.coats; coat++) {
      const batches = exactBatches(sealProduct.value, sealPerCoatMl, input.cupWaste, { pct: 0 }, input.scaleResolutionG, () => ({ kind: 'seal_coat', coat }));
      if (!batches.ok) return batches;
      sealGroups.push(batches.value);
    }
  }

  const layerVolumes = slices.value.map((slice) => {
    const fillVolumeMl = mm3ToMl(slice.fillVolumeMm3);
    const overPourMl = (fillVolumeMl * input.overPourPct) / 100;
    return { fillVolumeMl, overPourMl, pourVolumeMl: fillVolumeMl + overPourMl };
  });
  const layerGroups: ExactBatch[][] = [];
  for (let layer = 0; layer < slices.value.length; layer++) {
    const batches = exactBatches(
      deep,
      layerVolumes[layer]!.pourVolumeMl,
      input.cupWaste,
      { pct: pigmentPct.value, densityGPerMl: pigmentChoice?.pigment.densityGPerMl },
      input.scaleResolutionG,
      () => ({ kind: 'layer', layer }),
    );
    if (!batches.ok) return batches;
    layerGroups.push(batches.value);
  }

  const sealShown = shownAmounts(sealGroups, input.scaleResolutionG, () => 0);
  const deepShown = shownAmounts(layerGroups, input.scaleResolutionG, () => pigmentPct.value);

  const sealResinPerG = sealProduct?.ok ? resinPricePerG(sealProduct.value) : 0;
  const deepResinPerG = resinPricePerG(deep);
  const pigmentPerG = pigmentChoice ? pigmentPricePerG(pigmentChoice.pigment) : 0;
  const sealCostAmounts = sealShown.groups.map((g) => g.batches.map((b) => costOfBatch(b, sealResinPerG, 0)));
  const deepCostAmounts = deepShown.groups.map((g) => g.batches.map((b) => costOfBatch(b, deepResinPerG, pigmentPerG)));
  const wood = input.wood ? woodCost(input.wood) : null;
  if (wood && !wood.ok) return wood;
  const sealCostTree = groupedTree(sealCostAmounts);
  const deepCostTree = groupedTree(deepCostAmounts);
  const woodExact = wood?.ok ? wood.value.cost : 0;
  const pieceCost = roundTree(
    { exact: sealCostTree.exact + deepCostTree.exact + woodExact, children: [sealCostTree, deepCostTree, { exact: woodExact }] },
    costStep,
  );
  const sealCosts = groupCosts(readGroupedTree(pieceCost.children[0]!, costStep));
  const deepCosts = groupCosts(readGroupedTree(pieceCost.children[1]!, costStep));
  const woodShown = stepsToAmount(pieceCost.children[2]!.steps, costStep);

  let nextIndex = 0;
  // The cups of one pour weigh the same, so each product and mass is worked out once.
  const cupPotLives = new Map<string, ReturnType<typeof cupPotLifeOf>>();
  const cupPotLife = (product: ResinSystem, resinG: number) => {
    const key = `${product.name}|${resinG}`;
    let known = cupPotLives.get(key);
    if (!known) {
      known = cupPotLifeOf(product, resinG, input.shopTempC);
      cupPotLives.set(key, known);
    }
    return known;
  };
  const planBatch = (exact: ExactBatch, shown: PartTotals & { ratioErrorPct: number }, cost: CostTotals): PlannedBatch => {
    const product = exact.pour.kind === 'seal_coat' && sealProduct?.ok ? sealProduct.value : deep;
    const cup = cupPotLife(product, shown.partA.grams + shown.partB.grams);
    return {
      ...shown,
      mixedDensityGPerMl: exact.mix.mixedDensityGPerMl,
      pigmentMl: exact.mix.pigmentMl,
      index: nextIndex++,
      pour: exact.pour,
      cost,
      cupPotLifeMin: cup.potLifeMin,
      cupPotLifeLimitedBy: cup.limitedBy,
    };
  };

  const sealCoat: SealCoatPlan | null =
    input.sealCoat && sealProduct?.ok
      ? {
          productName: sealProduct.value.name,
          wettedAreaMm2: input.cavity.wettedAreaMm2,
          filmThicknessMm: input.sealCoat.filmThicknessMm,
          absorptionFactor: input.sealCoat.absorptionFactor,
          volumeMl: sealVolumeMl,
          coats: sealGroups.map((group, coat) => ({
            index: coat,
            volumeMl: sealPerCoatMl,
            batches: group.map((exact, b) => planBatch(exact, sealShown.groups[coat]!.batches[b]!, sealCosts[coat]!.batches[b]!)),
            totals: sealShown.groups[coat]!.totals,
            cost: sealCosts[coat]!.group,
          })),
          totals: sealShown.overall,
          cost: sumCosts(sealCosts.map((c) => c.group)),
        }
      : null;

  const layers: LayerPlan[] = slices.value.map((slice, layer) => {
    const { fillVolumeMm3: _volume, ...levels } = slice;
    return {
      ...levels,
      ...layerVolumes[layer]!,
      batches: layerGroups[layer]!.map((exact, b) => planBatch(exact, deepShown.groups[layer]!.batches[b]!, deepCosts[layer]!.batches[b]!)),
      totals: deepShown.groups[layer]!.totals,
      cost: deepCosts[layer]!.group,
    };
  });

  const deepCostTotal = sumCosts(deepCosts.map((c) => c.group));
  const sealCostTotal = sealCoat?.cost ?? { resin: 0, pigment: 0, total: 0 };
  const fillVolumeMl = layerVolumes.reduce((a, l) => a + l.fillVolumeMl, 0);
  const overPourMl = layerVolumes.reduce((a, l) => a + l.overPourMl, 0);
  const batchTotal = sealGroups.flat().length + layerGroups.flat().length;
  const deepDensity = mixedDensity(deep.mixRatio, deep.densityAGPerMl, deep.densityBGPerMl);
  const sealDensity = sealProduct?.ok
    ? mixedDensity(sealProduct.value.mixRatio, sealProduct.value.densityAGPerMl, sealProduct.value.densityBGPerMl)
    : deepDensity;
  const wasteResinG =
    sealGroups.flat().length * cupWasteResinG(input.cupWaste, sealDensity) + layerGroups.flat().length * cupWasteResinG(input.cupWaste, deepDensity);

  const plan: PourPlan = {
    margins: {
      overPour: { label: 'Over-pour margin', pct: input.overPourPct, volumeMl: overPourMl },
      cupWaste: { label: 'Cup waste per batch', perBatch: input.cupWaste, batches: batchTotal, resinG: wasteResinG },
    },
    resolution: { grams: input.scaleResolutionG, ml: mlStep, cost: costStep, offRatioTolerancePct: input.offRatioTolerancePct ?? defaultOffRatioTolerancePct },
    fill: {
      fillLevelMm: input.fillLevelMm,
      fillVolumeMl,
      pourVolumeMl: fillVolumeMl + overPourMl,
      layerCount: slices.value.length,
      layerThicknessMm: slices.value[0]!.thicknessMm,
      deepestResinMm: Math.max(...slices.value.map((s) => s.deepestResinMm)),
    },
    sealCoat,
    layers,
    deepPour: {
      productName: deep.name,
      pigmentName: pigmentChoice?.pigment.name ?? null,
      pigmentPct: pigmentPct.value,
      totals: deepShown.overall,
      cost: deepCostTotal,
    },
    cost: {
      sealCoat: sealCostTotal.total,
      deepPour: deepCostTotal.total,
      wood: wood?.ok ? { ...wood.value, shownCost: woodShown } : null,
      piece: tidy(sealCostTotal.total + deepCostTotal.total + woodShown),
    },
    shopTimes: {
      deepPour: timesAtTemperature(deep, input.shopTempC),
      sealCoat: sealProduct?.ok ? timesAtTemperature(sealProduct.value, input.shopTempC) : null,
    },
    forecast,
    cautions: [],
  };
  const cautions = pourPlanCautions(input, plan, deep, sealProduct?.ok ? sealProduct.value : null);
  if (!cautions.ok) return cautions;
  plan.cautions = cautions.value;
  return ok(plan);
}
