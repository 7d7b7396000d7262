import { fail, ok, type Result } from '@gelpoint/core';

export type Vec3 = [number, number, number];

/** How big the model is in the file's own numbers, before anyone says what unit they are. */
export interface StlExtent {
  format: 'binary' | 'ascii';
  triangles: number;
  min: Vec3;
  max: Vec3;
  /** max − min per axis, in file units. */
  size: Vec3;
}

const headerBytes = 80;
const countBytes = 4;
const facetBytes = 50;
const normalBytes = 12;

function extentOf(format: StlExtent['format'], triangles: number, min: Vec3, max: Vec3): Result<StlExtent> {
  if (triangles === 0 || !min.every(Number.isFinite) || !max.every(Number.isFinite)) {
    return fail('stl_empty', 'The STL holds no triangles Gelpoint can read; export the mould again as a solid.');
  }
  return ok({ format, triangles, min, max, size: [max[0] - min[0], max[1] - min[1], max[2] - min[2]] });
}

function binaryExtent(view: DataView, triangles: number): Result<StlExtent> {
  const min: Vec3 = [Infinity, Infinity, Infinity];
  const max: Vec3 = [-Infinity, -Infinity, -Infinity];
  for (let t = 0; t < triangles; t++) {
    const facet = headerBytes + countBytes + t * facetBytes + normalBytes;
    for (let corner = 0; corner < 9; corner++) {
      const value = view.getFloat32(facet + corner * 4, true);
      const axis = corner % 3;
      if (value < min[axis]!) min[axis] = value;
      if (value > max[axis]!) max[axis] = value;
    }
  }
  return extentOf('binary', triangles, min, max);
}

const vertexLine = /vertex\s+(\S+)\s+(\S+)\s+(\S+)/g;

function asciiExtent(bytes: Uint8Array): Result<StlExtent> {
  const text = new TextDecoder('latin1').decode(bytes);
  const min: Vec3 = [Infinity, Infinity, Infinity];
  const max: Vec3 = [-Infinity, -Infinity, -Infinity];
  let corners = 0;
  for (const match of text.matchAll(vertexLine)) {
    for (let axis = 0; axis < 3; axis++) {
      const value = Number(match[axis + 1]);
      if (!Number.isFinite(value)) {
        return fail('stl_unreadable', `A vertex line of the STL holds "${match[axis + 1]}", which is not a number; export the mould again.`);
      }
      if (value < min[axis]!) min[axis] = value;
      if (value > max[axis]!) max[axis] = value;
    }
    corners++;
  }
  return extentOf('ascii', Math.floor(corners / 3), min, max);
}

/**
 * The model's extent from the STL bytes, read in the browser so the upload form can say what the
 * size looks like in each unit before anything is sent. A file whose length is exactly the header,
 * the count and 50 bytes per facet is binary, even when its header starts with "solid".
 */
export function stlExtent(bytes: Uint8Array): Result<StlExtent> {
  if (bytes.byteLength >= headerBytes + countBytes) {
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    const triangles = view.getUint32(headerBytes, true);
    if (headerBytes + countBytes + triangles * facetBytes === bytes.byteLength) return binaryExtent(view, triangles);
  }
  const start = new TextDecoder('latin1').decode(bytes.subarray(0, 512)).trimStart();
  if (start.toLowerCase().startsWith('solid')) return asciiExtent(bytes);
  if (bytes.byteLength >= headerBytes + countBytes) {
    const announced = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength).getUint32(headerBytes, true);
    const expected = headerBytes + countBytes + announced * facetBytes;
    return fail(
      'stl_length_mismatch',
      `The binary STL announces ${announced} triangles, which take ${expected} bytes, but the file has ${bytes.byteLength}; export it again and send the whole file.`,
    );
  }
  return fail('stl_unreadable', 'This file is neither a binary nor an ASCII STL; export the mould from your CAD program as STL.');
}
