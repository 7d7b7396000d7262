import type { BoundingBox } from './mesh-measures';
import { castRays } from './ray-batch';
import type { TriangleTable } from './triangle-table';

export const wetWithOutline = 1;
export const wetWithBox = 2;

/**
 * Which triangles the resin touches, per dam. A face that looks up is wetted when resin can stand
 * on it: always in a height-field mould, otherwise until the level passes a ceiling over it (an
 * overhang: beyond that level the space above it is cut off and holds trapped air). A wall (a face
 * within 1e-5 of vertical) is wetted when the space beside it holds resin: that space must have
 * mould beneath it (outline dam) or lie inside the box dam. Faces that look down are never wetted.
 */
export interface WettingClasses {
  /** Bit wetWithOutline / wetWithBox per triangle. */
  wet: Uint8Array;
  /** Level above which the triangle is cut off from the resin; Infinity when nothing is above it. */
  ceiling: Float64Array;
}

export function classifyWetting(
  positions: Float64Array, triangles: Uint32Array, table: TriangleTable, box: BoundingBox, heightField: boolean,
): WettingClasses {
  const wet = new Uint8Array(table.count);
  const ceiling = new Float64Array(table.count).fill(Infinity);
  const zMin = box.min[2];
  const diagonal = Math.hypot(box.max[0] - box.min[0], box.max[1] - box.min[1], box.max[2] - box.min[2]);
  const step = 1e-5 * diagonal;
  const tolerance = 1e-7 * diagonal;
  const rect = { minX: box.min[0], minY: box.min[1], maxX: box.max[0], maxY: box.max[1] };

  // Rays to cast: beside each wall whose outer side lies inside the box (outside it there is no
  // mould and no dam), and, when the mould is not a height field, above each floor face.
  const rayTriangle: number[] = [], rayX: number[] = [], rayY: number[] = [], rayZ: number[] = [];
  for (let t = 0; t < table.count; t++) {
    const facing = table.facing[t]!, steep = table.steep[t]!;
    if (facing < 0 && !steep) continue;
    if (!steep && heightField) {
      wet[t] = wetWithOutline | wetWithBox;
      continue;
    }
    const a = 3 * triangles[3 * t]!, b = 3 * triangles[3 * t + 1]!, c = 3 * triangles[3 * t + 2]!;
    if (!steep) {
      wet[t] = wetWithOutline | wetWithBox;
      rayTriangle.push(t);
      rayX.push((positions[a]! + positions[b]! + positions[c]!) / 3);
      rayY.push((positions[a + 1]! + positions[b + 1]! + positions[c + 1]!) / 3);
      rayZ.push((positions[a + 2]! + positions[b + 2]! + positions[c + 2]!) / 3);
      continue;
    }
    const ux = positions[b]! - positions[a]!, uy = positions[b + 1]! - positions[a + 1]!, uz = positions[b + 2]! - positions[a + 2]!;
    const vx = positions[c]! - positions[a]!, vy = positions[c + 1]! - positions[a + 1]!, vz = positions[c + 2]! - positions[a + 2]!;
    const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz;
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
  if (rayTriangle.length === 0) return { wet, ceiling };

  const found = castRays(Float64Array.from(rayX), Float64Array.from(rayY), positions, triangles, table, rect, zMin);
  for (let r = 0; r < rayTriangle.length; r++) {
    const t = rayTriangle[r]!, cz = rayZ[r]!;
    const from = found.start[r]!, to = found.start[r + 1]!;
    if (!table.steep[t]) {
      for (let k = from; k < to; k++) {
        const bottom = found.intervals[2 * k]!;
        if (bottom > cz + tolerance) {
          ceiling[t] = bottom;
          break;
        }
      }
      continue;
    }
    let floorBelow = false, blocked = false, over = Infinity;
    for (let k = from; k < to; k++) {
      const bottom = found.intervals[2 * k]!, top = found.intervals[2 * k + 1]!;
      if (bottom < cz - tolerance && top > cz + tolerance) blocked = true;
      else if (top <= cz + tolerance) floorBelow = true;
      else if (bottom < over) over = bottom;
    }
    if (blocked) continue;
    // The ray's point lies inside the box, so the box dam always holds resin there.
    wet[t] = (floorBelow ? wetWithOutline : 0) | wetWithBox;
    ceiling[t] = over;
  }
  return { wet, ceiling };
}
