/**
 * Big typed arrays sized for the C library's allocator and the kernel's huge pages.
 *
 * glibc serves a block of 128 kB or more with a mapping of its own, 4 kB pages rounded up with a
 * 16-byte header in front. Linux places an anonymous mapping whose length is a whole number of
 * 2 MB on a 2 MB boundary, so that (with transparent huge pages allowed for it, as
 * glibc.malloc.hugetlb=1 asks) every part of it can be a 2 MB page. Any other length leaves the
 * part before the first and after the last 2 MB boundary in 4 kB pages: about 2 MB of them for
 * every big array, 500 page faults, each of which cost about 10 µs on the virtual machines
 * measured (README, performance). So a big array's buffer asks for a whole number of 2 MB less
 * 4 kB, which the header and the rounding bring to exactly that number of 2 MB.
 *
 * The array is a view of its length over the start of that buffer; the pages past its end are
 * never touched, so they cost address space only. Elsewhere than on Linux (a browser reading an
 * analysis, say) the arrays are plain ones of their length.
 */
const hugePage = 2 * 1024 * 1024;
const smallPage = 4096;
const onLinux = (globalThis as { process?: { platform?: string } }).process?.platform === 'linux';

/** From this size up (64 small pages, 0.6 ms of faults) a buffer takes whole huge pages. */
const smallestRounded = 256 * 1024;

/** The bytes to ask for to hold `bytes`: on Linux, whole huge pages less one small page from smallestRounded up. */
export function pageSizedBytes(bytes: number, linux = onLinux): number {
  if (!linux || bytes < smallestRounded) return bytes;
  return Math.ceil((bytes + smallPage) / hugePage) * hugePage - smallPage;
}

/** A typed array's constructor: Uint8Array, Int32Array, Float64Array and the like. */
export interface TypedArrayKind<T> {
  new (buffer: ArrayBufferLike, byteOffset: number, length: number): T;
  readonly BYTES_PER_ELEMENT: number;
}

/** A zeroed array of `length` elements of this kind, over a buffer of pageSizedBytes. */
export function pageSized<T>(Kind: TypedArrayKind<T>, length: number): T {
  return new Kind(new ArrayBuffer(pageSizedBytes(Kind.BYTES_PER_ELEMENT * length)), 0, length);
}
