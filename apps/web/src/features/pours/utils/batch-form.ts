import type { LogBatchRequest } from '@gelpoint/contracts';
import { readDecimal, type UnitSystem } from '@gelpoint/core';
import { z } from 'zod';
import { inputUnitsOf, massToGrams, temperatureToC } from './shop-units';

/** The select's value for "the lot is not listed, I'll type its number". */
export const typedLot = 'typed';

export interface BatchFormInput {
  lotA: string;
  lotANumber: string;
  lotB: string;
  lotBNumber: string;
  lotPigment: string;
  lotPigmentNumber: string;
  weighedA: string;
  weighedB: string;
  weighedPigment: string;
  ambientTemp: string;
  surfaceTemp: string;
  rh: string;
  notes: string;
  acknowledgeExpiredLot: boolean;
}

export const batchFormFields = [
  'lotA',
  'lotANumber',
  'lotB',
  'lotBNumber',
  'lotPigment',
  'lotPigmentNumber',
  'weighedA',
  'weighedB',
  'weighedPigment',
  'ambientTemp',
  'surfaceTemp',
  'rh',
  'notes',
] as const;

export const emptyBatchForm: BatchFormInput = {
  lotA: '',
  lotANumber: '',
  lotB: '',
  lotBNumber: '',
  lotPigment: '',
  lotPigmentNumber: '',
  weighedA: '',
  weighedB: '',
  weighedPigment: '',
  ambientTemp: '',
  surfaceTemp: '',
  rh: '',
  notes: '',
  acknowledgeExpiredLot: false,
};

// The API's limits (packages/contracts pours.ts), checked here in the shop's units so the sentence can say what to type.
const maxGrams = 1_000_000;
const tempRangeC = { min: -30, max: 80 };

/** positive: above zero; present: typed, zero allowed (a cup's pigment); optional: blank means none. */
type WeighedRule = 'positive' | 'present' | 'optional';

function weighedField(label: string, unitSystem: UnitSystem, rule: WeighedRule) {
  const unit = inputUnitsOf(unitSystem).mass;
  const required = rule === 'positive';
  return z.string().transform((text, ctx) => {
    const value = readDecimal(text);
    if (value === null) {
      if (text.trim() === '' && rule === 'optional') return 0;
      if (text.trim() === '' && rule === 'present') {
        ctx.addIssue({ code: 'custom', message: `This cup takes pigment: enter the ${label} the scale showed, in ${unit} (0 if you left it out).` });
        return z.NEVER;
      }
      ctx.addIssue({ code: 'custom', message: `Enter the ${label} the scale showed, in ${unit}, such as ${unit === 'g' ? '212.4' : '7.49'}.` });
      return z.NEVER;
    }
    const grams = massToGrams(value, unitSystem);
    if (required ? !(grams > 0) : grams < 0) {
      ctx.addIssue({
        code: 'custom',
        message: `The ${label} must be ${required ? 'above zero' : 'zero or more'}; weigh it again and enter what the scale shows.`,
      });
      return z.NEVER;
    }
    if (grams > maxGrams) {
      ctx.addIssue({ code: 'custom', message: `The ${label} is more than any cup holds; check the scale's unit and enter it again.` });
      return z.NEVER;
    }
    return grams;
  });
}

function temperatureField(label: string, unitSystem: UnitSystem) {
  const unit = inputUnitsOf(unitSystem).temperature;
  return z.string().transform((text, ctx) => {
    if (text.trim() === '') return null;
    const value = readDecimal(text);
    if (value === null) {
      ctx.addIssue({ code: 'custom', message: `Enter the ${label} as a number in ${unit}, or leave it empty.` });
      return z.NEVER;
    }
    const tempC = temperatureToC(value, unitSystem);
    if (tempC < tempRangeC.min || tempC > tempRangeC.max) {
      ctx.addIssue({
        code: 'custom',
        message: `The ${label} must be between ${unitSystem === 'us' ? '−22 °F and 176 °F' : '−30 °C and 80 °C'}; check the thermometer's unit.`,
      });
      return z.NEVER;
    }
    return tempC;
  });
}

const humidityField = z.string().transform((text, ctx) => {
  if (text.trim() === '') return null;
  const value = readDecimal(text);
  if (value === null || value < 0 || value > 100) {
    ctx.addIssue({ code: 'custom', message: 'Enter the relative humidity from the hygrometer, 0 to 100 %, or leave it empty.' });
    return z.NEVER;
  }
  return value;
});

