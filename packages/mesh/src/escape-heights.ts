import { planeZAt } from './column-intervals';
import { shadowContains } from './plane-cover';
import { buildShadowIndex, type PlaneRect, type ShadowIndex } from './shadow-index';
import type { TriangleTable } from './triangle-table';

/**
 * Where the air under the mould's ceilings can get out. For a point p of the free space, its
 * escape height e(p) is the highest level s such that some path from p to the open top stays
 * above s all the way (the bottleneck of the best way out). Air at p is trapped once the resin
 * passes p's height if e(p) < z(p): it is under a ceiling every way out of which dips lower.
 *
 * The free space above a level s splits into pieces that only ever merge as s falls, and they
 * merge only at the heights of mesh corners: away from corners a plane cuts the surface and the
 * space beside it transversally. At a corner v the free space around v is one piece (the
 * surface is a closed manifold), and the pieces it touches above v's height are reached either
 * along a triangle at v that rises above v, or straight up from v when the space directly above v
 * is free (to the first ceiling over v, or the open top). So a union-find over the corners, taken
 * from the highest down, joining each corner to its neighbours already taken and to what is above
 * it, finds every merge at the height it happens; a corner's escape height is the height at which
 * its piece joins the open top.
 *
 * Dams are taken to stand just clear of the mould (as a box dam built around a board does), so
 * air and resin pass between a dam and the mould's outermost faces: for escaping, space outside
 * the dams is as open as the space above them, and the result does not depend on the dam.
 */
export interface EscapeHeights {
  /** Per corner: its escape height (mm); -Infinity when its piece never reaches the open top (a hollow sealed inside the mould). */
  vertexEscapeMm: Float64Array;
  /**
   * Per triangle: the escape height of the air against it — that of its highest corner, since
   * every point of a triangle reaches that corner along the triangle without going lower — when
   * some of the triangle lies above it (that part is held by trapped air); +Infinity when none
   * does; -Infinity when the triangle bounds a sealed hollow.
   */
  triangleEscapeMm: Float64Array;
  /** Triangles with some trapped or sealed part. */
  trappedTriangles: number;
}

/** Corner → triangles, as offsets into one list. */
function cornerTriangles(triangles: Uint32Array, vertexCount: number): { start: Uint32Array; list: Uint32Array } {
  const start = new Uint32Array(vertexCount + 1);
  for (let k = 0; k < triangles.length; k++) start[triangles[k]! + 1]!++;
  for (let v = 0; v < vertexCount; v++) start[v + 1]! += start[v]!;
  const fill = start.slice(0, vertexCount);
  const list = new Uint32Array(triangles.length);
  for (let k = 0; k < triangles.length; k++) list[fill[triangles[k]!]!++] = (k / 3) | 0;
  return { start, list };
}

const solidAbove = 0,
  freeAbove = 1,
  undecided = 2;

/**
 * Whether the space just above corner v is free, from v's own triangles. The vertical line is
 * taken where the shadow tie rule puts it (nudged by (−ε², +ε)), so it crosses the triangles at v
 * whose shadow holds that point, at heights z_v + ε·∂z/∂y − ε²·∂z/∂x: the highest crossing is
 * the one with the largest ∂z/∂y, then the smallest ∂z/∂x, and its facing says which side is
 * free. When no triangle at v holds the point (v on a wall, or at the edge of the mould's
 * shadow), the triangles at v cannot tell.
 */
function cornerSide(table: TriangleTable, v: number, start: Uint32Array, list: Uint32Array): number {
  const { positions, triangles, facing } = table;
  const vx = positions[3 * v]!,
    vy = positions[3 * v + 1]!;
  let bestGy = -Infinity,
    bestNegGx = -Infinity,
    side = undecided;
  for (let k = start[v]!; k < start[v + 1]!; k++) {
    const t = list[k]!;
    if (facing[t] === 0) continue;
    const a = 3 * triangles[3 * t]!,
      b = 3 * triangles[3 * t + 1]!,
      c = 3 * triangles[3 * t + 2]!;
    if (!shadowContains(positions[a]!, positions[a + 1]!, positions[b]!, positions[b + 1]!, positions[c]!, positions[c + 1]!, vx, vy)) continue;
    const ux = positions[b]! - positions[a]!,
      uy = positions[b + 1]! - positions[a + 1]!,
      uz = positions[b + 2]! - positions[a + 2]!;
    const wx = positions[c]! - positions[a]!,
      wy = positions[c + 1]! - positions[a + 1]!,
      wz = positions[c + 2]! - positions[a + 2]!;
    const nx = uy * wz - uz * wy,
      ny = uz * wx - ux * wz,
      nz = ux * wy - uy * wx;
    const gy = -ny / nz,
      negGx = nx / nz;
    if (gy > bestGy || (gy === bestGy && negGx > bestNegGx)) {
      bestGy = gy;
      bestNegGx = negGx;
      side = facing[t]! > 0 ? freeAbove : solidAbove;
    }
  }
  return side;
}

interface UpwardHit {
  /** Lowest triangle crossed above the corner, or -1. */
  triangle: number;
  /** Up-facing minus down-facing crossings above the corner: 0 when the corner's column is outside the solid there. */
  winding: number;
}

