import { pairCrossings, type Pairing } from './column-intervals';
import { edgeValue, shadowSpanInBand } from './plane-cover';
import { castRays } from './ray-batch';
import type { PlaneRect } from './shadow-index';
import type { TriangleTable } from './triangle-table';

/**
 * The mould sampled by vertical rays through the centres of a regular grid over its bounding box.
 * Along each ray the solid is known exactly (every triangle crossing, sorted and paired), so the
 * only error of the column method is in how well the centres stand for their cells.
 */
export interface ColumnGrid {
  originX: number;
  originY: number;
  cellX: number;
  cellY: number;
  nx: number;
  ny: number;
  /** Solid intervals per column, column c = j * nx + i. */
  counts: Uint16Array;
  /** Index (in intervals) of column c's first interval; nx * ny + 1 entries. */
  offsets: Uint32Array;
  /** [bottom, top] pairs in mm, ascending within each column. */
  intervals: Float32Array;
  /**
   * Per interval, the escape height of the air in the free gap just below it (mm): air stays in
   * that gap above this height once the resin rises past it. At or above the interval's bottom:
   * nothing is trapped there; -Infinity: the gap is sealed off from the pour.
   */
  escapeMm: Float32Array;
}

export interface ColumnGridBuild {
  grid: ColumnGrid;
  /** The triangle each interval's bottom lies on; -1 for the floor under a surface open underneath. */
  bottomTriangles: Int32Array;
  /** Columns whose crossings did not pair up even after a nudged re-cast. */
  unbalancedColumns: number;
}

export function offsetsFromCounts(counts: Uint16Array): Uint32Array {
  const offsets = new Uint32Array(counts.length + 1);
  for (let c = 0; c < counts.length; c++) offsets[c + 1] = offsets[c]! + counts[c]!;
  return offsets;
}

