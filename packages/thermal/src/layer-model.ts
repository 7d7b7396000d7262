import { ambientOf, checkAmbient, type Ambient, type AmbientSchedule } from './ambient';
import { buildColumnGrid, geometricCells, uniformCells, type ColumnGrid, type GridSegment, type Material } from './column-grid';
import { runColumn, type ColumnRun } from './column-run';
import { conversionAfterReducedTime, dgebaAmineKinetics, isothermalTimeToS, k2At, rateLawFromGelTime, type RateLaw } from './kinetics';
import { kelvin } from './physics';
import { checkResinThermal, type ResinThermal } from './resin-thermal';
import { fail, ok, type Result } from './result';
import { radiationWPerM2K, upwardPlateConvectionWPerM2K } from './surface';
import { sugarMaple12Pct, type WoodBase } from './wood';

/** Where and how a layer is poured. */
export interface PourConditions {
  /** The shop's air, °C, constant or over time (minutes after mixing). */
  ambient: AmbientSchedule;
  /** Temperature of the mix when poured; the air's at mixing when absent. */
  mixTempC?: number;
  /** What lies under the fresh resin: a wood blank (thick enough to count as semi-infinite) or nothing that takes heat. */
  base?: 'wood' | 'insulated';
  /** The wood under the cavity; sugar maple at 12 % moisture when absent. */
  wood?: WoodBase;
  /** Cured resin between the fresh layer and the base (earlier layers), mm. */
  curedResinBelowMm?: number;
  /** Temperature of the base and the cured resin at pouring; the air's at mixing when absent. */
  baseTempC?: number;
  /** Area / perimeter of the resin surface, mm, for the convection correlation; unknown errs hot. */
  surfaceLengthMm?: number;
  /** A fixed surface coefficient (convection + radiation), W/(m²·K), instead of the correlations. */
  surfaceHeatTransferWPerM2K?: number;
  /** Minutes the mix stood in the cup before pouring (it keeps curing at the mix temperature). */
  minutesMixedBeforePour?: number;
}

/** Grid and step refinement: 2 halves every cell and every step allowance. */
export interface Numerics {
  resolution?: number;
}

const resinCellsAtResolution1 = 16;
const stepKelvinAtResolution1 = 0.5;
const stepConversionAtResolution1 = 0.02;
const maxStepSAtResolution1 = 600;
const substrateGrowth = 1.25;

/** A validated resin and pour, ready for many layer depths. */
export interface LayerModel {
  resin: ResinThermal;
  law: RateLaw;
  ambient: Ambient;
  conditions: PourConditions;
  mixTempC: number;
  baseTempC: number;
  base: 'wood' | 'insulated';
  wood: WoodBase;
  resinMaterial: Material;
  reactionHeatJPerM3: number;
  initialConversion: number;
  /** How long a run may go: 1.5 × the isothermal time to 95 % cure at the coldest temperature, at least 2 h. */
  horizonS: number;
}

function conditionsError(conditions: PourConditions): string | null {
  const temp = (v: number | undefined, label: string) =>
    v !== undefined && !(Number.isFinite(v) && v >= -40 && v <= 80) ? `${label} must be a number of °C between −40 and 80, got ${String(v)}.` : null;
  const nonNegative = (v: number | undefined, label: string, unit: string) =>
    v !== undefined && !(Number.isFinite(v) && v >= 0) ? `${label} must be zero or more ${unit}, got ${String(v)}.` : null;
  const positive = (v: number | undefined, label: string, unit: string) =>
    v !== undefined && !(Number.isFinite(v) && v > 0) ? `${label} must be a number above zero ${unit}, got ${String(v)}.` : null;
  if (conditions.base !== undefined && conditions.base !== 'wood' && conditions.base !== 'insulated') {
    return `The base must be "wood" or "insulated", got "${String(conditions.base)}".`;
  }
  if (conditions.wood) {
    const w = conditions.wood;
    const bad =
      positive(w.conductivityWPerMK, "The wood's conductivity", 'W/(m·K)') ??
      positive(w.densityGPerMl, "The wood's density", 'g/mL') ??
      positive(w.heatCapacityJPerGK, "The wood's heat capacity", 'J/(g·K)');
    if (bad) return bad;
  }
  return (
    temp(conditions.mixTempC, 'The mix temperature') ??
    temp(conditions.baseTempC, 'The base temperature') ??
    nonNegative(conditions.curedResinBelowMm, 'The cured resin below', 'mm') ??
    positive(conditions.surfaceLengthMm, 'The surface length (area / perimeter)', 'mm') ??
    positive(conditions.surfaceHeatTransferWPerM2K, 'The surface heat transfer coefficient', 'W/(m²·K)') ??
    nonNegative(conditions.minutesMixedBeforePour, 'The time the mix stood before pouring', 'minutes')
  );
}

