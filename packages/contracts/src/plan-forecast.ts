import { z } from 'zod';

const ForecastLayer = z.object({
  index: z.number().int().describe('0-based, from the floor up'),
  thicknessMm: z.number(),
  peakC: z.number().describe('forecast peak temperature of the layer (°C), at its hottest spot'),
  timeToPeakMin: z.number().describe('minutes from mixing to the peak'),
  peakDepthMm: z.number().describe('depth of the hottest point below the resin surface (mm)'),
  hottest: z
    .object({ xMm: z.number(), yMm: z.number() })
    .optional()
    .describe("a mould's hottest column, in the mould's own frame (mm); absent for a quick shape"),
  overLimit: z.boolean().describe('the forecast peak is above the accepted peak'),
  runaway: z.boolean().describe('the layer reaches its adiabatic ceiling: the resin would smoke before the peak shown'),
  curve: z.array(z.object({ timeMin: z.number(), tempC: z.number() })).describe('temperature against time at the hottest spot'),
});

/** 1 as first stored; 2 adds a mould's peak map and reads the same otherwise. */
const ForecastVersion = z.union([z.literal(1), z.literal(2)]);

/** The exotherm forecast of a plan's deep-pour layers: an estimate calibrated to the data sheet. */
export const PlanForecast = z
  .discriminatedUnion('available', [
    z.object({
      version: ForecastVersion,
      available: z.literal(true),
      model: z.string().describe('the rate law and the numerical scheme, in words'),
      calibratedTo: z.string().describe('the data-sheet point the model reproduces, in words'),
      calibration: z.object({ maxLayerMm: z.number(), tempC: z.number(), heatScale: z.number() }),
      limitC: z.number().describe('the accepted peak (°C)'),
      shopTempC: z.number(),
      maxLayerMm: z.number().describe("the thickest single layer on bare wood at the shop's temperature, never above the data sheet's"),
      limitedBy: z.enum(['data_sheet', 'forecast']),
      defaultsUsed: z
        .array(z.enum(['reactionHeatJPerG', 'thinFilmGelMin', 'heatCapacityJPerGK', 'conductivityWPerMK', 'acceptedPeakC', 'activationEnergyKJPerMol']))
        .describe('shelf settings that were empty and took their default'),
      layers: z.array(ForecastLayer),
      peakMap: z
        .object({
          bands: z
            .array(z.object({ upToMm: z.number(), peakC: z.number() }))
            .describe('resin depth bands, shallow to deep: a column peaks at the peakC of the first band whose upToMm is at or above its depth'),
          hottest: z
            .object({ xMm: z.number(), yMm: z.number(), layerIndex: z.number().int(), peakC: z.number(), timeToPeakMin: z.number() })
            .describe("the hottest column of the pour, in the mould's own frame (mm)"),
        })
        .optional()
        .describe("a mould's forecast peak temperature by resin depth (version 2); absent for a quick shape and in version 1"),
    }),
    z.object({
      version: ForecastVersion,
      available: z.literal(false),
      code: z.string(),
      reason: z.string().describe('why there is no forecast, in a sentence'),
    }),
  ])
  .describe('the exotherm forecast; plans saved before it existed have none');
export type PlanForecast = z.infer<typeof PlanForecast>;
