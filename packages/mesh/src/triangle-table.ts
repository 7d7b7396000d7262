import { SpareMemory } from './spare-memory';

/**
 * Per-triangle quantities every stage needs, computed once into flat typed arrays.
 * With n = (b − a) × (c − a) for corners a, b, c (outward winding): the triangle's area is |n|/2
 * and the signed area of its shadow on the table is n_z/2 (positive when it faces up).
 */
export interface TriangleTable {
  count: number;
  /** The mesh it was built from (not copied): vertex coordinates and three vertex indices per triangle. */
  positions: Float64Array;
  triangles: Uint32Array;
  /** n_z / 2: signed area of the triangle's shadow on the xy plane. */
  shadowArea: Float64Array;
  /** |n| / 2. */
  area: Float64Array;
  /** Lowest, middle and highest corner z, three per triangle. */
  sortedZ: Float64Array;
  /** 1 up, -1 down, 0 exactly vertical (no shadow). */
  facing: Int8Array;
  /** Within 1e-5 of vertical: its wetting is decided like a wall's, by the space beside it. */
  steep: Uint8Array;
}

/** Slope below which a face counts as a wall: float32 exports leave this much noise on vertical faces. */
export const steepNormalZ = 1e-5;

/**
 * Builds the table, in `spare` memory when it is given (every entry is written below, so memory
 * that held something else will do), otherwise in fresh arrays.
 */
export function buildTriangleTable(positions: Float64Array, triangles: Uint32Array, spare: Uint8Array | null = null): TriangleTable {
  return fillTable(positions, triangles, spare, -1).table;
}

/**
 * The table, and in the same pass the triangles whose height over their longest edge is at most
 * `toleranceMm`: no area at the model's resolution (the mesh clean-up's test, which needs the same
 * edge vectors and normal).
 */
export function tableWithFlats(
  positions: Float64Array,
  triangles: Uint32Array,
  spare: Uint8Array | null,
  toleranceMm: number,
): { table: TriangleTable; flat: number[] } {
  return fillTable(positions, triangles, spare, toleranceMm);
}

/** One pass over the triangles; flats are listed when `toleranceMm` is not negative. */
function fillTable(positions: Float64Array, triangles: Uint32Array, spare: Uint8Array | null, toleranceMm: number): { table: TriangleTable; flat: number[] } {
  const count = triangles.length / 3;
  const memory = new SpareMemory(spare);
  const shadowArea = memory.float64(count);
  const area = memory.float64(count);
  const sortedZ = memory.float64(count * 3);
  const facing = memory.int8(count);
  const steep = memory.uint8(count);
  const listFlats = toleranceMm >= 0,
    tol2 = toleranceMm * toleranceMm;
  const flat: number[] = [];
  for (let t = 0; t < count; t++) {
    const a = 3 * triangles[3 * t]!,
      b = 3 * triangles[3 * t + 1]!,
      c = 3 * triangles[3 * t + 2]!;
    const ax = positions[a]!,
      ay = positions[a + 1]!,
      az = positions[a + 2]!;
    const ux = positions[b]! - ax,
      uy = positions[b + 1]! - ay,
      uz = positions[b + 2]! - az;
    const vx = positions[c]! - ax,
      vy = positions[c + 1]! - ay,
      vz = positions[c + 2]! - az;
    const nx = uy * vz - uz * vy,
      ny = uz * vx - ux * vz,
      nz = ux * vy - uy * vx;
    const n2 = nx * nx + ny * ny + nz * nz;
    const len = Math.sqrt(n2);
    shadowArea[t] = nz / 2;
    area[t] = len / 2;
    facing[t] = nz > 0 ? 1 : nz < 0 ? -1 : 0;
    steep[t] = Math.abs(nz) <= steepNormalZ * len ? 1 : 0;
    if (listFlats) {
      const wx = vx - ux,
        wy = vy - uy,
        wz = vz - uz;
      const longest2 = Math.max(ux * ux + uy * uy + uz * uz, vx * vx + vy * vy + vz * vz, wx * wx + wy * wy + wz * wz);
      // height = |n| / longest edge; compared squared to stay off square roots.
      if (n2 <= tol2 * longest2) flat.push(t);
    }
    let z0 = az,
      z1 = positions[b + 2]!,
      z2 = positions[c + 2]!;
    if (z0 > z1) {
      const s = z0;
      z0 = z1;
      z1 = s;
    }
    if (z1 > z2) {
      const s = z1;
      z1 = z2;
      z2 = s;
    }
    if (z0 > z1) {
      const s = z0;
      z0 = z1;
      z1 = s;
    }
    sortedZ[3 * t] = z0;
    sortedZ[3 * t + 1] = z1;
    sortedZ[3 * t + 2] = z2;
  }
  return { table: { count, positions, triangles, shadowArea, area, sortedZ, facing, steep }, flat };
}
