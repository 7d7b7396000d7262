import { shadowSpanInBand } from './plane-cover';
import { buildShadowIndex, type PlaneRect } from './shadow-index';
import type { TriangleTable } from './triangle-table';

export interface HeightFieldCheck {
  /** Every vertical line meets the solid in at most one interval: no overhangs, no undercuts. */
  heightField: boolean;
  /**
   * Volume (mm³) the check cannot see: faces within 1e-5 of vertical that look down are not
   * tested (their shadows are slivers), so this bounds what they could hide: shadow × height.
   */
  unseenMm3: number;
}

/**
 * Clips triangle u's shadow by triangle d's shadow (both given as x,y corner arrays) and returns
 * the overlap's area, writing its vertex average — a point inside it — to centre.
 */
function shadowOverlap(u: Float64Array, d: Float64Array, centre: Float64Array, work: { a: Float64Array; b: Float64Array }): number {
  let src = work.a,
    dst = work.b;
  for (let k = 0; k < 6; k++) src[k] = u[k]!;
  let count = 3;
  for (let e = 0; e < 3 && count > 0; e++) {
    const px = d[2 * e]!,
      py = d[2 * e + 1]!;
    const qx = d[(2 * e + 2) % 6]!,
      qy = d[(2 * e + 3) % 6]!;
    const rx = d[(2 * e + 4) % 6]!,
      ry = d[(2 * e + 5) % 6]!;
    const ex = qx - px,
      ey = qy - py;
    const inward = ex * (ry - py) - ey * (rx - px) > 0 ? 1 : -1;
    let out = 0;
    for (let i = 0; i < count; i++) {
      const ax = src[2 * i]!,
        ay = src[2 * i + 1]!;
      const bx = src[(2 * i + 2) % (2 * count)]!,
        by = src[(2 * i + 3) % (2 * count)]!;
      const sa = inward * (ex * (ay - py) - ey * (ax - px));
      const sb = inward * (ex * (by - py) - ey * (bx - px));
      if (sa >= 0) {
        dst[2 * out] = ax;
        dst[2 * out + 1] = ay;
        out++;
      }
      if (sa >= 0 !== sb >= 0) {
        const s = sa / (sa - sb);
        dst[2 * out] = ax + s * (bx - ax);
        dst[2 * out + 1] = ay + s * (by - ay);
        out++;
      }
    }
    count = out;
    const swap = src;
    src = dst;
    dst = swap;
  }
  if (count < 3) return 0;
  let twice = 0,
    sx = 0,
    sy = 0;
  for (let i = 0; i < count; i++) {
    const ax = src[2 * i]!,
      ay = src[2 * i + 1]!;
    const bx = src[(2 * i + 2) % (2 * count)]!,
      by = src[(2 * i + 3) % (2 * count)]!;
    twice += ax * by - ay * bx;
    sx += ax;
    sy += ay;
  }
  centre[0] = sx / count;
  centre[1] = sy / count;
  return Math.abs(twice) / 2;
}

function planeZ(positions: Float64Array, triangles: Uint32Array, t: number, x: number, y: number): number {
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
  return az - (nx * (x - ax) + ny * (y - ay)) / nz;
}

/**
 * Decides whether the mould is a height field, exactly rather than by sampling: some vertical line
 * meets the solid twice exactly when a face that looks down has a face that looks up below it
 * with overlapping shadows (the bottom of the upper piece and the top of the lower one). Every
 * down-facing face is tested against the up-facing faces listed in the cells its shadow covers.
 */
