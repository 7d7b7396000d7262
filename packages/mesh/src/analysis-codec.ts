import { decodeFloat32, decodeFloat64, decodeUint16, encodeFloat32, encodeFloat64, encodeUint16 } from './base64';
import type { CavityAnalysis, CavityModel, StoredColumnGrid, StoredLevelSeries } from './cavity-analysis';
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

export function storeColumnGrid(grid: ColumnGrid): StoredColumnGrid {
  return {
    originMm: [grid.originX, grid.originY],
    cellMm: [grid.cellX, grid.cellY],
    nx: grid.nx,
    ny: grid.ny,
    counts: encodeUint16(grid.counts),
    intervalsMm: encodeFloat32(grid.intervals),
  };
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
  if (stored.version !== 1 || stored.encoding !== 'base64-little-endian') return invalid('unknown version');
  const analysis = stored as unknown as CavityAnalysis;
  const box = analysis.bboxMm;
  if (!isRecord(box) || !finiteNumbers(box.min, 3) || !finiteNumbers(box.max, 3)) return invalid('bounding box');
  if (analysis.method !== 'exact' && analysis.method !== 'columns') return invalid('method');
  if (analysis.method === 'exact') {
    const facts = analysis.exact;
    if (!isRecord(facts)) return invalid('exact facts');
    const numbers = [facts.footprintAreaMm2, facts.tableAreaMm2, facts.lowestFloorMm, facts.unseenMm3];
    if (!numbers.every((v) => typeof v === 'number' && Number.isFinite(v))) return invalid('exact facts');
    if (facts.raisedUndersideTopMm !== null && !(typeof facts.raisedUndersideTopMm === 'number' && Number.isFinite(facts.raisedUndersideTopMm))) return invalid('exact facts');
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
  if (!counts || !intervals || counts.length !== nx * ny) return invalid('column data');
  const offsets = offsetsFromCounts(counts);
  if (2 * offsets[counts.length]! !== intervals.length) return invalid('column intervals');
  const grid: ColumnGrid = {
    originX: columns.originMm[0], originY: columns.originMm[1], cellX: columns.cellMm[0], cellY: columns.cellMm[1],
    nx, ny, counts, offsets, intervals,
  };
  return ok({ kind: 'gelpoint-cavity-model', analysis, series, grid });
}
