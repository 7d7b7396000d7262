import { ExothermAnswer, ExothermRequest, exothermRoutes as routes } from '@gelpoint/contracts';
import { exothermCaution, forecastSingleLayer } from '@gelpoint/thermal';
import type { z } from 'zod';
import { AppError } from '../../http/errors';
import type { RouteRegistry } from '../../http/route-registry';

/** One layer's forecast, the numbers of `gelpoint exotherm --json` for the same inputs. */
export function exothermAnswer(body: z.output<typeof ExothermRequest>): ExothermAnswer {
  const answer = forecastSingleLayer({
    depthMm: body.depthMm,
    ambientC: body.ambientC,
    reactionHeatJPerG: body.reactionHeatJG,
    activationEnergyKJPerMol: body.activationKJMol,
    refTempC: body.refTempC,
    gelTimeMin: body.gelMin,
    densityGPerMl: body.densityGMl,
    heatCapacityJPerGK: body.heatCapacityJGK,
    conductivityWPerMK: body.conductivityWMK,
    base: body.base,
    limitC: body.limitC,
  });
  if (!answer.ok) throw new AppError('bad_request', answer.error.code, answer.error.message);
  const { forecast: f, max, base } = answer.value;
  return {
    peakC: f.peakC,
    timeToPeakMin: f.timeToPeakMin,
    peakDepthMm: f.peakDepthMm,
    model: f.model,
    ...(max ? { maxLayerMm: max.maxLayerMm, maxLayerPeakC: max.peakC, limitC: max.limitC } : {}),
    depthMm: f.depthMm,
    ambientC: body.ambientC,
    base,
    adiabaticRiseK: f.adiabaticRiseK,
    runaway: f.runaway,
    reachedTimeLimit: f.reachedTimeLimit,
    caution: exothermCaution,
  };
}

export function exothermRoutes(api: RouteRegistry): void {
  api.implement(routes, { forecastExotherm: ({ body }) => exothermAnswer(body) });
}
