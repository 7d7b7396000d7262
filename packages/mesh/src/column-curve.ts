import { forEachGap, gapResinTop } from './column-fill';
import type { ColumnGrid } from './column-grid';
import type { Dam } from './dam';

function firstAbove(levels: Float64Array, z: number): number {
  let lo = 0,
    hi = levels.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (levels[mid]! <= z) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Fill volume at many ascending levels in one pass over the columns. In each free gap of a
 * column (floor f, resin top a) the resin depth is h − f for f < h ≤ a and a − f above, linear
 * pieces in h; they go into difference arrays over the level index, so the curve costs
 * O(columns + levels), not O(columns × levels).
 */
export function columnCurve(grid: ColumnGrid, levels: Float64Array, dam: Dam, zMin: number): Float64Array {
  const n = levels.length;
  const slope = new Float64Array(n + 1);
  const offset = new Float64Array(n + 1);
  const columns = grid.nx * grid.ny;
  const gap = (floor: number, ceiling: number, escape: number): void => {
    const top = gapResinTop(floor, ceiling, escape);
    if (!(top > floor)) return;
    const from = firstAbove(levels, floor);
    const to = top === Infinity ? n : firstAbove(levels, top);
    if (to > from) {
      slope[from]! += 1;
      slope[to]! -= 1;
      offset[from]! -= floor;
      offset[to]! += floor;
    }
    if (top !== Infinity) {
      offset[to]! += top - floor;
      offset[n]! -= top - floor;
    }
  };
  for (let c = 0; c < columns; c++) forEachGap(grid, c, dam, zMin, gap);
  const cellArea = grid.cellX * grid.cellY;
  const volumes = new Float64Array(n);
  let s = 0,
    o = 0;
  for (let k = 0; k < n; k++) {
    s += slope[k]!;
    o += offset[k]!;
    volumes[k] = Math.max(0, (s * levels[k]! + o) * cellArea);
  }
  return volumes;
}
