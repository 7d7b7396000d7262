import type { Path64, Paths64 } from 'clipper2-ts';
import { polygonLibrary } from './polygon-library';
import type { PlaneRect } from './shadow-index';
import type { TriangleTable } from './triangle-table';

/**
 * The outlines (projected onto the table) of the region a set of triangles covers, as closed
 * loops: the half-edges of the set whose neighbour across the edge is not in the set, chained end
 * to start. Any chaining at a corner where loops touch gives the same winding number everywhere,
 * which is all the union below reads.
 */
function boundaryLoops(table: TriangleTable, inSet: Uint8Array, vertexCount: number): number[][] {
  const { triangles } = table;
  const key = (a: number, b: number): number => a * vertexCount + b;
  const edges = new Set<number>();
  for (let t = 0; t < table.count; t++) {
    if (!inSet[t]) continue;
    for (let k = 0; k < 3; k++) edges.add(key(triangles[3 * t + k]!, triangles[3 * t + ((k + 1) % 3)]!));
  }
  const outgoing = new Map<number, number[]>();
  for (let t = 0; t < table.count; t++) {
    if (!inSet[t]) continue;
    for (let k = 0; k < 3; k++) {
      const a = triangles[3 * t + k]!,
        b = triangles[3 * t + ((k + 1) % 3)]!;
      if (edges.has(key(b, a))) continue;
      const list = outgoing.get(a);
      if (list) list.push(b);
      else outgoing.set(a, [b]);
    }
  }
  const loops: number[][] = [];
  for (const [first, list] of outgoing) {
    while (list.length > 0) {
      const loop = [first];
      let at = list.pop()!;
      while (at !== first) {
        loop.push(at);
        const onward = outgoing.get(at);
        if (!onward || onward.length === 0) break;
        at = onward.pop()!;
      }
      loops.push(loop);
    }
  }
  return loops;
}

/** Area of {points covered by the set at least once}: the union of the loops by the non-zero rule (Clipper2). */
function unionArea(table: TriangleTable, loops: number[][], rect: PlaneRect): number {
  const positions = table.positions;
  const cx = (rect.minX + rect.maxX) / 2,
    cy = (rect.minY + rect.maxY) / 2;
  // Integer coordinates to about 2^31 across: sub-nanometre steps on a metre-wide mould.
  const scale = 2 ** 31 / Math.max(rect.maxX - rect.minX, rect.maxY - rect.minY, 1e-9);
  const paths: Paths64 = loops
    .filter((l) => l.length >= 3)
    .map((loop): Path64 =>
      loop.map((v) => ({
        x: Math.round((positions[3 * v]! - cx) * scale),
        y: Math.round((positions[3 * v + 1]! - cy) * scale),
      })),
    );
  if (paths.length === 0) return 0;
  const { Clipper, FillRule } = polygonLibrary();
  return Math.abs(Clipper.areaPaths(Clipper.union(paths, FillRule.NonZero))) / (scale * scale);
}

/**
 * Area of the mould's shadow on the table: the floor inside dams along its outline. Every point
 * of the shadow lies under at least one face that looks down (the bottom of the lowest solid
 * above it), so the shadow is the union of those faces' shadows. The faces lying on the table
 * tile their part without overlap, so their area is summed exactly; only what the raised faces
 * add beyond it goes through the polygon union.
 */
export function outlineArea(table: TriangleTable, vertexCount: number, rect: PlaneRect, zMin: number, tableToleranceMm: number): number {
  const down = new Uint8Array(table.count),
    base = new Uint8Array(table.count);
  let baseArea = 0,
    raised = 0;
  for (let t = 0; t < table.count; t++) {
    if (table.facing[t]! >= 0) continue;
    down[t] = 1;
    if (table.sortedZ[3 * t + 2]! <= zMin + tableToleranceMm) {
      base[t] = 1;
      baseArea -= table.shadowArea[t]!;
    } else {
      raised++;
    }
  }
  if (raised === 0) return baseArea;
  const all = unionArea(table, boundaryLoops(table, down, vertexCount), rect);
  const onTable = unionArea(table, boundaryLoops(table, base, vertexCount), rect);
  return baseArea + Math.max(0, all - onTable);
}
