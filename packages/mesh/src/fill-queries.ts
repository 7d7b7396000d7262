import { readAnalysis } from './analysis-codec';
import type { CavityAnalysis, CavityFill, CavityModel, CurvePoint, DepthMap, MethodFigures } from './cavity-analysis';
import type { ColumnGrid } from './column-grid';
import { columnCurve } from './column-curve';
import { columnFill } from './column-fill';
import { checkDam, type Dam } from './dam';
import { LevelQuantity, seriesFillErrorMm3, seriesValue } from './level-series';
import { fail, ok, type MeshWarning, type Result } from './result';

/** Either the stored analysis (decoded on each call) or a model from readAnalysis (decoded once). */
export type CavitySource = CavityAnalysis | CavityModel;

export function modelOf(source: CavitySource): Result<CavityModel> {
  return source.kind === 'gelpoint-cavity-model' ? ok(source) : readAnalysis(source);
}

function checkLevel(levelMm: number): Result<number> {
  if (typeof levelMm !== 'number' || !Number.isFinite(levelMm)) {
    return fail('level_invalid', `The fill level must be a finite number of millimetres, got ${String(levelMm)}.`);
  }
  return ok(levelMm);
}

function percent(errorMm3: number, volumeMm3: number): number {
  return volumeMm3 > 0 ? (100 * errorMm3) / volumeMm3 : 0;
}

/** The dam's floor area less the shadows' sum, with the rounding of a floor the shadows fill exactly dropped. */
export function uncoveredAreaMm2(model: CavityModel, dam: Dam): number {
  const facts = model.analysis.exact!;
  const area = dam === 'box' ? facts.boxAreaMm2 : facts.outlineAreaMm2;
  const uncovered = area - facts.coveredAreaMm2;
  return Math.abs(uncovered) > 1e-9 * area ? uncovered : 0;
}

/** The level quantities at h: summed exactly when the analysis was asked for h, otherwise read from the series. */
interface LevelQuantities {
  value: (q: LevelQuantity) => number;
  /** Summed at h itself, so no interpolation error. */
  summed: boolean;
}

function quantitiesAt(model: CavityModel, h: number): LevelQuantities {
  const summed = model.valuesAt?.(h) ?? null;
  if (summed) return { value: (q) => summed[q]!, summed: true };
  const series = model.series;
  return { value: (q) => seriesValue(series, q, h), summed: false };
}

/**
 * Resin by the exact series: the free space below h inside the dam (divergence theorem, see
 * level-series) less the air held in pockets and the hollows the pour never reaches.
 */
function exactVolume(model: CavityModel, h: number, dam: Dam, at: LevelQuantities = quantitiesAt(model, h)): number {
  const zMin = model.analysis.bboxMm.min[2];
  if (!(h > zMin)) return 0;
  const free = at.value(LevelQuantity.Up) + at.value(LevelQuantity.Down) + uncoveredAreaMm2(model, dam) * (h - zMin);
  return Math.max(0, free - at.value(LevelQuantity.Trapped) - at.value(LevelQuantity.Sealed));
}

function exactErrorMm3(model: CavityModel, h: number, at: LevelQuantities): number {
  return (at.summed ? 0 : seriesFillErrorMm3(model.series, h)) + model.analysis.exact!.unseenMm3;
}

/**
 * Resin up to level h (mm, Z-up frame) with the given dam: volume, wetted area, deepest column,
 * trapped air, the depth map, and which method answered with what error estimate.
 */
