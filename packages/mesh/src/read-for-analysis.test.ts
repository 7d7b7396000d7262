import { describe, expect, it } from 'vitest';
import { encode3mf, encodeObj } from '../test/mould-files';
import { cellSolid, inverted, mapped } from '../test/moulds';
import { readMouldFile } from './mould-file';
import { prepareMesh } from './prepare-mesh';
import { readMouldForAnalysis } from './read-for-analysis';
import { encodeStlAscii, encodeStlBinary } from './stl/encode-stl';

// A 32 × 24 × 12 mm block with a 20 × 16 mm pocket from z = 5 up, and the same block wound inside out.
const pocket = cellSolid([0, 6, 26, 32], [0, 4, 20, 24], [0, 5, 12], (i, j, k) => !(i === 1 && j === 1 && k === 1));
const files: Record<string, Uint8Array> = {
  'binary STL': encodeStlBinary(pocket),
  'binary STL wound inside out, in inches, y up': encodeStlBinary(inverted(mapped(pocket, (x, y, z) => [x / 25.4, z / 25.4, -y / 25.4]))),
  'ASCII STL': new TextEncoder().encode(encodeStlAscii(pocket)),
  OBJ: new TextEncoder().encode(encodeObj(pocket, { quads: true })),
  '3MF in inches': encode3mf(pocket, 'inch', 25.4),
};

/** What the worker has always done: readMouldFile, then prepareMesh on its soup. */
function asBefore(bytes: Uint8Array, units: 'mm' | 'in', up: 'y' | 'z') {
  const file = readMouldFile(bytes);
  if (!file.ok) return file;
  const mesh = prepareMesh(file.value.soup, { units, up });
  return mesh.ok ? { ok: true as const, file: file.value, mesh: mesh.value } : mesh;
}

describe('reading a mould file for its analysis without writing to its bytes', () => {
  for (const [name, bytes] of Object.entries(files)) {
    it(`gives the ${name} the counts and the mesh that readMouldFile and prepareMesh give, bit for bit`, () => {
      const [units, up] = name.includes('inches') ? (['in', name.includes('y up') ? 'y' : 'z'] as const) : (['mm', 'z'] as const);
      const untouched = bytes.slice();
      const read = readMouldForAnalysis(bytes);
      if (!read.ok) throw new Error(read.error.message);
      const before = asBefore(untouched, units, up);
      if (!before.ok) throw new Error(before.error.message);
      expect(read.value.format).toBe(before.file.format);
      expect(read.value.fileUnits).toBe(before.file.fileUnits);
      expect(read.value.triangles).toBe(before.file.soup.triangleCount);
      const mesh = read.value.prepare(units, up);
      if (!mesh.ok) throw new Error(mesh.error.message);
      expect(mesh.value.positionsMm).toEqual(before.mesh.positionsMm);
      expect(mesh.value.triangles).toEqual(before.mesh.triangles);
      expect(mesh.value.topology).toEqual(before.mesh.topology);
      expect(mesh.value.enclosedVolumeMm3).toBe(before.mesh.enclosedVolumeMm3);
      expect(mesh.value.warnings).toEqual(before.mesh.warnings);
      // Another reader (the request storing the upload) sees the bytes as they came.
      expect(bytes).toEqual(untouched);
    });
  }

  it('refuses what readMouldFile refuses, with its code and sentence', () => {
    const nan = encodeStlBinary(pocket);
    new DataView(nan.buffer).setFloat32(84 + 50 * 3 + 12 + 4, Number.NaN, true);
    const cases: [Uint8Array, { maxTriangles?: number }][] = [
      [nan, {}],
      [encodeStlBinary(pocket), { maxTriangles: 10 }],
      [encodeStlBinary(pocket).subarray(0, 300), {}],
      [new Uint8Array(0), {}],
    ];
    for (const [bytes, options] of cases) {
      const read = readMouldForAnalysis(bytes, options);
      const before = readMouldFile(bytes, options);
      expect(read.ok).toBe(false);
      expect(before.ok).toBe(false);
      if (!read.ok && !before.ok) expect(read.error).toEqual(before.error);
    }
  });
});
