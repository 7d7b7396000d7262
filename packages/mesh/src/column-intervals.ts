export interface Pairing {
  /** Solid intervals written. */
  intervals: number;
  /** False when the crossings did not pair up (a hole in the surface, or a ray grazing a seam). */
  balanced: boolean;
}

/**
 * Turns the points where a vertical line crosses the surface into the solid intervals along it.
 * Walking down from above the mould (always outside), an up-facing crossing enters the solid and a
 * down-facing one leaves it. Starting from above is what lets an open surface (a mould exported as
 * its top skin only) still read as "solid below the skin". At equal heights the up-facing crossing
 * goes first, so a seam counted twice gives an empty interval instead of a broken one.
 * Sorts z/up/tri[from..to) in place; writes ascending [bottom, top] pairs to out from outAt and,
 * when given, the triangle each interval's bottom lies on to outTri (index outAt / 2 on), -1 when
 * the bottom is the floor of a surface open underneath.
 */
export function pairCrossings(
  z: Float64Array,
  up: Uint8Array,
  tri: Int32Array | null,
  from: number,
  to: number,
  floorZ: number,
  out: Float32Array | Float64Array,
  outAt: number,
  outTri: Int32Array | null,
  pairing: Pairing,
): void {
  for (let i = from + 1; i < to; i++) {
    const zi = z[i]!,
      ui = up[i]!,
      ti = tri ? tri[i]! : 0;
    let j = i - 1;
    while (j >= from && (z[j]! < zi || (z[j] === zi && up[j]! < ui))) {
      z[j + 1] = z[j]!;
      up[j + 1] = up[j]!;
      if (tri) tri[j + 1] = tri[j]!;
      j--;
    }
    z[j + 1] = zi;
    up[j + 1] = ui;
    if (tri) tri[j + 1] = ti;
  }
  let winding = 0;
  let top = 0;
  let balanced = true;
  // Intervals come out top first; they are written from the far end and shifted down at the end.
  const capacity = to - from;
  let written = 0;
  const triAt = outAt / 2;
  for (let i = from; i <= to; i++) {
    let bottom: number,
      bottomTri = -1;
    if (i < to) {
      if (up[i]) {
        if (winding === 0) top = z[i]!;
        winding++;
        continue;
      }
      if (winding === 0) {
        balanced = false;
        continue;
      }
      winding--;
      if (winding > 0) continue;
      bottom = z[i]!;
      bottomTri = tri ? tri[i]! : -1;
    } else {
      // Still inside below the lowest crossing: a surface open underneath.
      if (winding === 0) break;
      balanced = false;
      bottom = Math.min(floorZ, top);
    }
    if (!(top > bottom)) continue;
    if (written > 0) {
      const prevAt = outAt + 2 * (capacity - written);
      if (top >= out[prevAt]!) {
        if (bottom < out[prevAt]!) {
          out[prevAt] = bottom;
          if (outTri) outTri[triAt + capacity - written] = bottomTri;
        }
        continue;
      }
    }
    written++;
    out[outAt + 2 * (capacity - written)] = bottom;
    out[outAt + 2 * (capacity - written) + 1] = top;
    if (outTri) outTri[triAt + capacity - written] = bottomTri;
  }
  const first = capacity - written;
  for (let k = 0; k < written; k++) {
    out[outAt + 2 * k] = out[outAt + 2 * (first + k)]!;
    out[outAt + 2 * k + 1] = out[outAt + 2 * (first + k) + 1]!;
    if (outTri) outTri[triAt + k] = outTri[triAt + first + k]!;
  }
  pairing.intervals = written;
  pairing.balanced = balanced;
}

/** Height where the vertical line through (x, y) meets the plane of triangle t. */
export function planeZAt(positions: Float64Array, triangles: Uint32Array, t: number, x: number, y: number): number {
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
  const z = az - (nx * (x - ax) + ny * (y - ay)) / nz;
  const lo = Math.min(az, positions[b + 2]!, positions[c + 2]!),
    hi = Math.max(az, positions[b + 2]!, positions[c + 2]!);
  return z < lo ? lo : z > hi ? hi : z;
}
