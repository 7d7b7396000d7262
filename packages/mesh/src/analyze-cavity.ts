import { lazyAnalysis } from './analysis-codec';
import { cavityAnalysisVersion, type CavityAnalysis, type ExactFacts } from './cavity-analysis';
import { columnEscape } from './column-escape';
import { columnFill } from './column-fill';
import { buildColumnGrid, type ColumnGrid } from './column-grid';
import { escapeHeights } from './escape-heights';
import { checkHeightField } from './height-field';
import { chooseKnots } from './level-knots';
import { buildLevelSeries, levelQuantityCount, type LevelSeries } from './level-series';
import { levelValues, type LevelValues } from './level-values';
import { outlineArea } from './outline-area';
import type { CavityMesh } from './prepare-mesh';
import { fail, ok, type Result } from './result';
import { buildTriangleTable, type TriangleTable } from './triangle-table';
import { classifyWetting, wettingFrame } from './wetting-classes';
import { levelsWithoutTable } from './levels-without-table';
import { OverhangSurvey, type SurveyFace } from './overhang-survey';

export interface AnalyzeCavityOptions {
  /**
   * Levels (mm, Z-up frame) to answer exactly, e.g. the planned pour levels: the stored series has
   * them among its knots, and up to 8 of them are summed over the faces directly, so a question
   * about one of them needs no series (only another level, a curve or storing the analysis builds it).
   */
  levelsMm?: number[];
  /** Accuracy the column method's resolution is chosen for, in percent of the fill. Default 0.5. */
  targetErrorPct?: number;
  /** Most columns kept (bounds the stored size: about 9 bytes each as base64). Default 262,144. */
  maxColumns?: number;
  /** Most knots of the level series (about 170 bytes each as base64). Default 512. */
  maxKnots?: number;
}

export const analysisDefaults = { targetErrorPct: 0.5, maxColumns: 262_144, maxKnots: 512 };

/** Most levels summed face by face (`levelsMm`); more are read from the series. */
const maxSummedLevels = 8;

/** Most solid intervals stored (8 bytes each): about 3 MB, 4 MB as base64. */
const maxStoredIntervals = 393_216;

function gridShape(columns: number, width: number, depth: number): [number, number] {
  // A sliver (a mould 1e20 times longer than wide) must not ask for more columns than the budget.
  const nx = Math.min(columns, Math.max(1, Math.round(Math.sqrt((columns * width) / depth))));
  return [nx, Math.max(1, Math.round(columns / nx))];
}

function takeSpare(mesh: CavityMesh): Uint8Array | null {
  const spare = mesh.spareMemory ?? null;
  mesh.spareMemory = null;
  return spare;
}

/** One pass over the faces: whether anything hangs over free space, and the sums the exact fill needs. */
function surveyOverhangs(table: TriangleTable, zMin: number, height: number, tableToleranceMm: number): OverhangSurvey {
  const survey = new OverhangSurvey(zMin, height, tableToleranceMm);
  const face: SurveyFace = { facing: 0, shadowArea: 0, z0: 0, z2: 0, steep: false };
  for (let t = 0; t < table.count; t++) {
    face.facing = table.facing[t]!;
    face.shadowArea = table.shadowArea[t]!;
    face.z0 = table.sortedZ[3 * t]!;
    face.z2 = table.sortedZ[3 * t + 2]!;
    face.steep = table.steep[t] === 1;
    survey.add(face);
  }
  return survey;
}

/**
 * The cavity report's groundwork: checks whether the exact method applies and returns a plain-JSON
 * analysis that later answers fill questions without the mesh, through the level series and the
 * column grid, each built when first read (storing the analysis reads both). Pure: typed arrays
 * in, plain object out (worker friendly).
 */
