import {
  calibrateToDataSheet,
  cupPotLife,
  forecastLayer,
  forecastMould,
  peakBandsOf,
  proposeLayers,
  type Calibration,
  type PeakBand,
  type ForecastPoint,
  type PlannedLayer,
} from '@gelpoint/thermal';
export { peakAtDepth, peakBandsOf, type PeakBand } from '@gelpoint/thermal';
import { exothermSettingsOf, type ExothermSettingField, type ExothermSettings } from './exotherm-settings';
import type { LayerSlice } from './layers';
import { fail, ok, type Result } from './result';
import { potLifeMinAt } from './pot-life';
import type { ResinSystem } from './shelf';

/** A cavity report's resin depths at the plan's fill level, in the mould's own frame (mm). */
export interface PlanDepthMap {
  originMm: [number, number];
  cellMm: [number, number];
  nx: number;
  ny: number;
  /** Row-major (index j·nx + i); 0 where no resin stands. */
  depthsMm: ArrayLike<number>;
}

export interface ForecastCurvePoint {
  /** Minutes after mixing. */
  timeMin: number;
  tempC: number;
}

export interface PlanLayerForecast {
  index: number;
  thicknessMm: number;
  peakC: number;
  /** Minutes from mixing this layer's resin to its peak. */
  timeToPeakMin: number;
  /** Below the resin surface, at the hottest spot. */
  peakDepthMm: number;
  /** The hottest column of a mould, in the mould's frame; absent for a quick shape (every column alike). */
  hottest?: { xMm: number; yMm: number };
  overLimit: boolean;
  /** The layer reached its adiabatic ceiling: the real resin would smoke before the peak shown. */
  runaway: boolean;
  /** Temperature against time at the hottest spot, at most curvePoints points. */
  curve: ForecastCurvePoint[];
}

/**
 * The forecast peak over a mould, kept small: a column's peak depends only on its resin depth (the
 * depth classes of the whole-mould forecast), so a step table of depth bands paints any cell of the
 * plan's depth map. Bands are sorted by depth; a column belongs to the first band whose upToMm is at
 * or above its depth.
 */
export interface PlanPeakMap {
  bands: PeakBand[];
  /** The hottest column of the whole pour, in the mould's frame (mm). */
  hottest: { xMm: number; yMm: number; layerIndex: number; peakC: number; timeToPeakMin: number };
}

/** 2 added the mould's peak map; 1 (stored before it) reads the same without one. */
export const planForecastVersion = 2;
/** Versions a stored plan may carry; a new forecast is always planForecastVersion. */
export type PlanForecastVersion = 1 | typeof planForecastVersion;

export type PlanForecast =
  | {
      version: PlanForecastVersion;
      available: true;
      /** The rate law and the numerical scheme, in words. */
      model: string;
      /** The data-sheet point the model reproduces, in words. */
      calibratedTo: string;
      calibration: { maxLayerMm: number; tempC: number; heatScale: number };
      limitC: number;
      shopTempC: number;
      /** The thickest single layer on bare wood at the shop's temperature, never above the data sheet's. */
      maxLayerMm: number;
      limitedBy: 'data_sheet' | 'forecast';
      /** Shelf settings that were empty and took their default. */
      defaultsUsed: ExothermSettingField[];
      layers: PlanLayerForecast[];
      /** A mould's peak map; absent for a quick shape and in forecasts stored before version 2. */
      peakMap?: PlanPeakMap;
    }
  | { version: PlanForecastVersion; available: false; code: string; reason: string };

const curvePoints = 48;

/** The series thinned to a small curve that keeps its peak. */
function curveOf(series: ForecastPoint[]): ForecastCurvePoint[] {
  if (series.length === 0) return [];
  let peak = 0;
  for (let k = 1; k < series.length; k++) if (series[k]!.hottestC > series[peak]!.hottestC) peak = k;
  const stride = Math.max(1, Math.ceil(series.length / (curvePoints - 1)));
  const picks = new Set<number>([peak, series.length - 1]);
  for (let k = 0; k < series.length; k += stride) picks.add(k);
  return [...picks].sort((a, b) => a - b).map((k) => ({ timeMin: round(series[k]!.timeMin, 2), tempC: round(series[k]!.hottestC, 2) }));
}

function round(x: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
}

const calibrations = new Map<string, Result<{ settings: ExothermSettings; calibration: Calibration }>>();
const calibrationsKept = 16;

/**
 * The product's forecast settings, calibrated to its data sheet. The same product is calibrated once
 * (the live planner asks again on every keystroke); the answer depends only on the key's values.
 */
