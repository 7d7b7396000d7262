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

function pageSizedBuffer(bytes: number): ArrayBuffer {
  return new ArrayBuffer(pageSizedBytes(bytes));
}

export function pageSizedUint32(length: number): Uint32Array {
  return new Uint32Array(pageSizedBuffer(4 * length), 0, length);
}

export function pageSizedInt32(length: number): Int32Array {
  return new Int32Array(pageSizedBuffer(4 * length), 0, length);
}

export function pageSizedFloat64(length: number): Float64Array {
  return new Float64Array(pageSizedBuffer(8 * length), 0, length);
}

export function pageSizedUint8(length: number): Uint8Array {
  return new Uint8Array(pageSizedBuffer(length), 0, length);
}

export function pageSizedInt8(length: number): Int8Array {
  return new Int8Array(pageSizedBuffer(length), 0, length);
}