export function buildColumnGrid(
  positions: Float64Array,
  triangles: Uint32Array,
  table: TriangleTable,
  rect: PlaneRect,
  floorZ: number,
  nx: number,
  ny: number,
  repair: boolean,
): ColumnGridBuild {
  const originX = rect.minX,
    originY = rect.minY;
  const cellX = (rect.maxX - rect.minX) / nx,
    cellY = (rect.maxY - rect.minY) / ny;
  let capacity = 2 * nx * ny + 1024;
  let hitColumn = new Int32Array(capacity);
  let hitZ = new Float64Array(capacity);
  let hitUp = new Uint8Array(capacity);
  let hitTri = new Int32Array(capacity);
  let hits = 0;
  const span = new Float64Array(2);

  for (let t = 0; t < table.count; t++) {
    const facing = table.facing[t]!;
    if (facing === 0) continue;
    const a = 3 * triangles[3 * t]!,
      b = 3 * triangles[3 * t + 1]!,
      c = 3 * triangles[3 * t + 2]!;
    const x0 = positions[a]!,
      y0 = positions[a + 1]!,
      z0 = positions[a + 2]!;
    const x1 = positions[b]!,
      y1 = positions[b + 1]!,
      z1 = positions[b + 2]!;
    const x2 = positions[c]!,
      y2 = positions[c + 1]!,
      z2 = positions[c + 2]!;
    const minY = Math.min(y0, y1, y2),
      maxY = Math.max(y0, y1, y2);
    const jLo = Math.max(0, Math.ceil((minY - originY) / cellY - 0.5 - 1e-9));
    const jHi = Math.min(ny - 1, Math.floor((maxY - originY) / cellY - 0.5 + 1e-9));
    if (jLo > jHi) continue;
    const s0 = edgeValue(x1, y1, x2, y2, x0, y0);
    const s1 = edgeValue(x2, y2, x0, y0, x1, y1);
    const s2 = edgeValue(x0, y0, x1, y1, x2, y2);
    if (s0 === 0 || s1 === 0 || s2 === 0) continue;
    const ux = x1 - x0,
      uy = y1 - y0,
      uz = z1 - z0,
      vx = x2 - x0,
      vy = y2 - y0,
      vz = z2 - z0;
    const nz = ux * vy - uy * vx;
    const gx = -(uy * vz - uz * vy) / nz,
      gy = -(uz * vx - ux * vz) / nz;
    const zLo = Math.min(z0, z1, z2),
      zHi = Math.max(z0, z1, z2);
    const up = facing > 0 ? 1 : 0;
    for (let j = jLo; j <= jHi; j++) {
      const py = originY + (j + 0.5) * cellY;
      if (!shadowSpanInBand(x0, y0, x1, y1, x2, y2, py, py, span)) continue;
      const iLo = Math.max(0, Math.ceil((span[0]! - originX) / cellX - 0.5 - 1e-9));
      const iHi = Math.min(nx - 1, Math.floor((span[1]! - originX) / cellX - 0.5 + 1e-9));
      for (let i = iLo; i <= iHi; i++) {
        const px = originX + (i + 0.5) * cellX;
        const e0 = edgeValue(x1, y1, x2, y2, px, py);
        if (e0 === 0 ? s0 < 0 : e0 > 0 !== s0 > 0) continue;
        const e1 = edgeValue(x2, y2, x0, y0, px, py);
        if (e1 === 0 ? s1 < 0 : e1 > 0 !== s1 > 0) continue;
        const e2 = edgeValue(x0, y0, x1, y1, px, py);
        if (e2 === 0 ? s2 < 0 : e2 > 0 !== s2 > 0) continue;
        if (hits === capacity) {
          capacity *= 2;
          const c2 = new Int32Array(capacity);
          c2.set(hitColumn);
          hitColumn = c2;
          const z2b = new Float64Array(capacity);
          z2b.set(hitZ);
          hitZ = z2b;
          const u2 = new Uint8Array(capacity);
          u2.set(hitUp);
          hitUp = u2;
          const t2 = new Int32Array(capacity);
          t2.set(hitTri);
          hitTri = t2;
        }
        hitTri[hits] = t;
        const z = z0 + gx * (px - x0) + gy * (py - y0);
        hitColumn[hits] = j * nx + i;
        hitZ[hits] = z < zLo ? zLo : z > zHi ? zHi : z;
        hitUp[hits] = up;
        hits++;
      }
    }
  }

  const columns = nx * ny;
  const start = new Uint32Array(columns + 1);
  for (let h = 0; h < hits; h++) start[hitColumn[h]! + 1]!++;
  let busiest = 0;
  for (let col = 0; col < columns; col++) {
    busiest = Math.max(busiest, start[col + 1]!);
    start[col + 1]! += start[col]!;
  }
  const fill = start.slice(0, columns);
  const sortedZ = new Float64Array(hits);
  const sortedUp = new Uint8Array(hits);
  const sortedTri = new Int32Array(hits);
  for (let h = 0; h < hits; h++) {
    const at = fill[hitColumn[h]!]!++;
    sortedZ[at] = hitZ[h]!;
    sortedUp[at] = hitUp[h]!;
    sortedTri[at] = hitTri[h]!;
  }

  const counts = new Uint16Array(columns);
  let intervals = new Float32Array(Math.max(16, 2 * Math.ceil(hits / 2) + 16));
  let bottoms = new Int32Array(intervals.length / 2);
  let written = 0;
  const scratch = new Float64Array(2 * Math.max(1, busiest));
  const scratchTri = new Int32Array(Math.max(1, busiest));
  const pairing: Pairing = { intervals: 0, balanced: true };
  const unbalanced: number[] = [];
  for (let col = 0; col < columns; col++) {
    pairCrossings(sortedZ, sortedUp, sortedTri, start[col]!, start[col + 1]!, floorZ, scratch, 0, scratchTri, pairing);
    if (!pairing.balanced) unbalanced.push(col);
    const n = Math.min(pairing.intervals, 65535);
    if (written + 2 * n > intervals.length) {
      const grown = new Float32Array(2 * Math.max(intervals.length, (written + 2 * n) / 2));
      grown.set(intervals);
      intervals = grown;
      const grownBottoms = new Int32Array(grown.length / 2);
      grownBottoms.set(bottoms);
      bottoms = grownBottoms;
    }
    for (let k = 0; k < 2 * n; k++) intervals[written + k] = scratch[k]!;
    for (let k = 0; k < n; k++) bottoms[written / 2 + k] = scratchTri[k]!;
    written += 2 * n;
    counts[col] = n;
  }
  intervals = intervals.slice(0, written);
  bottoms = bottoms.slice(0, written / 2);
  let unbalancedColumns = unbalanced.length;
  if (repair && unbalanced.length > 0) {
    // A ray through a seam can meet a neighbour twice or not at all; a nudge far below any
    // feature size moves it off the seam. The nudged rays are cast together.
    const xs = new Float64Array(unbalanced.length),
      ys = new Float64Array(unbalanced.length);
    unbalanced.forEach((col, r) => {
      const i = col % nx,
        j = (col - i) / nx;
      xs[r] = originX + (i + 0.5) * cellX + cellX * 1.3e-7;
      ys[r] = originY + (j + 0.5) * cellY + cellY * 0.7e-7;
    });
    const nudged = castRays(xs, ys, positions, triangles, table.facing, rect, floorZ);
    const replaced = new Map<number, number>();
    unbalanced.forEach((col, r) => {
      if (nudged.balanced[r]) replaced.set(col, r);
    });
    if (replaced.size > 0) {
      const oldOffsets = offsetsFromCounts(counts);
      const merged: number[] = [],
        mergedBottoms: number[] = [];
      for (let col = 0; col < columns; col++) {
        const r = replaced.get(col);
        if (r === undefined) {
          for (let k = oldOffsets[col]!; k < oldOffsets[col + 1]!; k++) {
            merged.push(intervals[2 * k]!, intervals[2 * k + 1]!);
            mergedBottoms.push(bottoms[k]!);
          }
        } else {
          const from = nudged.start[r]!,
            to = nudged.start[r + 1]!;
          for (let k = from; k < to; k++) {
            merged.push(nudged.intervals[2 * k]!, nudged.intervals[2 * k + 1]!);
            mergedBottoms.push(nudged.bottomTriangles[k]!);
          }
          counts[col] = to - from;
        }
      }
      intervals = Float32Array.from(merged);
      bottoms = Int32Array.from(mergedBottoms);
      unbalancedColumns -= replaced.size;
    }
  }
  // Until the escape analysis says otherwise, no gap holds air: each escapes at its own ceiling.
  const escapeMm = new Float32Array(intervals.length / 2);
  for (let k = 0; k < escapeMm.length; k++) escapeMm[k] = intervals[2 * k]!;
  return {
    grid: { originX, originY, cellX, cellY, nx, ny, counts, offsets: offsetsFromCounts(counts), intervals, escapeMm },
    bottomTriangles: bottoms,
    unbalancedColumns,
  };
}
