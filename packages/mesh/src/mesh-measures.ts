export interface BoundingBox {
  min: [number, number, number];
  max: [number, number, number];
}

export function boundingBox(positions: Float64Array, vertexCount: number): BoundingBox {
  const min: [number, number, number] = [Infinity, Infinity, Infinity];
  const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  for (let v = 0; v < vertexCount; v++) {
    for (let k = 0; k < 3; k++) {
      const c = positions[3 * v + k]!;
      if (c < min[k]!) min[k] = c;
      if (c > max[k]!) max[k] = c;
    }
  }
  return { min, max };
}

export interface SurfaceMeasures {
  /** Σ over triangles of the signed tetrahedron volumes to a reference point (divergence theorem). */
  signedVolumeMm3: number;
  surfaceAreaMm2: number;
}

/**
 * Volume by the divergence theorem: for a closed surface, V = Σ (a · (b × c)) / 6 over its
 * triangles. The corners are taken relative to the box centre so large offsets do not eat digits.
 */
export function surfaceMeasures(positions: Float64Array, triangles: Uint32Array, box: BoundingBox): SurfaceMeasures {
  const ox = (box.min[0] + box.max[0]) / 2,
    oy = (box.min[1] + box.max[1]) / 2,
    oz = (box.min[2] + box.max[2]) / 2;
  let six = 0;
  let twiceArea = 0;
  for (let t = 0; t < triangles.length; t += 3) {
    const a = 3 * triangles[t]!,
      b = 3 * triangles[t + 1]!,
      c = 3 * triangles[t + 2]!;
    const ax = positions[a]! - ox,
      ay = positions[a + 1]! - oy,
      az = positions[a + 2]! - oz;
    const bx = positions[b]! - ox,
      by = positions[b + 1]! - oy,
      bz = positions[b + 2]! - oz;
    const cx = positions[c]! - ox,
      cy = positions[c + 1]! - oy,
      cz = positions[c + 2]! - oz;
    six += ax * (by * cz - bz * cy) + ay * (bz * cx - bx * cz) + az * (bx * cy - by * cx);
    const ux = bx - ax,
      uy = by - ay,
      uz = bz - az,
      vx = cx - ax,
      vy = cy - ay,
      vz = cz - az;
    const nx = uy * vz - uz * vy,
      ny = uz * vx - ux * vz,
      nz = ux * vy - uy * vx;
    twiceArea += Math.sqrt(nx * nx + ny * ny + nz * nz);
  }
  return { signedVolumeMm3: six / 6, surfaceAreaMm2: twiceArea / 2 };
}
