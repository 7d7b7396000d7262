import { decodeFloat32, decodeFloat64, decodeUint16, encodeFloat32, encodeFloat64, encodeUint16 } from './base64';
import { cavityAnalysisVersion, type CavityAnalysis, type CavityModel, type StoredColumnGrid, type StoredLevelSeries } from './cavity-analysis';
import { offsetsFromCounts, type ColumnGrid } from './column-grid';
import { levelQuantityCount, type LevelSeries } from './level-series';
import { fail, ok, type Result } from './result';

export function storeLevelSeries(series: LevelSeries): StoredLevelSeries {
  return {
    knotsMm: encodeFloat64(series.knots),
    coefficients: encodeFloat64(series.coefficients),
    endValue: Array.from(series.endValue),
    endSlope: Array.from(series.endSlope),
    complete: series.complete,
    fillPieceErrorMm3: series.fillPieceErrorMm3 ? encodeFloat32(series.fillPieceErrorMm3) : null,
  };
}

/** Only the gaps that hold air are stored; most moulds have none. */
function heldAir(grid: ColumnGrid): Float64Array {
  const pairs: number[] = [];
  for (let k = 0; k < grid.escapeMm.length; k++) {
    if (grid.escapeMm[k]! < grid.intervals[2 * k]!) pairs.push(k, grid.escapeMm[k]!);
  }
  return Float64Array.from(pairs);
}

export function storeColumnGrid(grid: ColumnGrid): StoredColumnGrid {
  return {
    originMm: [grid.originX, grid.originY],
    cellMm: [grid.cellX, grid.cellY],
    nx: grid.nx,
    ny: grid.ny,
    counts: encodeUint16(grid.counts),
    intervalsMm: encodeFloat32(grid.intervals),
    heldAirMm: encodeFloat64(heldAir(grid)),
  };
}

/** Models of analyses made in this process, so reading one back skips the base64 round trip. */
const madeHere = new WeakMap<object, Made>();

/** What an analysis made here can still give: each part is worked out when first asked for. */
interface Made {
  series: () => LevelSeries;
  grid: () => ColumnGrid;
  valuesAt: (levelMm: number) => Float64Array | null;
}

/** Works `make` out once, when first called, then forgets it (it may hold the mesh and its tables). */
function once<T>(make: () => T): () => T {
  let pending: (() => T) | null = make;
  let made: T | undefined;
  return () => {
    if (pending) {
      made = pending();
      pending = null;
    }
    return made as T;
  };
}

/**
 * The stored form keeps only escape heights below their gap's ceiling (the rest read back as the
 * ceiling, which the queries treat alike): a grid made here is set the same way, so the model
 * handed back holds exactly what reading the stored form would give.
 */
function asStored(grid: ColumnGrid): ColumnGrid {
  const { escapeMm, intervals } = grid;
  for (let k = 0; k < escapeMm.length; k++) if (escapeMm[k]! > intervals[2 * k]!) escapeMm[k] = intervals[2 * k]!;
  return grid;
}

/**
 * The analysis as stored, with its two blobs encoded to base64 only when first read (JSON.stringify,
 * structured clone and spreading all read them), and the level series and the column grid worked
 * out only when something asks for them (functions are given for them): a caller that only asks
 * about the levels it named when analysing, as the command line does, pays for neither, and
 * readAnalysis hands back the arrays it was made from. Assigning a blob replaces it and makes the
 * object an ordinary stored analysis again.
 */
export function lazyAnalysis(
  header: Omit<CavityAnalysis, 'levels' | 'columns'>,
  parts: { series: () => LevelSeries; grid: () => ColumnGrid; valuesAt: (levelMm: number) => Float64Array | null },
): CavityAnalysis {
  // Each dropped once used: they hold the mesh and its triangle table.
  const series = once(parts.series);
  const grid = once(() => asStored(parts.grid()));
  let levels: StoredLevelSeries | null = null;
  let columns: StoredColumnGrid | null = null;
  const { warnings, ...rest } = header;
  const analysis = {
    ...rest,
    get levels(): StoredLevelSeries {
      return (levels ??= storeLevelSeries(series()));
    },
    set levels(value: StoredLevelSeries) {
      levels = value;
      madeHere.delete(analysis);
    },
    get columns(): StoredColumnGrid {
      return (columns ??= storeColumnGrid(grid()));
    },
    set columns(value: StoredColumnGrid) {
      columns = value;
      madeHere.delete(analysis);
    },
    warnings,
  } satisfies CavityAnalysis;
  madeHere.set(analysis, { series, grid, valuesAt: parts.valuesAt });
  return analysis;
}

const invalid = (what: string): Result<never> =>
  fail('analysis_invalid', `The stored cavity analysis is damaged or from another version (${what}); analyse the mould's STL again.`);

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function finiteNumbers(value: unknown, length: number): value is number[] {
  return Array.isArray(value) && value.length === length && value.every((v) => typeof v === 'number' && Number.isFinite(v));
}

/**
 * Checks and decodes a stored analysis (for example one read back from jsonb). Everything a query
 * will index is checked here, so a damaged record is refused with a reason instead of giving wrong
 * numbers.
 */
