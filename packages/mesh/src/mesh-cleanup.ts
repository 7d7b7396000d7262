import { analyseEdges, type EdgeTopology } from './edge-topology';

/**
 * Clean-up after the exact weld, for files as writers leave them:
 *  - corners a writer's rounding left a hair apart are welded, where the surface is open;
 *  - triangles with no area (at the weld tolerance) are dropped, unless they stitch a closed
 *    surface together (a T-junction: dropping one would open its three edges);
 *  - exact duplicate faces (same corners, same winding) are dropped.
 * Each step runs only when the topology shows it can change something, so a clean closed mesh
 * pays for one pass over its triangles.
 */
export interface CleanedMesh {
  positionsMm: Float64Array;
  triangles: Uint32Array;
  vertexCount: number;
  edges: EdgeTopology;
  /** Vertices merged into a neighbour within the tolerance. */
  verticesWelded: number;
  /** Triangles dropped for having no area (counting those the weld collapsed). */
  zeroAreaDropped: number;
  duplicatesDropped: number;
}

/** Vertices on edges that are not shared by exactly two triangles (open, or non-manifold). */
function unpairedVertices(triangles: Uint32Array, neighbour: Int32Array, vertexCount: number): Uint32Array {
  const marked = new Uint8Array(vertexCount);
  let count = 0;
  for (let e = 0; e < neighbour.length; e++) {
    if (neighbour[e]! >= 0) continue;
    const t = (e / 3) | 0,
      k = e - 3 * t;
    for (const v of [triangles[e]!, triangles[3 * t + ((k + 1) % 3)]!]) {
      if (!marked[v]) {
        marked[v] = 1;
        count++;
      }
    }
  }
  const list = new Uint32Array(count);
  let at = 0;
  for (let v = 0; v < vertexCount; v++) if (marked[v]) list[at++] = v;
  return list;
}

/**
 * Welds the given vertices to an earlier one within `toleranceMm`. The grid's cells are twice the
 * tolerance wide, so every vertex within reach of a point lies in its own cell or the neighbour on
 * the nearer side along each axis: 8 cells to look in. Returns the vertex each vertex becomes
 * (itself when it stays).
 */
function weldWithin(positionsMm: Float64Array, candidates: Uint32Array, vertexCount: number, toleranceMm: number): { into: Uint32Array; welded: number } {
  const into = new Uint32Array(vertexCount);
  for (let v = 0; v < vertexCount; v++) into[v] = v;
  const n = candidates.length;
  let size = 16;
  while (size < 2 * n) size *= 2;
  const mask = size - 1;
  const head = new Int32Array(size).fill(-1);
  const next = new Int32Array(n);
  const cell = new Float64Array(3 * n);
  const inv = 1 / (2 * toleranceMm);
  const tol2 = toleranceMm * toleranceMm;
  let welded = 0;
  for (let i = 0; i < n; i++) {
    const v = candidates[i]!;
    const px = positionsMm[3 * v]!,
      py = positionsMm[3 * v + 1]!,
      pz = positionsMm[3 * v + 2]!;
    const gx = px * inv,
      gy = py * inv,
      gz = pz * inv;
    const cx = Math.floor(gx),
      cy = Math.floor(gy),
      cz = Math.floor(gz);
    cell[3 * i] = cx;
    cell[3 * i + 1] = cy;
    cell[3 * i + 2] = cz;
    const ox = gx - cx < 0.5 ? -1 : 1,
      oy = gy - cy < 0.5 ? -1 : 1,
      oz = gz - cz < 0.5 ? -1 : 1;
    let found = -1;
    for (let k = 0; k < 8 && found < 0; k++) {
      const qx = cx + (k & 1 ? ox : 0),
        qy = cy + (k & 2 ? oy : 0),
        qz = cz + (k & 4 ? oz : 0);
      for (let j = head[cellHash(qx, qy, qz, mask)]!; j >= 0; j = next[j]!) {
        if (cell[3 * j] !== qx || cell[3 * j + 1] !== qy || cell[3 * j + 2] !== qz) continue;
        const w = candidates[j]!;
        const ex = positionsMm[3 * w]! - px,
          ey = positionsMm[3 * w + 1]! - py,
          ez = positionsMm[3 * w + 2]! - pz;
        if (ex * ex + ey * ey + ez * ez <= tol2) {
          found = w;
          break;
        }
      }
    }
    if (found >= 0) {
      into[v] = found;
      welded++;
    } else {
      const h = cellHash(cx, cy, cz, mask);
      next[i] = head[h]!;
      head[h] = i;
    }
  }
  return { into, welded };
}