export function calibratedProduct(product: ResinSystem): Result<{ settings: ExothermSettings; calibration: Calibration }> {
  const settings = exothermSettingsOf(product);
  const key = JSON.stringify([settings.resin, settings.sheet]);
  const known = calibrations.get(key);
  if (known) return known;
  const calibrated = calibrateToDataSheet(settings.resin, settings.sheet, { base: 'wood' });
  const answer: Result<{ settings: ExothermSettings; calibration: Calibration }> = calibrated.ok ? ok({ settings, calibration: calibrated.value }) : calibrated;
  if (calibrations.size >= calibrationsKept) calibrations.delete(calibrations.keys().next().value!);
  calibrations.set(key, answer);
  return answer;
}

/** The thickest single layer whose forecast peak stays under the accepted peak at the shop's temperature, never above the data sheet's. */
export function forecastMaxLayer(
  product: ResinSystem,
  shopTempC: number,
): Result<{ maxLayerMm: number; limitedBy: 'data_sheet' | 'forecast'; limitC: number }> {
  const cal = calibratedProduct(product);
  if (!cal.ok) return cal;
  const proposal = proposeLayers(cal.value.calibration.resin, cal.value.settings.sheet, { ambient: shopTempC, base: 'wood' });
  if (!proposal.ok) return proposal;
  if (proposal.value.maxLayerMm <= 0) {
    return fail(
      'no_layer_under_limit',
      `At ${shopTempC} °C the forecast keeps no layer under ${proposal.value.limitC} °C; pour when the shop is cooler or choose a slower product.`,
    );
  }
  return ok({ maxLayerMm: proposal.value.maxLayerMm, limitedBy: proposal.value.limitedBy, limitC: proposal.value.limitC });
}

interface LayerInput {
  slices: readonly LayerSlice[];
  fillLevelMm: number;
  shopTempC: number;
  depthMap?: PlanDepthMap | undefined;
}

export interface PlanLayersForecast {
  layers: PlanLayerForecast[];
  peakMap?: PlanPeakMap;
}

/** Each planned layer's forecast: a quick shape's uniform depth, or a mould's depth map by depth classes (with its peak map). */
export function forecastPlanLayers(product: ResinSystem, input: LayerInput): Result<PlanLayersForecast> {
  const cal = calibratedProduct(product);
  if (!cal.ok) return cal;
  const resin = cal.value.calibration.resin;
  const limitC = cal.value.settings.resin.acceptedPeakC;
  const base = { ambient: input.shopTempC, base: 'wood' as const };
  const layerAt = (resinMm: number, curedMm: number) => forecastLayer(resin, { ...base, curedResinBelowMm: curedMm }, resinMm, { series: true });

  if (!input.depthMap) {
    const out: PlanLayerForecast[] = [];
    for (const slice of input.slices) {
      const f = layerAt(slice.deepestResinMm, slice.index === 0 ? 0 : slice.fromLevelMm);
      if (!f.ok) return f;
      out.push({
        index: slice.index,
        thicknessMm: slice.thicknessMm,
        peakC: f.value.peakC,
        timeToPeakMin: f.value.timeToPeakMin,
        peakDepthMm: f.value.peakDepthMm,
        overLimit: f.value.peakC > limitC,
        runaway: f.value.runaway,
        curve: curveOf(f.value.series),
      });
    }
    return ok({ layers: out });
  }

  const map = input.depthMap;
  const depths = Float32Array.from(map.depthsMm);
  let deepestMm = 0;
  for (const d of depths) if (d > deepestMm) deepestMm = d;
  if (!(deepestMm > 0)) return fail('depth_map_empty', 'The depth map holds no resin at this fill level, so there is nothing to forecast.');
  // The plan's levels start at the cavity floor; the map's at its deepest column. Align the tops, so the fill level is the same surface.
  const shift = deepestMm - input.fillLevelMm;
  const planned: PlannedLayer[] = [];
  for (const slice of input.slices) {
    const bottom = slice.index === 0 ? 0 : Math.max(0, slice.fromLevelMm + shift, planned.at(-1)?.[1] ?? 0);
    const top = slice.index === input.slices.length - 1 ? deepestMm : Math.max(bottom + 1e-6, slice.toLevelMm + shift);
    planned.push([bottom, top]);
  }
  const mould = forecastMould(resin, base, { depthsMm: depths, nx: map.nx, ny: map.ny, cellMm: map.cellMm }, planned);
  if (!mould.ok) return mould;
  const out: PlanLayerForecast[] = [];
  for (const layer of mould.value.layers) {
    const slice = input.slices[layer.index]!;
    if (layer.hottest.i < 0) {
      out.push({
        index: layer.index,
        thicknessMm: slice.thicknessMm,
        peakC: input.shopTempC,
        timeToPeakMin: 0,
        peakDepthMm: 0,
        overLimit: false,
        runaway: false,
        curve: [],
      });
      continue;
    }
    const k = layer.hottest.j * map.nx + layer.hottest.i;
    const floor = deepestMm - depths[k]!;
    const [bottom, top] = planned[layer.index]!;
    // The curve at the hottest column, with its own resin and cured depth (the classes round those up, so its peak is at most the layer's).
    const f = layerAt(top - Math.max(floor, bottom), Math.max(0, bottom - floor));
    if (!f.ok) return f;
    out.push({
      index: layer.index,
      thicknessMm: slice.thicknessMm,
      peakC: layer.peakC,
      timeToPeakMin: layer.timeToPeakMin,
      peakDepthMm: f.value.peakDepthMm,
      hottest: { xMm: map.originMm[0] + (layer.hottest.i + 0.5) * map.cellMm[0], yMm: map.originMm[1] + (layer.hottest.j + 0.5) * map.cellMm[1] },
      overLimit: layer.peakC > limitC,
      runaway: layer.runaway,
      curve: curveOf(f.value.series),
    });
  }
  const top = mould.value.hottest;
  if (!top) return ok({ layers: out });
  return ok({
    layers: out,
    peakMap: {
      bands: peakBandsOf(depths, mould.value.peakMap),
      hottest: {
        xMm: map.originMm[0] + (top.i + 0.5) * map.cellMm[0],
        yMm: map.originMm[1] + (top.j + 0.5) * map.cellMm[1],
        layerIndex: top.layerIndex,
        peakC: top.tempC,
        timeToPeakMin: top.timeToPeakMin,
      },
    },
  });
}

