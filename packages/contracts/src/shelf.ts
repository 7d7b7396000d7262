import { z } from 'zod';
import { Id, Timestamp, UserRef, requiredText, text } from './common';

const positive = (label: string, max: number) =>
  z
    .number({ message: `${label} must be a number` })
    .gt(0, { message: `${label} must be above zero` })
    .max(max, { message: `${label} must be at most ${max}` });
const nonNegative = (label: string, max: number) =>
  z
    .number({ message: `${label} must be a number` })
    .min(0, { message: `${label} must be zero or more` })
    .max(max, { message: `${label} must be at most ${max}` });
const tempC = (label: string) =>
  z
    .number({ message: `${label} must be a number (°C)` })
    .min(-40, { message: `${label} must be at least −40 °C` })
    .max(150, { message: `${label} must be at most 150 °C` });

export const ResinUse = z.enum(['seal', 'deep_pour', 'casting', 'coating'], { message: 'use must be seal, deep_pour, casting or coating' });
export const RatioBasis = z.enum(['weight', 'volume'], { message: 'the ratio basis must be weight or volume' });

const resinSystemFields = {
  name: requiredText(120, 'name'),
  maker: text(120, 'maker').default(''),
  use: ResinUse,
  mixRatio: z.object({ a: positive('part A of the ratio', 1000), b: positive('part B of the ratio', 1000), basis: RatioBasis }),
  densityAGPerMl: positive('density of part A', 5),
  densityBGPerMl: positive('density of part B', 5),
  potLifeMin: positive('pot life', 10_000),
  gelTimeH: positive('gel time', 1000),
  tackFreeH: positive('tack-free time', 1000),
  recoatWindow: z.object({ earliestH: nonNegative('earliest recoat', 1000), latestH: positive('latest recoat', 10_000) }),
  demoldH: positive('demold time', 10_000),
  fullCureH: positive('full cure time', 10_000),
  readyToMachineH: positive('ready-to-machine time', 10_000).nullable().default(null),
  referenceTempC: tempC('reference temperature'),
  minWorkTempC: tempC('minimum working temperature'),
  maxWorkTempC: tempC('maximum working temperature'),
  maxLayerMm: positive('maximum layer thickness', 1000),
  maxBatchG: positive('maximum batch mass', 1_000_000),
  activationEnergyKJPerMol: positive('activation energy', 500).nullable().default(null),
  hardnessShoreD: positive('Shore D hardness', 100)
    .nullable()
    .default(null)
    .describe('the cured hardness the data sheet states; release then needs a cure check that reached it'),
  reactionHeatJPerG: positive('heat of reaction', 1500)
    .nullable()
    .default(null)
    .describe('J/g of mixed A + B, by DSC; null takes a published DGEBA/amine value (486 J/g). The exotherm forecast calibrates it to the data sheet'),
  thinFilmGelMin: positive('thin-film gel time', 43_200)
    .nullable()
    .default(null)
    .describe("minutes for a thin film to gel at the reference temperature; null takes the data sheet's gel time"),
  heatCapacityJPerGK: z
    .number({ message: 'heat capacity must be a number' })
    .min(0.5, { message: 'heat capacity must be at least 0.5 J/(g·K)' })
    .max(4, { message: 'heat capacity must be at most 4 J/(g·K)' })
    .nullable()
    .default(null)
    .describe('J/(g·K) of the mixed resin; null takes 1.5, typical of published cure models'),
  conductivityWPerMK: z
    .number({ message: 'thermal conductivity must be a number' })
    .min(0.05, { message: 'thermal conductivity must be at least 0.05 W/(m·K)' })
    .max(5, { message: 'thermal conductivity must be at most 5 W/(m·K)' })
    .nullable()
    .default(null)
    .describe('W/(m·K) of the cured resin; null takes 0.2, typical of unfilled polymers'),
  acceptedPeakC: z
    .number({ message: 'accepted peak temperature must be a number (°C)' })
    .max(300, { message: 'accepted peak temperature must be at most 300 °C' })
    .nullable()
    .default(null)
    .describe("°C: the hottest the shop lets a layer get; the forecast is calibrated so the data sheet's maximum layer peaks here. null takes 60 °C"),
  pricePerKit: nonNegative('price per kit', 1_000_000),
  kitSizeG: positive('kit size', 10_000_000),
  shelfLifeMonths: positive('shelf life', 600),
};

type TimesToCheck = {
  referenceTempC?: number;
  acceptedPeakC?: number | null;
  recoatWindow?: { earliestH: number; latestH: number };
  minWorkTempC?: number;
  maxWorkTempC?: number;
  potLifeMin?: number;
  gelTimeH?: number;
  tackFreeH?: number;
  demoldH?: number;
  readyToMachineH?: number | null;
  fullCureH?: number;
};

