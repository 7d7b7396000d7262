import { fail, ok, type Result } from '../result';
import type { TriangleSoup } from './triangle-soup';

export const binaryHeaderBytes = 84;
export const binaryRecordBytes = 50;

/** The triangle count a binary STL announces in bytes 80..83, or null when the header is incomplete. */
export function announcedTriangleCount(bytes: Uint8Array): number | null {
  if (bytes.length < binaryHeaderBytes) return null;
  return new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength).getUint32(80, true);
}

/** Reads a binary STL whose length has already been matched against its announced count. */
export function parseBinaryStl(bytes: Uint8Array, maxTriangles: number): Result<TriangleSoup> {
  const count = announcedTriangleCount(bytes) ?? 0;
  if (count === 0) {
    return fail('stl_no_triangles', 'The binary STL announces 0 triangles; export the mould again with its surface included.');
  }
  if (count > maxTriangles) {
    return fail('stl_too_many_triangles', `The STL holds ${count} triangles, more than the ${maxTriangles} this service accepts; decimate the mesh in your CAD program and upload it again.`);
  }
  const positions = new Float32Array(count * 9);
  const bad = readCorners(bytes, count, positions);
  if (bad >= 0) {
    return fail('stl_non_finite', `Triangle ${bad + 1} of the STL has a coordinate that is not a finite number (NaN or infinity); repair or re-export the mesh.`);
  }
  return ok({ positions, triangleCount: count, format: 'binary' });
}

/** Index of the first triangle with a non-finite coordinate, or -1. */
function readCorners(bytes: Uint8Array, count: number, positions: Float32Array): number {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let t = 0; t < count; t++) {
    // Each record: normal (12 bytes, ignored: it is recomputed from the corners), 3 corners, 2 spare.
    const at = binaryHeaderBytes + t * binaryRecordBytes + 12;
    let finiteCheck = 0;
    for (let k = 0; k < 9; k++) {
      const v = view.getFloat32(at + 4 * k, true);
      positions[t * 9 + k] = v;
      finiteCheck += v - v;
    }
    if (finiteCheck !== 0) return t;
  }
  return -1;
}
