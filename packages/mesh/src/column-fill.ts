import type { ColumnGrid } from './column-grid';
import type { Dam } from './dam';

export interface ColumnFill {
  volumeMm3: number;
  trappedAirMm3: number;
  maxDepthMm: number;
  /** Resin thickness per column (row-major, column c = j * nx + i), every gap counted. */
  depthsMm: Float32Array;
  /** Error bound of volumeMm3 from how well each column's centre stands for its cell (mm³). */
  errorMm3: number;
}

/**
 * Calls visit(floor, ceiling, escape) for each free gap of column c that lies inside the dam:
 * between the table (zMin) or an interval's top and the next interval's bottom, or above the
 * highest interval (ceiling and escape Infinity). Dams along the outline hold only columns with
 * mould in them; the box dam holds every column.
 */
export function forEachGap(grid: ColumnGrid, c: number, dam: Dam, zMin: number, visit: (floor: number, ceiling: number, escape: number) => void): void {
  const first = grid.offsets[c]!,
    count = grid.counts[c]!;
  if (count === 0) {
    if (dam === 'box') visit(zMin, Infinity, Infinity);
    return;
  }
  let floor = zMin;
  for (let k = 0; k < count; k++) {
    const bottom = grid.intervals[2 * (first + k)]!;
    if (bottom > floor) visit(floor, bottom, grid.escapeMm[first + k]!);
    floor = Math.max(floor, grid.intervals[2 * (first + k) + 1]!);
  }
  visit(floor, Infinity, Infinity);
}

/**
 * Resin in a gap filled to h: up to h, but not above the gap's escape height when that is below
 * its ceiling (air held under the ceiling), and nothing in a sealed gap.
 */
export function gapResinTop(floor: number, ceiling: number, escape: number): number {
  if (escape === -Infinity) return floor;
  return escape >= ceiling ? ceiling : Math.max(floor, escape);
}

/**
 * Resin and trapped air at level h, column by column: every free gap below h holds resin up to h,
 * except the air held between its escape height and its ceiling.
 */
export function columnFill(grid: ColumnGrid, h: number, dam: Dam, zMin: number): ColumnFill {
  const { nx, ny } = grid;
  const cellArea = grid.cellX * grid.cellY;
  const columns = nx * ny;
  const depthsMm = new Float32Array(columns);
  const depths = new Float64Array(columns);
  let volume = 0,
    trapped = 0,
    maxDepth = 0,
    depth = 0;
  const visit = (floor: number, ceiling: number, escape: number): void => {
    if (!(h > floor)) return;
    depth += Math.min(h, gapResinTop(floor, ceiling, escape)) - floor;
    if (escape !== -Infinity && escape < ceiling) trapped += Math.max(0, Math.min(h, ceiling) - Math.max(floor, escape));
  };
  for (let c = 0; c < columns; c++) {
    depth = 0;
    forEachGap(grid, c, dam, zMin, visit);
    depths[c] = depth;
    depthsMm[c] = depth;
    volume += depth;
    if (depth > maxDepth) maxDepth = depth;
  }
  return {
    volumeMm3: volume * cellArea,
    trappedAirMm3: trapped * cellArea,
    maxDepthMm: maxDepth,
    depthsMm,
    errorMm3: samplingErrorMm3(depths, nx, ny, grid.cellX, grid.cellY),
  };
}

/**
 * Bound on the centre-sample error. Where the depth jumps between neighbouring columns (a wall,
 * the waterline) the true edge lies anywhere between the two centres, so each such pair can be
 * off by half a cell times the jump; on a smooth floor the error is second order. Both are
 * caught by the second difference along each axis: a jump D between columns i and i+1 gives
 * |Δ²| = D at both, and cellArea × (|Δ²x| + |Δ²y|) / 4 summed over the columns equals the
 * half-cell bound of every jump; for a smooth floor it is a few times the midpoint-rule error
 * (cell²/24)·(d_xx + d_yy)·cellArea. Outside the grid the depth is taken as unchanged: the grid
 * tiles the bounding box exactly, so its edge is no source of error.
 */
function samplingErrorMm3(depths: Float64Array, nx: number, ny: number, cellX: number, cellY: number): number {
  let sum = 0;
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i,
        d = depths[c]!;
      const left = i > 0 ? depths[c - 1]! : d,
        right = i + 1 < nx ? depths[c + 1]! : d;
      const down = j > 0 ? depths[c - nx]! : d,
        up = j + 1 < ny ? depths[c + nx]! : d;
      sum += Math.abs(left - 2 * d + right) + Math.abs(down - 2 * d + up);
    }
  }
  return (sum * cellX * cellY) / 4;
}
