import type { DepthMap } from '../types';

/** The depth map of a fill and the level it was filled to: where resin stands, column by column. */
export interface ResinFootprint {
  map: DepthMap;
  fillLevelMm: number;
}

/**
 * Whether resin stands at (x, y) at a level: the column's resin at the fill level reaches down past that level.
 * Outside the map there is no resin.
 */
function wetAt(fp: ResinFootprint, x: number, y: number, levelMm: number): boolean {
  const { map } = fp;
  const i = Math.floor((x - map.originMm[0]) / map.cellMm[0]);
  const j = Math.floor((y - map.originMm[1]) / map.cellMm[1]);
  if (i < 0 || j < 0 || i >= map.nx || j >= map.ny) return false;
  const depth = map.depthsMm[j * map.nx + i] ?? 0;
  return depth > Math.max(0, fp.fillLevelMm - levelMm);
}

/**
 * The outline of the resin surface at one level: the mould's triangles cut by the plane z = level, keeping only the
 * cut edges with resin on one side of them. The outer walls of the block, dry on both sides, drop out; the cavity's
 * walls stay, so the line sits on the cavity where the layer's surface meets the wood. `positions` holds unindexed
 * triangles (x, y, z per corner, in mm); the answer holds line segments as pairs of points.
 */
export function resinOutline(positions: ArrayLike<number>, levelMm: number, footprint: ResinFootprint): number[] {
  const out: number[] = [];
  // A cell or so beside the wall: far enough to leave the wall's own column, near enough for a narrow channel.
  const reach = Math.max(footprint.map.cellMm[0], footprint.map.cellMm[1]);
  const corner = [0, 0, 0].map(() => [0, 0, 0]) as [number, number, number][];
  const d = [0, 0, 0];
  for (let t = 0; t + 8 < positions.length; t += 9) {
    let above = 0;
    for (let k = 0; k < 3; k++) {
      const c = corner[k]!;
      c[0] = positions[t + 3 * k]!;
      c[1] = positions[t + 3 * k + 1]!;
      c[2] = positions[t + 3 * k + 2]!;
      d[k] = c[2] - levelMm;
      // A corner on the plane counts as above it, so a face lying in the plane adds nothing and an edge ending on it
      // is cut exactly once.
      if (d[k]! >= 0) above++;
    }
    if (above === 0 || above === 3) continue;
    const cut: number[] = [];
    for (let k = 0; k < 3; k++) {
      const a = k;
      const b = (k + 1) % 3;
      if (d[a]! >= 0 === d[b]! >= 0) continue;
      const s = d[a]! / (d[a]! - d[b]!);
      const p = corner[a]!;
      const q = corner[b]!;
      cut.push(p[0] + (q[0] - p[0]) * s, p[1] + (q[1] - p[1]) * s);
    }
    if (cut.length !== 4) continue;
    const [x1, y1, x2, y2] = cut as [number, number, number, number];
    if (Math.hypot(x2 - x1, y2 - y1) < 1e-9) continue;
    // The face's normal, flattened: which way is off the wall, whatever the file's winding.
    const [p0, p1, p2] = corner;
    const ux = p1![0] - p0![0],
      uy = p1![1] - p0![1],
      uz = p1![2] - p0![2];
    const vx = p2![0] - p0![0],
      vy = p2![1] - p0![1],
      vz = p2![2] - p0![2];
    const nx = uy * vz - uz * vy;
    const ny = uz * vx - ux * vz;
    const nLength = Math.hypot(nx, ny);
    if (nLength < 1e-12) continue;
    const mx = (x1 + x2) / 2;
    const my = (y1 + y2) / 2;
    const ox = (nx / nLength) * reach;
    const oy = (ny / nLength) * reach;
    if (wetAt(footprint, mx + ox, my + oy, levelMm) || wetAt(footprint, mx - ox, my - oy, levelMm)) out.push(x1, y1, levelMm, x2, y2, levelMm);
  }
  return out;
}

/** The outlines at several levels, one list of segments for one line drawing. */
export function resinOutlines(positions: ArrayLike<number>, levelsMm: readonly number[], footprint: ResinFootprint): number[] {
  return levelsMm.flatMap((level) => resinOutline(positions, level, footprint));
}
