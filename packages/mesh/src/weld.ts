import { pageSized } from './page-sized';
import { toZUpMm, type UpAxis } from './frame';
import type { TriangleSoup } from './stl/triangle-soup';

export interface WeldedMesh {
  /** Three coordinates per vertex, millimetres, Z-up. */
  positionsMm: Float64Array;
  /** Three vertex indices per triangle, in the file's winding. */
  triangles: Uint32Array;
  vertexCount: number;
  triangleCount: number;
  /** Triangles dropped because two of their corners became the same vertex. */
  degenerateDropped: number;
}

export interface WeldFrame {
  up: UpAxis;
  /** Millimetres per file unit. */
  scale: number;
  /** 0: corners weld only when bit-identical; above 0: corners weld when they share a cell of this size (mm). */
  toleranceMm: number;
}

function mix(a: number, b: number, c: number): number {
  let h = Math.imul(a, 0x9e3779b1) ^ Math.imul(b, 0x85ebca77) ^ Math.imul(c, 0xc2b2ae3d);
  h ^= h >>> 15;
  h = Math.imul(h, 0x2c1b3c6d);
  h ^= h >>> 12;
  return h >>> 0;
}

/** A second mix for the big table, so its slots do not follow the recent-corner cache's bits. */
function spread(hash: number): number {
  const h = Math.imul(hash ^ (hash >>> 16), 0x7feb352d);
  return (h ^ (h >>> 15)) >>> 0;
}

/**
 * Corners → vertex ids by open addressing on three 32-bit keys per vertex. The table and the key
 * store grow by doubling, so a closed mesh (about one vertex per six corners) never pays for the
 * worst case of a soup with no shared corners.
 */
class VertexTable {
  keys: Uint32Array;
  count = 0;
  private slots: Int32Array;
  private mask: number;

  constructor(expected: number) {
    let size = 1024;
    while (size < expected * 2) size *= 2;
    this.slots = new Int32Array(size).fill(-1);
    this.mask = size - 1;
    this.keys = new Uint32Array(3 * Math.max(256, expected));
  }

  /** The id of the vertex with these keys; a new id when they were not seen before. */
  idOf(kx: number, ky: number, kz: number, hash: number): number {
    // Locals, and the rare insertion kept out of line, so this stays small enough to inline.
    const keys = this.keys,
      slots = this.slots,
      mask = this.mask;
    let h = spread(hash) & mask;
    for (;;) {
      const slot = slots[h]!;
      if (slot < 0) return this.add(kx, ky, kz, h);
      if (keys[3 * slot] === kx && keys[3 * slot + 1] === ky && keys[3 * slot + 2] === kz) return slot;
      h = (h + 1) & mask;
    }
  }

  private add(kx: number, ky: number, kz: number, h: number): number {
    const id = this.count++;
    if (3 * this.count > this.keys.length) {
      const grown = new Uint32Array(this.keys.length * 2);
      grown.set(this.keys);
      this.keys = grown;
    }
    this.keys[3 * id] = kx;
    this.keys[3 * id + 1] = ky;
    this.keys[3 * id + 2] = kz;
    this.slots[h] = id;
    if (2 * this.count > this.slots.length) this.grow();
    return id;
  }

  private grow(): void {
    const size = this.slots.length * 2;
    this.slots = new Int32Array(size).fill(-1);
    this.mask = size - 1;
    for (let v = 0; v < this.count; v++) {
      let h = spread(mix(this.keys[3 * v]!, this.keys[3 * v + 1]!, this.keys[3 * v + 2]!)) & this.mask;
      while (this.slots[h]! >= 0) h = (h + 1) & this.mask;
      this.slots[h] = v;
    }
  }
}

/** Distinct corners handled per partition: its keys and table (about 200 kB) stay in the core's cache. */
const partitionTarget = 8192;
/** Words per listed miss: corner, hash, three keys. */
const recordSize = 5;
const recentMask = 16383;

/** Corners handed to listMisses at a time, so the miss list grows by at most this many records between checks of its room. */
const sliceCorners = 1 << 16;

/**
 * Pass 1 of ExactWelder over `count` corners from corner `first` on: a corner seen a moment ago
 * points at that earlier corner, any other is listed as a miss (`missRecords` has room for all of
 * them). Returns the number of misses listed. Arrays in, a number out and no other state, so it is
 * compiled once, not thrown away when its caller's code first meets something new.
 */
