import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellSolid } from '../../test/moulds';
import { encodeStlAscii, encodeStlBinary } from './encode-stl';
import { parseStl } from './parse-stl';

// Layout of binary STL (StereoLithography Interface Specification, 3D Systems 1988, from memory):
// 80-byte header, little-endian uint32 triangle count, then 50 bytes per triangle (normal, three
// corners as 12 little-endian float32, a 2-byte attribute word).
const cube = cellSolid([0, 10], [0, 20], [0, 5], () => true);
const text = (s: string): Uint8Array => new TextEncoder().encode(s);

function facet(corners: string[][]): string {
  return `facet normal 0 0 0\nouter loop\n${corners.map((c) => `vertex ${c.join(' ')}`).join('\n')}\nendloop\nendfacet\n`;
}

describe('parseStl: reading', () => {
  it('reads back a binary file corner for corner, as float32', () => {
    const soup = parseStl(encodeStlBinary(cube));
    expect(soup.ok).toBe(true);
    if (!soup.ok) return;
    expect(soup.value.format).toBe('binary');
    expect(soup.value.triangleCount).toBe(cube.triangleCount);
    expect(Array.from(soup.value.positions)).toEqual(Array.from(cube.positions, Math.fround));
  });

  it('reads the same corners in place when it may overwrite the bytes, and copies when the file is quirky', () => {
    const rounded = Array.from(cube.positions, Math.fround);
    const bytes = encodeStlBinary(cube);
    const soup = parseStl(bytes, { consumeBytes: true });
    expect(soup.ok && soup.value.positions.buffer).toBe(bytes.buffer);
    expect(soup.ok && Array.from(soup.value.positions)).toEqual(rounded);
    // A stray byte after the last record: the normals are checked after the corners, so no overwriting.
    const trailing = new Uint8Array(bytes.length + 1);
    trailing.set(encodeStlBinary(cube));
    const copy = Uint8Array.from(trailing);
    const quirky = parseStl(trailing, { consumeBytes: true });
    expect(quirky.ok && quirky.value.positions.buffer).not.toBe(trailing.buffer);
    expect(quirky.ok && Array.from(quirky.value.positions)).toEqual(rounded);
    expect(trailing).toEqual(copy);
    // Not at a 4-byte boundary of its buffer: read into an array of its own.
    const shifted = new Uint8Array(bytes.length + 2);
    shifted.set(encodeStlBinary(cube), 2);
    const unaligned = parseStl(shifted.subarray(2), { consumeBytes: true });
    expect(unaligned.ok && Array.from(unaligned.value.positions)).toEqual(rounded);
  });

  it('decides binary by the size rule even when the 80-byte header begins with "solid"', () => {
    const soup = parseStl(encodeStlBinary(cube, 'solid cube exported by a CAD program'));
    expect(soup.ok && soup.value.format).toBe('binary');
    expect(soup.ok && soup.value.triangleCount).toBe(12);
  });

  it('reads the same corners, bit for bit, from the ASCII and the binary file of one mesh', () => {
    const odd = cellSolid([0.1, 3.3333333], [-7.25, 1e-3], [1e5, 1e5 + 0.7], () => true);
    const a = parseStl(text(encodeStlAscii(odd)));
    const b = parseStl(encodeStlBinary(odd));
    expect(a.ok && b.ok).toBe(true);
    if (!a.ok || !b.ok) return;
    expect(a.value.format).toBe('ascii');
    expect(Array.from(a.value.positions)).toEqual(Array.from(b.value.positions));
  });

  it('reads CRLF line ends, tabs, blank lines, capitals and exponents', () => {
    const body =
      'SOLID part\r\n\r\n  FACET NORMAL 0 0 1\r\n\tOuter Loop\r\n' +
      '  vertex 1.5e+02 0 -2.5E-01\r\n vertex\t0.0e0 1.0E+1   0\r\nvertex +1 .5 3.\r\n endloop\r\nendfacet\r\nendsolid part\r\n';
    const soup = parseStl(text(body));
    expect(soup.ok).toBe(true);
    if (!soup.ok) return;
    expect(Array.from(soup.value.positions)).toEqual([150, 0, -0.25, 0, 10, 0, 1, 0.5, 3].map(Math.fround));
  });

  it('reads several solid … endsolid blocks into one mesh', () => {
    const tri = [
      ['0', '0', '0'],
      ['1', '0', '0'],
      ['0', '1', '0'],
    ];
    const body = `solid a\n${facet(tri)}endsolid a\nsolid b\n${facet(tri)}${facet(tri)}endsolid b\n`;
    const soup = parseStl(text(body));
    expect(soup.ok && soup.value.triangleCount).toBe(3);
  });

  it('never throws on arbitrary bytes: it answers with a value', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 400 }), (bytes) => {
        const result = parseStl(bytes);
        return result.ok ? result.value.triangleCount > 0 : typeof result.error.message === 'string' && result.error.message.length > 20;
      }),
      { numRuns: 300 },
    );
    fc.assert(
      fc.property(fc.string({ maxLength: 300 }), (s) => {
        const result = parseStl(text(`solid x\n${s}`));
        return typeof result.ok === 'boolean';
      }),
      { numRuns: 300 },
    );
  });
});

