import { z } from 'zod';
import { Id, requiredText } from './common';

export const UnitSystem = z.enum(['metric', 'us']);
export type UnitSystem = z.infer<typeof UnitSystem>;

export const ScaleResolutionG = z.union([z.literal(0.1), z.literal(1)], {
  message: 'scale resolution must be 0.1 or 1 (grams)',
});

/** An IANA time zone the runtime knows (Intl rejects a name it cannot place). */
export const TimeZone = z
  .string({ message: 'the time zone must be text, such as America/Vancouver' })
  .trim()
  .min(1, { message: 'the time zone is required, such as America/Vancouver' })
  .max(64, { message: 'the time zone must be at most 64 characters' })
  .refine(
    (zone) => {
      try {
        new Intl.DateTimeFormat('en', { timeZone: zone });
        return true;
      } catch {
        return false;
      }
    },
    { message: 'the time zone is not one Gelpoint knows; use an IANA name such as America/Vancouver or Europe/Berlin' },
  );

const hour = (label: string) =>
  z
    .number({ message: `${label} must be a whole hour from 0 to 23` })
    .int({ message: `${label} must be a whole hour from 0 to 23` })
    .min(0, { message: `${label} must be a whole hour from 0 to 23` })
    .max(23, { message: `${label} must be a whole hour from 0 to 23` });
const profileTemp = (label: string) =>
  z
    .number({ message: `${label} must be a number (°C)` })
    .min(-30, { message: `${label} must be at least −30 °C` })
    .max(60, { message: `${label} must be at most 60 °C` });

export const ShopTemperatureProfile = z
  .discriminatedUnion(
    'mode',
    [
      z.object({ mode: z.literal('plan') }).strict(),
      z
        .object({
          mode: z.literal('day_night'),
          dayTempC: profileTemp('the day temperature'),
          nightTempC: profileTemp('the night temperature'),
          dayStartHour: hour('the hour the day starts'),
          nightStartHour: hour('the hour the night starts'),
        })
        .strict()
        .refine((p) => p.dayStartHour !== p.nightStartHour, { message: 'day and night must start at different hours', path: ['nightStartHour'] }),
      z.object({ mode: z.literal('learned') }).strict(),
    ],
    { message: "the temperature profile's mode must be plan, day_night or learned" },
  )
  .describe("where nothing is logged: the plan's shop temperature, day and night at local hours, or learned from the last 7 days of readings");
export type ShopTemperatureProfile = z.infer<typeof ShopTemperatureProfile>;
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
  timeZone: z.string().describe('IANA zone the shop lives in; every time shown or mailed uses it'),
  temperatureProfile: ShopTemperatureProfile,
  dayStartHour: z.number().int().describe('local hour the working day starts: the morning digest goes out, quiet hours end'),
  quietFromHour: z.number().int().describe('local hour quiet hours start: reminders due after it wait for the morning digest'),
  currency: z.string().describe('ISO 4217 code every cost and price of the shop is in'),
});
export type Shop = z.infer<typeof Shop>;

export const UpdateShopRequest = z
  .object({
    name: requiredText(120, 'shop name'),
    unitSystem: UnitSystem,
    scaleResolutionG: ScaleResolutionG,
    offRatioTolerancePct: z
      .number({ message: 'the off-ratio tolerance must be a number (%)' })
      .min(0.5, { message: 'the off-ratio tolerance must be at least 0.5 %' })
      .max(20, { message: 'the off-ratio tolerance must be at most 20 %' }),
    readingCarryH: z
      .number({ message: 'how long a reading speaks for must be a number of hours' })
      .min(0, { message: 'how long a reading speaks for cannot be negative' })
      .max(48, { message: 'how long a reading speaks for must be at most 48 h' }),
    timeZone: TimeZone,
    temperatureProfile: ShopTemperatureProfile,
    dayStartHour: hour('the hour the working day starts'),
    quietFromHour: hour('the hour quiet hours start'),
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
