import type { ColumnGrid } from './column-grid';
import type { Dam } from './dam';

function firstAbove(levels: Float64Array, z: number): number {
  let lo = 0, hi = levels.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (levels[mid]! <= z) lo = mid + 1; else hi = mid;
  }
  return lo;
}

/**
 * Fill volume at many ascending levels in one pass over the columns. In each free gap of a
 * column (floor f, ceiling c) the resin depth is h − f for f < h ≤ c and nothing otherwise, a
 * linear piece in h; the pieces go into difference arrays over the level index, so the curve
 * costs O(columns + levels), not O(columns × levels).
 */
export function columnCurve(grid: ColumnGrid, levels: Float64Array, dam: Dam, zMin: number): Float64Array {
  const n = levels.length;
  const slope = new Float64Array(n + 1);
  const offset = new Float64Array(n + 1);
  const { counts, offsets, intervals } = grid;
  const columns = grid.nx * grid.ny;
  const box = dam === 'box';
  const gap = (floor: number, ceiling: number): void => {
    const from = firstAbove(levels, floor);
    const to = ceiling === Infinity ? n : firstAbove(levels, ceiling);
    if (to <= from) return;
    slope[from]! += 1; slope[to]! -= 1;
    offset[from]! -= floor; offset[to]! += floor;
  };
  for (let c = 0; c < columns; c++) {
    const first = offsets[c]!, count = counts[c]!;
    if (box) gap(zMin, count > 0 ? intervals[2 * first]! : Infinity);
    for (let k = 0; k < count; k++) {
      gap(intervals[2 * (first + k) + 1]!, k + 1 < count ? intervals[2 * (first + k + 1)]! : Infinity);
    }
  }
  const cellArea = grid.cellX * grid.cellY;
  const volumes = new Float64Array(n);
  let s = 0, o = 0;
  for (let k = 0; k < n; k++) {
    s += slope[k]!;
    o += offset[k]!;
    volumes[k] = Math.max(0, (s * levels[k]! + o) * cellArea);
  }
  return volumes;
}
