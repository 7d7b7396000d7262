import { storeColumnGrid, storeLevelSeries } from './analysis-codec';
import type { CavityAnalysis, ExactFacts } from './cavity-analysis';
import { columnFill } from './column-fill';
import { buildColumnGrid, type ColumnGrid } from './column-grid';
import { checkHeightField } from './height-field';
import { chooseKnots } from './level-knots';
import { buildLevelSeries } from './level-series';
import type { CavityMesh } from './prepare-mesh';
import { fail, ok, type Result } from './result';
import { buildTriangleTable, type TriangleTable } from './triangle-table';
import { classifyWetting } from './wetting-classes';

export interface AnalyzeCavityOptions {
  /** Levels (mm, Z-up frame) the stored series must answer exactly, e.g. the planned pour levels. */
  levelsMm?: number[];
  /** Accuracy the column method's resolution is chosen for, in percent of the fill. Default 0.5. */
  targetErrorPct?: number;
  /** Most columns kept (bounds the stored size: about 9 bytes each as base64). Default 262,144. */
  maxColumns?: number;
  /** Most knots of the level series (about 170 bytes each as base64). Default 512. */
  maxKnots?: number;
}

export const analysisDefaults = { targetErrorPct: 0.5, maxColumns: 262_144, maxKnots: 512 };

/** Most solid intervals stored (8 bytes each): about 3 MB, 4 MB as base64. */
const maxStoredIntervals = 393_216;

function gridShape(columns: number, width: number, depth: number): [number, number] {
  // A sliver (a mould 1e20 times longer than wide) must not ask for more columns than the budget.
  const nx = Math.min(columns, Math.max(1, Math.round(Math.sqrt((columns * width) / depth))));
  return [nx, Math.max(1, Math.round(columns / nx))];
}

function exactFacts(table: TriangleTable, box: CavityMesh['bboxMm'], unseenMm3: number): ExactFacts {
  let footprint = 0, lowestFloor = Infinity, raisedTop = -Infinity;
  const zMin = box.min[2], height = box.max[2] - box.min[2];
  for (let t = 0; t < table.count; t++) {
    if (table.facing[t]! > 0) {
      footprint += table.shadowArea[t]!;
      lowestFloor = Math.min(lowestFloor, table.sortedZ[3 * t]!);
    } else if (table.facing[t]! < 0 && table.sortedZ[3 * t + 2]! > zMin + 1e-9 * height) {
      raisedTop = Math.max(raisedTop, table.sortedZ[3 * t + 2]!);
    }
  }
  const boxArea = (box.max[0] - box.min[0]) * (box.max[1] - box.min[1]);
  const uncovered = boxArea - footprint;
  return {
    footprintAreaMm2: footprint,
    // A footprint that fills its box leaves only rounding behind.
    tableAreaMm2: uncovered > 1e-9 * boxArea ? uncovered : 0,
    lowestFloorMm: lowestFloor,
    raisedUndersideTopMm: raisedTop === -Infinity ? null : raisedTop,
    unseenMm3,
  };
}

/**
 * The cavity report's groundwork: checks whether the exact method applies, builds the level
 * series and the column grid, and returns them as a plain-JSON analysis that later answers fill
 * questions without the mesh. Pure: typed arrays in, plain object out (worker friendly).
 */