const lotNumber = z.string().trim().max(80, { message: 'A lot number has at most 80 characters; copy it from the label.' });

/** The mixing form's rules for a shop's units; its output is in grams, °C and %. */
export function batchFormSchema(unitSystem: UnitSystem, { pigmentRequired = false }: { pigmentRequired?: boolean } = {}) {
  return z.object({
    lotA: z.string(),
    lotANumber: lotNumber,
    lotB: z.string(),
    lotBNumber: lotNumber,
    lotPigment: z.string(),
    lotPigmentNumber: lotNumber,
    weighedA: weighedField('weighed part A', unitSystem, 'positive'),
    weighedB: weighedField('weighed part B', unitSystem, 'positive'),
    weighedPigment: weighedField('weighed pigment', unitSystem, pigmentRequired ? 'present' : 'optional'),
    ambientTemp: temperatureField('air temperature', unitSystem),
    surfaceTemp: temperatureField('surface temperature', unitSystem),
    rh: humidityField,
    notes: z.string().trim().max(2000, { message: 'Notes have at most 2000 characters; shorten them.' }),
    acknowledgeExpiredLot: z.boolean(),
  });
}

export type BatchFormValues = z.output<ReturnType<typeof batchFormSchema>>;

function lotOf(choice: string, typed: string, listedLotIds: ReadonlySet<string>): { id: string | null; number: string } {
  if (choice !== '' && choice !== typedLot && listedLotIds.has(choice)) return { id: choice, number: '' };
  return { id: null, number: typed.trim() };
}

/** The batch as the API takes it: a listed lot by its id, a typed one by its number. */
export function logBatchRequest(
  values: BatchFormValues,
  planBatchIndex: number,
  listedLotIds: ReadonlySet<string>,
  mixedAt: string | null,
  confirmUnusual = false,
): LogBatchRequest {
  const a = lotOf(values.lotA, values.lotANumber, listedLotIds);
  const b = lotOf(values.lotB, values.lotBNumber, listedLotIds);
  const pigment = lotOf(values.lotPigment, values.lotPigmentNumber, listedLotIds);
  return {
    planBatchIndex,
    ...(mixedAt ? { mixedAt } : {}),
    lotAId: a.id,
    lotBId: b.id,
    lotPigmentId: pigment.id,
    lotANumber: a.number,
    lotBNumber: b.number,
    lotPigmentNumber: pigment.number,
    weighedAG: values.weighedA,
    weighedBG: values.weighedB,
    weighedPigmentG: values.weighedPigment,
    ambientTempC: values.ambientTemp,
    surfaceTempC: values.surfaceTemp,
    rhPct: values.rh,
    notes: values.notes,
    acknowledgeExpiredLot: values.acknowledgeExpiredLot,
    confirmUnusual,
  };
}

/** The live readings of a half-filled form, in grams and °C; null where nothing readable is typed yet. */
export function liveReadings(values: Pick<BatchFormInput, 'weighedA' | 'weighedB' | 'ambientTemp' | 'surfaceTemp' | 'rh'>, unitSystem: UnitSystem) {
  const mass = (text: string) => {
    const v = readDecimal(text);
    return v === null ? null : massToGrams(v, unitSystem);
  };
  const temp = (text: string) => {
    const v = readDecimal(text);
    return v === null ? null : temperatureToC(v, unitSystem);
  };
  return {
    weighedAG: mass(values.weighedA),
    weighedBG: mass(values.weighedB),
    ambientTempC: temp(values.ambientTemp),
    surfaceTempC: temp(values.surfaceTemp),
    rhPct: readDecimal(values.rh),
  };
}

// The API names fields as the request does; the form names them as the person sees them.
const requestToFormField: Record<string, (typeof batchFormFields)[number]> = {
  lotAId: 'lotA',
  lotBId: 'lotB',
  lotPigmentId: 'lotPigment',
  lotANumber: 'lotANumber',
  lotBNumber: 'lotBNumber',
  lotPigmentNumber: 'lotPigmentNumber',
  weighedAG: 'weighedA',
  weighedBG: 'weighedB',
  weighedPigmentG: 'weighedPigment',
  ambientTempC: 'ambientTemp',
  surfaceTempC: 'surfaceTemp',
  rhPct: 'rh',
  notes: 'notes',
};

/** The server's field messages under the names of the form's own fields; unknown names are kept as they are. */
export function formFieldsOf(fields: Readonly<Record<string, string>>): Record<string, string> {
  return Object.fromEntries(Object.entries(fields).map(([name, message]) => [requestToFormField[name] ?? name, message]));
}
