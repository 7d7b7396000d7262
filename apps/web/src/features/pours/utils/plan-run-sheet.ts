import { PourPlanResult } from '@gelpoint/contracts';
import { fail, ok, type Result } from '@gelpoint/core';
import { z } from 'zod';

// The stored result is read through contracts' PourPlanResult (older plans brought up to its current version); the
// product snapshot only as far as the pour page needs it.
const StoredProduct = z.looseObject({
  id: z.string(),
  name: z.string(),
  mixRatio: z.object({ a: z.number(), b: z.number(), basis: z.enum(['weight', 'volume']) }),
  densityAGPerMl: z.number(),
  densityBGPerMl: z.number(),
  potLifeMin: z.number(),
  maxBatchG: z.number(),
  minWorkTempC: z.number(),
  maxWorkTempC: z.number(),
  referenceTempC: z.number(),
  fullCureH: z.number(),
  activationEnergyKJPerMol: z.number().optional(),
});
const StoredSnapshot = z.looseObject({
  deepPour: StoredProduct,
  sealCoat: StoredProduct.nullable().default(null),
  pigment: z.looseObject({ id: z.string(), name: z.string() }).nullable().default(null),
});

export type PlanProduct = z.infer<typeof StoredProduct>;
export type PlanCaution = PourPlanResult['cautions'][number];

export interface RunSheetCup {
  /** The plan's batch index: what the API calls planBatchIndex. */
  index: number;
  /** 1-based place in the whole run sheet. */
  order: number;
  /** "Seal coat 1", "Layer 2". */
  pourLabel: string;
  /** The step as the API names it: "seal_coat:1", "layer:2" (counted from 1). */
  stepKey: string;
  kind: 'seal_coat' | 'layer';
  batchInPour: number;
  batchesInPour: number;
  targetAG: number;
  targetBG: number;
  targetPigmentG: number;
  totalG: number;
  product: PlanProduct;
  /** The plan's pot life for this very cup (its own heat counted); absent on plans saved before it was worked out. */
  potLifeMin?: number;
  pigment: { id: string; name: string } | null;
  /** The plan's cautions about this very cup (too heavy, heats fast). */
  cautions: PlanCaution[];
}

export interface RunSheet {
  cups: RunSheetCup[];
  deepPour: PlanProduct;
  sealCoat: PlanProduct | null;
}

/** A saved plan as it arrives: checked here, whatever its declared type, since it may be older than this page. */
type StoredPlan = { result: unknown; productSnapshot: unknown };

/**
 * Every cup of a saved plan in mixing order (seal coats first, then layers from the floor up), with the grams the
 * plan shows and the product each cup is mixed from. The plan's own batch index stays the key.
 */
export function runSheetOf(plan: StoredPlan): Result<RunSheet> {
  const result = PourPlanResult.safeParse(plan.result);
  const snapshot = StoredSnapshot.safeParse(plan.productSnapshot);
  if (!result.success || !snapshot.success) {
    return fail('plan_unreadable', 'The stored pour plan is not in a form this page can read. Open the plan and save it again, then reload this page.');
  }
  const { sealCoat, layers, deepPour, cautions } = result.data;
  const pigment = snapshot.data.pigment && deepPour.pigmentName !== null ? { id: snapshot.data.pigment.id, name: snapshot.data.pigment.name } : null;
  const seal = snapshot.data.sealCoat;
  if (sealCoat && sealCoat.coats.length > 0 && !seal) {
    return fail('plan_unreadable', 'The stored pour plan has a seal coat but no seal-coat product in its snapshot. Open the plan and save it again.');
  }
  const pours = [
    ...(sealCoat?.coats ?? []).map((coat) => ({
      kind: 'seal_coat' as const,
      label: `Seal coat ${coat.index + 1}`,
      stepKey: `seal_coat:${coat.index + 1}`,
      batches: coat.batches,
      product: seal!,
      pigment: null,
    })),
    ...layers.map((layer) => ({
      kind: 'layer' as const,
      label: `Layer ${layer.index + 1}`,
      stepKey: `layer:${layer.index + 1}`,
      batches: layer.batches,
      product: snapshot.data.deepPour,
      pigment,
    })),
  ];
  const cups = pours
    .flatMap((pour) =>
      pour.batches.map((batch, b) => ({
        index: batch.index,
        order: 0,
        pourLabel: pour.label,
        stepKey: pour.stepKey,
        kind: pour.kind,
        batchInPour: b + 1,
        batchesInPour: pour.batches.length,
        targetAG: batch.partA.grams,
        targetBG: batch.partB.grams,
        targetPigmentG: batch.pigment.grams,
        totalG: batch.totalGrams,
        product: pour.product,
        ...(batch.cupPotLifeMin === undefined ? {} : { potLifeMin: batch.cupPotLifeMin }),
        pigment: batch.pigment.grams > 0 ? pour.pigment : null,
        cautions: cautions.filter((c) => c.appliesTo.kind === 'batch' && c.appliesTo.index === batch.index),
      })),
    )
    .sort((p, q) => p.index - q.index)
    .map((cup, i) => ({ ...cup, order: i + 1 }));
  return ok({ cups, deepPour: snapshot.data.deepPour, sealCoat: seal });
}

/** The product a cure step runs on: "seal_coat:…" steps cure as the seal-coat product, everything else as the deep pour. */
export function productOfStep(sheet: RunSheet, step: string | null): PlanProduct {
  return step?.startsWith('seal_coat') && sheet.sealCoat ? sheet.sealCoat : sheet.deepPour;
}

/** Whether the plan has a seal coat or layer still to pour after this step. */
export function hasStepAfter(sheet: RunSheet, step: string | null): boolean {
  if (step === null) return sheet.cups.length > 0;
  const last = sheet.cups.map((cup) => cup.stepKey).lastIndexOf(step);
  return last >= 0 && last < sheet.cups.length - 1;
}
