import { caution, handlingCautions, type Caution } from './cautions';
import { timesAtTemperature } from './cure-model';
import { surfaceDewPointCheck } from './dew-point';
import { defaultOffRatioTolerancePct } from './off-ratio';
import type { PlannedBatch, PourPlan, PourPlanInput } from './pour-plan-types';
import { ok, type Result } from './result';
import type { ResinSystem } from './shelf';

/** A batch at half the product's limit or more already heats itself fast in the cup (common practice). */
export const fastHeatShareOfMaxBatch = 0.5;
/** Below ten scale steps a weighed amount is off by more than 5 % (common practice for weighing). */
export const minScaleStepsForPigment = 10;

/** Everything a finished plan should warn about, worked out from the plan's own numbers. */
export function pourPlanCautions(input: PourPlanInput, plan: PourPlan, deep: ResinSystem, seal: ResinSystem | null): Result<Caution[]> {
  const cautions: Caution[] = [];
  const products: [ResinSystem, number][] = seal
    ? [
        [deep, 0],
        [seal, 1],
      ]
    : [[deep, 0]];
  for (const [product, index] of products) {
    if (input.shopTempC < product.minWorkTempC) {
      cautions.push(
        caution(
          'shop_temp_out_of_range',
          'warning',
          `The shop at ${input.shopTempC} °C is below the ${product.minWorkTempC} °C minimum of "${product.name}": it will cure slowly or not at all, and may blush. Warm the shop and the resin before pouring.`,
          'product',
          index,
        ),
      );
    } else if (input.shopTempC > product.maxWorkTempC) {
      cautions.push(
        caution(
          'shop_temp_out_of_range',
          'warning',
          `The shop at ${input.shopTempC} °C is above the ${product.maxWorkTempC} °C maximum of "${product.name}": pot life shortens and the exotherm can run away. Pour when it is cooler.`,
          'product',
          index,
        ),
      );
    }
  }

  const pigment = input.deepPour.pigment;
  if (pigment && pigment.pct > pigment.pigment.maxPct) {
    cautions.push(
      caution(
        'pigment_over_max',
        'warning',
        `${pigment.pct} % of "${pigment.pigment.name}" is over its maximum of ${pigment.pigment.maxPct} % of the resin mass; too much pigment can keep the resin from curing fully. Lower it to ${pigment.pigment.maxPct} % or less.`,
        'pigment',
      ),
    );
  }
  const firstLayerBatch = plan.layers[0]?.batches[0];
  if (pigment && pigment.pct > 0 && firstLayerBatch) {
    const exactPigmentG = (firstLayerBatch.partA.grams + firstLayerBatch.partB.grams) * (pigment.pct / 100);
    if (exactPigmentG < minScaleStepsForPigment * input.scaleResolutionG) {
      cautions.push(
        caution(
          'pigment_below_scale',
          'info',
          `Each batch takes only about ${exactPigmentG.toFixed(2)} g of pigment, under ${minScaleStepsForPigment} steps of a ${input.scaleResolutionG} g scale; weigh the pigment on a finer scale, or premix it into part A for all batches at once.`,
          'pigment',
        ),
      );
    }
  }

  for (const layer of plan.layers) {
    if (layer.deepestResinMm > deep.maxLayerMm + 1e-9) {
      cautions.push(
        caution(
          'layer_too_thick',
          'danger',
          `Layer ${layer.index + 1} puts down ${layer.deepestResinMm.toFixed(1)} mm of resin at the cavity's deepest point, more than the ${deep.maxLayerMm} mm "${deep.name}" allows: the exotherm there can crack, yellow or smoke. Fill that pocket on its own first, or choose a product rated for deeper layers.`,
          'layer',
          layer.index,
        ),
      );
    }
  }

  const pourGroups: { product: ResinSystem; batches: PlannedBatch[]; name: string }[] = [
    ...(plan.sealCoat?.coats ?? []).map((coat) => ({ product: seal!, batches: coat.batches, name: `seal coat ${coat.index + 1}` })),
    ...plan.layers.map((layer) => ({ product: deep, batches: layer.batches, name: `layer ${layer.index + 1}` })),
  ];
  for (const group of pourGroups) {
    for (const batch of group.batches) {
      if (batch.totalGrams > group.product.maxBatchG) {
        cautions.push(
          caution(
            'batch_too_heavy',
            'danger',
            `Batch ${batch.index + 1} (${group.name}) is ${batch.totalGrams} g, over the ${group.product.maxBatchG} g maximum batch of "${group.product.name}": in the cup it can overheat before it is poured. Split it into more batches.`,
            'batch',
            batch.index,
          ),
        );
      }
    }
    const heaviest = group.batches.reduce<PlannedBatch | null>((max, b) => (max === null || b.totalGrams > max.totalGrams ? b : max), null);
    if (heaviest && heaviest.totalGrams >= fastHeatShareOfMaxBatch * group.product.maxBatchG) {
      const potLifeMin = timesAtTemperature(group.product, input.shopTempC).potLifeMin;
      cautions.push(
        caution(
          'cup_heat_builds_fast',
          'warning',
          `The batches of ${group.name} are up to ${heaviest.totalGrams} g; a mass like that heats itself quickly in the cup, and at ${input.shopTempC} °C the pot life is about ${Math.round(potLifeMin)} min. Mix one cup at a time and pour it out at once.`,
          'batch',
          heaviest.index,
        ),
      );
    }
  }

  cautions.push(...ratioAtScaleCautions(input, pourGroups));

  if (input.shopAir) {
    const dew = surfaceDewPointCheck(input.shopAir.surfaceTempC, input.shopTempC, input.shopAir.rhPct);
    if (!dew.ok) return dew;
    if (dew.value.caution) cautions.push(dew.value.caution);
  }

  cautions.push(...handlingCautions());
  return ok(cautions);
}

/** Cups whose grams, rounded to the shop's scale, still miss the product's ratio by more than the shop allows. */
function ratioAtScaleCautions(input: PourPlanInput, groups: { product: ResinSystem; batches: PlannedBatch[]; name: string }[]): Caution[] {
  const tolerance = input.offRatioTolerancePct ?? defaultOffRatioTolerancePct;
  const out: Caution[] = [];
  for (const group of groups) {
    const off = group.batches.filter((b) => Math.abs(b.ratioErrorPct) > tolerance);
    if (off.length === 0) continue;
    const worst = off.reduce((w, b) => (Math.abs(b.ratioErrorPct) > Math.abs(w.ratioErrorPct) ? b : w));
    const { a, b, basis } = group.product.mixRatio;
    const cups = off.length === 1 ? `Cup ${worst.index + 1}` : `${off.length} cups`;
    out.push(
      caution(
        'cup_off_ratio_at_scale',
        'warning',
        `${cups} of ${group.name}: on a ${input.scaleResolutionG} g scale the nearest amounts (${worst.partA.grams} g A to ${worst.partB.grams} g B${off.length > 1 ? ' at worst' : ''}) are ${worst.ratioErrorPct > 0 ? '+' : ''}${worst.ratioErrorPct.toFixed(1)} % off the ${a}:${b} ratio by ${basis} of "${group.product.name}", more than the shop's ${tolerance} %. Weigh on a finer scale or mix fewer, larger cups.`,
        'batch',
        worst.index,
      ),
    );
  }
  return out;
}