function listMisses(
  bits: Uint32Array,
  count: number,
  first: number,
  recentCorner: Int32Array,
  recentKey: Uint32Array,
  cornerVertex: Uint32Array,
  missRecords: Uint32Array,
  misses: number,
): number {
  for (let i = 0; i < count; i++) {
    const c = first + i;
    // -0 and +0 are the same point; their bit patterns are not.
    let bx = bits[3 * i]!,
      by = bits[3 * i + 1]!,
      bz = bits[3 * i + 2]!;
    if (bx === 0x80000000) bx = 0;
    if (by === 0x80000000) by = 0;
    if (bz === 0x80000000) bz = 0;
    const hash = mix(bx, by, bz);
    const r = hash & recentMask;
    const cached = recentCorner[r]!;
    if (cached >= 0 && recentKey[3 * r] === bx && recentKey[3 * r + 1] === by && recentKey[3 * r + 2] === bz) {
      cornerVertex[c] = cached;
      continue;
    }
    const at = recordSize * misses++;
    // A second mix, so the partitions and their slots do not follow the recent cache's bits.
    missRecords[at] = c;
    missRecords[at + 1] = spread(hash);
    missRecords[at + 2] = bx;
    missRecords[at + 3] = by;
    missRecords[at + 4] = bz;
    recentCorner[r] = c;
    recentKey[3 * r] = bx;
    recentKey[3 * r + 1] = by;
    recentKey[3 * r + 2] = bz;
  }
  return misses;
}

/** Bit-identical corners welded: the vertices' keys and every corner's vertex, in the file's frame. */
export interface ExactWeld {
  /** Three per vertex: the float32 bits of its coordinates (−0 read as +0), vertices numbered in the order their first corner appears. */
  keys: Uint32Array;
  /** The vertex of every corner, three per triangle. */
  cornerVertex: Uint32Array;
  /**
   * Memory the weld wrote and needs no more once the keys, which it holds, have been read
   * (framedWeld): lent on as SpareMemory; null when there is none.
   */
  spare: Uint8Array | null;
}

/**
 * Welds bit-identical corners and numbers the vertices in the order their first corner appears,
 * taking the corners a block at a time as a reader finds them (`add`), so a file need never be
 * held whole.
 *
 * A big hash table over every vertex would take one cache miss per new vertex, so the work is
 * done in passes that each stay in cache:
 *  1. files list neighbouring triangles one after another, so most corners were seen a moment
 *     ago: a small direct-mapped cache of recent corners points them at that earlier corner; the
 *     rest (misses) are listed with their keys and hash (this pass runs as the corners arrive);
 *  2. the misses are sorted stably into partitions by the top bits of the hash;
 *  3. each partition finds, with a small table of its own, the first corner with each key and
 *     points the later ones at it;
 *  4. one pass in corner order gives each corner that points at itself the next vertex number and
 *     every other corner the number of the (earlier) corner it points at.
 * Every corner thus points at an earlier corner with the same key, or at itself when it is the
 * first, which gives the same numbering as one table consulted in corner order.
 */
export class ExactWelder {
  /** Corners taken so far. */
  corners = 0;
  private readonly recentCorner = new Int32Array(recentMask + 1).fill(-1);
  private readonly recentKey = new Uint32Array(3 * (recentMask + 1));
  // One record per miss: corner, hash, then the three keys, so each pass below reads and writes
  // one stream per partition instead of one per field.
  private missRecords: Uint32Array;
  private misses = 0;

  /** `cornerVertex` has room for every corner that will be added. */
  constructor(private readonly cornerVertex: Uint32Array) {
    // Room for the sorted copy too (see finish): pages never written cost nothing.
    this.missRecords = pageSized(Uint32Array, 2 * recordSize * Math.max(1024, Math.ceil(cornerVertex.length / 4)));
  }

  /** Takes `count` corners, three float32 bit patterns each, from the start of `bits`. */
  add(bits: Uint32Array, count: number): void {
    for (let from = 0; from < count; from += sliceCorners) {
      const slice = Math.min(sliceCorners, count - from);
      // Room for every corner of the slice to be a miss, with its sorted copy (see finish).
      const needed = 2 * recordSize * (this.misses + slice);
      if (needed > this.missRecords.length) {
        const grown = pageSized(Uint32Array, Math.max(needed, 2 * this.missRecords.length));
        grown.set(this.missRecords.subarray(0, recordSize * this.misses));
        this.missRecords = grown;
      }
      const sliced = from === 0 && slice === count ? bits : bits.subarray(3 * from, 3 * (from + slice));
      this.misses = listMisses(sliced, slice, this.corners, this.recentCorner, this.recentKey, this.cornerVertex, this.missRecords, this.misses);
      this.corners += slice;
    }
  }

