import type { ColumnGrid } from './column-grid';
import type { ColumnRun } from './column-run';
import { prepareLayerModel, runLayer, type LayerModel, type Numerics, type PourConditions } from './layer-model';
import type { ResinThermal } from './resin-thermal';
import { fail, ok, type Result } from './result';

export interface ForecastPoint {
  /** Minutes after mixing. */
  timeMin: number;
  /** Temperature at the depth where the layer peaks. */
  hottestC: number;
  /** Conversion at that depth. */
  conversionAtHottest: number;
  /** Mass-averaged conversion of the layer. */
  meanConversion: number;
}

export interface LayerForecast {
  depthMm: number;
  peakC: number;
  /** Minutes from mixing to the peak. */
  timeToPeakMin: number;
  /** Depth of the hottest point below the resin surface. */
  peakDepthMm: number;
  /** ΔH·(calibrated factor)/cp: the ceiling no layer can pass, reached only where no heat leaves. */
  adiabaticRiseK: number;
  /** At most 200 points, in time order, the peak among them. */
  series: ForecastPoint[];
  /** The rate law and the numerical scheme, in words. */
  model: string;
  /** True when the run reached its time limit before the peak was certain (a very slow or very cold cure). */
  reachedTimeLimit: boolean;
  /**
   * True when the layer reached its adiabatic ceiling (start + ΔH/cp): a runaway. peakC is then that
   * ceiling, the hottest the model can say; the real resin smokes and decomposes before it.
   */
  runaway: boolean;
}

const maxSeriesPoints = 200;

function f(n: number, digits = 3): string {
  return Number(n.toFixed(digits)).toString();
}

export function describeModel(model: LayerModel): string {
  const kin = model.law.kinetics;
  const base =
    model.base === 'insulated' ? 'an insulated base (no heat flows down)' : `${model.wood.name} (USDA Wood Handbook, ch. 4) as a semi-infinite solid`;
  const cured = (model.conditions.curedResinBelowMm ?? 0) > 0 ? ` under ${f(model.conditions.curedResinBelowMm!, 1)} mm of cured resin` : '';
  const top =
    model.conditions.surfaceHeatTransferWPerM2K !== undefined
      ? `a fixed ${f(model.conditions.surfaceHeatTransferWPerM2K, 2)} W/(m²·K) to the air`
      : 'natural convection from the upper surface of a hot plate (Incropera) plus linearised radiation';
  return (
    `Autocatalytic cure law of Kamal & Sourour (1973) in the one-activation-energy form fitted to DGEBA/amine systems by Barral et al. (1995), ` +
    `dα/dt = k2(T)·(ε + α^m)·(1 − α)^n with m = ${f(kin.m)}, n = ${f(kin.n)}, ` +
    `ε = ${f(kin.k1OverK2)} and one Arrhenius activation energy of ${f(model.resin.activationEnergyKJPerMol, 2)} kJ/mol, ` +
    `k2 set by the thin-film gel time (α = ${f(kin.gelConversion)}) of ${f(model.resin.gelTimeMin, 1)} min at ${f(model.resin.refTempC, 1)} °C; ` +
    `heat of reaction ${f(model.resin.reactionHeatJPerG * (model.resin.heatScale ?? 1), 1)} J/g` +
    `${model.resin.heatScale !== undefined && model.resin.heatScale !== 1 ? ` (calibrated ×${f(model.resin.heatScale, 4)})` : ''}. ` +
    `1-D heat conduction through the layer's depth by finite volumes; TR-BDF2 time steps implicit in temperature and conversion together (Newton), with an adaptive step size; ` +
    `top: ${top}; base: ${base}${cured}.`
  );
}

function seriesOf(run: ColumnRun, grid: ColumnGrid, offsetS: number): ForecastPoint[] {
  const rec = run.record;
  if (!rec) return [];
  const node = run.peakNode;
  let weightSum = 0;
  for (let i = 0; i < grid.reactingNodes; i++) weightSum += grid.reactingVolume[i]!;
  const count = rec.timeS.length;
  const stride = Math.max(1, Math.ceil(count / (maxSeriesPoints - 1)));
  const picks: number[] = [];
  for (let k = 0; k < count; k += stride) picks.push(k);
  if (picks.at(-1) !== count - 1) picks.push(count - 1);
  let peakStep = 0;
  for (let k = 1; k < count; k++) if (rec.temps[k]![node]! > rec.temps[peakStep]![node]!) peakStep = k;
  if (!picks.includes(peakStep)) {
    picks.push(peakStep);
    picks.sort((a, b) => a - b);
  }
  return picks.map((k) => {
    const conv = rec.conversions[k]!;
    let mean = 0;
    for (let i = 0; i < grid.reactingNodes; i++) mean += grid.reactingVolume[i]! * conv[i]!;
    return {
      timeMin: (rec.timeS[k]! + offsetS) / 60,
      hottestC: rec.temps[k]![node]!,
      conversionAtHottest: conv[node]!,
      meanConversion: mean / weightSum,
    };
  });
}