function cellHash(x: number, y: number, z: number, mask: number): number {
  return ((Math.imul(x | 0, 0x9e3779b1) ^ Math.imul(y | 0, 0x85ebca77) ^ Math.imul(z | 0, 0xc2b2ae3d)) >>> 0) & mask;
}

/** Triangles whose height over their longest edge is at most the tolerance: no area at the model's resolution. */
function flatTriangles(positionsMm: Float64Array, triangles: Uint32Array, toleranceMm: number): number[] {
  const tol2 = toleranceMm * toleranceMm;
  const flat: number[] = [];
  const p = positionsMm;
  for (let t = 0; t < triangles.length / 3; t++) {
    const a = 3 * triangles[3 * t]!,
      b = 3 * triangles[3 * t + 1]!,
      c = 3 * triangles[3 * t + 2]!;
    const ux = p[b]! - p[a]!,
      uy = p[b + 1]! - p[a + 1]!,
      uz = p[b + 2]! - p[a + 2]!;
    const vx = p[c]! - p[a]!,
      vy = p[c + 1]! - p[a + 1]!,
      vz = p[c + 2]! - p[a + 2]!;
    const wx = vx - ux,
      wy = vy - uy,
      wz = vz - uz;
    const nx = uy * vz - uz * vy,
      ny = uz * vx - ux * vz,
      nz = ux * vy - uy * vx;
    const longest2 = Math.max(ux * ux + uy * uy + uz * uz, vx * vx + vy * vy + vz * vz, wx * wx + wy * wy + wz * wz);
    // height = |n| / longest edge; compared squared to stay off square roots.
    if (nx * nx + ny * ny + nz * nz <= tol2 * longest2) flat.push(t);
  }
  return flat;
}

/** Later copies of a face with the same three corners in the same cyclic order. */
function duplicateFaces(triangles: Uint32Array): Uint8Array {
  const count = triangles.length / 3;
  const duplicate = new Uint8Array(count);
  let size = 16;
  while (size < 2 * count) size *= 2;
  const mask = size - 1;
  const slots = new Int32Array(size).fill(-1);
  const key = new Uint32Array(3 * count);
  for (let t = 0; t < count; t++) {
    let a = triangles[3 * t]!,
      b = triangles[3 * t + 1]!,
      c = triangles[3 * t + 2]!;
    // Rotate so the smallest corner leads; the winding is kept.
    if (b < a && b < c) [a, b, c] = [b, c, a];
    else if (c < a && c < b) [a, b, c] = [c, a, b];
    key[3 * t] = a;
    key[3 * t + 1] = b;
    key[3 * t + 2] = c;
    let h = ((Math.imul(a, 0x9e3779b1) ^ Math.imul(b, 0x85ebca77) ^ Math.imul(c, 0xc2b2ae3d)) >>> 0) & mask;
    for (;;) {
      const s = slots[h]!;
      if (s < 0) {
        slots[h] = t;
        break;
      }
      if (key[3 * s] === a && key[3 * s + 1] === b && key[3 * s + 2] === c) {
        duplicate[t] = 1;
        break;
      }
      h = (h + 1) & mask;
    }
  }
  return duplicate;
}

/** The triangles not marked, in order. */
function withoutMarked(triangles: Uint32Array, marked: Uint8Array): Uint32Array {
  let kept = 0;
  for (let t = 0; t < marked.length; t++) if (!marked[t]) kept++;
  const out = new Uint32Array(3 * kept);
  let at = 0;
  for (let t = 0; t < marked.length; t++) {
    if (marked[t]) continue;
    out[at++] = triangles[3 * t]!;
    out[at++] = triangles[3 * t + 1]!;
    out[at++] = triangles[3 * t + 2]!;
  }
  return out;
}