  /** Passes 2 to 4 over the corners added; the welder is spent afterwards. */
  finish(): ExactWeld {
    const missRecords = this.missRecords,
      misses = this.misses,
      cornerVertex = this.cornerVertex;
    let partitionBits = 0;
    while (misses >>> partitionBits > partitionTarget && partitionBits < 16) partitionBits++;
    const start = partitionStarts(missRecords, misses, partitionBits);
    // Behind the list when it fits, so the two make one stretch of memory to lend on.
    const listEnd = recordSize * misses;
    const sorted = missRecords.subarray(listEnd, 2 * listEnd);
    sortIntoPartitions(missRecords, misses, partitionBits, start, sorted);
    pointAtFirst(sorted, start, cornerVertex);
    const count = numberVertices(missRecords, this.corners, cornerVertex);
    // The list and its sorted copy are spent but for the keys at its start.
    const spare = listEnd > 0 ? new Uint8Array(missRecords.buffer, missRecords.byteOffset, 8 * listEnd) : null;
    return { keys: missRecords.subarray(0, 3 * count), cornerVertex, spare };
  }
}

// Passes 2 to 4 of ExactWelder.finish, each a function of arrays and numbers only: a pass of its
// own is compiled when its loop gets hot, not thrown away when the pass before it ends.

/** The partition of a miss: the top `bits` bits of its hash (`>>> 32` would shift by 0). */
function partitionOf(hash: number, bits: number): number {
  return (hash >>> (31 - bits)) >>> 1;
}

/** Where each partition's misses start in the sorted list, and (last) where the list ends. */
function partitionStarts(missRecords: Uint32Array, misses: number, bits: number): Uint32Array {
  const partitions = 1 << bits;
  const start = new Uint32Array(partitions + 1);
  for (let m = 0; m < misses; m++) start[partitionOf(missRecords[recordSize * m + 1]!, bits) + 1]!++;
  for (let q = 0; q < partitions; q++) start[q + 1]! += start[q]!;
  return start;
}

/** Pass 2: the misses copied into `sorted` by partition, in corner order within each. */
function sortIntoPartitions(missRecords: Uint32Array, misses: number, bits: number, start: Uint32Array, sorted: Uint32Array): void {
  const next = start.slice(0, start.length - 1);
  for (let m = 0; m < misses; m++) {
    const from = recordSize * m,
      to = recordSize * next[partitionOf(missRecords[from + 1]!, bits)]!++;
    sorted[to] = missRecords[from]!;
    sorted[to + 1] = missRecords[from + 1]!;
    sorted[to + 2] = missRecords[from + 2]!;
    sorted[to + 3] = missRecords[from + 3]!;
    sorted[to + 4] = missRecords[from + 4]!;
  }
}

/** Pass 3: in each partition, with a small table of its own, every miss points at the first corner with its keys. */
function pointAtFirst(sorted: Uint32Array, start: Uint32Array, cornerVertex: Uint32Array): void {
  const partitions = start.length - 1;
  let largest = 0;
  for (let q = 0; q < partitions; q++) largest = Math.max(largest, start[q + 1]! - start[q]!);
  let tableSize = 16;
  while (tableSize < 2 * largest) tableSize *= 2;
  // Slot → 1 + index in the sorted misses of the first corner with that key; 0 when empty.
  const slots = new Int32Array(tableSize);
  for (let q = 0; q < partitions; q++) {
    const from = start[q]!,
      to = start[q + 1]!;
    let size = 16;
    while (size < 2 * (to - from)) size *= 2;
    const mask = size - 1;
    slots.fill(0, 0, size);
    for (let j = from; j < to; j++) {
      const at = recordSize * j,
        corner = sorted[at]!,
        kx = sorted[at + 2]!,
        ky = sorted[at + 3]!,
        kz = sorted[at + 4]!;
      let h = sorted[at + 1]! & mask;
      for (;;) {
        const slot = slots[h]!;
        if (slot === 0) {
          slots[h] = j + 1;
          cornerVertex[corner] = corner;
          break;
        }
        const first = recordSize * (slot - 1);
        if (sorted[first + 2] === kx && sorted[first + 3] === ky && sorted[first + 4] === kz) {
          cornerVertex[corner] = sorted[first]!;
          break;
        }
        h = (h + 1) & mask;
      }
    }
  }
}

/**
 * Pass 4: vertex numbers in corner order; returns how many. The first corner with a key is always
 * a miss (nothing earlier could be cached under it), and the misses are listed in corner order:
 * walking them alongside finds its keys. They are written over the list's start (vertex n at 3n,
 * read from miss m ≥ n at 5m, and only later misses read after it), which is spent once read.
 */