/** A cure runs in one order: gel, tack-free, demold, machinable, full cure. A data sheet typed out of order is refused. */
const cureOrder: { field: keyof TimesToCheck; words: string }[] = [
  { field: 'gelTimeH', words: 'gel' },
  { field: 'tackFreeH', words: 'tack-free' },
  { field: 'demoldH', words: 'demold' },
  { field: 'readyToMachineH', words: 'ready to machine' },
  { field: 'fullCureH', words: 'full cure' },
];

function timesOutOfOrder(v: TimesToCheck): { paths: string[]; message: string } | null {
  const given = cureOrder.filter(({ field }) => typeof v[field] === 'number') as { field: keyof TimesToCheck; words: string }[];
  for (let i = 0; i + 1 < given.length; i++) {
    const a = given[i]!;
    const b = given[i + 1]!;
    const ta = v[a.field] as number;
    const tb = v[b.field] as number;
    if (ta > tb)
      return {
        paths: [a.field, b.field],
        message: `${b.words} (${tb} h) comes before ${a.words} (${ta} h); a cure reaches gel, tack-free, demold, machining and full cure in that order — check the data sheet`,
      };
  }
  return null;
}

const resinSystemRules = <T extends z.ZodType<TimesToCheck>>(s: T) =>
  s
    .refine((v) => !v.recoatWindow || v.recoatWindow.earliestH <= v.recoatWindow.latestH, {
      message: 'the recoat window must open before it closes',
      path: ['recoatWindow'],
    })
    .refine((v) => v.minWorkTempC === undefined || v.maxWorkTempC === undefined || v.minWorkTempC < v.maxWorkTempC, {
      message: 'the minimum working temperature must be below the maximum',
      path: ['minWorkTempC'],
    })
    .refine((v) => v.potLifeMin === undefined || v.gelTimeH === undefined || v.potLifeMin <= v.gelTimeH * 60, {
      message: 'the pot life cannot be longer than the gel time: a mixed cup gels no later than a thin film does',
      path: ['potLifeMin'],
    })
    .refine((v) => v.acceptedPeakC === undefined || v.acceptedPeakC === null || v.referenceTempC === undefined || v.acceptedPeakC > v.referenceTempC, {
      message: "the accepted peak temperature must be above the reference temperature: a layer poured at the data sheet's temperature warms, it never cools",
      path: ['acceptedPeakC'],
    })
    .superRefine((v, ctx) => {
      const wrong = timesOutOfOrder(v);
      // Either time may be the slip: both fields carry the sentence.
      for (const path of wrong?.paths ?? []) ctx.addIssue({ code: 'custom', message: wrong!.message, path: [path] });
    });

export const ResinSystemInput = resinSystemRules(z.object(resinSystemFields).strict());
export type ResinSystemInput = z.input<typeof ResinSystemInput>;

export const ResinSystemView = z.object({
  id: Id,
  ...resinSystemFields,
  name: z.string(),
  maker: z.string(),
  readyToMachineH: z.number().nullable(),
  activationEnergyKJPerMol: z.number().nullable(),
  hardnessShoreD: z.number().nullable(),
  reactionHeatJPerG: z.number().nullable(),
  thinFilmGelMin: z.number().nullable(),
  heatCapacityJPerGK: z.number().nullable(),
  conductivityWPerMK: z.number().nullable(),
  acceptedPeakC: z.number().nullable(),
  /** What the exotherm forecast uses for each setting: the shelf's value, or the named default when it is empty. */
  exothermSettings: z
    .record(
      z.enum(['reactionHeatJPerG', 'thinFilmGelMin', 'heatCapacityJPerGK', 'conductivityWPerMK', 'acceptedPeakC', 'activationEnergyKJPerMol']),
      z.object({ value: z.number(), isDefault: z.boolean(), source: z.string() }),
    )
    .describe('per setting: the value the forecast uses, whether it is a default, and where it comes from'),
  /** The activation energy the cure model uses: the data sheet's, or the common-practice default. */
  effectiveActivationEnergyKJPerMol: z.number(),
  archived: z.boolean(),
  updatedAt: Timestamp,
});
export type ResinSystemView = z.infer<typeof ResinSystemView>;

export const PigmentKind = z.enum(['powder', 'paste', 'liquid'], { message: 'kind must be powder, paste or liquid' });

const pigmentFields = {
  name: requiredText(120, 'name'),
  kind: PigmentKind,
  densityGPerMl: positive('pigment density', 25).describe('g/mL: the pigment takes its own volume in the pour'),
  recommendedPct: nonNegative('recommended loading', 100).describe('% of part A + part B by mass'),
  maxPct: positive('maximum loading', 100).describe('% of part A + part B by mass'),
  pricePerPack: nonNegative('price per pack', 1_000_000),
  packSizeG: positive('pack size', 1_000_000),
};
export const PigmentInput = z
  .object(pigmentFields)
  .strict()
  .refine((v) => v.recommendedPct <= v.maxPct, { message: 'the recommended loading cannot be above the maximum', path: ['recommendedPct'] });
export type PigmentInput = z.input<typeof PigmentInput>;

export const PigmentView = z.object({ id: Id, ...pigmentFields, name: z.string(), archived: z.boolean(), updatedAt: Timestamp });
export type PigmentView = z.infer<typeof PigmentView>;

