import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { triangleBelow, type TriangleBelow } from './triangle-fill';

/** Area of the part of the triangle below h, by clipping the polygon and Gauss's shoelace formula. */
function clippedShare(corners: [number, number, number][], h: number): number {
  const below: [number, number][] = [];
  for (let i = 0; i < 3; i++) {
    const a = corners[i]!,
      b = corners[(i + 1) % 3]!;
    if (a[2] <= h) below.push([a[0], a[1]]);
    if (a[2] < h !== b[2] < h && a[2] !== b[2]) {
      const s = (h - a[2]) / (b[2] - a[2]);
      if (s > 0 && s < 1) below.push([a[0] + s * (b[0] - a[0]), a[1] + s * (b[1] - a[1])]);
    }
  }
  const shoelace = (p: [number, number][]): number =>
    Math.abs(
      p.reduce((sum, q, i) => {
        const r = p[(i + 1) % p.length]!;
        return sum + q[0] * r[1] - q[1] * r[0];
      }, 0),
    ) / 2;
  return below.length < 3 ? 0 : shoelace(below) / shoelace(corners.map((c) => [c[0], c[1]]));
}

const sorted = (c: [number, number, number][]): [number, number, number] => {
  const z = c.map((p) => p[2]).sort((a, b) => a - b);
  return [z[0]!, z[1]!, z[2]!];
};

describe('triangleBelow', () => {
  const out: TriangleBelow = { share: 0, shareSlope: 0, depth: 0 };
  const corners: [number, number, number][] = [
    [0, 0, 2],
    [10, 1, 7],
    [3, 8, 4],
  ];
  const [z0, z1, z2] = sorted(corners);

  it('gives the share below h equal to the clipped polygon area (shoelace formula)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1.5, max: 7.5, noNaN: true }), (h) => {
        triangleBelow(z0, z1, z2, h, false, out);
        return Math.abs(out.share - clippedShare(corners, h)) < 1e-12;
      }),
    );
  });

  it("gives depth = ∫ share dh (Simpson’s rule on a fine step) and share' as its slope", () => {
    const simpson = (f: (x: number) => number, a: number, b: number, n = 2000): number => {
      const step = (b - a) / n;
      let sum = f(a) + f(b);
      for (let i = 1; i < n; i++) sum += (i % 2 ? 4 : 2) * f(a + i * step);
      return (sum * step) / 3;
    };
    const share = (h: number): number => {
      triangleBelow(z0, z1, z2, h, false, out);
      return out.share;
    };
    for (const h of [3, 4, 5.5, 7, 9]) {
      triangleBelow(z0, z1, z2, h, false, out);
      const depth = out.depth,
        slope = out.shareSlope;
      expect(depth).toBeCloseTo(simpson(share, 0, h), 9);
      expect(slope).toBeCloseTo((share(h + 1e-6) - share(h - 1e-6)) / 2e-6, 5);
    }
  });

  it('matches the truncated-prism volume A·(h1 + h2 + h3)/3 above the triangle (CRC)', () => {
    // CRC Concise Encyclopedia of Mathematics, prism: a right prism cut by an oblique plane has
    // volume base × mean of the three edge heights; here the heights are h − z of each corner.
    const h = 12;
    triangleBelow(z0, z1, z2, h, false, out);
    expect(out.depth).toBeCloseTo((h - 2 + (h - 7) + (h - 4)) / 3, 12);
    expect(out.share).toBe(1);
  });

  it('matches the pyramid volume base × height / 3 below the middle corner (CRC)', () => {
    // Below z1 the resin over the triangle is a pyramid with apex at the lowest corner whose base
    // is the cut at h, similar to the corner triangle: V = shadow · share(h) · (h − z0) / 3.
    const h = 3.2;
    triangleBelow(z0, z1, z2, h, false, out);
    expect(out.depth).toBeCloseTo((clippedShare(corners, h) * (h - z0)) / 3, 12);
  });

  it('jumps from 0 to 1 at a flat triangle, from below and from above', () => {
    triangleBelow(5, 5, 5, 5, false, out);
    expect([out.share, out.depth]).toEqual([0, 0]);
    triangleBelow(5, 5, 5, 5, true, out);
    expect([out.share, out.depth]).toEqual([1, 0]);
    triangleBelow(5, 5, 5, 6.5, false, out);
    expect(out.depth).toBe(1.5);
  });
});