/** Drops vertices no triangle uses any more, so the bounding box is that of the surface. */
function compacted(positionsMm: Float64Array, triangles: Uint32Array, vertexCount: number): { positionsMm: Float64Array; vertexCount: number } {
  const renumber = new Int32Array(vertexCount).fill(-1);
  let used = 0;
  for (let i = 0; i < triangles.length; i++) {
    const v = triangles[i]!;
    if (renumber[v]! < 0) renumber[v] = used++;
    triangles[i] = renumber[v]!;
  }
  const out = new Float64Array(3 * used);
  for (let v = 0; v < vertexCount; v++) {
    const to = renumber[v]!;
    if (to >= 0) {
      out[3 * to] = positionsMm[3 * v]!;
      out[3 * to + 1] = positionsMm[3 * v + 1]!;
      out[3 * to + 2] = positionsMm[3 * v + 2]!;
    }
  }
  return { positionsMm: out, vertexCount: used };
}

/** `spare`: memory nothing else uses, for the edge pairing's working arrays (see SpareMemory). */
export function cleanMesh(
  positionsMm: Float64Array,
  triangles: Uint32Array,
  vertexCount: number,
  toleranceMm: number,
  spare: Uint8Array | null = null,
): CleanedMesh {
  let edges = analyseEdges(triangles, vertexCount, false, spare);
  let changed = false;
  let verticesWelded = 0;
  let zeroAreaDropped = 0;
  let duplicatesDropped = 0;

  if (edges.openEdges > 0 && toleranceMm > 0) {
    const withNeighbours = analyseEdges(triangles, vertexCount, true, spare);
    const weld = weldWithin(positionsMm, unpairedVertices(triangles, withNeighbours.neighbour, vertexCount), vertexCount, toleranceMm);
    if (weld.welded > 0) {
      verticesWelded = weld.welded;
      const collapsed = new Uint8Array(triangles.length / 3);
      for (let i = 0; i < triangles.length; i++) triangles[i] = weld.into[triangles[i]!]!;
      for (let t = 0; t < collapsed.length; t++) {
        const a = triangles[3 * t]!,
          b = triangles[3 * t + 1]!,
          c = triangles[3 * t + 2]!;
        if (a === b || b === c || a === c) {
          collapsed[t] = 1;
          zeroAreaDropped++;
        }
      }
      triangles = withoutMarked(triangles, collapsed);
      edges = analyseEdges(triangles, vertexCount, false, spare);
      changed = true;
    }
  }

  const flat = flatTriangles(positionsMm, triangles, toleranceMm);
  if (flat.length > 0) {
    const { neighbour } = analyseEdges(triangles, vertexCount, true, spare);
    const drop = new Uint8Array(triangles.length / 3);
    let dropped = 0;
    for (const t of flat) {
      if (neighbour[3 * t]! >= 0 && neighbour[3 * t + 1]! >= 0 && neighbour[3 * t + 2]! >= 0) continue;
      drop[t] = 1;
      dropped++;
    }
    if (dropped > 0) {
      zeroAreaDropped += dropped;
      triangles = withoutMarked(triangles, drop);
      edges = analyseEdges(triangles, vertexCount, false, spare);
      changed = true;
    }
  }

  // A face written twice uses each of its edges twice in the same direction: none of that is
  // possible unless the edges show non-manifold or misoriented uses.
  if (edges.nonManifoldEdges > 0 || edges.misorientedEdges > 0) {
    const duplicate = duplicateFaces(triangles);
    for (let t = 0; t < duplicate.length; t++) duplicatesDropped += duplicate[t]!;
    if (duplicatesDropped > 0) {
      triangles = withoutMarked(triangles, duplicate);
      edges = analyseEdges(triangles, vertexCount, false, spare);
      changed = true;
    }
  }

  if (!changed) return { positionsMm, triangles, vertexCount, edges, verticesWelded, zeroAreaDropped, duplicatesDropped };
  const compact = compacted(positionsMm, triangles, vertexCount);
  return {
    positionsMm: compact.positionsMm,
    triangles,
    vertexCount: compact.vertexCount,
    edges: analyseEdges(triangles, compact.vertexCount, false, spare),
    verticesWelded,
    zeroAreaDropped,
    duplicatesDropped,
  };
}