export function checkDepthMm(depthMm: number, label = 'The layer depth'): Result<number> {
  if (!Number.isFinite(depthMm) || depthMm <= 0 || depthMm > 2000) {
    return fail('depth_out_of_range', `${label} must be a number of mm above 0 and at most 2000, got ${String(depthMm)}.`);
  }
  return ok(depthMm);
}

/** The forecast of an already prepared model (no validation; the mould forecast and calibration reuse it). */
export function forecastPrepared(model: LayerModel, depthMm: number, options: Numerics & { series?: boolean } = {}): LayerForecast {
  const { run, grid } = runLayer(model, depthMm, { ...options, record: options.series ?? true });
  const offsetS = (model.conditions.minutesMixedBeforePour ?? 0) * 60;
  return {
    depthMm,
    peakC: run.peakC,
    timeToPeakMin: (run.peakTimeS + offsetS) / 60,
    peakDepthMm: run.peakDepthM * 1000,
    adiabaticRiseK: model.reactionHeatJPerM3 / model.resinMaterial.volumetricHeatJPerM3K,
    series: seriesOf(run, grid, offsetS),
    model: describeModel(model),
    reachedTimeLimit: run.hitEnd,
    runaway: run.runaway,
  };
}

/** How hot one layer of `depthMm` gets, where and when, poured under these conditions. */
export function forecastLayer(
  resin: ResinThermal,
  conditions: PourConditions,
  depthMm: number,
  options: Numerics & { series?: boolean } = {},
): Result<LayerForecast> {
  const depth = checkDepthMm(depthMm);
  if (!depth.ok) return depth;
  const model = prepareLayerModel(resin, conditions);
  if (!model.ok) return model;
  return ok(forecastPrepared(model.value, depthMm, options));
}

export interface MaxLayer {
  /** The deepest single layer whose forecast peak stays at or under the limit, mm (to 0.1 mm, rounded down). */
  maxLayerMm: number;
  /** Forecast peak of a layer of maxLayerMm. */
  peakC: number;
  limitC: number;
  /** True when even searchCapMm stays under the limit (the answer is then the cap). */
  reachedCap: boolean;
}

const depthToleranceMm = 0.05;

/**
 * The deepest layer under a limit, by bisection on depth: the forecast peak rises with depth
 * (checked in tests), so the depths under the limit form one interval from zero.
 */
export function maxLayerPrepared(model: LayerModel, limitC: number, capMm: number, options: Numerics = {}): Result<MaxLayer> {
  const startC = Math.max(model.mixTempC, model.baseTempC, model.ambient.atS(0));
  if (limitC <= startC) {
    return fail(
      'limit_below_start',
      `The limit of ${f(limitC, 1)} °C is not above the starting temperature of ${f(startC, 1)} °C, so no layer can stay under it; pour when it is cooler or raise the limit.`,
    );
  }
  const peakOf = (d: number) => runLayer(model, d, { ...options, stopAboveC: limitC }).run.peakC;
  let lo = 0;
  let loPeak = startC;
  let hi = Math.min(capMm, 10);
  let hiPeak = peakOf(hi);
  while (hiPeak <= limitC && hi < capMm) {
    lo = hi;
    loPeak = hiPeak;
    hi = Math.min(capMm, hi * 2);
    hiPeak = peakOf(hi);
  }
  if (hiPeak <= limitC) return ok({ maxLayerMm: hi, peakC: hiPeak, limitC, reachedCap: true });
  while (hi - lo > depthToleranceMm) {
    const mid = (lo + hi) / 2;
    const p = peakOf(mid);
    if (p <= limitC) {
      lo = mid;
      loPeak = p;
    } else hi = mid;
  }
  const rounded = Math.floor(lo * 10) / 10;
  if (rounded <= 0) return ok({ maxLayerMm: 0, peakC: startC, limitC, reachedCap: false });
  return ok({ maxLayerMm: rounded, peakC: rounded === lo ? loPeak : peakOf(rounded), limitC, reachedCap: false });
}

/** The deepest single layer whose forecast peak stays at or under limitC (searched up to capMm, 1000 mm by default). */
export function maxLayerDepth(resin: ResinThermal, conditions: PourConditions, limitC: number, options: Numerics & { capMm?: number } = {}): Result<MaxLayer> {
  if (!Number.isFinite(limitC)) return fail('limit_invalid', `The peak limit must be a number of °C, got ${String(limitC)}.`);
  const cap = options.capMm ?? 1000;
  const capCheck = checkDepthMm(cap, 'The search cap');
  if (!capCheck.ok) return capCheck;
  const model = prepareLayerModel(resin, conditions);
  if (!model.ok) return model;
  return maxLayerPrepared(model.value, limitC, cap, options);
}
