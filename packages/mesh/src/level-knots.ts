import type { TriangleTable } from './triangle-table';
import type { WettingClasses } from './wetting-classes';

/** A set of distinct numbers that gives up once it would exceed `cap` (open addressing on the bits). */
class BoundedNumberSet {
  private readonly table: Float64Array;
  private readonly used: Uint8Array;
  private readonly mask: number;
  private readonly word = new Float64Array(1);
  private readonly bits = new Uint32Array(this.word.buffer);
  readonly values: number[] = [];
  full = false;

  constructor(private readonly cap: number) {
    let size = 16;
    while (size < cap * 4) size *= 2;
    this.table = new Float64Array(size);
    this.used = new Uint8Array(size);
    this.mask = size - 1;
  }

  add(value: number): void {
    if (this.full) return;
    const v = value + 0;
    this.word[0] = v;
    let h = (Math.imul(this.bits[0]!, 0x9e3779b1) ^ Math.imul(this.bits[1]!, 0x85ebca77)) >>> 0;
    h = (h ^ (h >>> 15)) & this.mask;
    while (this.used[h]) {
      if (this.table[h] === v) return;
      h = (h + 1) & this.mask;
    }
    if (this.values.length >= this.cap) {
      this.full = true;
      return;
    }
    this.used[h] = 1;
    this.table[h] = v;
    this.values.push(v);
  }
}

export interface KnotChoice {
  knots: Float64Array;
  /** Every corner height and escape height is a knot. */
  complete: boolean;
}

function sortedUnique(values: number[]): Float64Array {
  const sorted = Float64Array.from(values).sort();
  let w = 0;
  for (let i = 0; i < sorted.length; i++) if (i === 0 || sorted[i] !== sorted[w - 1]) sorted[w++] = sorted[i]!;
  return sorted.slice(0, w);
}

/**
 * Knots for the level series. When the mould has at most `maxKnots` distinct corner heights (CNC
 * pockets cut in terraces have a few dozen) every one is a knot and the series is exact. Otherwise
 * the knots are evenly spaced, plus the levels of flat faces (where the fill's slope jumps), the
 * escape heights of trapped air (where the trapped volume starts to grow), and the levels the
 * caller asked for, so those stay exact.
 */
export function chooseKnots(
  table: TriangleTable,
  classes: WettingClasses,
  escape: Float64Array | null,
  zMin: number,
  zMax: number,
  required: number[],
  maxKnots: number,
): KnotChoice {
  const inRange = required.filter((h) => h > zMin && h < zMax);
  const corners = new BoundedNumberSet(maxKnots);
  for (let t = 0; t < table.count && !corners.full; t++) {
    if (table.facing[t] === 0 && classes.wet[t] === 0) continue;
    corners.add(table.sortedZ[3 * t]!);
    corners.add(table.sortedZ[3 * t + 1]!);
    corners.add(table.sortedZ[3 * t + 2]!);
    const e = escape ? escape[t]! : Infinity;
    if (Number.isFinite(e)) corners.add(e);
  }
  if (!corners.full) {
    return { knots: sortedUnique([zMin, zMax, ...inRange, ...corners.values].filter((z) => z >= zMin && z <= zMax)), complete: true };
  }
  const quarter = Math.max(1, Math.floor(maxKnots / 4));
  const flats = new BoundedNumberSet(quarter);
  const escapes = new BoundedNumberSet(quarter);
  for (let t = 0; t < table.count; t++) {
    if (table.sortedZ[3 * t] === table.sortedZ[3 * t + 2]) flats.add(table.sortedZ[3 * t]!);
  }
  if (escape) for (let t = 0; t < table.count; t++) if (Number.isFinite(escape[t]!)) escapes.add(escape[t]!);
  const extras = [...inRange, ...flats.values, ...escapes.values];
  const even = Math.max(quarter, maxKnots - extras.length);
  const evenKnots: number[] = [];
  for (let k = 0; k <= even; k++) evenKnots.push(k === even ? zMax : zMin + ((zMax - zMin) * k) / even);
  return { knots: sortedUnique([...evenKnots, ...extras].filter((z) => z >= zMin && z <= zMax)), complete: false };
}

/**
 * Finds indices in ascending points through buckets over their range: a corner height finds its
 * place in a step or two, without the branch misses of a binary search (the level series asks once
 * per vertex, half a million times for a million triangles).
 */
export function knotLocator(points: Float64Array): {
  atLeast: (z: number) => number;
  above: (z: number, from: number) => number;
} {
  const n = points.length;
  const size = 4 * n;
  const from = points[0]!;
  const scale = n > 1 && points[n - 1]! > from ? size / (points[n - 1]! - from) : 0;
  const buckets = new Uint32Array(size + 1);
  for (let b = 0, k = 0; b <= size; b++) {
    const z = from + b / scale;
    while (k < n && points[k]! < z) k++;
    buckets[b] = k;
  }
  /** First index whose point is ≥ z. */
  const atLeast = (z: number): number => {
    const b = (z - from) * scale;
    let k = b <= 0 ? 0 : b >= size ? buckets[size]! : buckets[Math.floor(b)]!;
    while (k > 0 && points[k - 1]! >= z) k--;
    while (k < n && points[k]! < z) k++;
    return k;
  };
  /** First index from `start` whose point is > z. */
  const above = (z: number, start: number): number => {
    let k = start;
    while (k < n && points[k]! <= z) k++;
    return k;
  };
  return { atLeast, above };
}
