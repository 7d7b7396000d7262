import type { PlannedBatch, PourPlan } from '@gelpoint/core';
import type { PlanSnapshot, SnapshotProduct } from './saved-plan';

export interface RunSheetBatch {
  /** The plan's own batch index (0-based), which its cautions refer to. */
  index: number;
  /** 1-based place in the order of mixing across the whole plan. */
  order: number;
  of: number;
  /** "Seal coat 1", "Layer 2". */
  pourLabel: string;
  /** 1-based within its pour, e.g. batch 2 of 3 of layer 1. */
  batchInPour: number;
  batchesInPour: number;
  product: SnapshotProduct;
  pigmentName: string | null;
  partAG: number;
  partBG: number;
  pigmentG: number;
  totalG: number;
  /** This cup's pot life at the shop temperature the plan was made for, its own heat counted when the plan says. */
  potLifeMin: number;
  /** True when the cup's own heat makes its pot life shorter than the data sheet's. */
  potLifeShortenedByHeat: boolean;
  shopTempC: number;
  /** How far the shown grams are from the product's ratio, in percent, when more than the shop allows; else null. */
  offRatioPct: number | null;
  /** The layer's forecast peak (an estimate), when the plan has a forecast; null for a seal coat. */
  forecastPeakC: number | null;
  forecastOverLimit: boolean;
  /** Where the layer's resin stands when it is poured: its top level, measured from the cavity floor (mm); null for a seal coat. */
  targetLevelMm: number | null;
  /**
   * When this pour may go on, counted from the pour before it (the data sheet's recoat window at the shop
   * temperature); null for the first pour of the plan.
   */
  window: { afterLabel: string; opensH: number; closesH: number } | null;
}

interface Pour {
  label: string;
  batches: readonly PlannedBatch[];
  product: SnapshotProduct;
  potLifeMin: number;
  shopTempC: number;
  pigmentName: string | null;
  targetLevelMm: number | null;
  forecast: { peakC: number; overLimit: boolean } | null;
  /** The window this pour opens for the next one: a seal coat's recoat window before the first layer, the deep pour's between layers. */
  recoat: { opensH: number; closesH: number };
}

/**
 * Every cup of the plan in the order it is mixed: the seal coats first, each coat once the one before is tacky,
 * then the layers from the floor up. Amounts are the plan's own rounded grams, so the sheet adds up as the plan does.
 */
export function runSheetBatches(plan: PourPlan, snapshot: PlanSnapshot): RunSheetBatch[] {
  const pours: Pour[] = [];
  const sealTimes = plan.shopTimes.sealCoat;
  if (plan.sealCoat && snapshot.sealCoat && sealTimes) {
    for (const coat of plan.sealCoat.coats) {
      pours.push({
        label: `Seal coat ${coat.index + 1}`,
        batches: coat.batches,
        product: snapshot.sealCoat,
        potLifeMin: sealTimes.potLifeMin,
        shopTempC: sealTimes.tempC,
        pigmentName: null,
        targetLevelMm: null,
        forecast: null,
        recoat: { opensH: sealTimes.nextLayerOpensH, closesH: sealTimes.nextLayerClosesH },
      });
    }
  }
  const deep = plan.shopTimes.deepPour;
  for (const layer of plan.layers) {
    pours.push({
      label: `Layer ${layer.index + 1}`,
      batches: layer.batches,
      product: snapshot.deepPour,
      potLifeMin: deep.potLifeMin,
      shopTempC: deep.tempC,
      pigmentName: plan.deepPour.pigmentName,
      targetLevelMm: layer.toLevelMm,
      forecast: plan.forecast.available ? (plan.forecast.layers[layer.index] ?? null) : null,
      recoat: { opensH: deep.nextLayerOpensH, closesH: deep.nextLayerClosesH },
    });
  }
  // Each pour waits on the one before it, within that one's recoat window.
  const windowOf = (i: number): RunSheetBatch['window'] => {
    const before = pours[i - 1];
    return before ? { afterLabel: before.label, opensH: before.recoat.opensH, closesH: before.recoat.closesH } : null;
  };
  const rows = pours.flatMap((pour, p) =>
    pour.batches.map((batch, b) => ({
      index: batch.index,
      row: {
        pourLabel: pour.label,
        batchInPour: b + 1,
        batchesInPour: pour.batches.length,
        product: pour.product,
        pigmentName: batch.pigment.grams > 0 ? pour.pigmentName : null,
        partAG: batch.partA.grams,
        partBG: batch.partB.grams,
        pigmentG: batch.pigment.grams,
        totalG: batch.totalGrams,
        potLifeMin: batch.cupPotLifeMin ?? pour.potLifeMin,
        potLifeShortenedByHeat: batch.cupPotLifeLimitedBy === 'cup_heating',
        shopTempC: pour.shopTempC,
        offRatioPct: Math.abs(batch.ratioErrorPct) > plan.resolution.offRatioTolerancePct ? batch.ratioErrorPct : null,
        targetLevelMm: pour.targetLevelMm,
        forecastPeakC: pour.forecast?.peakC ?? null,
        forecastOverLimit: pour.forecast?.overLimit ?? false,
        window: windowOf(p),
      },
    })),
  );
  rows.sort((p, q) => p.index - q.index);
  return rows.map(({ index, row }, i) => ({ index, order: i + 1, of: rows.length, ...row }));
}
