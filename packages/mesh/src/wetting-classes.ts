import type { BoundingBox } from './mesh-measures';
import { castRays } from './ray-batch';
import type { PlaneRect } from './shadow-index';
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

/** What deciding a face's wetting needs of the mould: its box, and the step and tolerance both scale with. */
export interface WettingFrame {
  rect: PlaneRect;
  zMin: number;
  /** How far beside a wall its point is taken (1e-5 of the box's diagonal). */
  step: number;
  /** How far a point may lie inside a solid's skin and still count as outside it (1e-7 of the diagonal). */
  tolerance: number;
}

export function wettingFrame(box: BoundingBox): WettingFrame {
  const diagonal = Math.hypot(box.max[0] - box.min[0], box.max[1] - box.min[1], box.max[2] - box.min[2]);
  return {
    rect: { minX: box.min[0], minY: box.min[1], maxX: box.max[0], maxY: box.max[1] },
    zMin: box.min[2],
    step: 1e-5 * diagonal,
    tolerance: 1e-7 * diagonal,
  };
}

/** A face that is not a wall: wet with either dam unless it lies on the table (the mould's base). */
export function faceWetting(facing: number, topZ: number, frame: WettingFrame): number {
  const onTable = facing < 0 && topZ <= frame.zMin + frame.tolerance;
  return onTable ? 0 : wetWithOutline | wetWithBox;
}

/** Where a wall's vertical ray goes: the point beside its centre, outward; false when that point is outside the box (dry) or the wall has no horizontal normal. */
export function wallRay(positions: Float64Array, triangles: Uint32Array, t: number, frame: WettingFrame, point: { x: number; y: number; z: number }): boolean {
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
  if (!(horizontal > 0)) return false;
  const px = (positions[a]! + positions[b]! + positions[c]!) / 3 + (frame.step * nx) / horizontal;
  const py = (positions[a + 1]! + positions[b + 1]! + positions[c + 1]!) / 3 + (frame.step * ny) / horizontal;
  const { rect } = frame;
  if (!(px > rect.minX && px < rect.maxX && py > rect.minY && py < rect.maxY)) return false;
  point.x = px;
  point.y = py;
  point.z = (positions[a + 2]! + positions[b + 2]! + positions[c + 2]!) / 3;
  return true;
}

/** Walls whose rays are cast together: the triangle and the ray's point of each. */
export class WallRays {
  readonly triangles: number[] = [];
  private readonly xs: number[] = [];
  private readonly ys: number[] = [];
  private readonly zs: number[] = [];
  private readonly point = { x: 0, y: 0, z: 0 };

  /** Takes wall t when its point lies inside the box. */
  add(positions: Float64Array, triangles: Uint32Array, t: number, frame: WettingFrame): void {
    if (!wallRay(positions, triangles, t, frame, this.point)) return;
    this.triangles.push(t);
    this.xs.push(this.point.x);
    this.ys.push(this.point.y);
    this.zs.push(this.point.z);
  }

  /**
   * Casts the rays and calls `wet` with each wall's wetting: the box dam holds resin beside it (its point is inside
   * the box) unless a solid stands there, and dams along the outline do too when the point is also over or under the
   * mould.
   */
  cast(positions: Float64Array, triangles: Uint32Array, facing: Int8Array, frame: WettingFrame, wet: (t: number, bits: number) => void): void {
    if (this.triangles.length === 0) return;
    const found = castRays(Float64Array.from(this.xs), Float64Array.from(this.ys), positions, triangles, facing, frame.rect, frame.zMin);
    for (let r = 0; r < this.triangles.length; r++) {
      const cz = this.zs[r]!;
      const from = found.start[r]!,
        to = found.start[r + 1]!;
      let blocked = false;
      for (let k = from; k < to; k++) {
        if (found.intervals[2 * k]! < cz - frame.tolerance && found.intervals[2 * k + 1]! > cz + frame.tolerance) blocked = true;
      }
      if (!blocked) wet(this.triangles[r]!, (to > from ? wetWithOutline : 0) | wetWithBox);
    }
  }
}

export function classifyWetting(positions: Float64Array, triangles: Uint32Array, table: TriangleTable, box: BoundingBox): WettingClasses {
  const wet = new Uint8Array(table.count);
  const frame = wettingFrame(box);
  const walls = new WallRays();
  for (let t = 0; t < table.count; t++) {
    if (!table.steep[t]) wet[t] = faceWetting(table.facing[t]!, table.sortedZ[3 * t + 2]!, frame);
    else walls.add(positions, triangles, t, frame);
  }
  walls.cast(positions, triangles, table.facing, frame, (t, bits) => (wet[t] = bits));
  return { wet };
}
