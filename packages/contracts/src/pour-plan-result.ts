import { z } from 'zod';
import { PlanForecast } from './plan-forecast';

/**
 * The computed pour plan as a pour_plans row stores it: packages/core's PourPlan, written by the API when the plan
 * is saved. Rows carry no version number, so the version is told by what they hold:
 *   1: the first plans (cups rounded part by part): no ratioErrorPct or pigmentMl on a cup, no offRatioTolerancePct;
 *   2: cups rounded on ratio: each cup's ratioErrorPct and pigmentMl, the tolerance the plan was judged against;
 *   3: the exotherm forecast (whose own version is its `version` field); cups may carry their own pot life.
 * Reading an older row fills what it lacks with what that plan meant, so every reader sees version 3.
 */
export const POUR_PLAN_RESULT_VERSION = 3;

const Part = z.object({ grams: z.number(), ml: z.number() });
const PartTotals = z.object({ partA: Part, partB: Part, pigment: z.object({ grams: z.number() }), totalGrams: z.number() });
const CostTotals = z.object({ resin: z.number(), pigment: z.number(), total: z.number() });
const CupWaste = z.union([z.object({ massG: z.number() }), z.object({ volumeMl: z.number() })]);

// The tolerance core judges cups against when the shop sets none: what version 1 plans were judged by.
const defaultOffRatioTolerancePct = 3;

const PlannedBatch = z.object({
  partA: Part,
  partB: Part,
  pigment: z.object({ grams: z.number() }),
  totalGrams: z.number(),
  mixedDensityGPerMl: z.number(),
  index: z.number().int(),
  pour: z.discriminatedUnion('kind', [
    z.object({ kind: z.literal('seal_coat'), coat: z.number().int() }),
    z.object({ kind: z.literal('layer'), layer: z.number().int() }),
  ]),
  cost: CostTotals,
  // Version 1 cups were weighed exactly on ratio before being rounded, and their pigment was left out of the volume.
  ratioErrorPct: z.number().default(0),
  pigmentMl: z.number().default(0),
  cupPotLifeMin: z.number().optional(),
  cupPotLifeLimitedBy: z.enum(['cup_heating', 'data_sheet']).optional(),
});

const TimesAtTemperature = z.object({
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

const PlanCaution = z.object({
  code: z.string(),
  severity: z.enum(['info', 'warning', 'danger']),
  message: z.string(),
  appliesTo: z.object({ kind: z.enum(['plan', 'layer', 'batch', 'product', 'pigment']), index: z.number().int().optional() }),
});

/** What a plan saved before the forecast existed (versions 1 and 2) says in its place. */
export const notForecast = {
  version: 1,
  available: false,
  code: 'saved_before_forecast',
  reason: 'This plan was saved before Gelpoint forecast the exotherm; save it again to see each layer’s forecast peak.',
} as const;

/** A stored plan result of any version, read as version 3. */
export const PourPlanResult = z.object({
  margins: z.object({
    overPour: z.object({ label: z.string(), pct: z.number(), volumeMl: z.number() }),
    cupWaste: z.object({ label: z.string(), perBatch: CupWaste, batches: z.number().int(), resinG: z.number() }),
  }),
  resolution: z.object({
    grams: z.union([z.literal(0.1), z.literal(1)]),
    ml: z.number(),
    cost: z.number(),
    offRatioTolerancePct: z.number().default(defaultOffRatioTolerancePct),
  }),
  fill: z.object({
    fillLevelMm: z.number(),
    fillVolumeMl: z.number(),
    pourVolumeMl: z.number(),
    layerCount: z.number().int(),
    layerThicknessMm: z.number(),
    deepestResinMm: z.number(),
  }),
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
  shopTimes: z.object({ deepPour: TimesAtTemperature, sealCoat: TimesAtTemperature.nullable() }),
  forecast: PlanForecast.default(notForecast),
  cautions: z.array(PlanCaution),
});
export type PourPlanResult = z.output<typeof PourPlanResult>;
/** What a pour_plans row's result column may hold: a result of any version, read as version 3 through PourPlanResult. */
export type StoredPourPlanResult = z.input<typeof PourPlanResult>;

/** Which version a stored result was written as (see POUR_PLAN_RESULT_VERSION), told by what it holds. */
export function pourPlanResultVersionOf(stored: unknown): 1 | 2 | 3 {
  const s = stored as { forecast?: unknown; resolution?: { offRatioTolerancePct?: unknown } } | null;
  if (s && typeof s === 'object' && s.forecast !== undefined) return 3;
  if (s && typeof s === 'object' && s.resolution?.offRatioTolerancePct !== undefined) return 2;
  return 1;
}
