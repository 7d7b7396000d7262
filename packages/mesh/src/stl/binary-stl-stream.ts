import { pageSized } from '../page-sized';
import { onlyWhitespace, looksLikeText, opensWith } from '../text-bytes';
import { fail, ok, type MeshWarning, type Result } from '../result';
import { ExactWelder, type ExactWeld } from '../weld';
import { binaryHeaderBytes, binaryRecordBytes } from './parse-binary-stl';
import { defaultMaxTriangles } from './triangle-soup';

/**
 * Copies the corners of `count` records from `at` on (9 float32 bit patterns each, after the
 * 12-byte normal, which is recomputed later) into `block` from record `fill` on. Returns the first
 * of them with a coordinate that is not finite, or -1. A loop of its own, with nothing but
 * reads and writes of arrays in it, so it is compiled once and stays so.
 */
function copyCorners(view: DataView, at: number, count: number, block: Uint32Array, fill: number): number {
  let firstNonFinite = -1;
  for (let r = 0; r < count; r++) {
    const from = at + r * binaryRecordBytes + 12,
      to = 9 * (fill + r);
    let exponents = 0;
    for (let k = 0; k < 9; k++) {
      const bits = view.getUint32(from + 4 * k, true);
      block[to + k] = bits;
      // All exponent bits set: infinity or NaN (IEEE 754 binary32).
      exponents |= (bits & 0x7f800000) === 0x7f800000 ? 1 : 0;
    }
    if (exponents !== 0 && firstNonFinite < 0) firstNonFinite = r;
  }
  return firstNonFinite;
}

/** A binary STL read in chunks, its corners welded as they came (see prepareStreamedStl). */
export interface StreamedStl {
  weld: ExactWeld;
  triangleCount: number;
  format: 'binary';
  warnings: MeshWarning[];
}

export interface BinaryStlStreamOptions {
  /** Refuse files with more triangles than this (memory guard for uploads). Default 5,000,000. */
  maxTriangles?: number;
}

/** Records gathered before each hand-over to the welder: 36 kB of corners, which stay in cache. */
const blockRecords = 1024;

/**
 * Reads a binary STL from chunks of any size (`push`), welding the corners of each record as it
 * arrives, so the file is never held whole and its corners are never gathered into a soup. Only
 * files whose reading cannot differ from readMouldFile's are taken (see `open`): a well-formed
 * binary STL, its size and count in agreement; everything else goes to readMouldFile.
 */
export class BinaryStlStream {
  private readonly record = new Uint8Array(binaryRecordBytes);
  private recordFill = 0;
  private received = 0;
  private readonly block = new Uint32Array(9 * blockRecords);
  private blockFill = 0;
  private triangle = 0;
  private firstNonFinite = -1;
  private readonly welder: ExactWelder;

  private constructor(
    private readonly fileBytes: number,
    private readonly triangleCount: number,
  ) {
    this.welder = new ExactWelder(pageSized(Uint32Array, 3 * triangleCount));
  }

  /**
   * A stream for a file of `fileBytes` bytes that opens with `head` (its first bytes, at least the
   * 84-byte header unless the file is shorter), or null when readMouldFile must read it whole: a
   * zip, text that may be an ASCII STL, a size that does not follow the binary rule for the
   * header's count, no triangles or more than `maxTriangles`.
   */
  static open(head: Uint8Array, fileBytes: number, options: BinaryStlStreamOptions = {}): BinaryStlStream | null {
    const maxTriangles = options.maxTriangles ?? defaultMaxTriangles;
    if (!Number.isInteger(maxTriangles) || maxTriangles < 1) return null;
    if (head.length < binaryHeaderBytes || head.length > fileBytes) return null;
    // A zip's local file header or end record, "PK\x03\x04" or "PK\x05\x06" (PKWARE APPNOTE.TXT §4.3.7): a 3MF.
    if (head[0] === 0x50 && head[1] === 0x4b) return null;
    const announced = new DataView(head.buffer, head.byteOffset, binaryHeaderBytes).getUint32(80, true);
    if (announced < 1 || announced > maxTriangles || fileBytes !== binaryHeaderBytes + binaryRecordBytes * announced) return null;
    // Text as far as the head goes may be text to the end, and then perhaps an ASCII STL.
    if (onlyWhitespace(head) || ((opensWith(head, 'solid') || opensWith(head, 'facet')) && looksLikeText(head))) return null;
    return new BinaryStlStream(fileBytes, announced);
  }

  /** The file's next bytes, from its first on; chunks may split the header or a record anywhere. */
  push(chunk: Uint8Array): void {
    const length = chunk.length;
    this.received += length;
    if (this.received > this.fileBytes) return;
    // The header's bytes were read by `open`: skip those in this chunk.
    let at = Math.min(length, Math.max(0, binaryHeaderBytes - (this.received - length)));
    if (at === length) return;
    if (this.recordFill > 0) {
      const take = Math.min(binaryRecordBytes - this.recordFill, length - at);
      this.record.set(chunk.subarray(at, at + take), this.recordFill);
      this.recordFill += take;
      at += take;
      if (this.recordFill < binaryRecordBytes) return;
      this.takeRecords(this.record, 0, 1);
      this.recordFill = 0;
    }
    const whole = Math.floor((length - at) / binaryRecordBytes);
    this.takeRecords(chunk, at, whole);
    at += whole * binaryRecordBytes;
    if (at < length) {
      this.record.set(chunk.subarray(at), 0);
      this.recordFill = length - at;
    }
  }

  /** The welded corners, or the same refusal readMouldFile gives the whole file. */
  finish(): Result<StreamedStl> {
    if (this.blockFill > 0) this.flush();
    if (this.received !== this.fileBytes || this.triangle !== this.triangleCount) {
      return fail(
        'stl_truncated',
        `The binary STL announces ${this.triangleCount} triangles (${this.fileBytes} bytes) but ${this.received} bytes were read; the file changed while it was read, so read it again.`,
      );
    }
    if (this.firstNonFinite >= 0) {
      return fail(
        'stl_non_finite',
        `Triangle ${this.firstNonFinite + 1} of the STL has a coordinate that is not a finite number (NaN or infinity); repair or re-export the mesh.`,
      );
    }
    return ok({ weld: this.welder.finish(), triangleCount: this.triangleCount, format: 'binary', warnings: [] });
  }

  private takeRecords(bytes: Uint8Array, from: number, count: number): void {
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    for (let r = 0; r < count;) {
      const take = Math.min(count - r, blockRecords - this.blockFill);
      const nonFinite = copyCorners(view, from + r * binaryRecordBytes, take, this.block, this.blockFill);
      if (nonFinite >= 0 && this.firstNonFinite < 0) this.firstNonFinite = this.triangle + this.blockFill + nonFinite;
      this.blockFill += take;
      r += take;
      if (this.blockFill === blockRecords) this.flush();
    }
  }

  private flush(): void {
    // After a non-finite corner the file is refused: the rest need no welding.
    if (this.firstNonFinite < 0) this.welder.add(this.block, 3 * this.blockFill);
    this.triangle += this.blockFill;
    this.blockFill = 0;
  }
}
