import { binaryHeaderBytes, binaryRecordBytes } from './parse-binary-stl';

/**
 * STL writers: the engine hands cleaned meshes back to other programs, and tests write the same
 * mesh both ways. Normals are written from the corners' winding (right-hand rule).
 */
export interface StlSource {
  /** Nine coordinates per triangle. */
  positions: ArrayLike<number>;
  triangleCount: number;
}

function facetNormal(p: ArrayLike<number>, at: number): [number, number, number] {
  const ux = p[at + 3]! - p[at]!,
    uy = p[at + 4]! - p[at + 1]!,
    uz = p[at + 5]! - p[at + 2]!;
  const vx = p[at + 6]! - p[at]!,
    vy = p[at + 7]! - p[at + 1]!,
    vz = p[at + 8]! - p[at + 2]!;
  const nx = uy * vz - uz * vy,
    ny = uz * vx - ux * vz,
    nz = ux * vy - uy * vx;
  const len = Math.hypot(nx, ny, nz);
  return len > 0 ? [nx / len, ny / len, nz / len] : [0, 0, 0];
}

/** Binary STL; `header` (at most 80 ASCII characters) may begin with "solid", as many exporters do. */
export function encodeStlBinary(source: StlSource, header = 'gelpoint mesh'): Uint8Array {
  const bytes = new Uint8Array(binaryHeaderBytes + binaryRecordBytes * source.triangleCount);
  for (let i = 0; i < Math.min(80, header.length); i++) bytes[i] = header.charCodeAt(i) & 0x7f;
  const view = new DataView(bytes.buffer);
  view.setUint32(80, source.triangleCount, true);
  const p = source.positions;
  for (let t = 0; t < source.triangleCount; t++) {
    const at = binaryHeaderBytes + t * binaryRecordBytes;
    const normal = facetNormal(p, t * 9);
    for (let k = 0; k < 3; k++) view.setFloat32(at + 4 * k, normal[k]!, true);
    for (let k = 0; k < 9; k++) view.setFloat32(at + 12 + 4 * k, p[t * 9 + k]!, true);
  }
  return bytes;
}

export interface AsciiStlOptions {
  solidName?: string;
  lineEnding?: '\n' | '\r\n';
}

/** Writes float32-rounded coordinates with 9 significant digits, enough to read back bit for bit. */
export function encodeStlAscii(source: StlSource, options: AsciiStlOptions = {}): string {
  const name = options.solidName ?? 'gelpoint';
  const eol = options.lineEnding ?? '\n';
  const p = source.positions;
  const num = (v: number): string => Math.fround(v).toPrecision(9);
  const lines: string[] = [`solid ${name}`];
  for (let t = 0; t < source.triangleCount; t++) {
    const normal = facetNormal(p, t * 9);
    lines.push(`  facet normal ${normal.map((v) => v.toExponential(6)).join(' ')}`, '    outer loop');
    for (let c = 0; c < 3; c++) {
      const at = t * 9 + c * 3;
      lines.push(`      vertex ${num(p[at]!)} ${num(p[at + 1]!)} ${num(p[at + 2]!)}`);
    }
    lines.push('    endloop', '  endfacet');
  }
  lines.push(`endsolid ${name}`, '');
  return lines.join(eol);
}
