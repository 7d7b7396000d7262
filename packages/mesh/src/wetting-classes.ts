import type { BoundingBox } from './mesh-measures';
import { castRays } from './ray-batch';
import type { TriangleTable } from './triangle-table';

export const wetWithOutline = 1;
export const wetWithBox = 2;

/**
 * Which faces look into the dammed space, per dam: only those can touch resin (how far up they
 * do is the level series' business, from the escape heights). A face that is not a wall looks
 * into the space straight above or below it, inside the mould's shadow and so inside either dam,
 * unless it lies on the table (the mould's base). A wall (a face within 1e-5 of vertical) looks
 * sideways: into the box dam when the point beside it is inside the bounding box, into dams along
 * the outline when that point is also over or under the mould; a dam standing against a wall
 * covers it.
 */
export interface WettingClasses {
  /** Bit wetWithOutline / wetWithBox per triangle. */
  wet: Uint8Array;
}

export function classifyWetting(positions: Float64Array, triangles: Uint32Array, table: TriangleTable, box: BoundingBox): WettingClasses {
  const wet = new Uint8Array(table.count);
  const zMin = box.min[2];
  const diagonal = Math.hypot(box.max[0] - box.min[0], box.max[1] - box.min[1], box.max[2] - box.min[2]);
  const step = 1e-5 * diagonal;
  const tolerance = 1e-7 * diagonal;
  const rect = { minX: box.min[0], minY: box.min[1], maxX: box.max[0], maxY: box.max[1] };

  const rayTriangle: number[] = [],
    rayX: number[] = [],
    rayY: number[] = [],
    rayZ: number[] = [];
  for (let t = 0; t < table.count; t++) {
    if (!table.steep[t]) {
      const onTable = table.facing[t]! < 0 && table.sortedZ[3 * t + 2]! <= zMin + tolerance;
      if (!onTable) wet[t] = wetWithOutline | wetWithBox;
      continue;
    }
    const a = 3 * triangles[3 * t]!,
      b = 3 * triangles[3 * t + 1]!,
      c = 3 * triangles[3 * t + 2]!;
    const ux = positions[b]! - positions[a]!,
      uy = positions[b + 1]! - positions[a + 1]!,
      uz = positions[b + 2]! - positions[a + 2]!;
    const vx = positions[c]! - positions[a]!,
      vy = positions[c + 1]! - positions[a + 1]!,
      vz = positions[c + 2]! - positions[a + 2]!;
    const nx = uy * vz - uz * vy,
      ny = uz * vx - ux * vz;
    const horizontal = Math.hypot(nx, ny);
    if (!(horizontal > 0)) continue;
    const px = (positions[a]! + positions[b]! + positions[c]!) / 3 + (step * nx) / horizontal;
    const py = (positions[a + 1]! + positions[b + 1]! + positions[c + 1]!) / 3 + (step * ny) / horizontal;
    if (!(px > rect.minX && px < rect.maxX && py > rect.minY && py < rect.maxY)) continue;
    rayTriangle.push(t);
    rayX.push(px);
    rayY.push(py);
    rayZ.push((positions[a + 2]! + positions[b + 2]! + positions[c + 2]!) / 3);
  }
  if (rayTriangle.length === 0) return { wet };

  const found = castRays(Float64Array.from(rayX), Float64Array.from(rayY), positions, triangles, table, rect, zMin);
  for (let r = 0; r < rayTriangle.length; r++) {
    const t = rayTriangle[r]!,
      cz = rayZ[r]!;
    const from = found.start[r]!,
      to = found.start[r + 1]!;
    let blocked = false;
    for (let k = from; k < to; k++) {
      if (found.intervals[2 * k]! < cz - tolerance && found.intervals[2 * k + 1]! > cz + tolerance) blocked = true;
    }
    if (blocked) continue;
    // The point beside the wall is inside the bounding box, so the box dam holds resin there.
    wet[t] = (to > from ? wetWithOutline : 0) | wetWithBox;
  }
  return { wet };
}
