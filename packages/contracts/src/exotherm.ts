import { z } from 'zod';

const num = (label: string, unit: string) =>
  z.number({ message: `${label} must be a number (${unit})` }).refine(Number.isFinite, { message: `${label} must be finite` });

/** One layer's forecast, with the inputs of `gelpoint exotherm` (same names, in JSON). */
export const ExothermRequest = z
  .object({
    depthMm: num('depthMm', 'mm').describe('depth of the layer (mm)'),
    ambientC: num('ambientC', '°C').describe('the shop temperature, which the mix starts at too (°C)'),
    reactionHeatJG: num('reactionHeatJG', 'J/g').describe('heat of reaction of the mixed system (J/g, by DSC)'),
    activationKJMol: num('activationKJMol', 'kJ/mol').describe('activation energy of the cure (kJ/mol)'),
    refTempC: num('refTempC', '°C').describe('temperature the gel time is given at (°C)'),
    gelMin: num('gelMin', 'min').describe('isothermal gel time of a thin film at refTempC (minutes)'),
    densityGMl: num('densityGMl', 'g/mL').optional().describe('mixed density (g/mL); 1.1 when absent'),
    heatCapacityJGK: num('heatCapacityJGK', 'J/(g·K)').optional().describe('heat capacity (J/(g·K)); 1.5 when absent'),
    conductivityWMK: num('conductivityWMK', 'W/(m·K)').optional().describe('thermal conductivity (W/(m·K)); 0.2 when absent'),
    base: z.enum(['wood', 'insulated'], { message: 'base must be wood or insulated' }).optional().describe('bare wood (default) or an insulated base'),
    limitC: num('limitC', '°C').optional().describe('with a limit, the answer also gives maxLayerMm, the deepest single layer whose peak stays at or under it'),
  })
  .strict();
export type ExothermRequest = z.input<typeof ExothermRequest>;

/** The same fields as `gelpoint exotherm --json`. */
export const ExothermAnswer = z.object({
  peakC: z.number(),
  timeToPeakMin: z.number().describe('minutes from mixing to the peak'),
  peakDepthMm: z.number().describe('depth of the hottest point below the resin surface (mm)'),
  model: z.string().describe('the rate law and the numerical scheme, in words'),
  maxLayerMm: z.number().optional(),
  maxLayerPeakC: z.number().optional(),
  limitC: z.number().optional(),
  depthMm: z.number(),
  ambientC: z.number(),
  base: z.enum(['wood', 'insulated']),
  adiabaticRiseK: z.number(),
  runaway: z.boolean(),
  reachedTimeLimit: z.boolean(),
  caution: z.string(),
});
export type ExothermAnswer = z.infer<typeof ExothermAnswer>;