export function fillAt(source: CavitySource, levelMm: number, dam: Dam = 'outline'): Result<CavityFill> {
  const model = modelOf(source);
  if (!model.ok) return model;
  const level = checkLevel(levelMm);
  if (!level.ok) return level;
  const damChecked = checkDam(dam);
  if (!damChecked.ok) return damChecked;
  const { analysis } = model.value;
  const h = level.value;
  const at = quantitiesAt(model.value, h);
  const zMin = analysis.bboxMm.min[2];
  // The columns are walked when something needs them: at once for the column method and for the
  // deepest resin under overhangs, otherwise only when the depth map or the cross-check is read.
  let walked: ReturnType<typeof columnFill> | null = null;
  const columns = (): ReturnType<typeof columnFill> => (walked ??= columnFill(model.value.grid, h, dam, zMin));
  const wettedAreaMm2 = Math.max(0, at.value(LevelQuantity.Wetted) + (dam === 'box' ? at.value(LevelQuantity.WettedBox) : 0));

  let volumeMm3: number, trappedAirMm3: number, maxDepthMm: number, estimatedErrorPct: number;
  let exact: MethodFigures | null = null;
  if (analysis.method === 'exact') {
    const facts = analysis.exact!;
    volumeMm3 = exactVolume(model.value, h, dam, at);
    estimatedErrorPct = percent(exactErrorMm3(model.value, h, at), volumeMm3);
    exact = { volumeMm3, estimatedErrorPct };
    trappedAirMm3 = h > zMin ? Math.max(0, at.value(LevelQuantity.Trapped)) : 0;
    if (facts.overhangs) {
      // Resin under overhangs stacks in several gaps of one column: the depth map says where it is thickest.
      maxDepthMm = columns().maxDepthMm;
    } else {
      maxDepthMm = Math.max(0, h - facts.lowestFloorMm);
      if (uncoveredAreaMm2(model.value, dam) > 0) maxDepthMm = Math.max(maxDepthMm, h - zMin);
    }
  } else {
    volumeMm3 = columns().volumeMm3;
    estimatedErrorPct = percent(columns().errorMm3, columns().volumeMm3);
    trappedAirMm3 = columns().trappedAirMm3;
    maxDepthMm = columns().maxDepthMm;
  }

  const warnings: MeshWarning[] = [];
  const box = analysis.bboxMm;
  const boxVolume = (box.max[0] - box.min[0]) * (box.max[1] - box.min[1]) * (box.max[2] - box.min[2]);
  if (trappedAirMm3 > 1e-6 * boxVolume) {
    warnings.push({
      code: 'trapped_air',
      message: `About ${(trappedAirMm3 / 1000).toPrecision(3)} mL of air will be held below the level, under ceilings that rise above every way out for it: drill a vent at the top of each such pocket or turn the mould so they open upwards.`,
    });
  }
  if (analysis.method === 'columns' && estimatedErrorPct > analysis.targetErrorPct) {
    warnings.push({
      code: 'accuracy_target_missed',
      message: `The fill is within about ${estimatedErrorPct.toPrecision(2)} % rather than the ${analysis.targetErrorPct} % asked for: the column grid hit its size limit. Add a little more margin to the pour.`,
    });
  }

  const method = analysis.method;
  let columnFigures: CavityFill['columns'] | null = null;
  let depthMap: DepthMap | null = null;
  return ok({
    levelMm: h,
    dam,
    volumeMm3,
    wettedAreaMm2,
    maxDepthMm,
    trappedAirMm3,
    method,
    resolutionMm: method === 'columns' ? resolutionOf(model.value.grid) : null,
    estimatedErrorPct,
    exact,
    get columns(): CavityFill['columns'] {
      return (columnFigures ??= {
        volumeMm3: columns().volumeMm3,
        estimatedErrorPct: percent(columns().errorMm3, columns().volumeMm3),
        resolutionMm: resolutionOf(model.value.grid),
      });
    },
    get depthMap(): DepthMap {
      const grid = model.value.grid;
      return (depthMap ??= {
        originMm: [grid.originX, grid.originY],
        cellMm: [grid.cellX, grid.cellY],
        nx: grid.nx,
        ny: grid.ny,
        depthsMm: columns().depthsMm,
      });
    },
    warnings,
  });
}

function resolutionOf(grid: ColumnGrid): number {
  return Math.max(grid.cellX, grid.cellY);
}

/** Evenly spaced levels from the mould's lowest z to its highest z. */
function evenLevels(model: CavityModel, count: number): number[] {
  const { min, max } = model.analysis.bboxMm;
  return Array.from({ length: count }, (_, k) => (k === count - 1 ? max[2] : min[2] + ((max[2] - min[2]) * k) / (count - 1)));
}

/**
 * The volume-versus-level curve: at `levels` evenly spaced levels from the mould's lowest to its
 * highest z when given a count (at least 2), or at the given levels (mm).
 */
export function curve(source: CavitySource, levels: number | number[], dam: Dam = 'outline'): Result<CurvePoint[]> {
  const model = modelOf(source);
  if (!model.ok) return model;
  const damChecked = checkDam(dam);
  if (!damChecked.ok) return damChecked;
  let points: number[];
  if (typeof levels === 'number') {
    if (!Number.isInteger(levels) || levels < 2) {
      return fail('level_invalid', `The curve needs a whole number of levels, at least 2, got ${String(levels)}.`);
    }
    points = evenLevels(model.value, levels);
  } else {
    if (!levels.every((h) => typeof h === 'number' && Number.isFinite(h))) {
      return fail('level_invalid', 'Every curve level must be a finite number of millimetres.');
    }
    points = levels;
  }
  const m = model.value;
  if (m.analysis.method === 'exact') {
    return ok(points.map((levelMm) => ({ levelMm, volumeMm3: exactVolume(m, levelMm, dam) })));
  }
  const order = points.map((_, i) => i).sort((a, b) => points[a]! - points[b]!);
  const sorted = Float64Array.from(order.map((i) => points[i]!));
  const volumes = columnCurve(m.grid, sorted, dam, m.analysis.bboxMm.min[2]);
  const out: CurvePoint[] = new Array(points.length);
  order.forEach((i, k) => {
    out[i] = { levelMm: points[i]!, volumeMm3: volumes[k]! };
  });
  return ok(out);
}

/** Volume of each layer between consecutive levels (mm, ascending): n levels give n − 1 layers. */
export function layerVolumes(source: CavitySource, levelsMm: number[], dam: Dam = 'outline'): Result<number[]> {
  if (levelsMm.length < 2) return fail('level_invalid', `Layers need at least two levels (the bottom and the top of the first layer), got ${levelsMm.length}.`);
  for (let i = 1; i < levelsMm.length; i++) {
    if (!(levelsMm[i]! >= levelsMm[i - 1]!)) {
      return fail(
        'levels_not_ascending',
        `Layer level ${i + 1} (${String(levelsMm[i])} mm) is below the level before it; list the layer levels from the bottom up.`,
      );
    }
  }
  const points = curve(source, levelsMm, dam);
  if (!points.ok) return points;
  const v = points.value;
  return ok(v.slice(1).map((p, i) => Math.max(0, p.volumeMm3 - v[i]!.volumeMm3)));
}
