import { PlanForecast, PourPlanInput, type PourPlanView } from '@gelpoint/contracts';
import { fail, ok, type Caution, type PourPlan, type Result, type TimesAtTemperature } from '@gelpoint/core';
import { z } from 'zod';
import type { SavedPlanInput } from './planner-values';

// The API stores core's PourPlan as it computed it; these schemas check what came back before a page relies on it.
const Part = z.object({ grams: z.number(), ml: z.number() });
const PartTotals = z.object({ partA: Part, partB: Part, pigment: z.object({ grams: z.number() }), totalGrams: z.number() });
const CostTotals = z.object({ resin: z.number(), pigment: z.number(), total: z.number() });
const CupWaste = z.union([z.object({ massG: z.number() }), z.object({ volumeMl: z.number() })]);

const PlannedBatch = z.object({
  partA: Part,
  partB: Part,
  pigment: z.object({ grams: z.number() }),
  totalGrams: z.number(),
  mixedDensityGPerMl: z.number(),
  index: z.number().int(),
  pour: z.discriminatedUnion('kind', [z.object({ kind: z.literal('seal_coat'), coat: z.number().int() }), z.object({ kind: z.literal('layer'), layer: z.number().int() })]),
  cost: CostTotals,
  // Plans saved before cups were rounded on ratio carry neither figure.
  ratioErrorPct: z.number().default(0),
  pigmentMl: z.number().default(0),
  cupPotLifeMin: z.number().optional(),
  cupPotLifeLimitedBy: z.enum(['cup_heating', 'data_sheet']).optional(),
});

const Times: z.ZodType<TimesAtTemperature> = z.object({
  tempC: z.number(),
  rateFactor: z.number(),
  belowMinimum: z.boolean(),
  potLifeMin: z.number(),
  gelTimeH: z.number(),
  nextLayerOpensH: z.number(),
  nextLayerClosesH: z.number(),
  tackFreeH: z.number(),
  demoldH: z.number(),
  fullCureH: z.number(),
  readyToMachineH: z.number(),
});

const SavedCaution: z.ZodType<Caution> = z.object({
  code: z.string(),
  severity: z.enum(['info', 'warning', 'danger']),
  message: z.string(),
  appliesTo: z.object({ kind: z.enum(['plan', 'layer', 'batch', 'product', 'pigment']), index: z.number().int().optional() }),
});

/** What a plan saved before the forecast existed says in its place. */
export const notForecast = {
  version: 1,
  available: false,
  code: 'saved_before_forecast',
  reason: 'This plan was saved before Gelpoint forecast the exotherm; save it again to see each layer’s forecast peak.',
} as const;

export const SavedPourPlan: z.ZodType<PourPlan> = z.object({
  margins: z.object({
    overPour: z.object({ label: z.string(), pct: z.number(), volumeMl: z.number() }),
    cupWaste: z.object({ label: z.string(), perBatch: CupWaste, batches: z.number().int(), resinG: z.number() }),
  }),
  resolution: z.object({ grams: z.union([z.literal(0.1), z.literal(1)]), ml: z.number(), cost: z.number(), offRatioTolerancePct: z.number().default(3) }),
  fill: z.object({ fillLevelMm: z.number(), fillVolumeMl: z.number(), pourVolumeMl: z.number(), layerCount: z.number().int(), layerThicknessMm: z.number(), deepestResinMm: z.number() }),
  sealCoat: z
    .object({
      productName: z.string(),
      wettedAreaMm2: z.number(),
      filmThicknessMm: z.number(),
      absorptionFactor: z.number(),
      volumeMl: z.number(),
      coats: z.array(z.object({ index: z.number().int(), volumeMl: z.number(), batches: z.array(PlannedBatch), totals: PartTotals, cost: CostTotals })),
      totals: PartTotals,
      cost: CostTotals,
    })
    .nullable(),
  layers: z.array(
    z.object({
      index: z.number().int(),
      fromLevelMm: z.number(),
      toLevelMm: z.number(),
      thicknessMm: z.number(),
      deepestResinMm: z.number(),
      fillVolumeMl: z.number(),
      overPourMl: z.number(),
      pourVolumeMl: z.number(),
      batches: z.array(PlannedBatch),
      totals: PartTotals,
      cost: CostTotals,
    }),
  ),
  deepPour: z.object({ productName: z.string(), pigmentName: z.string().nullable(), pigmentPct: z.number(), totals: PartTotals, cost: CostTotals }),
  cost: z.object({
    sealCoat: z.number(),
    deepPour: z.number(),
    wood: z.object({ boardFeet: z.number(), pricePerBoardFoot: z.number(), cost: z.number(), shownCost: z.number() }).nullable(),
    piece: z.number(),
  }),
  shopTimes: z.object({ deepPour: Times, sealCoat: Times.nullable() }),
  forecast: PlanForecast.default(notForecast),
  cautions: z.array(SavedCaution),
});

