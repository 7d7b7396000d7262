import { pageSized, type TypedArrayKind } from './page-sized';

/**
 * Typed arrays carved one after another out of memory nothing else uses any more (the bytes of a
 * file read in place), or fresh ones when there is none or it runs out. Fresh memory costs a page
 * fault per 4 kB at its first touch, which for a big mesh outweighs the arithmetic done in it
 * (fresh ones are page-sized, see page-sized.ts).
 * A carved array holds whatever was there: callers write every entry before reading it, or ask
 * for a cleared one.
 */
export class SpareMemory {
  private at: number;
  private readonly end: number;

  constructor(private readonly bytes: Uint8Array | null) {
    this.at = bytes ? bytes.byteOffset : 0;
    this.end = bytes ? bytes.byteOffset + bytes.byteLength : 0;
  }

  private take(length: number, size: number): number | null {
    if (!this.bytes) return null;
    const at = Math.ceil(this.at / size) * size;
    if (at + length * size > this.end) return null;
    this.at = at + length * size;
    return at;
  }

  private carve<T>(Kind: TypedArrayKind<T>, length: number): T {
    const at = this.take(length, Kind.BYTES_PER_ELEMENT);
    return at === null ? pageSized(Kind, length) : new Kind(this.bytes!.buffer, at, length);
  }

  float64(length: number): Float64Array {
    return this.carve(Float64Array, length);
  }

  uint32(length: number): Uint32Array {
    return this.carve(Uint32Array, length);
  }

  int8(length: number): Int8Array {
    return this.carve(Int8Array, length);
  }

  uint8(length: number): Uint8Array {
    return this.carve(Uint8Array, length);
  }
}