export function prepareLayerModel(resin: ResinThermal, conditions: PourConditions): Result<LayerModel> {
  const checked = checkResinThermal(resin);
  if (!checked.ok) return checked;
  const air = checkAmbient(conditions.ambient);
  if (!air.ok) return air;
  const bad = conditionsError(conditions);
  if (bad) return fail('pour_conditions_invalid', bad);
  const ambient = ambientOf(conditions.ambient);
  const law = rateLawFromGelTime(resin.gelTimeMin, resin.refTempC, resin.activationEnergyKJPerMol, resin.kinetics ?? dgebaAmineKinetics);
  const mixTempC = conditions.mixTempC ?? ambient.atS(0);
  const baseTempC = conditions.baseTempC ?? ambient.atS(0);
  const standS = (conditions.minutesMixedBeforePour ?? 0) * 60;
  const initialConversion = conversionAfterReducedTime(k2At(law, kelvin(mixTempC)) * standS, law.kinetics);
  const coldestC = Math.min(ambient.minC, mixTempC, baseTempC);
  const horizonS = Math.min(60 * 86400, Math.max(7200, 1.5 * isothermalTimeToS(law, 0.95, coldestC)));
  const rho = resin.densityGPerMl * 1000;
  return ok({
    resin,
    law,
    ambient,
    conditions,
    mixTempC,
    baseTempC,
    base: conditions.base ?? 'wood',
    wood: conditions.wood ?? sugarMaple12Pct,
    resinMaterial: { conductivityWPerMK: resin.conductivityWPerMK, volumetricHeatJPerM3K: rho * resin.heatCapacityJPerGK * 1000 },
    reactionHeatJPerM3: rho * resin.reactionHeatJPerG * 1000 * (resin.heatScale ?? 1),
    initialConversion,
    horizonS,
  });
}

export interface LayerRunOptions extends Numerics {
  /** Overrides the conditions' cured resin below, mm (the mould forecast varies it per column). */
  curedResinBelowMm?: number;
  record?: boolean;
  /** Stop once the peak passes this temperature (searches only need to know that it did). */
  stopAboveC?: number;
}

export function surfaceCoefficient(model: LayerModel): (surfaceC: number, airC: number) => number {
  const fixed = model.conditions.surfaceHeatTransferWPerM2K;
  if (fixed !== undefined) return () => fixed;
  const lengthM = model.conditions.surfaceLengthMm === undefined ? undefined : model.conditions.surfaceLengthMm / 1000;
  return (surfaceC, airC) => upwardPlateConvectionWPerM2K(surfaceC, airC, lengthM) + radiationWPerM2K(surfaceC, airC);
}

/** One run of one layer depth (no validation: the model was checked when prepared). */
export function runLayer(model: LayerModel, depthMm: number, options: LayerRunOptions = {}): { run: ColumnRun; grid: ColumnGrid } {
  const r = options.resolution ?? 1;
  const depthM = depthMm / 1000;
  const cellM = depthM / (resinCellsAtResolution1 * r);
  const segments: GridSegment[] = [
    { material: model.resinMaterial, thicknessM: depthM, reacting: true, cellsM: uniformCells(depthM, resinCellsAtResolution1 * r) },
  ];
  const curedM = (options.curedResinBelowMm ?? model.conditions.curedResinBelowMm ?? 0) / 1000;
  if (curedM > 0) segments.push({ material: model.resinMaterial, thicknessM: curedM, reacting: false, cellsM: geometricCells(curedM, cellM, substrateGrowth) });
  if (model.base === 'wood') {
    const w = model.wood;
    const wood: Material = { conductivityWPerMK: w.conductivityWPerMK, volumetricHeatJPerM3K: w.densityGPerMl * 1000 * w.heatCapacityJPerGK * 1000 };
    // Four diffusion lengths over the whole run: the far end then never feels the resin, as in a semi-infinite solid.
    const woodM = Math.max(0.02, 4 * Math.sqrt((wood.conductivityWPerMK / wood.volumetricHeatJPerM3K) * model.horizonS));
    const lastCell = segments[segments.length - 1]!.cellsM.at(-1)!;
    segments.push({ material: wood, thicknessM: woodM, reacting: false, cellsM: geometricCells(woodM, lastCell, substrateGrowth) });
  }
  const grid = buildColumnGrid('slab', segments);
  const run = runColumn({
    grid,
    law: model.law,
    reactionHeatJPerM3: model.reactionHeatJPerM3,
    surfaceH: surfaceCoefficient(model),
    ambient: model.ambient,
    initialTempC: (_z, reacting) => (reacting ? model.mixTempC : model.baseTempC),
    initialConversion: model.initialConversion,
    stepKelvin: stepKelvinAtResolution1 / r,
    stepConversion: stepConversionAtResolution1 / r,
    maxStepS: maxStepSAtResolution1 / r,
    endS: model.horizonS,
    until: 'peak',
    record: options.record ?? false,
    ...(options.stopAboveC === undefined ? {} : { stopAboveC: options.stopAboveC }),
  });
  return { run, grid };
}