export function analyzeCavity(mesh: CavityMesh, options: AnalyzeCavityOptions = {}): Result<CavityAnalysis> {
  const targetErrorPct = options.targetErrorPct ?? analysisDefaults.targetErrorPct;
  const maxColumns = options.maxColumns ?? analysisDefaults.maxColumns;
  const maxKnots = options.maxKnots ?? analysisDefaults.maxKnots;
  const levelsMm = options.levelsMm ?? [];
  if (!(targetErrorPct > 0) || !Number.isFinite(targetErrorPct)) {
    return fail('option_invalid', `targetErrorPct must be a positive percentage, got ${String(targetErrorPct)}.`);
  }
  if (!Number.isInteger(maxColumns) || maxColumns < 16)
    return fail('option_invalid', `maxColumns must be a whole number of at least 16, got ${String(maxColumns)}.`);
  if (!Number.isInteger(maxKnots) || maxKnots < 16) return fail('option_invalid', `maxKnots must be a whole number of at least 16, got ${String(maxKnots)}.`);
  if (!levelsMm.every(Number.isFinite)) return fail('level_invalid', 'Every level must be a finite number of millimetres.');

  const { positionsMm: positions, triangles, bboxMm: box } = mesh;
  const zMin = box.min[2],
    zMax = box.max[2];
  const width = box.max[0] - box.min[0],
    depth = box.max[1] - box.min[1],
    height = zMax - zMin;
  const rect = { minX: box.min[0], minY: box.min[1], maxX: box.max[0], maxY: box.max[1] };
  // A face counts as lying on the table within float32 rounding of its height (a file's corners
  // are float32: 2^-24 of their size) or 1e-7 of the mould's height, whichever is larger.
  const tableToleranceMm = Math.max(1e-7 * height, 4 * 2 ** -24 * Math.max(Math.abs(zMin), Math.abs(zMax)));
  // The triangle table, built when first needed, in the spare memory: taken once, since a second
  // analysis of the mesh must not write over the table of the first.
  let madeTable: TriangleTable | null = null;
  const tableOf = (): TriangleTable => (madeTable ??= buildTriangleTable(positions, triangles, takeSpare(mesh)));

  // The exact method needs a closed, consistently wound surface: the divergence theorem for the
  // free space below a level, and the escape analysis over its corners.
  const exact = mesh.topology.watertight && mesh.topology.windingConflicts === 0;
  // Summing costs a pass over the faces per level: beyond a few levels the series answers them instead.
  const distinct = [...new Set(levelsMm.map((h) => h + 0))];
  const asked = Float64Array.from(distinct.length <= maxSummedLevels ? distinct : []);
  // Asked about a few levels, a closed mould that nothing hangs over needs no table: one pass over
  // its faces answers those levels (the series and the columns build the table if they are read).
  const quick = exact && asked.length > 0 ? levelsWithoutTable(positions, triangles, asked, height, tableToleranceMm, wettingFrame(box)) : null;
  let facts: ExactFacts | null = null;
  let escape: Float64Array | null = null;
  let heightField = false;
  if (exact) {
    const survey = quick ? quick.survey : surveyOverhangs(tableOf(), zMin, height, tableToleranceMm);
    const boxArea = width * depth;
    let outline = survey.coveredAreaMm2,
      heldAirFaces = 0;
    if (survey.present) {
      // Something hangs over free space: find where air is held, and the shadow the outline dams enclose.
      const table = tableOf();
      const escapes = escapeHeights(table, mesh.vertexCount, rect);
      escape = escapes.triangleEscapeMm;
      heldAirFaces = escapes.trappedTriangles;
      outline = outlineArea(table, mesh.vertexCount, rect, zMin, tableToleranceMm);
      heightField = checkHeightField(positions, triangles, table, rect, height).heightField;
    } else {
      // Nothing but the base looks down (walls within 1e-5 of vertical aside): every column is one
      // solid standing on the table, no air is held and the outline's area is the shadows' sum.
      heightField = true;
    }
    facts = {
      outlineAreaMm2: outline,
      boxAreaMm2: boxArea,
      coveredAreaMm2: survey.coveredAreaMm2,
      lowestFloorMm: survey.lowestFloorMm,
      overhangs: survey.present,
      heldAirFaces,
      unseenMm3: survey.present ? 0 : survey.wallSliverMm3,
    };
  }
  const classes = quick ? quick.classes : classifyWetting(positions, triangles, tableOf(), box);
  const series = (): LevelSeries => {
    const table = tableOf();
    const knots = chooseKnots(table, classes, escape, zMin, zMax, levelsMm, maxKnots);
    return buildLevelSeries(knots.knots, knots.complete, table, classes, escape, zMin);
  };
  // The levels asked for are summed over the faces, all together: above, or on the first question about one of them.
  let summed: LevelValues | null = quick ? quick.values : null;
  const valuesAt = (levelMm: number): Float64Array | null => {
    const k = asked.indexOf(levelMm);
    if (k < 0) return null;
    summed ??= levelValues(asked, tableOf(), classes, escape, zMin);
    return Float64Array.from({ length: levelQuantityCount }, (_, q) => summed!.values[q * asked.length + k]!);
  };

  const build = (count: number): ColumnGrid => {
    const built = buildColumnGrid(positions, triangles, tableOf(), rect, zMin, ...gridShape(count, width, depth), exact);
    const grid = built.grid;
    if (!exact) {
      grid.escapeMm = columnEscape(grid, zMin);
    } else if (escape) {
      for (let k = 0; k < grid.escapeMm.length; k++) {
        const t = built.bottomTriangles[k]!;
        if (t >= 0 && escape[t]! !== Infinity) grid.escapeMm[k] = escape[t]!;
      }
    }
    return grid;
  };
  // Keep the stored intervals (8 bytes each) within a few MB, whatever the shape.
  const fitted = (columns: number): { grid: ColumnGrid; columns: number } => {
    const grid = build(columns);
    const intervals = grid.intervals.length / 2;
    if (intervals <= maxStoredIntervals) return { grid, columns };
    const fewer = Math.max(16, Math.floor((columns * maxStoredIntervals * 0.95) / intervals));
    return { grid: build(fewer), columns: -fewer };
  };
  let gridOf: () => ColumnGrid;
  if (exact) {
    // The exact method needs the columns only for the depth map, the cross-check and the deepest
    // resin under overhangs: they are built when first asked for, which a caller that only wants
    // the fill's volume never does.
    gridOf = () => fitted(Math.min(maxColumns, 65_536)).grid;
  } else {
    let { grid, columns } = fitted(Math.min(maxColumns, Math.max(65_536, 2 * mesh.triangleCount)));
    if (columns > 0) {
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
        ({ grid, columns } = fitted(Math.min(maxColumns, Math.ceil(columns * factor * factor))));
        if (columns < 0) break;
      }
    }
    gridOf = () => grid;
  }

  return ok(
    lazyAnalysis(
      {
        kind: 'gelpoint-cavity-analysis',
        version: cavityAnalysisVersion,
        encoding: 'base64-little-endian',
        triangles: mesh.triangleCount,
        vertices: mesh.vertexCount,
        watertight: mesh.topology.watertight,
        openEdges: mesh.topology.openEdges,
        nonManifoldEdges: mesh.topology.nonManifoldEdges,
        bboxMm: { min: [...box.min], max: [...box.max] },
        enclosedVolumeMm3: mesh.enclosedVolumeMm3,
        surfaceAreaMm2: mesh.surfaceAreaMm2,
        heightField,
        method: exact ? 'exact' : 'columns',
        targetErrorPct,
        exact: facts,
        warnings: [...mesh.warnings],
      },
      { series, grid: gridOf, valuesAt },
    ),
  );
}
