import { beforeAll, describe, expect, it } from 'vitest';
import { boxDamResin, loadManifold, type ManifoldKernel } from '../test/manifold-reference';
import { bellOverPlate, cellSolid, heightFieldBlock, recessedChamberBlock, revolvedPocketBlock, tSlotBlock, type GeneratedMesh } from '../test/moulds';
import { meshOf, relative, unwrap } from '../test/pipeline';
import { analyzeCavity } from './analyze-cavity';
import { fillAt } from './fill-queries';

let kernel: ManifoldKernel;
beforeAll(async () => {
  kernel = await loadManifold();
});

const dams = ['outline', 'box'] as const;

/** Every corner height of a generated mould, and the points between and beyond them. */
function levelsOf(generated: GeneratedMesh): number[] {
  const heights = [...new Set(Array.from({ length: generated.positions.length / 3 }, (_, k) => generated.positions[3 * k + 2]!))].sort((a, b) => a - b);
  const between = heights.slice(1).map((h, k) => (h + heights[k]!) / 2);
  return [...heights, ...between, heights.at(-1)! + 3, heights[0]! - 1];
}

/**
 * The same mould analysed twice: once asked for the levels (answered by summing over the faces),
 * once as stored (answered by its series, exact here: every corner height is a knot).
 */
function bothWays(generated: GeneratedMesh, levels: number[]) {
  const summed = unwrap(analyzeCavity(meshOf(generated), { levelsMm: levels }));
  const stored = JSON.parse(JSON.stringify(unwrap(analyzeCavity(meshOf(generated))))) as typeof summed;
  return { summed, stored };
}

describe('fills at the levels asked for, summed over the faces', () => {
  // Trapped air under a ceiling recess (a shaft into a chamber: CRC cuboids), a hollow sealed in
  // the wood, a T-slot under an overhang and a bell over a plate (air held in a curved cup).
  const moulds: [string, GeneratedMesh][] = [
    ['a chamber whose ceiling recess holds air', recessedChamberBlock()],
    [
      'a pocket over a sealed hollow',
      cellSolid(
        [0, 10, 15, 25, 30, 40],
        [0, 10, 15, 25, 30, 40],
        [0, 8, 13, 20, 30],
        (i, j, k) => !((k === 3 && i >= 1 && i <= 3 && j >= 1 && j <= 3) || (k === 1 && i === 2 && j === 2)),
      ),
    ],
    ['a T-slot', tSlotBlock()],
    ['a bell over a plate', bellOverPlate(24)],
    // Nothing hangs over these two: they are summed in one pass without the triangle table, the
    // terraces' walls wetted as their rays find.
    [
      'a pocket cut in terraces',
      cellSolid(
        [0, 5, 10, 30, 35, 40],
        [0, 5, 10, 25, 30, 35],
        [0, 3, 6, 9, 12],
        (i, j, k) => !((k === 3 && i >= 1 && i <= 3 && j >= 1 && j <= 3) || (k === 2 && i === 2 && j >= 1 && j <= 3) || (k === 1 && i === 2 && j === 2)),
      ),
    ],
    [
      'a bowl',
      revolvedPocketBlock({
        halfSide: 20,
        bottomZ: 0,
        topZ: 18,
        profile: [
          [0, 6],
          [8, 6],
          [14, 18],
        ],
        segments: 48,
      }),
    ],
  ];

  for (const [name, generated] of moulds) {
    it(`${name}: the exact series' values at every corner height, between them and beyond them`, () => {
      const levels = levelsOf(generated);
      const { summed, stored } = bothWays(generated, levels);
      expect(summed.method).toBe('exact');
      const { min, max } = summed.bboxMm;
      const scale = (max[0] - min[0]) * (max[1] - min[1]) * (max[2] - min[2]);
      for (const level of levels) {
        for (const dam of dams) {
          const a = unwrap(fillAt(summed, level, dam));
          const b = unwrap(fillAt(stored, level, dam));
          expect(Math.abs(a.volumeMm3 - b.volumeMm3)).toBeLessThanOrEqual(1e-12 * scale);
          expect(Math.abs(a.trappedAirMm3 - b.trappedAirMm3)).toBeLessThanOrEqual(1e-12 * scale);
          expect(Math.abs(a.wettedAreaMm2 - b.wettedAreaMm2)).toBeLessThanOrEqual(1e-12 * scale ** (2 / 3));
          expect(a.maxDepthMm).toBe(b.maxDepthMm);
          expect(a.estimatedErrorPct).toBe(0);
        }
      }
    });
  }

  it('takes the pass without the table for the moulds nothing hangs over', () => {
    for (const [name, generated] of moulds) {
      const overhangs = unwrap(analyzeCavity(meshOf(generated))).exact!.overhangs;
      expect([name, overhangs]).toEqual([name, !['a pocket cut in terraces', 'a bowl'].includes(name)]);
    }
  });

  it('holds the cuboids of the chamber (CRC): resin to the level, the recess’s air above it', () => {
    const [, chamber] = moulds[0]!;
    // The chamber: x, y 5 → 35, z 5 → 10; the shaft: x, y 15 → 25 from z 10 up; the recess: x, y 5 → 10, z 10 → 12.
    const { summed } = bothWays(chamber, [9, 11, 15]);
    expect(unwrap(fillAt(summed, 9, 'outline')).volumeMm3).toBeCloseTo(30 * 30 * 4, 6);
    const at15 = unwrap(fillAt(summed, 15, 'outline'));
    expect(at15.trappedAirMm3).toBeCloseTo(5 * 5 * 2, 6);
    expect(at15.volumeMm3).toBeCloseTo(30 * 30 * 5 + 10 * 10 * 5, 6);
  });

  it('a terrain of 20,000 faces, more heights than knots: manifold-3d’s box prism minus mould at the level', () => {
    const terrain = heightFieldBlock({
      width: 120,
      depth: 80,
      bottomZ: 0,
      nx: 100,
      ny: 100,
      top: (x, y) => 30 - 9 * Math.sin((Math.PI * x) / 120) * Math.sin((Math.PI * y) / 80) - 2 * Math.cos(x / 7) * Math.sin(y / 5),
    });
    const mesh = meshOf(terrain);
    for (const level of [24.5, 28, 31.25]) {
      const analysis = unwrap(analyzeCavity(meshOf(terrain), { levelsMm: [level] }));
      const f = unwrap(fillAt(analysis, level, 'box'));
      expect(f.estimatedErrorPct).toBe(0);
      const reference = boxDamResin(kernel, mesh, level).volume();
      expect(relative(f.volumeMm3, reference)).toBeLessThan(1e-9);
      // The series answers the same level within rounding: the level is one of its knots.
      const stored = JSON.parse(JSON.stringify(analysis)) as typeof analysis;
      expect(relative(unwrap(fillAt(stored, level, 'box')).volumeMm3, f.volumeMm3)).toBeLessThan(1e-12);
    }
  });
});
