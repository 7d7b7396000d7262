import type { ColumnGrid } from './column-grid';
import type { Dam } from './dam';

export interface ColumnFill {
  volumeMm3: number;
  trappedAirMm3: number;
  maxDepthMm: number;
  /** Resin depth per column (row-major, column c = j * nx + i). */
  depthsMm: Float32Array;
  /** Error bound of volumeMm3 from how well each column's centre stands for its cell (mm³). */
  errorMm3: number;
}

/**
 * Resin and trapped air at level h, column by column. In a column with solid intervals
 * [a0, b0] … ascending, resin stands on the top b_i of the highest interval that starts below h,
 * unless that interval reaches h (the column is solid there). Free gaps below that interval are
 * cut off from above: trapped air. With the box dam the table at zMin is a floor too: a column
 * with no solid below h holds h − zMin, and the gap under its lowest interval is trapped once that
 * interval starts below h.
 */
export function columnFill(grid: ColumnGrid, h: number, dam: Dam, zMin: number): ColumnFill {
  const { nx, ny, counts, offsets, intervals } = grid;
  const cellArea = grid.cellX * grid.cellY;
  const columns = nx * ny;
  const depthsMm = new Float32Array(columns);
  const depths = new Float64Array(columns);
  let volume = 0, trapped = 0, maxDepth = 0;
  const box = dam === 'box';
  for (let c = 0; c < columns; c++) {
    const first = offsets[c]!, count = counts[c]!;
    let highest = -1;
    for (let k = 0; k < count; k++) {
      if (intervals[2 * (first + k)]! < h) highest = k; else break;
    }
    let depth = 0;
    if (highest < 0) {
      if (box && h > zMin) depth = h - zMin;
    } else {
      let gaps = box ? intervals[2 * first]! - zMin : 0;
      for (let k = 1; k <= highest; k++) gaps += intervals[2 * (first + k)]! - intervals[2 * (first + k) - 1]!;
      trapped += gaps;
      const top = intervals[2 * (first + highest) + 1]!;
      if (top < h) depth = h - top;
    }
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
      const c = j * nx + i, d = depths[c]!;
      const left = i > 0 ? depths[c - 1]! : d, right = i + 1 < nx ? depths[c + 1]! : d;
      const down = j > 0 ? depths[c - nx]! : d, up = j + 1 < ny ? depths[c + nx]! : d;
      sum += Math.abs(left - 2 * d + right) + Math.abs(down - 2 * d + up);
    }
  }
  return (sum * cellX * cellY) / 4;
}
