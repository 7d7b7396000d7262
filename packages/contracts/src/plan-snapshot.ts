import { z } from 'zod';

/**
 * The shelf values a pour_plans row was computed with (its product_snapshot column): packages/core's ResinSystem and
 * Pigment with the shelf row's id, as the API wrote them when the plan was saved. The fields core added later are
 * optional in core too, so one schema reads every row ever written.
 */
const SnapshotResin = z.object({
  id: z.string(),
  name: z.string(),
  use: z.enum(['seal', 'deep_pour', 'casting', 'coating']),
  mixRatio: z.object({ a: z.number(), b: z.number(), basis: z.enum(['weight', 'volume']) }),
  densityAGPerMl: z.number(),
  densityBGPerMl: z.number(),
  potLifeMin: z.number(),
  gelTimeH: z.number(),
  recoatWindow: z.object({ earliestH: z.number(), latestH: z.number() }),
  tackFreeH: z.number(),
  demoldH: z.number(),
  fullCureH: z.number(),
  readyToMachineH: z.number().optional(),
  referenceTempC: z.number(),
  minWorkTempC: z.number(),
  maxWorkTempC: z.number(),
  maxLayerMm: z.number(),
  maxBatchG: z.number(),
  activationEnergyKJPerMol: z.number().optional(),
  hardnessShoreD: z.number().optional(),
  reactionHeatJPerG: z.number().optional(),
  thinFilmGelMin: z.number().optional(),
  heatCapacityJPerGK: z.number().optional(),
  conductivityWPerMK: z.number().optional(),
  acceptedPeakC: z.number().optional(),
  pricePerKit: z.number(),
  kitSizeG: z.number(),
  shelfLifeMonths: z.number(),
});

const SnapshotPigment = z.object({
  id: z.string(),
  name: z.string(),
  kind: z.enum(['powder', 'paste', 'liquid']),
  // Plans saved before a pigment's density was asked for have none: core takes the resin's own.
  densityGPerMl: z.number().optional(),
  recommendedPct: z.number(),
  maxPct: z.number(),
  price: z.union([z.object({ pricePerG: z.number() }), z.object({ pricePerPack: z.number(), packSizeG: z.number() })]),
});

export const PlanProductSnapshot = z.object({
  deepPour: SnapshotResin,
  pigment: SnapshotPigment.nullable(),
  sealCoat: SnapshotResin.nullable(),
  scaleResolutionG: z.number(),
});
export type PlanProductSnapshot = z.output<typeof PlanProductSnapshot>;
/** What a pour_plans row's product_snapshot column holds. */
export type StoredPlanProductSnapshot = z.input<typeof PlanProductSnapshot>;