/** The shelf values a saved plan was made with; only what the pages show is checked. */
const SnapshotProduct = z.looseObject({
  id: z.string(),
  name: z.string(),
  mixRatio: z.object({ a: z.number(), b: z.number(), basis: z.enum(['weight', 'volume']) }),
  densityAGPerMl: z.number(),
  densityBGPerMl: z.number(),
  potLifeMin: z.number(),
  referenceTempC: z.number(),
  maxLayerMm: z.number(),
  maxBatchG: z.number(),
  minWorkTempC: z.number(),
  maxWorkTempC: z.number(),
});
export type SnapshotProduct = z.infer<typeof SnapshotProduct>;

const SnapshotPigment = z.looseObject({ id: z.string(), name: z.string(), maxPct: z.number(), recommendedPct: z.number() });

export const PlanSnapshot = z.looseObject({
  deepPour: SnapshotProduct,
  pigment: SnapshotPigment.nullable(),
  sealCoat: SnapshotProduct.nullable(),
  scaleResolutionG: z.number(),
});
export type PlanSnapshot = z.infer<typeof PlanSnapshot>;

export interface SavedPlan {
  plan: PourPlan;
  snapshot: PlanSnapshot;
  /** Null when the stored inputs no longer pass today's checks: the plan still shows and prints, but cannot be edited. */
  input: SavedPlanInput | null;
  /**
   * The plan was saved with its fill level in the mould's own frame and the server could not yet say where that
   * mould's cavity floor is: the number is not a height above the floor, so the planner does not take it as one.
   */
  levelInMouldFrame: boolean;
}

export const unreadableInputsMessage = 'The inputs stored with this plan no longer pass the current checks, so it cannot be opened in the planner. Plan the pour again from its piece.';

export const mouldFrameInputsMessage =
  'This plan was saved with its fill level in the mould file’s own frame, and its mould cannot say where its cavity floor is right now (it is being measured again, or it is gone). Open the plan again once the mould’s report is ready, or plan the pour again from its piece.';

/** Reads a saved plan's stored result and snapshot (and its inputs when they still pass), or says what it cannot read. */
export function readSavedPlan(view: Pick<PourPlanView, 'result' | 'productSnapshot' | 'inputs'>): Result<SavedPlan> {
  const plan = SavedPourPlan.safeParse(view.result);
  if (!plan.success) return fail('saved_result_unreadable', 'The stored result of this plan is not in a form this page can show. Save the plan again to recompute it.');
  const snapshot = PlanSnapshot.safeParse(view.productSnapshot);
  if (!snapshot.success) return fail('saved_snapshot_unreadable', 'The shelf values stored with this plan are not in a form this page can show. Save the plan again to take a new snapshot.');
  const levelInMouldFrame = (view.inputs as { levelFrom?: unknown }).levelFrom === 'mould';
  const input = PourPlanInput.safeParse(view.inputs);
  return ok({ plan: plan.data, snapshot: snapshot.data, input: input.success && !levelInMouldFrame ? input.data : null, levelInMouldFrame });
}
