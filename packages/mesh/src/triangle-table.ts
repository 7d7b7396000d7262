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

/** One face's entries of the table (see TriangleTable), worked out from its corners. */
export interface FaceGeometry {
  shadowArea: number;
  area: number;
  facing: number;
  steep: boolean;
  z0: number;
  z1: number;
  z2: number;
}

/** Fills `out` with triangle t's entries; one object is filled again face after face. */
export function faceGeometry(positions: Float64Array, triangles: Uint32Array, t: number, out: FaceGeometry): void {
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
  const len = Math.sqrt(nx * nx + ny * ny + nz * nz);
  out.shadowArea = nz / 2;
  out.area = len / 2;
  out.facing = nz > 0 ? 1 : nz < 0 ? -1 : 0;
  out.steep = Math.abs(nz) <= steepNormalZ * len;
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
  out.z0 = z0;
  out.z1 = z1;
  out.z2 = z2;
}

/**
 * Builds the table, in `spare` memory when it is given (every entry is written below, so memory
 * that held something else will do), otherwise in fresh arrays.
 */
export function buildTriangleTable(positions: Float64Array, triangles: Uint32Array, spare: Uint8Array | null = null): TriangleTable {
  const count = triangles.length / 3;
  const memory = new SpareMemory(spare);
  const shadowArea = memory.float64(count);
  const area = memory.float64(count);
  const sortedZ = memory.float64(count * 3);
  const facing = memory.int8(count);
  const steep = memory.uint8(count);
  const face: FaceGeometry = { shadowArea: 0, area: 0, facing: 0, steep: false, z0: 0, z1: 0, z2: 0 };
  for (let t = 0; t < count; t++) {
    faceGeometry(positions, triangles, t, face);
    shadowArea[t] = face.shadowArea;
    area[t] = face.area;
    facing[t] = face.facing;
    steep[t] = face.steep ? 1 : 0;
    sortedZ[3 * t] = face.z0;
    sortedZ[3 * t + 1] = face.z1;
    sortedZ[3 * t + 2] = face.z2;
  }
  return { count, positions, triangles, shadowArea, area, sortedZ, facing, steep };
}