/** The vertical line through corner v (by the tie rule), above v: what it meets first and whether it starts in the free space. */
function castUp(table: TriangleTable, index: ShadowIndex, v: number, out: UpwardHit): void {
  const { positions, triangles, facing } = table;
  const vx = positions[3 * v]!,
    vy = positions[3 * v + 1]!,
    vz = positions[3 * v + 2]!;
  const i = Math.min(index.nx - 1, Math.max(0, Math.floor((vx - index.originX) / index.cellX)));
  const j = Math.min(index.ny - 1, Math.max(0, Math.floor((vy - index.originY) / index.cellY)));
  const cell = j * index.nx + i;
  let lowest = Infinity;
  out.triangle = -1;
  out.winding = 0;
  for (let k = index.start[cell]!; k < index.start[cell + 1]!; k++) {
    const t = index.items[k]!;
    const a = triangles[3 * t]!,
      b = triangles[3 * t + 1]!,
      c = triangles[3 * t + 2]!;
    // The corner's own triangles meet the line at the corner itself, not above it.
    if (a === v || b === v || c === v) continue;
    if (table.sortedZ[3 * t + 2]! <= vz) continue;
    if (!shadowContains(positions[3 * a]!, positions[3 * a + 1]!, positions[3 * b]!, positions[3 * b + 1]!, positions[3 * c]!, positions[3 * c + 1]!, vx, vy))
      continue;
    const z = planeZAt(positions, triangles, t, vx, vy);
    if (!(z > vz)) continue;
    out.winding += facing[t]! > 0 ? 1 : -1;
    if (z < lowest) {
      lowest = z;
      out.triangle = t;
    }
  }
}

/** Highest corner of triangle t. */
function topCorner(table: TriangleTable, t: number): number {
  const { positions, triangles } = table;
  let best = triangles[3 * t]!;
  for (let k = 1; k < 3; k++) {
    const v = triangles[3 * t + k]!;
    if (positions[3 * v + 2]! > positions[3 * best + 2]!) best = v;
  }
  return best;
}

export function escapeHeights(table: TriangleTable, vertexCount: number, rect: PlaneRect): EscapeHeights {
  const { positions, triangles } = table;
  const { start, list } = cornerTriangles(triangles, vertexCount);
  const sky = vertexCount;

  // What each corner joins straight up: another corner (the highest of the ceiling above it), the open top, or nothing.
  const upward = new Int32Array(vertexCount).fill(-1);
  const sides = new Uint8Array(vertexCount);
  let rays = 0;
  for (let v = 0; v < vertexCount; v++) {
    sides[v] = cornerSide(table, v, start, list);
    if (sides[v] !== solidAbove) rays++;
  }
  if (rays > 0) {
    const nonVertical = new Uint8Array(table.count);
    for (let t = 0; t < table.count; t++) nonVertical[t] = table.facing[t] !== 0 ? 1 : 0;
    const index = buildShadowIndex(positions, triangles, nonVertical, rect);
    const hit: UpwardHit = { triangle: -1, winding: 0 };
    for (let v = 0; v < vertexCount; v++) {
      if (sides[v] === solidAbove) continue;
      castUp(table, index, v, hit);
      // An undecided corner is free above exactly when its column is outside the solid there.
      if (sides[v] === undecided && hit.winding !== 0) continue;
      if (hit.triangle < 0) upward[v] = sky;
      else if (table.facing[hit.triangle]! < 0) upward[v] = topCorner(table, hit.triangle);
    }
  }

  const z = new Float64Array(vertexCount);
  for (let v = 0; v < vertexCount; v++) z[v] = positions[3 * v + 2]!;
  const order = new Uint32Array(vertexCount);
  for (let v = 0; v < vertexCount; v++) order[v] = v;
  order.sort((a, b) => z[b]! - z[a]!);

  // Union-find with the members of each piece kept as a linked list, so that when a piece joins
  // the open top every corner in it gets that height once.
  const parent = new Int32Array(vertexCount + 1);
  const size = new Uint32Array(vertexCount + 1).fill(1);
  const next = new Int32Array(vertexCount + 1).fill(-1);
  const tail = new Int32Array(vertexCount + 1);
  for (let v = 0; v <= vertexCount; v++) {
    parent[v] = v;
    tail[v] = v;
  }
  const escape = new Float64Array(vertexCount).fill(-Infinity);
  const find = (a: number): number => {
    while (parent[a] !== a) {
      parent[a] = parent[parent[a]!]!;
      a = parent[a]!;
    }
    return a;
  };
  let height = 0;
  const union = (a: number, b: number): void => {
    let ra = find(a),
      rb = find(b);
    if (ra === rb) return;
    const skyRoot = find(sky);
    if (ra === skyRoot || rb === skyRoot) {
      // The other piece reaches the open top now, at the height being processed.
      const piece = ra === skyRoot ? rb : ra;
      for (let m = piece; m >= 0; m = next[m]!) escape[m] = height;
    }
    if (size[ra]! < size[rb]!) {
      const s = ra;
      ra = rb;
      rb = s;
    }
    parent[rb] = ra;
    size[ra]! += size[rb]!;
    next[tail[ra]!] = rb;
    tail[ra] = tail[rb]!;
  };

  const taken = new Uint8Array(vertexCount);
  for (let k = 0; k < vertexCount; k++) {
    const v = order[k]!;
    height = z[v]!;
    taken[v] = 1;
    for (let m = start[v]!; m < start[v + 1]!; m++) {
      const t = list[m]!;
      for (let c = 0; c < 3; c++) {
        const u = triangles[3 * t + c]!;
        if (u !== v && taken[u]) union(v, u);
      }
    }
    const up = upward[v]!;
    if (up >= 0) union(v, up);
  }

  const triangleEscapeMm = new Float64Array(table.count);
  let trappedTriangles = 0;
  for (let t = 0; t < table.count; t++) {
    const e = escape[topCorner(table, t)]!;
    if (e < table.sortedZ[3 * t + 2]!) {
      triangleEscapeMm[t] = e;
      trappedTriangles++;
    } else {
      triangleEscapeMm[t] = Infinity;
    }
  }
  return { vertexEscapeMm: escape, triangleEscapeMm, trappedTriangles };
}
