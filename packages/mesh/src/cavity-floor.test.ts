import { describe, expect, it } from 'vitest';
import { cellSolid, revolvedPocketBlock, revolvedSolid, tSlotBlock, withoutTriangles, type GeneratedMesh } from '../test/moulds';
import { analysisOf, relative, unwrap } from '../test/pipeline';
import { cavityFloorMm } from './cavity-floor';
import { readAnalysis } from './analysis-codec';
import { fillAt } from './fill-queries';

// A bowl blank: a 120 × 120 × 48 mm block with a hemispherical bowl of radius 38 mm turned into its top, so the
// bowl's bottom stands 10 mm above the blank's underside.
const r = 38,
  top = 48,
  floorZ = top - r;
const segments = 256;
const depthMm = 20;
const thetaAtDepth = Math.acos((r - depthMm) / r);
// Rings at even polar angles, with one exactly at the resin surface so the polygonal cap ends there.
const thetas = [
  ...Array.from({ length: 65 }, (_, k) => (thetaAtDepth * k) / 64),
  ...Array.from({ length: 32 }, (_, k) => thetaAtDepth + ((Math.PI / 2 - thetaAtDepth) * (k + 1)) / 32),
];
const bowlBlank = revolvedPocketBlock({
  halfSide: 60,
  bottomZ: 0,
  topZ: top,
  segments,
  profile: thetas.map((t) => [r * Math.sin(t), top - r * Math.cos(t)] as [number, number]),
});
// CRC Concise Encyclopedia of Mathematics, spherical cap: V = πh²(3r − h)/3.
const capMm3 = (Math.PI * depthMm * depthMm * (3 * r - depthMm)) / 3;

function model(mesh: GeneratedMesh) {
  return unwrap(readAnalysis(analysisOf(mesh)));
}

/** The floor is where the fill starts: nothing a hair below it, resin a hair above it. */
function expectFillStartsAt(m: ReturnType<typeof model>, floorMm: number, dam: 'outline' | 'box'): void {
  expect(unwrap(fillAt(m, floorMm - 0.01, dam)).volumeMm3).toBe(0);
  expect(unwrap(fillAt(m, floorMm + 0.01, dam)).volumeMm3).toBeGreaterThan(0);
}

describe('the cavity floor', () => {
  it('is the bottom of a bowl turned into a blank, not the blank’s underside, and a depth typed from it gives the spherical cap', () => {
    const m = model(bowlBlank);
    expect(m.analysis.method).toBe('exact');
    const floor = unwrap(cavityFloorMm(m));
    expect(floor).toBe(floorZ);
    expectFillStartsAt(m, floor, 'outline');
    // The square blank fills its own bounding box: the box dam stands on the same floor.
    expect(unwrap(cavityFloorMm(m, 'box'))).toBe(floorZ);
    // The bowl is a stack of 256-gon frusta inscribed in the sphere: within 0.1 % of the cap's closed form.
    const resin = unwrap(fillAt(m, floor + depthMm)).volumeMm3;
    expect(relative(resin, capMm3)).toBeLessThan(1e-3);
    // Measured from the underside instead, the same 20 mm holds only a 10 mm cap: the mistake a single datum removes.
    const fromUnderside = unwrap(fillAt(m, m.analysis.bboxMm.min[2] + depthMm)).volumeMm3;
    expect(relative(fromUnderside, (Math.PI * 100 * (3 * r - 10)) / 3)).toBeLessThan(2e-3);
  });

  it('comes from the column grid when the mesh is open, within a hair of the true bottom', () => {
    // One triangle of the underside missing: not watertight, so the column method answers.
    const bottomFan = bowlBlank.triangleCount - 1;
    const m = model(withoutTriangles(bowlBlank, [bottomFan]));
    expect(m.analysis.method).toBe('columns');
    const floor = unwrap(cavityFloorMm(m));
    // A column centre at distance d from the axis sees the bowl d²/2r above its bottom; cells here are under 0.5 mm.
    expect(floor).toBeGreaterThanOrEqual(floorZ);
    expect(floor - floorZ).toBeLessThan(0.01);
    expectFillStartsAt(m, floor, 'outline');
    const fill = unwrap(fillAt(m, floor + depthMm));
    expect(relative(fill.volumeMm3, capMm3)).toBeLessThan(fill.estimatedErrorPct / 100 + 1e-3);
  });

  it('is the table for a box dam round a round blank, and the pocket floor for dams along its outline', () => {
    // A round tray of radius 50 and height 30 with a pocket of radius 40 down to 10 (revolved profile).
    const n = 128;
    const m = model(
      revolvedSolid(
        [
          [0, 0],
          [50, 0],
          [50, 30],
          [40, 30],
          [40, 10],
          [0, 10],
        ],
        n,
      ),
    );
    expect(unwrap(cavityFloorMm(m, 'outline'))).toBe(10);
    expect(unwrap(cavityFloorMm(m, 'box'))).toBe(0);
    expectFillStartsAt(m, 0, 'box');
    // 5 mm of resin in the box corners: (100² − 128-gon area) × 5, the regular polygon's area (N/2)R² sin(2π/N) (CRC).
    const corners = (100 * 100 - (n / 2) * 50 * 50 * Math.sin((2 * Math.PI) / n)) * 5;
    // The STL stores float32 corners, so the polygon is the closed form to about 1e-7 of its size.
    expect(relative(unwrap(fillAt(m, 5, 'box')).volumeMm3, corners)).toBeLessThan(1e-6);
  });

  it('is found under overhangs, where only the columns know which floors the resin reaches', () => {
    // A channel (z 10 to 30) under a slot that opens at the top: the floor is the channel's, at z 10.
    const m = model(tSlotBlock());
    expect(m.analysis.exact?.overhangs).toBe(true);
    expect(unwrap(cavityFloorMm(m))).toBe(10);
    expectFillStartsAt(m, 10, 'outline');
  });

  it('ignores a hollow sealed inside the blank below the pocket', () => {
    // A 40 × 40 × 20 block, pocket from z 12 up, and a sealed 10 × 10 × 4 void at z 4 to 8 that no pour reaches.
    const m = model(
      cellSolid(
        [0, 10, 15, 25, 30, 40],
        [0, 10, 15, 25, 30, 40],
        [0, 4, 8, 12, 20],
        (i, j, k) => !((k === 3 && i >= 1 && i <= 3 && j >= 1 && j <= 3) || (k === 1 && i === 2 && j === 2)),
      ),
    );
    expect(unwrap(cavityFloorMm(m))).toBe(12);
    expectFillStartsAt(m, 12, 'outline');
  });

  it('refuses a dam it does not know', () => {
    const m = model(tSlotBlock());
    const r = cavityFloorMm(m, 'moat' as never);
    expect(!r.ok && r.error.code).toBe('dam_invalid');
  });
});