export function readAnalysis(stored: unknown): Result<CavityModel> {
  if (!isRecord(stored) || stored.kind !== 'gelpoint-cavity-analysis') return invalid('not a cavity analysis');
  const made = madeHere.get(stored);
  if (made) {
    return ok({
      kind: 'gelpoint-cavity-model',
      analysis: stored as unknown as CavityAnalysis,
      get series(): LevelSeries {
        return made.series();
      },
      get grid(): ColumnGrid {
        return made.grid();
      },
      valuesAt: made.valuesAt,
    });
  }
  if (typeof stored.version === 'number' && Number.isInteger(stored.version) && stored.version >= 1 && stored.version < cavityAnalysisVersion) {
    // Earlier versions counted resin only where it could drop straight down from the surface.
    return fail(
      'analysis_outdated',
      `This cavity analysis was made by an earlier version of the engine (version ${stored.version}, now ${cavityAnalysisVersion}) whose fill rule has since changed; analyse the mould's STL again.`,
    );
  }
  if (stored.version !== cavityAnalysisVersion || stored.encoding !== 'base64-little-endian') return invalid('unknown version');
  const analysis = stored as unknown as CavityAnalysis;
  const box = analysis.bboxMm;
  if (!isRecord(box) || !finiteNumbers(box.min, 3) || !finiteNumbers(box.max, 3)) return invalid('bounding box');
  if (analysis.method !== 'exact' && analysis.method !== 'columns') return invalid('method');
  if (analysis.method === 'exact') {
    const facts = analysis.exact;
    if (!isRecord(facts)) return invalid('exact facts');
    const numbers = [facts.outlineAreaMm2, facts.boxAreaMm2, facts.coveredAreaMm2, facts.lowestFloorMm, facts.heldAirFaces, facts.unseenMm3];
    if (!numbers.every((v) => typeof v === 'number' && Number.isFinite(v)) || typeof facts.overhangs !== 'boolean') return invalid('exact facts');
  }
  if (!(typeof analysis.targetErrorPct === 'number' && analysis.targetErrorPct > 0) || !Array.isArray(analysis.warnings)) return invalid('header');

  const levels = analysis.levels;
  if (!isRecord(levels) || typeof levels.knotsMm !== 'string' || typeof levels.coefficients !== 'string') return invalid('level series');
  const knots = decodeFloat64(levels.knotsMm);
  const coefficients = decodeFloat64(levels.coefficients);
  if (!knots || knots.length < 2 || !coefficients) return invalid('level series data');
  for (let k = 1; k < knots.length; k++) if (!(knots[k]! > knots[k - 1]!)) return invalid('level knots not ascending');
  if (coefficients.length !== levelQuantityCount * (knots.length - 1) * 4) return invalid('level coefficients');
  if (!finiteNumbers(levels.endValue, levelQuantityCount) || !finiteNumbers(levels.endSlope, levelQuantityCount)) return invalid('level ends');
  let pieceErrors: Float32Array | null = null;
  if (levels.fillPieceErrorMm3 !== null) {
    pieceErrors = typeof levels.fillPieceErrorMm3 === 'string' ? decodeFloat32(levels.fillPieceErrorMm3) : null;
    if (!pieceErrors || pieceErrors.length !== knots.length - 1) return invalid('level errors');
  }
  const series: LevelSeries = {
    knots,
    coefficients,
    endValue: Float64Array.from(levels.endValue),
    endSlope: Float64Array.from(levels.endSlope),
    complete: levels.complete === true,
    fillPieceErrorMm3: pieceErrors,
  };

  const columns = analysis.columns;
  if (!isRecord(columns) || !finiteNumbers(columns.originMm, 2) || !finiteNumbers(columns.cellMm, 2)) return invalid('column grid');
  const { nx, ny } = columns;
  if (!Number.isInteger(nx) || !Number.isInteger(ny) || nx < 1 || ny < 1) return invalid('column grid size');
  if (!(columns.cellMm[0] > 0) || !(columns.cellMm[1] > 0)) return invalid('column cell size');
  const counts = typeof columns.counts === 'string' ? decodeUint16(columns.counts) : null;
  const intervals = typeof columns.intervalsMm === 'string' ? decodeFloat32(columns.intervalsMm) : null;
  const held = typeof columns.heldAirMm === 'string' ? decodeFloat64(columns.heldAirMm) : null;
  if (!counts || !intervals || !held || counts.length !== nx * ny || held.length % 2 !== 0) return invalid('column data');
  const offsets = offsetsFromCounts(counts);
  if (2 * offsets[counts.length]! !== intervals.length) return invalid('column intervals');
  const escapeMm = new Float32Array(intervals.length / 2);
  for (let k = 0; k < escapeMm.length; k++) escapeMm[k] = intervals[2 * k]!;
  for (let p = 0; p < held.length; p += 2) {
    const k = held[p]!,
      e = held[p + 1]!;
    if (!Number.isInteger(k) || k < 0 || k >= escapeMm.length || !(e === -Infinity || Number.isFinite(e))) return invalid('held air');
    escapeMm[k] = e;
  }
  const grid: ColumnGrid = {
    originX: columns.originMm[0],
    originY: columns.originMm[1],
    cellX: columns.cellMm[0],
    cellY: columns.cellMm[1],
    nx,
    ny,
    counts,
    offsets,
    intervals,
    escapeMm,
  };
  return ok({ kind: 'gelpoint-cavity-model', analysis, series, grid });
}
