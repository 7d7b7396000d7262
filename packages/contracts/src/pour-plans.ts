import { z } from 'zod';
import { Id, Timestamp, UserRef, requiredText } from './common';
import { Dam, LevelFrom } from './molds';
import { PourPlanResult } from './pour-plan-result';

const positive = (label: string, max: number, unit = '') =>
  z
    .number({ message: `${label} must be a number${unit ? ` (${unit})` : ''}` })
    .gt(0, { message: `${label} must be above zero` })
    .max(max, { message: `${label} must be at most ${max}${unit ? ` ${unit}` : ''}` });
const nonNegative = (label: string, max: number, unit = '') =>
  z
    .number({ message: `${label} must be a number${unit ? ` (${unit})` : ''}` })
    .min(0, { message: `${label} must be zero or more` })
    .max(max, { message: `${label} must be at most ${max}${unit ? ` ${unit}` : ''}` });

// The largest pieces a resin shop pours: a slab of 6 m × 3 m, resin at most half a metre deep (common practice
// for the biggest river tables); anything larger is a typing slip, not a piece.
const maxLengthMm = 6_000;
const maxWidthMm = 3_000;
const maxDepthMm = 500;

export const QuickShape = z.discriminatedUnion(
  'kind',
  [
    z
      .object({
        kind: z.literal('rectangle'),
        lengthMm: positive('length', maxLengthMm, 'mm'),
        widthMm: positive('width', maxWidthMm, 'mm'),
        depthMm: positive('depth', maxDepthMm, 'mm'),
      })
      .strict(),
    z
      .object({
        kind: z.literal('channel'),
        lengthMm: positive('length', maxLengthMm, 'mm'),
        widthMm: positive('width', maxWidthMm, 'mm'),
        depthMm: positive('depth', maxDepthMm, 'mm'),
      })
      .strict(),
    z.object({ kind: z.literal('cylinder'), diameterMm: positive('diameter', maxWidthMm, 'mm'), depthMm: positive('depth', maxDepthMm, 'mm') }).strict(),
    z
      .object({
        kind: z.literal('area_depth'),
        areaMm2: positive('area', maxLengthMm * maxWidthMm, 'mm²'),
        averageDepthMm: positive('average depth', maxDepthMm, 'mm'),
        maxDepthMm: positive('deepest point', maxDepthMm, 'mm').optional(),
        perimeterMm: positive('perimeter', 2 * (maxLengthMm + maxWidthMm), 'mm').optional(),
      })
      .strict(),
  ],
  { message: 'the shape must be rectangle, channel, cylinder or area_depth' },
);
export type QuickShape = z.infer<typeof QuickShape>;

export const PlanCavity = z.discriminatedUnion(
  'source',
  [
    z.object({ source: z.literal('mold'), moldId: Id, dam: Dam.default('outline') }).strict(),
    z.object({ source: z.literal('shape'), shape: QuickShape }).strict(),
  ],
  { message: 'the cavity comes from a mould (source: mold) or a quick shape (source: shape)' },
);

export const PourPlanInput = z
  .object({
    pieceId: Id,
    name: requiredText(120, 'name'),
    cavity: PlanCavity,
    fillLevelMm: z
      .number({ message: 'fill level must be a number (mm)' })
      .refine(Number.isFinite, { message: 'fill level must be finite' })
      .describe(
        "height of the resin surface above the cavity floor (mm), for a mould as for a quick shape; with levelFrom 'mould', a height in the mould's own frame",
      ),
    levelFrom: LevelFrom.default('floor').describe(
      "floor (default): fillLevelMm is measured from the cavity floor. mould: from the mould file's own frame, for a mould's cavity only; the plan is stored measured from the floor either way",
    ),
    deepPour: z.object({ resinSystemId: Id, pigmentId: Id.nullable().default(null), pigmentPct: nonNegative('pigment loading', 100).default(0) }).strict(),
    sealCoat: z
      .object({
        resinSystemId: Id,
        filmThicknessMm: positive('film thickness', 5),
        coats: z.number().int().min(1).max(10),
        absorptionFactor: z.number().min(1).max(5),
      })
      .strict()
      .nullable()
      .default(null),
    overPourPct: nonNegative('over-pour', 50, '%').default(5),
    // A scraped cup keeps grams, not kilograms: half a kilogram is already far more than any cup holds back.
    cupWaste: z
      .union([z.object({ massG: nonNegative('cup waste', 500, 'g') }).strict(), z.object({ volumeMl: nonNegative('cup waste', 500, 'mL') }).strict()])
      .default({ massG: 5 }),
    shopTempC: z.number({ message: 'shop temperature must be a number (°C)' }).min(-30).max(60),
    shopAir: z
      .object({ rhPct: z.number().min(0).max(100), surfaceTempC: z.number().min(-30).max(80) })
      .strict()
      .nullable()
      .default(null),
    wood: z
      .object({
        lengthMm: positive('wood length', maxLengthMm, 'mm'),
        widthMm: positive('wood width', maxWidthMm, 'mm'),
        thicknessMm: positive('wood thickness', maxDepthMm, 'mm'),
        pricePerBoardFoot: nonNegative('price per board foot', 100_000),
      })
      .strict()
      .nullable()
      .default(null),
  })
  .strict();
export type PourPlanInput = z.input<typeof PourPlanInput>;

export const PourPlanView = z.object({
  id: Id,
  pieceId: Id,
  moldId: Id.nullable(),
  name: z.string(),
  /**
   * The inputs as saved. A mould plan's fillLevelMm is measured from the cavity floor (levelFrom: 'floor'); one saved
   * before the marker existed is answered converted from its mould's frame, or with levelFrom: 'mould' while the
   * mould's analysis cannot say where its floor is.
   */
  inputs: z.record(z.string(), z.unknown()),
  /** The shelf values the plan used, as they were when it was saved. */
  productSnapshot: z.record(z.string(), z.unknown()),
  /** The computed plan (layers, batches, seal coat, cost, cautions, forecast) from packages/core, read as its current version. */
  result: PourPlanResult,
  createdBy: UserRef.nullable(),
  createdAt: Timestamp,
  updatedAt: Timestamp,
});
export type PourPlanView = z.infer<typeof PourPlanView>;

export const PourPlanList = z.object({
  items: z.array(PourPlanView.omit({ result: true, inputs: true, productSnapshot: true }).extend({ totalGrams: z.number() })),
  total: z.number().int(),
});
export const PourPlanListQuery = z
  .object({
    pieceId: Id.optional(),
    limit: z.coerce.number().int().min(1).max(200).default(50),
    offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
  })
  .strict();
