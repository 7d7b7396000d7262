import { z } from 'zod';
import { Id, requiredText } from './common';

export const UnitSystem = z.enum(['metric', 'us']);
export type UnitSystem = z.infer<typeof UnitSystem>;

export const ScaleResolutionG = z.union([z.literal(0.1), z.literal(1)], {
  message: 'scale resolution must be 0.1 or 1 (grams)',
});

/** The ISO 4217 codes this runtime can format (ECMA-402 Intl.supportedValuesOf), read once. */
const knownCurrencies: ReadonlySet<string> = new Set(Intl.supportedValuesOf('currency'));

export const CurrencyCode = z
  .string({ message: 'the currency must be a three-letter ISO 4217 code, e.g. USD, CAD or MXN' })
  .trim()
  .toUpperCase()
  .refine((code) => knownCurrencies.has(code), {
    message: 'the currency must be a three-letter ISO 4217 code in use, e.g. USD, CAD or MXN',
  });

export const Shop = z.object({
  id: Id,
  name: z.string(),
  unitSystem: UnitSystem,
  scaleResolutionG: z.number(),
  offRatioTolerancePct: z.number().describe('weighed A:B may differ from the product ratio by this much before a batch is flagged'),
  readingCarryH: z.number().describe('how long one temperature reading speaks for on either side of it; beyond, the cure log has a gap'),
  windowCloseLeadMin: z.number().int().describe('closing pour windows are announced this many minutes before they close'),
  currency: z.string().describe('ISO 4217 code every cost and price of the shop is in'),
});
export type Shop = z.infer<typeof Shop>;

export const UpdateShopRequest = z
  .object({
    name: requiredText(120, 'shop name'),
    unitSystem: UnitSystem,
    scaleResolutionG: ScaleResolutionG,
    offRatioTolerancePct: z.number({ message: 'the off-ratio tolerance must be a number (%)' }).min(0.5, { message: 'the off-ratio tolerance must be at least 0.5 %' }).max(20, { message: 'the off-ratio tolerance must be at most 20 %' }),
    readingCarryH: z.number({ message: 'how long a reading speaks for must be a number of hours' }).min(0, { message: 'how long a reading speaks for cannot be negative' }).max(48, { message: 'how long a reading speaks for must be at most 48 h' }),
    windowCloseLeadMin: z
      .number({ message: 'the warning before a window closes must be a number of minutes' })
      .int({ message: 'the warning before a window closes must be whole minutes' })
      .min(0, { message: 'the warning before a window closes cannot be negative' })
      .max(720, { message: 'the warning before a window closes must be at most 720 min (12 h)' }),
    currency: CurrencyCode,
  })
  .partial()
  .strict();
export type UpdateShopRequest = z.infer<typeof UpdateShopRequest>;
