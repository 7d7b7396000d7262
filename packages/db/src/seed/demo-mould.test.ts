import { describe, expect, it } from 'vitest';
import { loadManifold, outlineDamResin } from '../../../mesh/test/manifold-reference';
import { readBinaryStlIndexed, type IndexedStl } from '../../../mesh/test/stl-indexed';
import { demoMouldSpec, demoMouldStl } from './demo-mould';

const bytes = demoMouldStl();
const stl = readBinaryStlIndexed(bytes);
const triangleCount = stl.triangles.length / 3;
const vertex = (v: number) => [stl.positionsMm[3 * v]!, stl.positionsMm[3 * v + 1]!, stl.positionsMm[3 * v + 2]!] as const;

/** Divergence theorem: Σ over the faces of the signed tetrahedra to the origin, a · (b × c) / 6. */
function signedVolumeMm3(mesh: IndexedStl): number {
  let sum = 0;
  for (let t = 0; t < mesh.triangles.length; t += 3) {
    const [a, b, c] = [vertex(mesh.triangles[t]!), vertex(mesh.triangles[t + 1]!), vertex(mesh.triangles[t + 2]!)];
    sum += a[0] * (b[1] * c[2] - b[2] * c[1]) - a[1] * (b[0] * c[2] - b[2] * c[0]) + a[2] * (b[0] * c[1] - b[1] * c[0]);
  }
  return sum / 6;
}

describe('the generated demo mould', () => {
  it('is the same file, to the byte, every time it is made', () => {
    expect(Buffer.from(demoMouldStl()).equals(Buffer.from(bytes))).toBe(true);
  });

  it('is a binary STL of a 300 mm blank, 60 mm thick, small enough to seed quickly', () => {
    expect(triangleCount).toBeGreaterThanOrEqual(20_000);
    expect(triangleCount).toBeLessThanOrEqual(60_000);
    expect(stl.bboxMm.min).toEqual([-150, -150, 0]);
    expect(stl.bboxMm.max).toEqual([150, 150, 60]);
  });

  it('is closed and wound one way: every edge is met once in each direction', () => {
    const directed = new Map<string, number>();
    for (let t = 0; t < stl.triangles.length; t += 3) {
      for (let k = 0; k < 3; k++) {
        const key = `${stl.triangles[t + k]}>${stl.triangles[t + ((k + 1) % 3)]}`;
        directed.set(key, (directed.get(key) ?? 0) + 1);
      }
    }
    let unmatched = 0;
    for (const [key, n] of directed) {
      const [a, b] = key.split('>');
      if (n !== 1 || directed.get(`${b}>${a}`) !== 1) unmatched++;
    }
    expect(unmatched).toBe(0);
  });

  it('has a pocket floor 10 to 40 mm below the top face, deepest and shallowest points included', () => {
    const floorZ: number[] = [];
    for (let v = 0; v < stl.positionsMm.length / 3; v++) {
      const z = vertex(v)[2];
      if (z > 0 && z < demoMouldSpec.blankThicknessMm) floorZ.push(z);
    }
    expect(Math.min(...floorZ)).toBe(60 - 40);
    expect(Math.max(...floorZ)).toBe(60 - 10);
  });

  it('encloses the blank less its pocket, wound outward (manifold-3d for the pocket)', async () => {
    const kernel = await loadManifold();
    const pocket = outlineDamResin(kernel, stl, 60);
    const pocketMm3 = pocket.volume();
    pocket.delete();
    // CRC Concise Encyclopedia of Mathematics, regular polygon of n sides inscribed in radius R: A = (n/2)·R²·sin(2π/n);
    // the blank is that polygon (n = 256, R = 150 mm) as a prism 60 mm tall.
    const n = demoMouldSpec.segments;
    const blankMm3 = (n / 2) * 150 ** 2 * Math.sin((2 * Math.PI) / n) * 60;
    // A lagoon, not a scratch: between a tenth and a half of the blank.
    expect(pocketMm3 / blankMm3).toBeGreaterThan(0.1);
    expect(pocketMm3 / blankMm3).toBeLessThan(0.5);
    // float32 corners move the rings by parts in 10⁸, so the totals agree to about that.
    expect(Math.abs(signedVolumeMm3(stl) - (blankMm3 - pocketMm3)) / blankMm3).toBeLessThan(1e-6);
  });
});