describe('parseStl: refusals', () => {
  const codeOf = (bytes: Uint8Array, maxTriangles?: number): string | undefined => {
    const r = parseStl(bytes, maxTriangles === undefined ? {} : { maxTriangles });
    return r.ok ? undefined : r.error.code;
  };

  it('refuses empty and whitespace-only files', () => {
    expect(codeOf(new Uint8Array(0))).toBe('stl_empty');
    expect(codeOf(text(' \r\n\t '))).toBe('stl_empty');
  });

  it('refuses truncated binary and ASCII files', () => {
    const binary = encodeStlBinary(cube);
    expect(codeOf(binary.subarray(0, binary.length - 7))).toBe('stl_truncated');
    expect(codeOf(binary.subarray(0, 60))).toBe('stl_truncated');
    const ascii = encodeStlAscii(cube);
    expect(codeOf(text(ascii.slice(0, ascii.indexOf('endloop', 400))))).toBe('stl_truncated');
    expect(codeOf(text(ascii.slice(0, ascii.lastIndexOf('endsolid'))))).toBe('stl_truncated');
  });

  it('refuses files that are not STL', () => {
    expect(codeOf(text('hello, this is a note about the mould'))).toBe('stl_not_stl');
    expect(codeOf(text('solid x\nfacet normal 0 0 1\nouter loop\nvertex 0 zero 0\n'))).toBe('stl_not_stl');
    expect(
      codeOf(
        text(
          `solid x\n${facet([
            ['0', '0', '0'],
            ['1', '0', '0'],
            ['0', '1', '0'],
            ['1', '1', '0'],
          ])}endsolid x\n`,
        ),
      ),
    ).toBe('stl_not_stl');
    const png = new Uint8Array(200);
    png.set([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    png.set([1, 0, 0, 0], 80);
    expect(codeOf(png)).toBe('stl_not_stl');
  });

  it('refuses NaN and infinite coordinates', () => {
    const binary = encodeStlBinary(cube);
    new DataView(binary.buffer).setFloat32(84 + 50 * 3 + 12 + 4, Number.NaN, true);
    expect(codeOf(binary)).toBe('stl_non_finite');
    const inf = encodeStlBinary(cube);
    new DataView(inf.buffer).setFloat32(84 + 50 * 11 + 12 + 32, Number.POSITIVE_INFINITY, true);
    expect(codeOf(inf)).toBe('stl_non_finite');
    expect(
      codeOf(
        text(
          `solid x\n${facet([
            ['0', 'nan', '0'],
            ['1', '0', '0'],
            ['0', '1', '0'],
          ])}endsolid x\n`,
        ),
      ),
    ).toBe('stl_non_finite');
    expect(
      codeOf(
        text(
          `solid x\n${facet([
            ['0', '0', '-inf'],
            ['1', '0', '0'],
            ['0', '1', '0'],
          ])}endsolid x\n`,
        ),
      ),
    ).toBe('stl_non_finite');
  });

  it('refuses ASCII coordinates beyond the float32 range that STL corners are kept in', () => {
    // IEEE 754 binary32 holds at most (2 − 2^-23)·2^127 ≈ 3.4028235e38; 1e39 used to become
    // Infinity after the finite check and break the analysis downstream.
    const corners = (x: string) =>
      text(
        `solid x\n${facet([
          [x, '0', '0'],
          ['1', '0', '0'],
          ['0', '1', '0'],
        ])}endsolid x\n`,
      );
    expect(codeOf(corners('1e39'))).toBe('stl_non_finite');
    expect(codeOf(corners('-3.5e38'))).toBe('stl_non_finite');
    expect(codeOf(corners('3.4028234e38'))).toBeUndefined();
    const r = parseStl(corners('1e39'));
    expect(r.ok || r.error.message).toMatch(/^Line 4 of the ASCII STL has the coordinate "1e39", beyond/);
  });

  it('refuses more triangles than the configured cap, binary and ASCII', () => {
    expect(codeOf(encodeStlBinary(cube), 11)).toBe('stl_too_many_triangles');
    expect(codeOf(text(encodeStlAscii(cube)), 11)).toBe('stl_too_many_triangles');
    expect(codeOf(encodeStlBinary(cube), 12)).toBeUndefined();
  });

  it('refuses files without triangles', () => {
    expect(codeOf(encodeStlBinary({ positions: new Float64Array(0), triangleCount: 0 }))).toBe('stl_no_triangles');
    expect(codeOf(text('solid empty\nendsolid empty\n'))).toBe('stl_no_triangles');
  });

  it('says what was wrong and how to fix it', () => {
    const r = parseStl(encodeStlBinary(cube).subarray(0, 500));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/12 triangles.*500 bytes.*whole file/);
  });
});
