import { describe, expect, it } from 'vitest';
import { stlWithCount, stlWithTrailingBytes, encode3mf } from '../../test/mould-files';
import { bellOverPlate, cellSolid, inverted, mapped, revolvedPocketBlock, torus, tSlotBlock, withoutTriangles, type GeneratedMesh } from '../../test/moulds';
import { unwrap } from '../../test/pipeline';
import { readMouldFile } from '../mould-file';
import { prepareMesh, prepareStreamedStl, type CavityMesh, type PrepareMeshOptions } from '../prepare-mesh';
import type { Result } from '../result';
import { BinaryStlStream, type StreamedStl } from './binary-stl-stream';
import { encodeStlAscii, encodeStlBinary } from './encode-stl';
import { parseStl } from './parse-stl';

const box = cellSolid([0, 40], [0, 30], [0, 20], () => true);
const pocketBlock = cellSolid([0, 10, 30, 40], [0, 5, 25, 30], [0, 8, 20], (i, j, k) => !(i === 1 && j === 1 && k === 1));
const bowl = revolvedPocketBlock({
  halfSide: 15,
  bottomZ: 0,
  topZ: 20,
  profile: [
    [0, 12],
    [6, 12],
    [10, 20],
  ],
  segments: 48,
});

/** The bytes pushed in chunks of the given sizes (the last repeated to the end). */
function streamed(bytes: Uint8Array, sizes: number[] = [bytes.length], maxTriangles?: number): Result<StreamedStl> | null {
  const stream = BinaryStlStream.open(bytes.subarray(0, Math.max(84, sizes[0]!)), bytes.length, maxTriangles === undefined ? {} : { maxTriangles });
  if (!stream) return null;
  let at = 0;
  for (let i = 0; at < bytes.length; i++) {
    const size = sizes[Math.min(i, sizes.length - 1)]!;
    stream.push(bytes.subarray(at, at + size));
    at += size;
  }
  return stream.finish();
}

/** The mesh without the memory it lends on, which holds whatever was there. */
function comparable(mesh: CavityMesh): Omit<CavityMesh, 'spareMemory'> {
  const { spareMemory: _spare, ...rest } = mesh;
  return rest;
}

function wholeFileMesh(bytes: Uint8Array, options: PrepareMeshOptions = {}): Omit<CavityMesh, 'spareMemory'> {
  return comparable(unwrap(prepareMesh(unwrap(parseStl(bytes.slice(), { consumeBytes: true })), options)));
}

function streamedMesh(bytes: Uint8Array, sizes?: number[], options: PrepareMeshOptions = {}): Omit<CavityMesh, 'spareMemory'> {
  const read = streamed(bytes, sizes);
  if (read === null) throw new Error('the stream refused the file');
  return comparable(unwrap(prepareStreamedStl(unwrap(read), options)));
}

describe('BinaryStlStream: the same mesh as reading the whole file', () => {
  const moulds: [string, GeneratedMesh][] = [
    ['a box', box],
    ['a block with a pocket', pocketBlock],
    ['a revolved bowl', bowl],
    ['a torus', torus(30, 8, 40, 16)],
    ['a T-slot block', tSlotBlock()],
    ['a bell over a plate', bellOverPlate(24)],
    ['an inside-out block', inverted(pocketBlock)],
    ['a block with a hole', withoutTriangles(pocketBlock, [3, 7])],
  ];
  for (const [name, mould] of moulds) {
    it(`${name}: vertices, triangles, topology, measures and warnings match parseStl + prepareMesh`, () => {
      const bytes = encodeStlBinary(mould);
      expect(streamedMesh(bytes)).toEqual(wholeFileMesh(bytes));
      expect(streamedMesh(bytes, [1000, 777])).toEqual(wholeFileMesh(bytes));
    });
  }

  it('in inches with y up, as prepareMesh reads the same file', () => {
    const bytes = encodeStlBinary(mapped(bowl, (x, y, z) => [x / 25.4, z / 25.4, -y / 25.4]));
    const options: PrepareMeshOptions = { units: 'in', up: 'y' };
    expect(streamedMesh(bytes, undefined, options)).toEqual(wholeFileMesh(bytes, options));
  });

  it('welds a closed box to 8 corners, and a torus to V − E + F = 0 (Euler characteristic of genus 1)', () => {
    const cube = streamedMesh(encodeStlBinary(box));
    expect(cube.vertexCount).toBe(8);
    expect(cube.triangleCount).toBe(12);
    const ring = streamedMesh(encodeStlBinary(torus(30, 8, 40, 16)));
    expect(ring.topology.watertight).toBe(true);
    expect(ring.vertexCount - ring.topology.edges + ring.triangleCount).toBe(0);
  });

  it('reads -0 and +0 as one corner and drops triangles that collapse, as the whole-file reading does', () => {
    const signed = mapped(pocketBlock, (x, y, z) => [x === 0 ? -0 : x, y, z]);
    const bytes = encodeStlBinary(signed);
    const collapsed = new Float64Array(signed.positions.length + 9);
    collapsed.set(signed.positions);
    collapsed.set([5, 5, 5, 5, 5, 5, 9, 9, 9], signed.positions.length);
    const withSliver = encodeStlBinary({ positions: collapsed, triangleCount: signed.triangleCount + 1 });
    expect(streamedMesh(bytes)).toEqual(wholeFileMesh(bytes));
    expect(streamedMesh(withSliver)).toEqual(wholeFileMesh(withSliver));
    expect(streamedMesh(withSliver).topology.degenerateDropped).toBe(1);
  });

  it('takes a binary STL whose 80-byte header begins with "solid", as many exporters write it', () => {
    const bytes = encodeStlBinary(pocketBlock, 'solid pocket block');
    expect(streamedMesh(bytes)).toEqual(wholeFileMesh(bytes));
  });
});

