import { fail, ok, type MeshWarning, type Result } from '../result';
import type { TriangleSoup } from './triangle-soup';

export const binaryHeaderBytes = 84;
export const binaryRecordBytes = 50;

/** The triangle count a binary STL announces in bytes 80..83, or null when the header is incomplete. */
export function announcedTriangleCount(bytes: Uint8Array): number | null {
  if (bytes.length < binaryHeaderBytes) return null;
  return new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength).getUint32(80, true);
}

/** What the size of a file says about it as a binary STL. */
export interface BinaryLayout {
  /** The count in the header. */
  announced: number;
  /** Whole 50-byte records after the header. */
  records: number;
  /** Bytes after the last whole record (0..49). */
  trailing: number;
}

export function binaryLayout(bytes: Uint8Array): BinaryLayout | null {
  const announced = announcedTriangleCount(bytes);
  if (announced === null) return null;
  const body = bytes.length - binaryHeaderBytes;
  return { announced, records: Math.floor(body / binaryRecordBytes), trailing: body % binaryRecordBytes };
}

/** True when the header's count and the file's size agree exactly (the size rule of binary STL). */
export function isExactBinary(layout: BinaryLayout | null): boolean {
  return layout !== null && layout.trailing === 0 && layout.records === layout.announced;
}

/**
 * Reads a binary STL as its writer left it. Many writers stream the records and never go back to
 * fill in the count (it stays 0) or write a wrong one, and some add a byte or a line ending after
 * the last record, so the records are counted from the file's size: the header's count is only
 * believed when it agrees. A file cut short inside a record is refused, since its end is lost.
 */
export function parseBinaryStl(bytes: Uint8Array, maxTriangles: number, consumeBytes = false): Result<TriangleSoup> {
  const layout = binaryLayout(bytes);
  if (layout === null) {
    return fail(
      'stl_truncated',
      `The file is only ${bytes.length} bytes, shorter than the 84-byte header of a binary STL; the upload or export was cut short.`,
    );
  }
  const { announced, records, trailing } = layout;
  const expected = binaryHeaderBytes + binaryRecordBytes * announced;
  if (records === 0 && announced === 0) {
    return fail('stl_no_triangles', 'The binary STL announces 0 triangles and holds none; export the mould again with its surface included.');
  }
  if (announced > records && (trailing > 0 || records === 0)) {
    return fail(
      'stl_truncated',
      `The binary STL announces ${announced} triangles (${expected} bytes) but the file has only ${bytes.length} bytes; the upload or export was cut short, so send the whole file.`,
    );
  }
  if (records > maxTriangles) {
    return fail(
      'stl_too_many_triangles',
      `The STL holds ${records} triangles, more than the ${maxTriangles} this service accepts; decimate the mesh in your CAD program and upload it again.`,
    );
  }
  const exact = announced === records && trailing === 0;
  // In place only when the normals need no check afterwards (the file's count and size agree) and
  // the corners can be read as aligned float32s. Each record is read before anything is written
  // over it: record t is written at byte 36t, behind the 84 + 50t it is read from.
  const inPlace = consumeBytes && exact && bytes.byteOffset % 4 === 0;
  const positions = inPlace ? new Float32Array(bytes.buffer, bytes.byteOffset, records * 9) : new Float32Array(records * 9);
  const bad = readCorners(bytes, records, positions, !exact);
  if (bad >= 0) {
    return fail(
      'stl_non_finite',
      exact
        ? `Triangle ${bad + 1} of the STL has a coordinate that is not a finite number (NaN or infinity); repair or re-export the mesh.`
        : `Triangle ${bad + 1} of the file has a number that is not finite (NaN or infinity), and its header's count (${announced}) does not match its size either, so it is a damaged STL or not an STL at all; export the mould as STL again.`,
    );
  }
  const warnings: MeshWarning[] = [];
  if (announced === 0) {
    warnings.push({
      code: 'stl_count_mismatch',
      message: `The STL's header gives its triangle count as 0, as some writers leave it; the ${records} triangles the file holds were read.`,
    });
  } else if (announced < records) {
    warnings.push({
      code: 'stl_count_mismatch',
      message: `The STL's header announces ${announced} triangles but the file holds ${records}; all ${records} were read.`,
    });
  } else if (announced > records) {
    warnings.push({
      code: 'stl_count_mismatch',
      message: `The STL's header announces ${announced} triangles but the file holds only ${records}; those were read. If the export was cut short, upload the whole file.`,
    });
  }
  if (trailing > 0) {
    warnings.push({
      code: 'stl_trailing_bytes',
      message: `The STL has ${trailing} stray byte${trailing === 1 ? '' : 's'} after its last triangle; ${trailing === 1 ? 'it was' : 'they were'} ignored.`,
    });
  }
  return ok({ positions, triangleCount: records, format: 'binary', warnings, ...(inPlace ? { spareBytes: bytes } : {}) });
}

/**
 * Index of the first triangle with a non-finite number, or -1. The normal is recomputed from the
 * corners and the 2-byte attribute word (colour, for some writers) is never read; when the file's
 * count and size disagree the normal must still be finite, one more sign that these are STL records.
 */
function readCorners(bytes: Uint8Array, count: number, positions: Float32Array, checkNormals: boolean): number {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let t = 0; t < count; t++) {
    // Each record: normal (12 bytes), 3 corners, 2 spare.
    const at = binaryHeaderBytes + t * binaryRecordBytes + 12;
    let finiteCheck = 0;
    for (let k = 0; k < 9; k++) {
      const v = view.getFloat32(at + 4 * k, true);
      positions[t * 9 + k] = v;
      finiteCheck += v - v;
    }
    if (finiteCheck !== 0) return t;
  }
  return checkNormals ? firstNonFiniteNormal(view, count) : -1;
}

function firstNonFiniteNormal(view: DataView, count: number): number {
  for (let t = 0; t < count; t++) {
    const at = binaryHeaderBytes + t * binaryRecordBytes;
    let finiteCheck = 0;
    for (let k = 0; k < 3; k++) {
      const n = view.getFloat32(at + 4 * k, true);
      finiteCheck += n - n;
    }
    if (finiteCheck !== 0) return t;
  }
  return -1;
}
