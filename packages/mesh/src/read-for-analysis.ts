import type { FileUnits, UpAxis } from './frame';
import { readMouldFile, type MouldFormat, type ReadMouldFileOptions } from './mould-file';
import { prepareMesh, prepareStreamedStl, type CavityMesh } from './prepare-mesh';
import { ok, type Result } from './result';
import { BinaryStlStream } from './stl/binary-stl-stream';

/** A mould file read and checked, ready to become the mesh an analysis takes. */
export interface MouldForAnalysis {
  format: MouldFormat;
  /** The unit the file states (3MF); null for formats that carry none. */
  fileUnits: FileUnits | null;
  triangles: number;
  /** The welded, checked mesh in these units with this axis turned up; call it once (it uses up what was read). */
  prepare(units: FileUnits, up: UpAxis): Result<CavityMesh>;
}

/**
 * Reads a mould file for its analysis without writing to its bytes, which another reader may hold
 * at the same time: a binary STL is welded as it is read (BinaryStlStream, no copy of its corners),
 * any other file is read by readMouldFile. Either way the same refusals, the same counts and the
 * same mesh, bit for bit.
 */
export function readMouldForAnalysis(bytes: Uint8Array, options: Omit<ReadMouldFileOptions, 'consumeBytes'> = {}): Result<MouldForAnalysis> {
  const stream = BinaryStlStream.open(bytes, bytes.length, options.maxTriangles === undefined ? {} : { maxTriangles: options.maxTriangles });
  if (stream) {
    stream.push(bytes);
    const read = stream.finish();
    if (!read.ok) return read;
    const streamed = read.value;
    return ok({ format: 'stl', fileUnits: null, triangles: streamed.triangleCount, prepare: (units, up) => prepareStreamedStl(streamed, { units, up }) });
  }
  const file = readMouldFile(bytes, options);
  if (!file.ok) return file;
  const { soup, format, fileUnits } = file.value;
  return ok({ format, fileUnits, triangles: soup.triangleCount, prepare: (units, up) => prepareMesh(soup, { units, up }) });
}
