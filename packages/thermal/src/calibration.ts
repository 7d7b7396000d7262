import { checkDepthMm, maxLayerPrepared } from './layer-forecast';
import { prepareLayerModel, runLayer, type LayerModel, type Numerics, type PourConditions } from './layer-model';
import type { ResinThermal } from './resin-thermal';
import { fail, ok, type Result } from './result';

/** The data sheet's own exotherm statement: at most this thick a layer, poured at this temperature. */
export interface DataSheetLimit {
  maxLayerMm: number;
  tempC: number;
}

/** How the layer is poured, apart from the air (calibration uses the data sheet's temperature for that). */
export type PourSetting = Omit<PourConditions, 'ambient' | 'mixTempC' | 'baseTempC' | 'curedResinBelowMm' | 'minutesMixedBeforePour'>;

export interface Calibration {
  /** The resin with heatScale set; use it for every forecast of this product. */
  resin: ResinThermal;
  heatScale: number;
  /** What the model was calibrated to, for people, to show beside its numbers. */
  sentence: string;
}

function num(n: number, digits = 1): string {
  return Number(n.toFixed(digits)).toString();
}

function peakWithScale(base: LayerModel, scale: number, depthMm: number, limitC: number, options: Numerics): number {
  const model: LayerModel = { ...base, reactionHeatJPerM3: (base.reactionHeatJPerM3 / (base.resin.heatScale ?? 1)) * scale };
  return runLayer(model, depthMm, { ...options, stopAboveC: limitC }).run.peakC;
}

const lowestScale = 1e-3;
const peakToleranceK = 0.005;
const highestScale = 8;

/**
 * Fits one uncertain number so that a layer of exactly the data sheet's maximum thickness, poured
 * on this base at the data sheet's temperature (mix, air and base alike), peaks exactly at the
 * shop's accepted peak. The number fitted is a factor on the heat of reaction: the data sheet gives
 * the gel time (so the kinetics stay tied to it, and with them every "when"), while the heat per
 * gram of a commercial mix is rarely published and moves with its fillers and non-reactive
 * diluents, which is what makes one product safe at a depth where another runs away. The factor
 * also absorbs what the heat-loss model gets wrong at that point, so forecasts then extrapolate
 * only in temperature and geometry from a point the product's maker vouches for.
 */
export function calibrateToDataSheet(resin: ResinThermal, sheet: DataSheetLimit, setting: PourSetting = {}, options: Numerics = {}): Result<Calibration> {
  const depth = checkDepthMm(sheet.maxLayerMm, "The data sheet's maximum layer");
  if (!depth.ok) return depth;
  if (resin.acceptedPeakC === undefined) {
    return fail('accepted_peak_missing', 'Calibration needs the peak temperature the shop accepts (acceptedPeakC); enter it with the resin system.');
  }
  const limitC = resin.acceptedPeakC;
  const prepared = prepareLayerModel({ ...resin, heatScale: 1 }, { ...setting, ambient: sheet.tempC });
  if (!prepared.ok) return prepared;
  if (limitC <= sheet.tempC) {
    return fail(
      'accepted_peak_not_above_sheet',
      `The accepted peak (${num(limitC)} °C) must be above the data sheet's pouring temperature (${num(sheet.tempC)} °C).`,
    );
  }
  const model = prepared.value;
  const peak = (s: number) => peakWithScale(model, s, sheet.maxLayerMm, limitC, options);
  let lo = 1;
  let hi = 1;
  let p = peak(1);
  if (p < limitC) {
    while (p < limitC) {
      lo = hi;
      hi *= 2;
      if (hi > highestScale) {
        return fail(
          'calibration_out_of_reach',
          `Even ${highestScale} times the heat of reaction keeps a ${num(sheet.maxLayerMm)} mm layer at ${num(sheet.tempC)} °C under ${num(limitC)} °C in the model; check the gel time and the accepted peak against the data sheet.`,
        );
      }
      p = peak(hi);
    }
  } else {
    while (p >= limitC) {
      hi = lo;
      lo /= 2;
      if (lo < lowestScale) {
        return fail(
          'calibration_out_of_reach',
          `Even a thousandth of the heat of reaction takes a ${num(sheet.maxLayerMm)} mm layer at ${num(sheet.tempC)} °C over ${num(limitC)} °C in the model; check the gel time, the accepted peak and the data sheet's maximum layer.`,
        );
      }
      p = peak(lo);
    }
  }
  // Keep the side under the limit, so the data sheet's own point stays within it.
  let loPeak = peak(lo);
  for (let i = 0; i < 60 && limitC - loPeak > peakToleranceK; i++) {
    const mid = (lo + hi) / 2;
    const p = peak(mid);
    if (p < limitC) {
      lo = mid;
      loPeak = p;
    } else hi = mid;
  }
  const heatScale = lo;
  const sentence =
    `Calibrated so a ${num(sheet.maxLayerMm)} mm layer poured at ${num(sheet.tempC)} °C peaks at ${num(limitC)} °C, ` +
    `the data sheet's maximum thickness (heat of reaction ×${num(heatScale, 3)}, ${num(resin.reactionHeatJPerG * heatScale, 0)} J/g).`;
  return ok({ resin: { ...resin, heatScale }, heatScale, sentence });
}

