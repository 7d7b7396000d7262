/**
 * A binary STL read straight from the format's layout (80-byte header, a little-endian uint32 facet count, then 50
 * bytes a facet: normal, three corners as float32, a uint16 attribute), corners shared only where their coordinates
 * are bit-identical. It shares no code with the engine's readers, so tests can hand the very bytes a mould was stored
 * as to an outside geometry kernel.
 */
export interface IndexedStl {
  positionsMm: Float64Array;
  triangles: Uint32Array;
  bboxMm: { min: [number, number, number]; max: [number, number, number] };
}

export function readBinaryStlIndexed(bytes: Uint8Array): IndexedStl {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const count = view.getUint32(80, true);
  if (bytes.byteLength !== 84 + 50 * count) throw new Error(`a binary STL of ${count} facets is ${84 + 50 * count} bytes, not ${bytes.byteLength}`);
  const index = new Map<string, number>();
  const positions: number[] = [];
  const triangles = new Uint32Array(3 * count);
  const min: [number, number, number] = [Infinity, Infinity, Infinity];
  const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  for (let t = 0; t < count; t++) {
    for (let c = 0; c < 3; c++) {
      const at = 84 + 50 * t + 12 + 12 * c;
      const p = [view.getFloat32(at, true), view.getFloat32(at + 4, true), view.getFloat32(at + 8, true)];
      const key = p.join(',');
      let v = index.get(key);
      if (v === undefined) {
        v = positions.length / 3;
        index.set(key, v);
        positions.push(...p);
        for (let k = 0; k < 3; k++) {
          min[k] = Math.min(min[k]!, p[k]!);
          max[k] = Math.max(max[k]!, p[k]!);
        }
      }
      triangles[3 * t + c] = v;
    }
  }
  return { positionsMm: Float64Array.from(positions), triangles, bboxMm: { min, max } };
}