describe('BinaryStlStream: chunks split the file anywhere', () => {
  const bytes = encodeStlBinary(box);
  const expected = wholeFileMesh(bytes);

  it('two chunks, split at every offset of the header and the records', () => {
    for (let split = 84; split < bytes.length; split++) {
      expect(streamedMesh(bytes, [split, bytes.length - split])).toEqual(expected);
    }
  });

  it('the header itself split at every offset, and chunks of every size from 1 to 120 bytes', () => {
    for (let split = 1; split < 84; split++) {
      const stream = BinaryStlStream.open(bytes, bytes.length)!;
      stream.push(bytes.subarray(0, split));
      stream.push(bytes.subarray(split));
      expect(comparable(unwrap(prepareStreamedStl(unwrap(stream.finish()))))).toEqual(expected);
    }
    for (let size = 1; size <= 120; size++) {
      const stream = BinaryStlStream.open(bytes, bytes.length)!;
      for (let at = 0; at < bytes.length; at += size) stream.push(bytes.subarray(at, at + size));
      expect(comparable(unwrap(prepareStreamedStl(unwrap(stream.finish()))))).toEqual(expected);
    }
  });

  it('more records than one block of the welder, in chunks that are no multiple of a record', () => {
    const big = encodeStlBinary(torus(30, 8, 120, 40));
    expect(big.length).toBeGreaterThan(84 + 50 * 2 * 1024);
    expect(streamedMesh(big, [4096, 4093])).toEqual(wholeFileMesh(big));
  });
});

describe('BinaryStlStream: files it leaves to readMouldFile, and refusals', () => {
  it('leaves every file whose reading could differ to the whole-file reader', () => {
    const plain = encodeStlBinary(pocketBlock);
    const refused: [string, Uint8Array][] = [
      ['a wrong count', stlWithCount(pocketBlock, pocketBlock.triangleCount + 1)],
      ['a count of 0', stlWithCount(pocketBlock, 0)],
      ['stray bytes after the last record', stlWithTrailingBytes(pocketBlock, new Uint8Array([10]))],
      ['an ASCII STL', new TextEncoder().encode(encodeStlAscii(pocketBlock))],
      ['a 3MF (zip)', encode3mf(pocketBlock)],
      ['the header alone', plain.subarray(0, 84)],
      ['less than a header', plain.subarray(0, 40)],
    ];
    for (const [name, bytes] of refused) expect(streamed(bytes), name).toBeNull();
    // What the stream leaves is still read: the whole-file reader overlooks a wrong count, with a warning.
    const counted = readMouldFile(stlWithCount(pocketBlock, 0));
    expect(counted.ok && counted.value.soup.warnings.map((w) => w.code)).toEqual(['stl_count_mismatch']);
    expect(streamed(plain, [plain.length], pocketBlock.triangleCount - 1)).toBeNull();
    expect(streamed(plain, [plain.length], pocketBlock.triangleCount)).not.toBeNull();
  });

  it("refuses a corner that is not finite with the whole-file reader's sentence, at any chunking", () => {
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      const bytes = encodeStlBinary(pocketBlock);
      // Triangle 5, its second corner's y.
      new DataView(bytes.buffer).setFloat32(84 + 50 * 4 + 12 + 16, bad, true);
      const whole = parseStl(bytes.slice());
      expect(whole.ok).toBe(false);
      for (const sizes of [[bytes.length], [100, 7]]) {
        const read = streamed(bytes, sizes)!;
        expect(read.ok).toBe(false);
        if (!read.ok && !whole.ok) expect(read.error).toEqual(whole.error);
      }
    }
  });

  it('refuses a file that ends before its announced records or runs past them', () => {
    const bytes = encodeStlBinary(box);
    const short = BinaryStlStream.open(bytes, bytes.length)!;
    short.push(bytes.subarray(0, bytes.length - 1));
    const shortRead = short.finish();
    expect(shortRead.ok).toBe(false);
    if (!shortRead.ok) expect(shortRead.error.code).toBe('stl_truncated');
    const long = BinaryStlStream.open(bytes, bytes.length)!;
    long.push(bytes);
    long.push(new Uint8Array([1, 2, 3]));
    const longRead = long.finish();
    expect(longRead.ok).toBe(false);
    if (!longRead.ok) expect(longRead.error.message).toMatch(/announces 12 triangles \(684 bytes\) but 687 bytes were read/);
  });
});