export interface ProposedLayer {
  index: number;
  bottomMm: number;
  topMm: number;
  thicknessMm: number;
  peakC: number;
  timeToPeakMin: number;
}

export interface LayerProposal {
  /** The thickest single layer poured on the bare base at the shop's temperature, never above the data sheet's. */
  maxLayerMm: number;
  /** 'data_sheet' when the data sheet's maximum is the tighter limit, 'forecast' when the shop's conditions are. */
  limitedBy: 'data_sheet' | 'forecast';
  /** Equal layers filling totalDepthMm, each poured on the cured ones below, each forecast under the limit. */
  layers: ProposedLayer[];
  limitC: number;
}

function layersUnderLimit(model: LayerModel, totalMm: number, count: number, options: Numerics): ProposedLayer[] {
  const thick = totalMm / count;
  return Array.from({ length: count }, (_, index) => {
    const { run } = runLayer(model, thick, { ...options, curedResinBelowMm: index * thick });
    return { index, bottomMm: index * thick, topMm: (index + 1) * thick, thicknessMm: thick, peakC: run.peakC, timeToPeakMin: run.peakTimeS / 60 };
  });
}

/**
 * For the shop's conditions, the thickest layers whose forecast peak stays at or under the accepted
 * peak, never thicker than the data sheet allows. With totalDepthMm, the fewest equal layers that
 * fill it with every layer (each on the cured ones below) under the limit.
 */
export function proposeLayers(
  resin: ResinThermal,
  sheet: DataSheetLimit,
  conditions: PourConditions,
  totalDepthMm?: number,
  options: Numerics = {},
): Result<LayerProposal> {
  const sheetDepth = checkDepthMm(sheet.maxLayerMm, "The data sheet's maximum layer");
  if (!sheetDepth.ok) return sheetDepth;
  if (totalDepthMm !== undefined) {
    const total = checkDepthMm(totalDepthMm, 'The depth to fill');
    if (!total.ok) return total;
  }
  if (resin.acceptedPeakC === undefined) {
    return fail('accepted_peak_missing', 'Proposing layers needs the peak temperature the shop accepts (acceptedPeakC); enter it with the resin system.');
  }
  const limitC = resin.acceptedPeakC;
  const prepared = prepareLayerModel(resin, { ...conditions, curedResinBelowMm: 0 });
  if (!prepared.ok) return prepared;
  const model = prepared.value;
  const single = maxLayerPrepared(model, limitC, sheet.maxLayerMm, options);
  if (!single.ok) return single;
  const limitedBy = single.value.reachedCap ? 'data_sheet' : 'forecast';
  const maxLayerMm = single.value.maxLayerMm;
  if (totalDepthMm === undefined) return ok({ maxLayerMm, limitedBy, layers: [], limitC });
  if (maxLayerMm <= 0) {
    return fail('no_layer_under_limit', `At these conditions no layer stays under ${num(limitC)} °C; pour when the shop is cooler or choose a slower product.`);
  }
  let count = Math.max(1, Math.ceil(totalDepthMm / maxLayerMm - 1e-9));
  for (let tries = 0; tries < 50; tries++, count++) {
    const layers = layersUnderLimit(model, totalDepthMm, count, options);
    if (layers.every((l) => l.peakC <= limitC)) return ok({ maxLayerMm, limitedBy, layers, limitC });
  }
  return fail(
    'no_layer_under_limit',
    `No split of ${num(totalDepthMm)} mm keeps every layer under ${num(limitC)} °C; pour when the shop is cooler or choose a slower product.`,
  );
}
