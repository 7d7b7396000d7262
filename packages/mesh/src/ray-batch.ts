import { pairCrossings, planeZAt, type Pairing } from './column-intervals';
import { shadowContains } from './plane-cover';
import type { PlaneRect } from './shadow-index';

/** Solid intervals along many vertical lines, found together. */
export interface RayIntervals {
  /** Intervals of ray r are [bottom, top] pairs intervals[2·start[r] ..  2·start[r + 1]). */
  start: Uint32Array;
  intervals: Float64Array;
  /** The triangle each interval's bottom lies on (-1: the floor under a surface open underneath). */
  bottomTriangles: Int32Array;
  /** 1 where the crossings of the ray paired up. */
  balanced: Uint8Array;
}

/**
 * Casts vertical rays through the points (xs[r], ys[r]) in one pass over the triangles: the rays
 * are binned in a grid, and each triangle is tested only against the rays in the cells its
 * bounding box covers. For a handful of rays this costs one cheap sweep instead of an index over
 * a million triangles.
 */
export function castRays(
  xs: Float64Array,
  ys: Float64Array,
  positions: Float64Array,
  triangles: Uint32Array,
  /** Per triangle, as TriangleTable.facing: 1 up, -1 down, 0 vertical (never crossed). */
  facing: Int8Array,
  rect: PlaneRect,
  floorZ: number,
): RayIntervals {
  const rays = xs.length;
  const width = Math.max(rect.maxX - rect.minX, 1e-9),
    depth = Math.max(rect.maxY - rect.minY, 1e-9);
  const nx = Math.max(1, Math.min(2048, Math.round(Math.sqrt((rays * width) / depth))));
  const ny = Math.max(1, Math.min(2048, Math.round(rays / nx)));
  const cellX = width / nx,
    cellY = depth / ny;
  const cellOf = (x: number, y: number): number => {
    const i = Math.min(nx - 1, Math.max(0, Math.floor((x - rect.minX) / cellX)));
    const j = Math.min(ny - 1, Math.max(0, Math.floor((y - rect.minY) / cellY)));
    return j * nx + i;
  };
  const cellStart = new Uint32Array(nx * ny + 1);
  for (let r = 0; r < rays; r++) cellStart[cellOf(xs[r]!, ys[r]!) + 1]!++;
  for (let c = 0; c < nx * ny; c++) cellStart[c + 1]! += cellStart[c]!;
  const cellRays = new Uint32Array(rays);
  const fill = cellStart.slice(0, nx * ny);
  for (let r = 0; r < rays; r++) cellRays[fill[cellOf(xs[r]!, ys[r]!)]!++] = r;

  let capacity = 4 * rays + 64;
  let hitRay = new Uint32Array(capacity),
    hitZ = new Float64Array(capacity),
    hitUp = new Uint8Array(capacity),
    hitTri = new Int32Array(capacity);
  let hits = 0;
  if (rays > 0) {
    for (let t = 0; t < facing.length; t++) {
      if (facing[t] === 0) continue;
      const a = 3 * triangles[3 * t]!,
        b = 3 * triangles[3 * t + 1]!,
        c = 3 * triangles[3 * t + 2]!;
      const x0 = positions[a]!,
        y0 = positions[a + 1]!,
        x1 = positions[b]!,
        y1 = positions[b + 1]!,
        x2 = positions[c]!,
        y2 = positions[c + 1]!;
      const iLo = Math.max(0, Math.floor((Math.min(x0, x1, x2) - rect.minX) / cellX));
      const iHi = Math.min(nx - 1, Math.floor((Math.max(x0, x1, x2) - rect.minX) / cellX));
      const jLo = Math.max(0, Math.floor((Math.min(y0, y1, y2) - rect.minY) / cellY));
      const jHi = Math.min(ny - 1, Math.floor((Math.max(y0, y1, y2) - rect.minY) / cellY));
      for (let j = jLo; j <= jHi; j++) {
        for (let i = iLo; i <= iHi; i++) {
          const cell = j * nx + i;
          for (let k = cellStart[cell]!; k < cellStart[cell + 1]!; k++) {
            const r = cellRays[k]!;
            const px = xs[r]!,
              py = ys[r]!;
            if (!shadowContains(x0, y0, x1, y1, x2, y2, px, py)) continue;
            if (hits === capacity) {
              capacity *= 2;
              const r2 = new Uint32Array(capacity);
              r2.set(hitRay);
              hitRay = r2;
              const z2 = new Float64Array(capacity);
              z2.set(hitZ);
              hitZ = z2;
              const u2 = new Uint8Array(capacity);
              u2.set(hitUp);
              hitUp = u2;
              const t2 = new Int32Array(capacity);
              t2.set(hitTri);
              hitTri = t2;
            }
            hitTri[hits] = t;
            hitRay[hits] = r;
            hitZ[hits] = planeZAt(positions, triangles, t, px, py);
            hitUp[hits] = facing[t]! > 0 ? 1 : 0;
            hits++;
          }
        }
      }
    }
  }

  const rayStart = new Uint32Array(rays + 1);
  for (let h = 0; h < hits; h++) rayStart[hitRay[h]! + 1]!++;
  let busiest = 1;
  for (let r = 0; r < rays; r++) {
    busiest = Math.max(busiest, rayStart[r + 1]!);
    rayStart[r + 1]! += rayStart[r]!;
  }
  const at = rayStart.slice(0, rays);
  const z = new Float64Array(hits),
    up = new Uint8Array(hits),
    tri = new Int32Array(hits);
  for (let h = 0; h < hits; h++) {
    const w = at[hitRay[h]!]!++;
    z[w] = hitZ[h]!;
    up[w] = hitUp[h]!;
    tri[w] = hitTri[h]!;
  }
  const start = new Uint32Array(rays + 1);
  const balanced = new Uint8Array(rays);
  const out = new Float64Array(2 * busiest),
    outTri = new Int32Array(busiest);
  const pairing: Pairing = { intervals: 0, balanced: true };
  let intervals = new Float64Array(Math.max(16, hits + 16));
  let bottoms = new Int32Array(Math.ceil(intervals.length / 2));
  let written = 0;
  for (let r = 0; r < rays; r++) {
    pairCrossings(z, up, tri, rayStart[r]!, rayStart[r + 1]!, floorZ, out, 0, outTri, pairing);
    balanced[r] = pairing.balanced ? 1 : 0;
    if (2 * (written + pairing.intervals) > intervals.length) {
      const grown = new Float64Array(Math.max(2 * intervals.length, 2 * (written + pairing.intervals)));
      grown.set(intervals);
      intervals = grown;
      const grownBottoms = new Int32Array(Math.ceil(grown.length / 2));
      grownBottoms.set(bottoms);
      bottoms = grownBottoms;
    }
    for (let k = 0; k < 2 * pairing.intervals; k++) intervals[2 * written + k] = out[k]!;
    for (let k = 0; k < pairing.intervals; k++) bottoms[written + k] = outTri[k]!;
    written += pairing.intervals;
    start[r + 1] = written;
  }
  return { start, intervals: intervals.slice(0, 2 * written), bottomTriangles: bottoms.slice(0, written), balanced };
}