/** The forecast part of a plan: its layers, what it was calibrated to, and what it assumed. */
export function planForecastOf(
  product: ResinSystem,
  shopTempC: number,
  maxLayer: { maxLayerMm: number; limitedBy: 'data_sheet' | 'forecast' },
  forecast: PlanLayersForecast,
): PlanForecast {
  const cal = calibratedProduct(product);
  if (!cal.ok) return unavailable(cal.error.code, cal.error.message);
  const { settings, calibration } = cal.value;
  const model = forecastLayer(calibration.resin, { ambient: shopTempC, base: 'wood' }, Math.min(10, settings.sheet.maxLayerMm), { series: false });
  return {
    version: planForecastVersion,
    available: true,
    model: model.ok ? model.value.model : '',
    calibratedTo: calibration.sentence,
    calibration: { maxLayerMm: settings.sheet.maxLayerMm, tempC: settings.sheet.tempC, heatScale: calibration.heatScale },
    limitC: settings.resin.acceptedPeakC,
    shopTempC,
    maxLayerMm: maxLayer.maxLayerMm,
    limitedBy: maxLayer.limitedBy,
    defaultsUsed: (Object.keys(settings.settings) as ExothermSettingField[]).filter((f) => settings.settings[f].isDefault),
    layers: forecast.layers,
    ...(forecast.peakMap ? { peakMap: forecast.peakMap } : {}),
  };
}

export function unavailable(code: string, reason: string): PlanForecast {
  return { version: planForecastVersion, available: false, code, reason };
}

export interface CupPotLifeAnswer {
  potLifeMin: number;
  limitedBy: 'cup_heating' | 'data_sheet';
}

/**
 * How long a cup of this mass stays workable at the shop's temperature: the cup's own heat shortens the
 * data sheet's pot life (packages/thermal cupPotLife), never lengthens it. When the forecast cannot run
 * (its settings do not calibrate), the data sheet's pot life moved to the shop's temperature stands.
 */
export function cupPotLifeOf(product: ResinSystem, resinMassG: number, shopTempC: number): CupPotLifeAnswer {
  const sheet: CupPotLifeAnswer = { potLifeMin: potLifeMinAt(product, shopTempC), limitedBy: 'data_sheet' };
  const cal = calibratedProduct(product);
  const resin = cal.ok ? cal.value.calibration.resin : exothermSettingsOf(product).resin;
  const cup = cupPotLife(resin, { massG: resinMassG, ambientC: shopTempC, sheetPotLifeMin: product.potLifeMin, sheetPotLifeTempC: product.referenceTempC });
  if (!cup.ok) return sheet;
  return { potLifeMin: Math.min(cup.value.potLifeMin, sheet.potLifeMin), limitedBy: cup.value.potLifeMin < sheet.potLifeMin ? 'cup_heating' : 'data_sheet' };
}
