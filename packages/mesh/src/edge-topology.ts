import { pageSized } from './page-sized';
import { SpareMemory } from './spare-memory';

/**
 * How the triangles meet along their edges. A mould surface that holds resin must be closed:
 * every edge shared by exactly two triangles that run along it in opposite directions.
 */
export interface EdgeTopology {
  edgeCount: number;
  /** Edges used by one triangle only (holes in the surface). */
  openEdges: number;
  /** Edges used by three or more triangles. */
  nonManifoldEdges: number;
  /** Edges shared by two triangles that run along it in the same direction (one of them is wound backwards). */
  misorientedEdges: number;
  /** For half-edge 3t + k (from corner k to corner k + 1 of triangle t): the triangle across it, or -1. Empty unless asked for. */
  neighbour: Int32Array;
  /** 1 where the triangle across the half-edge runs along it in the same direction. Empty unless asked for. */
  sameDirection: Uint8Array;
}

/**
 * Groups half-edges by their lower vertex index (a counting sort, no hash map), then pairs them
 * inside each small group by their upper vertex.
 */
export function analyseEdges(triangles: Uint32Array, vertexCount: number, withNeighbours = false, spare: Uint8Array | null = null): EdgeTopology {
  const halfEdges = triangles.length;
  // The working arrays may live in spare memory; what is returned never does.
  const memory = new SpareMemory(spare);
  const start = memory.uint32(vertexCount + 1).fill(0);
  countByLower(triangles, start, vertexCount);
  const fill = memory.uint32(vertexCount);
  fill.set(start.subarray(0, vertexCount));
  // Each entry: the half-edge, and its upper vertex with the direction in the top bit, so the
  // pairing pass below reads memory in order.
  const grouped = memory.uint32(withNeighbours ? halfEdges : 0);
  const upperWay = memory.uint32(halfEdges);
  groupByLower(triangles, fill, upperWay, grouped, withNeighbours);
  const neighbour = pageSized(Int32Array, withNeighbours ? halfEdges : 0).fill(-1);
  const sameDirection = pageSized(Uint8Array, withNeighbours ? halfEdges : 0);
  const counts = pairEdges(start, upperWay, grouped, vertexCount, withNeighbours, neighbour, sameDirection);
  return {
    edgeCount: counts[0]!,
    openEdges: counts[1]!,
    nonManifoldEdges: counts[2]!,
    misorientedEdges: counts[3]!,
    neighbour,
    sameDirection,
  };
}

// The passes of analyseEdges, each a function of arrays and numbers only, so each is compiled when
// its loop gets hot instead of the whole being thrown away as a pass ends.

/** How many half-edges each vertex is the lower end of, as running starts (a counting sort's first pass). */
function countByLower(triangles: Uint32Array, start: Uint32Array, vertexCount: number): void {
  // Triangle by triangle, its three half-edges a→b, b→c, c→a (no modulo per half-edge).
  for (let e = 0; e < triangles.length; e += 3) {
    const a = triangles[e]!,
      b = triangles[e + 1]!,
      c = triangles[e + 2]!;
    start[(a < b ? a : b) + 1]!++;
    start[(b < c ? b : c) + 1]!++;
    start[(c < a ? c : a) + 1]!++;
  }
  for (let v = 0; v < vertexCount; v++) start[v + 1]! += start[v]!;
}

/** Every half-edge's upper vertex and direction (and, when asked, the half-edge) in its lower vertex's group. */
function groupByLower(triangles: Uint32Array, fill: Uint32Array, upperWay: Uint32Array, grouped: Uint32Array, withNeighbours: boolean): void {
  for (let e = 0; e < triangles.length; e += 3) {
    const a = triangles[e]!,
      b = triangles[e + 1]!,
      c = triangles[e + 2]!;
    const at0 = fill[a < b ? a : b]!++;
    upperWay[at0] = a < b ? (b | 0x80000000) >>> 0 : a;
    const at1 = fill[b < c ? b : c]!++;
    upperWay[at1] = b < c ? (c | 0x80000000) >>> 0 : b;
    const at2 = fill[c < a ? c : a]!++;
    upperWay[at2] = c < a ? (a | 0x80000000) >>> 0 : c;
    if (withNeighbours) {
      grouped[at0] = e;
      grouped[at1] = e + 1;
      grouped[at2] = e + 2;
    }
  }
}

/** Pairs the half-edges inside each group by their upper vertex: edges, open, non-manifold and misoriented ones, in that order. */
function pairEdges(
  start: Uint32Array,
  upperWay: Uint32Array,
  grouped: Uint32Array,
  vertexCount: number,
  withNeighbours: boolean,
  neighbour: Int32Array,
  sameDirection: Uint8Array,
): [number, number, number, number] {
  // Entries already paired are overwritten with this mark (no vertex has the largest index).
  const done = 0xffffffff;
  let edgeCount = 0,
    openEdges = 0,
    nonManifoldEdges = 0,
    misorientedEdges = 0;
  for (let v = 0; v < vertexCount; v++) {
    const from = start[v]!,
      to = start[v + 1]!;
    for (let i = from; i < to; i++) {
      const way = upperWay[i]!;
      if (way === done) continue;
      const upper = way & 0x7fffffff;
      let uses = 1;
      let j2 = -1,
        way2 = 0;
      for (let j = i + 1; j < to; j++) {
        const other = upperWay[j]!;
        if (other === done || (other & 0x7fffffff) !== upper) continue;
        upperWay[j] = done;
        uses++;
        if (j2 < 0) {
          j2 = j;
          way2 = other;
        }
      }
      edgeCount++;
      if (uses === 1) {
        openEdges++;
      } else if (uses > 2) {
        nonManifoldEdges++;
      } else {
        const same = way >>> 31 === way2 >>> 31 ? 1 : 0;
        if (same) misorientedEdges++;
        if (withNeighbours) {
          const e1 = grouped[i]!,
            e2 = grouped[j2]!;
          neighbour[e1] = (e2 / 3) | 0;
          neighbour[e2] = (e1 / 3) | 0;
          sameDirection[e1] = same;
          sameDirection[e2] = same;
        }
      }
    }
  }
  return [edgeCount, openEdges, nonManifoldEdges, misorientedEdges];
}
