import type { ColumnGrid } from './column-grid';

/** A binary max-heap of (key, item) pairs. */
class MaxHeap {
  private keys = new Float64Array(64);
  private items = new Int32Array(64);
  size = 0;

  push(key: number, item: number): void {
    if (this.size === this.keys.length) {
      const keys = new Float64Array(2 * this.size);
      keys.set(this.keys);
      this.keys = keys;
      const items = new Int32Array(2 * this.size);
      items.set(this.items);
      this.items = items;
    }
    let at = this.size++;
    while (at > 0) {
      const parent = (at - 1) >> 1;
      if (this.keys[parent]! >= key) break;
      this.keys[at] = this.keys[parent]!;
      this.items[at] = this.items[parent]!;
      at = parent;
    }
    this.keys[at] = key;
    this.items[at] = item;
  }

  /** Removes the largest; returns its item (its key is left in `topKey`). */
  pop(): number {
    const item = this.items[0]!;
    this.topKey = this.keys[0]!;
    const key = this.keys[--this.size]!,
      last = this.items[this.size]!;
    let at = 0;
    for (;;) {
      let child = 2 * at + 1;
      if (child >= this.size) break;
      if (child + 1 < this.size && this.keys[child + 1]! > this.keys[child]!) child++;
      if (this.keys[child]! <= key) break;
      this.keys[at] = this.keys[child]!;
      this.items[at] = this.items[child]!;
      at = child;
    }
    this.keys[at] = key;
    this.items[at] = last;
    return item;
  }

  topKey = 0;
}

/**
 * Escape heights on the column grid, for meshes the exact analysis cannot take (open or
 * non-manifold): the free gaps of neighbouring columns are joined where they overlap in height,
 * and air at the top of a gap that moves into a neighbour must come down to the lower of the two
 * ceilings. A priority flood from the open top (the gap above each column, and the space beside
 * the grid, where the dams stand just clear of the mould) gives every gap the best bottleneck
 * height of a way out. Returns one height per interval: that of the gap just below it.
 */
export function columnEscape(grid: ColumnGrid, zMin: number): Float32Array {
  const { nx, ny, counts, offsets, intervals } = grid;
  const columns = nx * ny;
  // Gap k of column c (k = 0 under the lowest interval, k = count above the highest) is node offsets[c] + c + k.
  const nodes = offsets[columns]! + columns;
  const best = new Float64Array(nodes).fill(-Infinity);
  const floorOf = (c: number, k: number): number => (k === 0 ? zMin : intervals[2 * (offsets[c]! + k - 1) + 1]!);
  const ceilingOf = (c: number, k: number): number => (k === counts[c]! ? Infinity : intervals[2 * (offsets[c]! + k)]!);
  const heap = new MaxHeap();
  const offer = (node: number, height: number): void => {
    if (height > best[node]!) {
      best[node] = height;
      heap.push(height, node);
    }
  };
  for (let c = 0; c < columns; c++) {
    const i = c % nx,
      j = (c - i) / nx;
    const edge = i === 0 || j === 0 || i === nx - 1 || j === ny - 1;
    for (let k = 0; k <= counts[c]!; k++) {
      const ceiling = ceilingOf(c, k);
      if (k === counts[c]! || edge) offer(offsets[c]! + c + k, ceiling);
    }
  }
  const columnOfNode = new Int32Array(nodes),
    gapOfNode = new Int32Array(nodes);
  for (let c = 0; c < columns; c++) {
    for (let k = 0; k <= counts[c]!; k++) {
      columnOfNode[offsets[c]! + c + k] = c;
      gapOfNode[offsets[c]! + c + k] = k;
    }
  }
  while (heap.size > 0) {
    const node = heap.pop();
    const height = heap.topKey;
    if (height < best[node]!) continue;
    const c = columnOfNode[node]!,
      k = gapOfNode[node]!;
    const floor = floorOf(c, k),
      ceiling = ceilingOf(c, k);
    if (!(ceiling > floor)) continue;
    const i = c % nx,
      j = (c - i) / nx;
    for (const [di, dj] of [
      [1, 0],
      [-1, 0],
      [0, 1],
      [0, -1],
    ] as const) {
      const ni = i + di,
        nj = j + dj;
      if (ni < 0 || nj < 0 || ni >= nx || nj >= ny) continue;
      const n = nj * nx + ni;
      for (let m = 0; m <= counts[n]!; m++) {
        const nFloor = floorOf(n, m),
          nCeiling = ceilingOf(n, m);
        if (nFloor >= ceiling) break;
        if (!(nCeiling > floor) || !(nCeiling > nFloor)) continue;
        offer(offsets[n]! + n + m, Math.min(height, nCeiling));
      }
    }
  }
  const escape = new Float32Array(offsets[columns]!);
  for (let c = 0; c < columns; c++) {
    for (let k = 0; k < counts[c]!; k++) {
      // An empty gap (an interval standing on the table or on the one below) holds nothing.
      const ceiling = ceilingOf(c, k);
      escape[offsets[c]! + k] = ceiling > floorOf(c, k) ? best[offsets[c]! + c + k]! : ceiling;
    }
  }
  return escape;
}
