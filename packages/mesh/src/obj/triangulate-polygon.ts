import earcut from 'earcut';

/**
 * Splits one polygon face into triangles that keep its winding. The corners are laid into the
 * polygon's best-fit plane, whose normal is Newell's (the sum of the edges' cross terms, exact for
 * planar polygons and the least-squares plane's normal in practice for nearly planar ones), and
 * earcut clips ears there, so concave faces come out right. Each triangle is then turned to face
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
  let nx = 0, ny = 0, nz = 0, cx = 0, cy = 0, cz = 0;
  for (let i = 0; i < n; i++) {
    const a = 3 * corners[i]!, b = 3 * corners[(i + 1) % n]!;
    const ax = vertices[a]!, ay = vertices[a + 1]!, az = vertices[a + 2]!;
    const bx = vertices[b]!, by = vertices[b + 1]!, bz = vertices[b + 2]!;
    nx += (ay - by) * (az + bz);
    ny += (az - bz) * (ax + bx);
    nz += (ax - bx) * (ay + by);
    cx += ax; cy += ay; cz += az;
  }
  const length = Math.hypot(nx, ny, nz);
  if (!(length > 0)) {
    fan(corners, out);
    return;
  }
  nx /= length; ny /= length; nz /= length;
  cx /= n; cy /= n; cz /= n;
  // u: the axis least along the normal, made perpendicular to it; v = n × u, so (u, v, n) is right-handed.
  const ax = Math.abs(nx), ay = Math.abs(ny), az = Math.abs(nz);
  let ux = ax <= ay && ax <= az ? 1 : 0, uy = ux === 0 && ay <= az ? 1 : 0, uz = ux === 0 && uy === 0 ? 1 : 0;
  const d = ux * nx + uy * ny + uz * nz;
  ux -= d * nx; uy -= d * ny; uz -= d * nz;
  const ul = Math.hypot(ux, uy, uz);
  ux /= ul; uy /= ul; uz /= ul;
  const vx = ny * uz - nz * uy, vy = nz * ux - nx * uz, vz = nx * uy - ny * ux;
  const flat = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    const p = 3 * corners[i]!;
    const px = vertices[p]! - cx, py = vertices[p + 1]! - cy, pz = vertices[p + 2]! - cz;
    flat[2 * i] = px * ux + py * uy + pz * uz;
    flat[2 * i + 1] = px * vx + py * vy + pz * vz;
  }
  const triangles = earcut(flat);
  if (triangles.length !== 3 * (n - 2)) {
    fan(corners, out);
    return;
  }
  for (let t = 0; t < triangles.length; t += 3) {
    const i = triangles[t]!, j = triangles[t + 1]!, k = triangles[t + 2]!;
    // The triangle's turn in the plane: positive when it runs counter-clockwise about n, as the polygon does.
    const turn = (flat[2 * j]! - flat[2 * i]!) * (flat[2 * k + 1]! - flat[2 * i + 1]!) - (flat[2 * j + 1]! - flat[2 * i + 1]!) * (flat[2 * k]! - flat[2 * i]!);
    if (turn >= 0) out.push(corners[i]!, corners[j]!, corners[k]!);
    else out.push(corners[i]!, corners[k]!, corners[j]!);
  }
}

function fan(corners: ArrayLike<number>, out: number[]): void {
  for (let i = 1; i + 1 < corners.length; i++) out.push(corners[0]!, corners[i]!, corners[i + 1]!);
}
