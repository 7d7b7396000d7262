import { dgebaAmineDefaults, type ResinThermal } from './resin-thermal';
import { forecastLayer, maxLayerDepth, type LayerForecast, type MaxLayer } from './layer-forecast';
import { ok, type Result } from './result';

/** Printed with every single-layer answer, by the CLI and the API alike. */
export const exothermCaution = 'Estimate only: the model cannot see your product; follow its SDS and TDS for layer thickness and safe handling.';

/** One layer poured at the shop's temperature, the mix at that temperature too: what `gelpoint exotherm` and POST /api/exotherm take. */
export interface SingleLayerInput {
  depthMm: number;
  ambientC: number;
  reactionHeatJPerG: number;
  activationEnergyKJPerMol: number;
  refTempC: number;
  /** Isothermal gel time of a thin film at refTempC. */
  gelTimeMin: number;
  densityGPerMl?: number | undefined;
  heatCapacityJPerGK?: number | undefined;
  conductivityWPerMK?: number | undefined;
  base?: 'wood' | 'insulated' | undefined;
  /** With a limit, also the deepest single layer that stays at or under it. */
  limitC?: number | undefined;
}

export interface SingleLayerForecast {
  forecast: LayerForecast;
  max: MaxLayer | null;
  base: 'wood' | 'insulated';
}

/** The forecast of one layer, and with a limit the deepest layer under it; the missing material values take dgebaAmineDefaults. */
export function forecastSingleLayer(input: SingleLayerInput): Result<SingleLayerForecast> {
  const resin: ResinThermal = {
    reactionHeatJPerG: input.reactionHeatJPerG,
    activationEnergyKJPerMol: input.activationEnergyKJPerMol,
    refTempC: input.refTempC,
    gelTimeMin: input.gelTimeMin,
    densityGPerMl: input.densityGPerMl ?? dgebaAmineDefaults.densityGPerMl,
    heatCapacityJPerGK: input.heatCapacityJPerGK ?? dgebaAmineDefaults.heatCapacityJPerGK,
    conductivityWPerMK: input.conductivityWPerMK ?? dgebaAmineDefaults.conductivityWPerMK,
  };
  const base = input.base ?? 'wood';
  const conditions = { ambient: input.ambientC, base } as const;
  const forecast = forecastLayer(resin, conditions, input.depthMm, { series: false });
  if (!forecast.ok) return forecast;
  if (input.limitC === undefined) return ok({ forecast: forecast.value, max: null, base });
  const max = maxLayerDepth(resin, conditions, input.limitC);
  if (!max.ok) return max;
  return ok({ forecast: forecast.value, max: max.value, base });
}
