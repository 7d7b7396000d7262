import { readDecimal, type UnitSystem } from '@gelpoint/core';
import { z } from 'zod';
import { localInputToIso } from './local-time';
import { inputUnitsOf, temperatureToC } from './shop-units';

export interface ReadingFormInput {
  at: string;
  temp: string;
}

/** One temperature typed off the shop thermometer; out in ISO time and °C for the API. */
export function readingFormSchema(unitSystem: UnitSystem) {
  const unit = inputUnitsOf(unitSystem).temperature;
  return z.object({
    at: z.string().transform((text, ctx) => {
      const iso = localInputToIso(text);
      if (iso === null) {
        ctx.addIssue({ code: 'custom', message: 'Enter the date and time the thermometer was read.' });
        return z.NEVER;
      }
      return iso;
    }),
    temp: z.string().transform((text, ctx) => {
      const value = readDecimal(text);
      if (value === null) {
        ctx.addIssue({ code: 'custom', message: `Enter the temperature in ${unit}, such as ${unit === '°C' ? '19.5' : '67'}.` });
        return z.NEVER;
      }
      const tempC = temperatureToC(value, unitSystem);
      if (tempC < -30 || tempC > 80) {
        ctx.addIssue({
          code: 'custom',
          message: `The temperature must be between ${unitSystem === 'us' ? '−22 °F and 176 °F' : '−30 °C and 80 °C'}; check the thermometer's unit.`,
        });
        return z.NEVER;
      }
      return tempC;
    }),
  });
}

export type ReadingFormValues = z.output<ReturnType<typeof readingFormSchema>>;

export interface CureCheckFormInput {
  stage: string;
  checkedAt: string;
  hardness: string;
  note: string;
}

export const cureCheckStages = ['liquid', 'gelled', 'tack_free', 'demoldable', 'machinable'] as const;

export const cureCheckFormSchema = z.object({
  stage: z.string().pipe(z.enum(cureCheckStages, { message: 'Choose what the resin was like when you checked it.' })),
  checkedAt: z.string().transform((text, ctx) => {
    const iso = localInputToIso(text);
    if (iso === null) {
      ctx.addIssue({ code: 'custom', message: 'Enter the date and time of the check.' });
      return z.NEVER;
    }
    return iso;
  }),
  hardness: z.string().transform((text, ctx) => {
    if (text.trim() === '') return null;
    const value = readDecimal(text);
    if (value === null || value < 0 || value > 100) {
      ctx.addIssue({ code: 'custom', message: 'Shore D hardness runs 0 to 100; enter the durometer reading, or leave it empty.' });
      return z.NEVER;
    }
    return value;
  }),
  note: z.string().trim().max(2000, { message: 'A note has at most 2000 characters; shorten it.' }),
});

export type CureCheckFormValues = z.output<typeof cureCheckFormSchema>;