export const LotPart = z.enum(['A', 'B', 'pigment'], { message: 'part must be A, B or pigment' });
const IsoDate = z.iso.date({ message: 'must be a date like 2026-12-01' });

export const LotInput = z
  .object({
    part: LotPart,
    resinSystemId: Id.nullable().default(null),
    pigmentId: Id.nullable().default(null),
    lotNumber: requiredText(80, 'lot number'),
    quantityG: positive('quantity', 10_000_000),
    receivedOn: IsoDate,
    expiresOn: IsoDate.nullable().default(null),
    notes: text(1000, 'notes').default(''),
  })
  .strict()
  .refine((v) => (v.part === 'pigment' ? v.pigmentId && !v.resinSystemId : v.resinSystemId && !v.pigmentId), {
    message: 'a part A or B lot names its resin system; a pigment lot names its pigment',
    path: ['part'],
  })
  .refine((v) => !v.expiresOn || v.expiresOn >= v.receivedOn, { message: 'a lot cannot expire before it was received', path: ['expiresOn'] });
export type LotInput = z.input<typeof LotInput>;

export const LotUpdate = z
  .object({
    lotNumber: requiredText(80, 'lot number'),
    remainingG: nonNegative('remaining quantity', 10_000_000),
    expiresOn: IsoDate.nullable(),
    notes: text(1000, 'notes'),
  })
  .partial()
  .strict();

export const LotView = z.object({
  id: Id,
  part: LotPart,
  resinSystemId: Id.nullable(),
  pigmentId: Id.nullable(),
  productName: z.string(),
  lotNumber: z.string(),
  quantityG: z.number(),
  remainingG: z.number(),
  receivedOn: z.string(),
  expiresOn: z.string().nullable(),
  notes: z.string(),
  expired: z.boolean(),
  low: z.boolean().describe('less than a tenth of what was received is left'),
});
export type LotView = z.infer<typeof LotView>;

export const SortDirection = z.enum(['asc', 'desc'], { message: 'dir must be asc or desc' });
export type SortDirection = z.infer<typeof SortDirection>;

/** The columns the shelf's tables sort by; the whole shelf is sorted before it is paged. */
export const ResinSystemSort = z.enum(['name', 'use', 'potLife', 'maxLayer', 'maxBatch', 'pricePerKg'], {
  message: 'sort must be name, use, potLife, maxLayer, maxBatch or pricePerKg',
});
export type ResinSystemSort = z.infer<typeof ResinSystemSort>;
export const PigmentSort = z.enum(['name', 'kind', 'recommendedLoading', 'maxLoading', 'pricePerKg'], {
  message: 'sort must be name, kind, recommendedLoading, maxLoading or pricePerKg',
});
export type PigmentSort = z.infer<typeof PigmentSort>;
export const LotSort = z.enum(['lotNumber', 'product', 'part', 'remaining', 'received', 'expires', 'state'], {
  message: 'sort must be lotNumber, product, part, remaining, received, expires or state',
});
export type LotSort = z.infer<typeof LotSort>;

const pageWindow = {
  limit: z.coerce.number().int().min(1).max(500).default(100),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
};

/** What the resin-system and pigment lists share; each list adds the columns it sorts by. */
export const ShelfListQuery = z
  .object({
    q: text(120, 'search').optional(),
    includeArchived: z.enum(['true', 'false']).optional(),
    ...pageWindow,
  })
  .strict();

export const ResinSystemListQuery = ShelfListQuery.extend({ sort: ResinSystemSort.optional(), dir: SortDirection.default('asc') });
export const PigmentListQuery = ShelfListQuery.extend({ sort: PigmentSort.optional(), dir: SortDirection.default('asc') });

export const LotListQuery = z
  .object({
    q: text(120, 'search').optional(),
    part: LotPart.optional(),
    productId: Id.optional(),
    status: z.enum(['all', 'in_stock', 'low', 'expired']).default('all'),
    sort: LotSort.optional(),
    dir: SortDirection.default('asc'),
    ...pageWindow,
  })
  .strict();

export const Page = <T extends z.ZodType>(item: T) => z.object({ items: z.array(item), total: z.number().int() });

/** One cup that drew on a lot: which pour and piece it went into, how much was weighed, who mixed it and when. */
export const LotUse = z.object({
  batchId: Id,
  pourId: Id,
  piece: z.object({ id: Id, name: z.string() }),
  planName: z.string(),
  /** The plan's step the cup belongs to, e.g. layer:2 or seal_coat:1. */
  step: z.string(),
  planBatchIndex: z.number().int(),
  part: LotPart,
  weighedG: z.number(),
  mixedAt: Timestamp,
  mixedBy: UserRef.nullable(),
  voided: z.boolean().describe('the batch was voided after it was logged: kept for the record, not counted'),
});
export type LotUse = z.infer<typeof LotUse>;

export const LotUsesQuery = z.object(pageWindow).strict();