function numberVertices(missRecords: Uint32Array, corners: number, cornerVertex: Uint32Array): number {
  const keys = missRecords;
  let count = 0;
  let m = 0;
  for (let c = 0; c < corners; c++) {
    const earlier = cornerVertex[c]!;
    if (earlier !== c) {
      cornerVertex[c] = cornerVertex[earlier]!;
      continue;
    }
    while (missRecords[recordSize * m] !== c) m++;
    const at = recordSize * m++;
    const kx = missRecords[at + 2]!,
      ky = missRecords[at + 3]!,
      kz = missRecords[at + 4]!;
    keys[3 * count] = kx;
    keys[3 * count + 1] = ky;
    keys[3 * count + 2] = kz;
    cornerVertex[c] = count++;
  }
  return count;
}

/**
 * The welded vertices in the Z-up millimetre frame, and the triangles without those whose corners
 * fell on one vertex (compacted in the corner array itself).
 */
export function framedWeld(weld: ExactWeld, triangleCount: number, frame: Pick<WeldFrame, 'up' | 'scale'>): WeldedMesh {
  const { keys, cornerVertex } = weld;
  const vertexCount = keys.length / 3;
  // The keys are the corners' float32 bits: read them back as coordinates.
  const coordinates = new Float32Array(keys.buffer, keys.byteOffset, vertexCount * 3);
  const positionsMm = pageSized(Float64Array, vertexCount * 3);
  if (frame.up === 'z' && frame.scale === 1) {
    // Millimetres, z up: the coordinates as they are (x · 1 is x), widened in one native copy.
    positionsMm.set(coordinates);
  } else {
    for (let v = 0; v < vertexCount; v++) {
      toZUpMm(coordinates[3 * v]!, coordinates[3 * v + 1]!, coordinates[3 * v + 2]!, frame.up, frame.scale, positionsMm, 3 * v);
    }
  }
  return withoutCollapsed(positionsMm, vertexCount, cornerVertex, triangleCount);
}

function withoutCollapsed(positionsMm: Float64Array, vertexCount: number, cornerVertex: Uint32Array, triangleCount: number): WeldedMesh {
  let kept = 0;
  for (let t = 0; t < triangleCount; t++) {
    const a = cornerVertex[3 * t]!,
      b = cornerVertex[3 * t + 1]!,
      c = cornerVertex[3 * t + 2]!;
    if (a === b || b === c || a === c) continue;
    // Compacting in place: a kept triangle never lands ahead of where it was read.
    cornerVertex[3 * kept] = a;
    cornerVertex[3 * kept + 1] = b;
    cornerVertex[3 * kept + 2] = c;
    kept++;
  }
  return {
    positionsMm,
    // The kept triangles' view over the same memory: a copy would touch as much fresh memory again.
    triangles: kept === triangleCount ? cornerVertex : cornerVertex.subarray(0, kept * 3),
    vertexCount,
    triangleCount: kept,
    degenerateDropped: triangleCount - kept,
  };
}

/**
 * Turns the triangle soup into an indexed mesh by merging corners that are the same point, and
 * writes the result in the Z-up millimetre frame.
 */
export function weldSoup(soup: TriangleSoup, frame: WeldFrame): WeldedMesh {
  const corners = soup.triangleCount * 3;
  const cornerVertex = pageSized(Uint32Array, corners);
  const p = soup.positions;

  if (frame.toleranceMm > 0) {
    // Keys are the corner's cell on a grid of the tolerance; prepareMesh keeps cell numbers
    // within 32 bits, so equal keys mean equal cells.
    const table = new VertexTable(Math.ceil(corners / 5));
    const inv = 1 / frame.toleranceMm;
    const scratch = new Float64Array(3);
    const firstCorner: number[] = [];
    for (let c = 0; c < corners; c++) {
      toZUpMm(p[3 * c]!, p[3 * c + 1]!, p[3 * c + 2]!, frame.up, frame.scale, scratch, 0);
      const kx = Math.round(scratch[0]! * inv) >>> 0,
        ky = Math.round(scratch[1]! * inv) >>> 0,
        kz = Math.round(scratch[2]! * inv) >>> 0;
      const before = table.count;
      cornerVertex[c] = table.idOf(kx, ky, kz, mix(kx, ky, kz));
      if (table.count > before) firstCorner.push(c);
    }
    const positionsMm = pageSized(Float64Array, table.count * 3);
    for (let v = 0; v < table.count; v++) {
      const c = firstCorner[v]!;
      toZUpMm(p[3 * c]!, p[3 * c + 1]!, p[3 * c + 2]!, frame.up, frame.scale, positionsMm, 3 * v);
    }
    return withoutCollapsed(positionsMm, table.count, cornerVertex, soup.triangleCount);
  }
  const welder = new ExactWelder(cornerVertex);
  welder.add(new Uint32Array(p.buffer, p.byteOffset, corners * 3), corners);
  return framedWeld(welder.finish(), soup.triangleCount, frame);
}