export function checkHeightField(positions: Float64Array, triangles: Uint32Array, table: TriangleTable, rect: PlaneRect, heightMm: number): HeightFieldCheck {
  // Only a down-facing face above the lowest up-facing corner can have one below it; in most
  // moulds that is none (the base is the only face looking down) and no index is needed.
  let lowestUp = Infinity;
  for (let t = 0; t < table.count; t++) if (table.facing[t]! > 0) lowestUp = Math.min(lowestUp, table.sortedZ[3 * t]!);
  let unseenMm3 = 0,
    highestCandidate = -Infinity;
  const candidate = new Uint8Array(table.count);
  for (let d = 0; d < table.count; d++) {
    if (table.facing[d]! >= 0) continue;
    if (table.steep[d]) {
      unseenMm3 += Math.abs(table.shadowArea[d]!) * heightMm;
      continue;
    }
    if (table.sortedZ[3 * d + 2]! > lowestUp) {
      candidate[d] = 1;
      highestCandidate = Math.max(highestCandidate, table.sortedZ[3 * d + 2]!);
    }
  }
  if (highestCandidate === -Infinity) return { heightField: true, unseenMm3 };
  const listed = new Uint8Array(table.count);
  for (let t = 0; t < table.count; t++) listed[t] = table.facing[t]! > 0 && table.sortedZ[3 * t]! < highestCandidate ? 1 : 0;
  const index = buildShadowIndex(positions, triangles, listed, rect);
  const cells = index.nx * index.ny;
  // Lowest up-facing corner per cell: a down-facing face below it can skip the whole cell.
  const cellLowestUp = new Float64Array(cells).fill(Infinity);
  for (let c = 0; c < cells; c++) {
    for (let k = index.start[c]!; k < index.start[c + 1]!; k++) {
      const u = index.items[k]!;
      if (table.facing[u]! > 0) cellLowestUp[c] = Math.min(cellLowestUp[c]!, table.sortedZ[3 * u]!);
    }
  }
  const seenBy = new Int32Array(table.count).fill(-1);
  const uCorners = new Float64Array(6),
    dCorners = new Float64Array(6),
    centre = new Float64Array(2),
    span = new Float64Array(2);
  const work = { a: new Float64Array(24), b: new Float64Array(24) };
  const zTolerance = 1e-7 * heightMm;

  for (let d = 0; d < table.count; d++) {
    if (!candidate[d]) continue;
    const dTop = table.sortedZ[3 * d + 2]!;
    for (let k = 0; k < 3; k++) {
      const v = 3 * triangles[3 * d + k]!;
      dCorners[2 * k] = positions[v]!;
      dCorners[2 * k + 1] = positions[v + 1]!;
    }
    const dShadow = Math.abs(table.shadowArea[d]!);
    const x0 = dCorners[0]!,
      y0 = dCorners[1]!,
      x1 = dCorners[2]!,
      y1 = dCorners[3]!,
      x2 = dCorners[4]!,
      y2 = dCorners[5]!;
    const slackY = index.cellY * 1e-9,
      slackX = index.cellX * 1e-9;
    const jLo = Math.max(0, Math.floor((Math.min(y0, y1, y2) - slackY - index.originY) / index.cellY));
    const jHi = Math.min(index.ny - 1, Math.floor((Math.max(y0, y1, y2) + slackY - index.originY) / index.cellY));
    for (let j = jLo; j <= jHi; j++) {
      const ylo = index.originY + j * index.cellY - slackY,
        yhi = ylo + index.cellY + 2 * slackY;
      if (!shadowSpanInBand(x0, y0, x1, y1, x2, y2, ylo, yhi, span)) continue;
      const iLo = Math.max(0, Math.floor((span[0]! - slackX - index.originX) / index.cellX));
      const iHi = Math.min(index.nx - 1, Math.floor((span[1]! + slackX - index.originX) / index.cellX));
      for (let i = iLo; i <= iHi; i++) {
        const cell = j * index.nx + i;
        if (cellLowestUp[cell]! >= dTop) continue;
        for (let k = index.start[cell]!; k < index.start[cell + 1]!; k++) {
          const u = index.items[k]!;
          if (table.facing[u]! <= 0 || seenBy[u] === d) continue;
          seenBy[u] = d;
          if (table.sortedZ[3 * u]! >= dTop) continue;
          for (let m = 0; m < 3; m++) {
            const v = 3 * triangles[3 * u + m]!;
            uCorners[2 * m] = positions[v]!;
            uCorners[2 * m + 1] = positions[v + 1]!;
          }
          const overlap = shadowOverlap(uCorners, dCorners, centre, work);
          // Shadows that merely share an edge leave a rounding-sized sliver, not an overlap.
          if (overlap <= 1e-9 * Math.min(dShadow, Math.abs(table.shadowArea[u]!))) continue;
          const zU = planeZ(positions, triangles, u, centre[0]!, centre[1]!);
          const zD = planeZ(positions, triangles, d, centre[0]!, centre[1]!);
          if (zU < zD - zTolerance) return { heightField: false, unseenMm3 };
        }
      }
    }
  }
  return { heightField: true, unseenMm3 };
}
