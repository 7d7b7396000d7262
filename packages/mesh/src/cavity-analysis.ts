import type { ColumnGrid } from './column-grid';
import type { LevelSeries } from './level-series';
import type { BoundingBox } from './mesh-measures';
import type { MeshWarning } from './result';

export type CavityMethod = 'exact' | 'columns';

/** The stored analysis's format; readAnalysis refuses other versions with `analysis_outdated`. */
export const cavityAnalysisVersion = 2;

/**
 * Everything needed to answer fill questions about a mould later, without its mesh: plain JSON
 * (numbers, strings, arrays), so the API can keep it as jsonb. Typed arrays are stored as base64
 * of their little-endian bytes (the `encoding` field says so).
 */
export interface CavityAnalysis {
  kind: 'gelpoint-cavity-analysis';
  version: typeof cavityAnalysisVersion;
  encoding: 'base64-little-endian';
  triangles: number;
  vertices: number;
  watertight: boolean;
  openEdges: number;
  nonManifoldEdges: number;
  bboxMm: BoundingBox;
  enclosedVolumeMm3: number | null;
  surfaceAreaMm2: number;
  /** Every vertical line meets the mould in at most one solid interval. */
  heightField: boolean;
  /** `exact` for closed, consistently wound moulds, `columns` otherwise. */
  method: CavityMethod;
  /** The accuracy the column resolution was chosen for. */
  targetErrorPct: number;
  /** Closed-form facts used by the exact method; null when it does not apply. */
  exact: ExactFacts | null;
  levels: StoredLevelSeries;
  columns: StoredColumnGrid;
  /** Warnings about the mesh itself (per-level ones come with each fill). */
  warnings: MeshWarning[];
}

export interface ExactFacts {
  /** Area of the mould's shadow on the table: the floor inside dams along its outline. */
  outlineAreaMm2: number;
  /** Area of the bounding box's footprint: the floor inside the box dam. */
  boxAreaMm2: number;
  /** Σ of the shadows of the faces that look down: the shadow counted once per solid layer above each point. */
  coveredAreaMm2: number;
  /** Lowest point of any up-facing face: where the deepest resin stands. */
  lowestFloorMm: number;
  /** Some raised face looks down (an overhang, an undercut, a raised underside), so resin can stand under the mould and air can be held. */
  overhangs: boolean;
  /** Faces with air held against them (or bounding a sealed hollow). */
  heldAirFaces: number;
  /**
   * Volume the analysis could not see: with no overhangs the escape analysis is skipped, and
   * faces within 1e-5 of vertical that look down could hold at most their shadow × height.
   */
  unseenMm3: number;
}

export interface StoredLevelSeries {
  /** base64 Float64: ascending knots, mm. */
  knotsMm: string;
  /** base64 Float64: 4 cubic coefficients per piece, quantities in the order up, down, trapped, sealed, wetted, wettedBox. */
  coefficients: string;
  endValue: number[];
  endSlope: number[];
  complete: boolean;
  /** base64 Float32 per piece, or null when complete. */
  fillPieceErrorMm3: string | null;
}

export interface StoredColumnGrid {
  originMm: [number, number];
  cellMm: [number, number];
  nx: number;
  ny: number;
  /** base64 Uint16: solid intervals per column, row-major. */
  counts: string;
  /** base64 Float32: [bottom, top] pairs, ascending per column. */
  intervalsMm: string;
  /**
   * base64 Float64: (interval index, escape height) pairs for the gaps below intervals whose air is
   * held (escape height below the interval's bottom; -Infinity: sealed off from the pour). Every
   * other gap lets its air out at its own ceiling.
   */
  heldAirMm: string;
}

/** A decoded analysis, ready for many queries. */
export interface CavityModel {
  kind: 'gelpoint-cavity-model';
  analysis: CavityAnalysis;
  series: LevelSeries;
  grid: ColumnGrid;
  /**
   * For an analysis made in this process: every level quantity (indexed by LevelQuantity) at a
   * level it was asked to answer exactly, summed over the faces; null at any other level.
   */
  valuesAt?: (levelMm: number) => Float64Array | null;
}

export interface DepthMap {
  /** Corner of the grid (min x, min y), mm; column (i, j) is centred at origin + ((i + ½)·cell). */
  originMm: [number, number];
  cellMm: [number, number];
  nx: number;
  ny: number;
  /** Resin thickness per column (every free gap of the column counted), row-major (index j * nx + i), mm. Transferable. */
  depthsMm: Float32Array;
}

export interface MethodFigures {
  volumeMm3: number;
  estimatedErrorPct: number;
}

export interface CavityFill {
  levelMm: number;
  dam: 'outline' | 'box';
  volumeMm3: number;
  /** Mould surface in contact with resin: floors, walls and undersides the resin reaches (for the seal coat). */
  wettedAreaMm2: number;
  /** Deepest resin column. */
  maxDepthMm: number;
  /** Free space below the level where air is held: under ceilings that rise above every way out. */
  trappedAirMm3: number;
  method: CavityMethod;
  /** Column cell size when the method is columns; null for exact. */
  resolutionMm: number | null;
  estimatedErrorPct: number;
  /** Both methods' volumes: the exact one where it applies, the columns one always. */
  exact: MethodFigures | null;
  columns: MethodFigures & { resolutionMm: number };
  depthMap: DepthMap;
  warnings: MeshWarning[];
}

export interface CurvePoint {
  levelMm: number;
  volumeMm3: number;
}
