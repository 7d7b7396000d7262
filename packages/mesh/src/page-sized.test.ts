import { describe, expect, it } from 'vitest';
import { pageSized, pageSizedBytes } from './page-sized';

const MB = 1024 * 1024;

describe('page-sized arrays', () => {
  // The rule checked, from memory of glibc's malloc (a block of 128 kB or more gets a mapping of its
  // own: the size plus a 16-byte header, rounded up to 4 kB pages) and of Linux's mmap (an anonymous
  // mapping whose length is a multiple of 2 MB is placed on a 2 MB boundary): asking for
  // k × 2 MB − 4 kB maps exactly k × 2 MB. Measured here (README, performance): touching a 12 MB array
  // took 569 page faults, a 12 MB − 4 kB one 58.
  it('asks for whole 2 MB pages less 4 kB on Linux, at least the bytes needed', () => {
    for (const bytes of [256 * 1024, MB, 2 * MB - 4096, 2 * MB - 4095, 2 * MB, 12 * MB + 1, 30_246_000]) {
      const asked = pageSizedBytes(bytes, true);
      expect(asked).toBeGreaterThanOrEqual(bytes);
      expect((asked + 4096) % (2 * MB)).toBe(0);
      expect(asked - bytes).toBeLessThan(2 * MB);
    }
    expect(pageSizedBytes(2 * MB - 4096, true)).toBe(2 * MB - 4096);
    expect(pageSizedBytes(2 * MB - 4095, true)).toBe(4 * MB - 4096);
  });

  it('leaves small buffers, and every buffer off Linux, at their size', () => {
    expect(pageSizedBytes(1000, true)).toBe(1000);
    expect(pageSizedBytes(256 * 1024 - 1, true)).toBe(256 * 1024 - 1);
    expect(pageSizedBytes(12 * MB, false)).toBe(12 * MB);
  });

  it('gives zeroed arrays of exactly the length asked for', () => {
    const a = pageSized(Uint32Array, 3_000_001);
    expect(a.length).toBe(3_000_001);
    expect(a.byteOffset).toBe(0);
    expect(a.buffer.byteLength).toBe(pageSizedBytes(4 * 3_000_001));
    expect(a.every((v) => v === 0)).toBe(true);
    expect(pageSized(Float64Array, 5).length).toBe(5);
    expect(pageSized(Int8Array, 0).length).toBe(0);
  });
});
