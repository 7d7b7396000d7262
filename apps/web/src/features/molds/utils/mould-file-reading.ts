import { readMouldFile, type Result } from '@gelpoint/mesh';
import type { MoldFileUnits, MoldFormat } from '../types';

export type Vec3 = [number, number, number];

/** What the upload form learns from the file in the browser, before anything is sent. */
export interface MouldFileReading {
  format: MoldFormat;
  /** The unit the file states (3MF); null for STL and OBJ. */
  fileUnits: MoldFileUnits | null;
  triangles: number;
  min: Vec3;
  max: Vec3;
  /** max − min per axis, in the file's own numbers. */
  size: Vec3;
}

/**
 * Reads the mould file with the same reader the server uses, so the form can say what format it
 * is, which unit a 3MF states, and how big the model comes out in each unit.
 */
export function readMouldFileInBrowser(bytes: Uint8Array): Result<MouldFileReading> {
  const read = readMouldFile(bytes);
  if (!read.ok) return read;
  const { positions } = read.value.soup;
  const min: Vec3 = [Infinity, Infinity, Infinity];
  const max: Vec3 = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i++) {
    const axis = i % 3;
    const v = positions[i]!;
    if (v < min[axis]!) min[axis] = v;
    if (v > max[axis]!) max[axis] = v;
  }
  return {
    ok: true,
    value: {
      format: read.value.format,
      fileUnits: read.value.fileUnits,
      triangles: read.value.soup.triangleCount,
      min,
      max,
      size: [max[0] - min[0], max[1] - min[1], max[2] - min[2]],
    },
  };
}