export function analyzeCavity(mesh: CavityMesh, options: AnalyzeCavityOptions = {}): Result<CavityAnalysis> {
  const targetErrorPct = options.targetErrorPct ?? analysisDefaults.targetErrorPct;
  const maxColumns = options.maxColumns ?? analysisDefaults.maxColumns;
  const maxKnots = options.maxKnots ?? analysisDefaults.maxKnots;
  const levelsMm = options.levelsMm ?? [];
  if (!(targetErrorPct > 0) || !Number.isFinite(targetErrorPct)) {
    return fail('option_invalid', `targetErrorPct must be a positive percentage, got ${String(targetErrorPct)}.`);
  }
  if (!Number.isInteger(maxColumns) || maxColumns < 16) return fail('option_invalid', `maxColumns must be a whole number of at least 16, got ${String(maxColumns)}.`);
  if (!Number.isInteger(maxKnots) || maxKnots < 16) return fail('option_invalid', `maxKnots must be a whole number of at least 16, got ${String(maxKnots)}.`);
  if (!levelsMm.every(Number.isFinite)) return fail('level_invalid', 'Every level must be a finite number of millimetres.');

  const { positionsMm: positions, triangles, bboxMm: box } = mesh;
  const zMin = box.min[2], zMax = box.max[2];
  const width = box.max[0] - box.min[0], depth = box.max[1] - box.min[1], height = zMax - zMin;
  const rect = { minX: box.min[0], minY: box.min[1], maxX: box.max[0], maxY: box.max[1] };
  const table = buildTriangleTable(positions, triangles);

  const closed = mesh.topology.watertight && mesh.topology.windingConflicts === 0;
  const check = closed ? checkHeightField(positions, triangles, table, rect, height) : { heightField: false, unseenMm3: 0 };
  const exact = closed && check.heightField;
  const classes = classifyWetting(positions, triangles, table, box, exact);
  const knots = chooseKnots(table, classes, zMin, zMax, levelsMm, maxKnots);
  const series = buildLevelSeries(knots.knots, knots.complete, table, classes, zMin);

  const repair = closed;
  const build = (count: number): ColumnGrid => buildColumnGrid(positions, triangles, table, rect, zMin, ...gridShape(count, width, depth), repair).grid;
  // The exact method needs the columns only for the depth map and the cross-check.
  let columns = exact ? Math.min(maxColumns, 65_536) : Math.min(maxColumns, Math.max(65_536, 2 * table.count));
  let grid = build(columns);
  // Keep the stored intervals (8 bytes each) within a few MB, whatever the shape.
  const fitIntervals = (): boolean => {
    const intervals = grid.intervals.length / 2;
    if (intervals <= maxStoredIntervals) return true;
    columns = Math.max(16, Math.floor((columns * maxStoredIntervals * 0.95) / intervals));
    grid = build(columns);
    return false;
  };
  if (fitIntervals() && !exact) {
    // Refine until the column estimate meets the target at the levels that matter, within the caps.
    const checkLevels = levelsMm.length > 0 ? levelsMm : [zMax];
    for (let round = 0; round < 3 && columns < maxColumns; round++) {
      let worst = 0;
      for (const level of checkLevels) {
        const fill = columnFill(grid, level, 'outline', zMin);
        if (fill.volumeMm3 > 0) worst = Math.max(worst, (100 * fill.errorMm3) / fill.volumeMm3);
      }
      if (worst <= targetErrorPct) break;
      // The estimate shrinks about in step with the cell size, so columns grow with its square.
      const factor = (worst / targetErrorPct) * 1.25;
      columns = Math.min(maxColumns, Math.ceil(columns * factor * factor));
      grid = build(columns);
      if (!fitIntervals()) break;
    }
  }

  return ok({
    kind: 'gelpoint-cavity-analysis',
    version: 1,
    encoding: 'base64-little-endian',
    triangles: mesh.triangleCount,
    vertices: mesh.vertexCount,
    watertight: mesh.topology.watertight,
    openEdges: mesh.topology.openEdges,
    nonManifoldEdges: mesh.topology.nonManifoldEdges,
    bboxMm: { min: [...box.min], max: [...box.max] },
    enclosedVolumeMm3: mesh.enclosedVolumeMm3,
    surfaceAreaMm2: mesh.surfaceAreaMm2,
    heightField: exact,
    method: exact ? 'exact' : 'columns',
    targetErrorPct,
    exact: exact ? exactFacts(table, box, check.unseenMm3) : null,
    levels: storeLevelSeries(series),
    columns: storeColumnGrid(grid),
    warnings: [...mesh.warnings],
  });
}
