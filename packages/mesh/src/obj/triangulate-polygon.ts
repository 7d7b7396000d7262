import earcut from 'earcut';

/**
 * Splits one polygon face into triangles that keep its winding. The corners are laid into the
 * polygon's best-fit plane, whose normal is Newell's (the sum of the edges' cross terms, exact for
 * planar polygons and the least-squares plane's normal in practice for nearly planar ones), and
 * earcut clips ears there (quads are split at the diagonal that lies inside them), so concave
 * faces come out right. Each triangle is then turned to face
 * the way the polygon faces. A polygon with no area (all corners on a line) is split as a fan: its
 * triangles have no area either and the mesh clean-up drops them.
 *
 * `corners` are vertex numbers into `vertices` (3 numbers each); triangles are appended to `out`.
 */
export function triangulatePolygon(vertices: Float64Array, corners: ArrayLike<number>, out: number[]): void {
  const n = corners.length;
  if (n === 3) {
    out.push(corners[0]!, corners[1]!, corners[2]!);
    return;
  }
  let nx = 0,
    ny = 0,
    nz = 0,
    cx = 0,
    cy = 0,
    cz = 0;
  for (let i = 0; i < n; i++) {
    const a = 3 * corners[i]!,
      b = 3 * corners[(i + 1) % n]!;
    const ax = vertices[a]!,
      ay = vertices[a + 1]!,
      az = vertices[a + 2]!;
    const bx = vertices[b]!,
      by = vertices[b + 1]!,
      bz = vertices[b + 2]!;
    nx += (ay - by) * (az + bz);
    ny += (az - bz) * (ax + bx);
    nz += (ax - bx) * (ay + by);
    cx += ax;
    cy += ay;
    cz += az;
  }
  const length = Math.hypot(nx, ny, nz);
  if (!(length > 0)) {
    fan(corners, out);
    return;
  }
  if (n === 4) {
    quad(vertices, corners, nx, ny, nz, out);
    return;
  }
  nx /= length;
  ny /= length;
  nz /= length;
  cx /= n;
  cy /= n;
  cz /= n;
  // u: the axis least along the normal, made perpendicular to it; v = n × u, so (u, v, n) is right-handed.
  const ax = Math.abs(nx),
    ay = Math.abs(ny),
    az = Math.abs(nz);
  let ux = ax <= ay && ax <= az ? 1 : 0,
    uy = ux === 0 && ay <= az ? 1 : 0,
    uz = ux === 0 && uy === 0 ? 1 : 0;
  const d = ux * nx + uy * ny + uz * nz;
  ux -= d * nx;
  uy -= d * ny;
  uz -= d * nz;
  const ul = Math.hypot(ux, uy, uz);
  ux /= ul;
  uy /= ul;
  uz /= ul;
  const vx = ny * uz - nz * uy,
    vy = nz * ux - nx * uz,
    vz = nx * uy - ny * ux;
  const flat = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    const p = 3 * corners[i]!;
    const px = vertices[p]! - cx,
      py = vertices[p + 1]! - cy,
      pz = vertices[p + 2]! - cz;
    flat[2 * i] = px * ux + py * uy + pz * uz;
    flat[2 * i + 1] = px * vx + py * vy + pz * vz;
  }
  const triangles = earcut(flat);
  if (triangles.length !== 3 * (n - 2)) {
    fan(corners, out);
    return;
  }
  for (let t = 0; t < triangles.length; t += 3) {
    const i = triangles[t]!,
      j = triangles[t + 1]!,
      k = triangles[t + 2]!;
    // The triangle's turn in the plane: positive when it runs counter-clockwise about n, as the polygon does.
    const turn = (flat[2 * j]! - flat[2 * i]!) * (flat[2 * k + 1]! - flat[2 * i + 1]!) - (flat[2 * j + 1]! - flat[2 * i + 1]!) * (flat[2 * k]! - flat[2 * i]!);
    if (turn >= 0) out.push(corners[i]!, corners[j]!, corners[k]!);
    else out.push(corners[i]!, corners[k]!, corners[j]!);
  }
}

/** The turn of p about the line from → to, seen along n: negative when p lies clockwise of it. */
function side(v: Float64Array, from: number, to: number, p: number, nx: number, ny: number, nz: number): number {
  const ux = v[3 * to]! - v[3 * from]!,
    uy = v[3 * to + 1]! - v[3 * from + 1]!,
    uz = v[3 * to + 2]! - v[3 * from + 2]!;
  const wx = v[3 * p]! - v[3 * from]!,
    wy = v[3 * p + 1]! - v[3 * from + 1]!,
    wz = v[3 * p + 2]! - v[3 * from + 2]!;
  return nx * (uy * wz - uz * wy) + ny * (uz * wx - ux * wz) + nz * (ux * wy - uy * wx);
}

/**
 * A quad, the commonest polygon, without earcut: of its two diagonals, AC lies inside exactly when
 * B and D are on opposite sides of it, seen along the normal (a simple quadrilateral always has
 * one such diagonal). For a convex quad both do, and AC is taken.
 */
function quad(v: Float64Array, corners: ArrayLike<number>, nx: number, ny: number, nz: number, out: number[]): void {
  const a = corners[0]!,
    b = corners[1]!,
    c = corners[2]!,
    d = corners[3]!;
  // Wound counter-clockwise about n, B lies clockwise of A→C and D counter-clockwise.
  if (side(v, a, c, b, nx, ny, nz) < 0 && side(v, a, c, d, nx, ny, nz) > 0) out.push(a, b, c, a, c, d);
  else if (side(v, b, d, c, nx, ny, nz) < 0 && side(v, b, d, a, nx, ny, nz) > 0) out.push(b, c, d, b, d, a);
  else out.push(a, b, c, a, c, d);
}

function fan(corners: ArrayLike<number>, out: number[]): void {
  for (let i = 1; i + 1 < corners.length; i++) out.push(corners[0]!, corners[i]!, corners[i + 1]!);
}
