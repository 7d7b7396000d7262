import type { ColumnGrid } from './column-grid';
import type { LevelSeries } from './level-series';
import type { BoundingBox } from './mesh-measures';
import type { MeshWarning } from './result';

export type CavityMethod = 'exact' | 'columns';

/**
 * Everything needed to answer fill questions about a mould later, without its mesh: plain JSON
 * (numbers, strings, arrays), so the API can keep it as jsonb. Typed arrays are stored as base64
 * of their little-endian bytes (the `encoding` field says so).
 */
export interface CavityAnalysis {
  kind: 'gelpoint-cavity-analysis';
  version: 1;
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
  /** `exact` for closed height-field moulds, `columns` otherwise. */
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
  /** Area of the mould's shadow on the table (Σ of up-facing shadows in a height field). */
  footprintAreaMm2: number;
  /** Bounding-box footprint not covered by the mould: the box dam's table area. */
  tableAreaMm2: number;
  /** Lowest point of any up-facing face: where the deepest resin stands. */
  lowestFloorMm: number;
  /** Highest point of a down-facing face above the base (the table reaches under it), or null. */
  raisedUndersideTopMm: number | null;
  /** Volume the height-field check could not see (near-vertical down-facing slivers). */
  unseenMm3: number;
}

export interface StoredLevelSeries {
  /** base64 Float64: ascending knots, mm. */
  knotsMm: string;
  /** base64 Float64: 4 cubic coefficients per piece, quantities in the order fill, wetted, wettedBox, underBox, trappedBox. */
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
}

/** A decoded analysis, ready for many queries. */
export interface CavityModel {
  kind: 'gelpoint-cavity-model';
  analysis: CavityAnalysis;
  series: LevelSeries;
  grid: ColumnGrid;
}

export interface DepthMap {
  /** Corner of the grid (min x, min y), mm; column (i, j) is centred at origin + ((i + ½)·cell). */
  originMm: [number, number];
  cellMm: [number, number];
  nx: number;
  ny: number;
  /** Resin depth per column, row-major (index j * nx + i), mm. Transferable. */
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
  /** Mould surface in contact with resin: floor and walls (for the seal coat). */
  wettedAreaMm2: number;
  /** Deepest resin column. */
  maxDepthMm: number;
  /** Free space below the level that resin cannot reach (under overhangs). */
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
