import { beforeAll, describe, expect, it } from 'vitest';
import { boxDamResin, boxDamResinWithoutPockets, loadManifold, outlineDamResin, type ManifoldKernel } from '../test/manifold-reference';
import { bellInside, bellOverPlate, boardOnLegs, boardRecess, cellSolid, mapped, revolvedPocketBlock, tSlotBlock, withoutTriangles } from '../test/moulds';
import { meshOf, relative, unwrap } from '../test/pipeline';
import { readAnalysis } from './analysis-codec';
import { analyzeCavity } from './analyze-cavity';
import type { CavityAnalysis, CavityFill } from './cavity-analysis';
import { curve, fillAt } from './fill-queries';
import type { CavityMesh } from './prepare-mesh';

let kernel: ManifoldKernel;
beforeAll(async () => {
  kernel = await loadManifold();
});

/** The goal for every exact figure: 0.01 % of the reference. */
const exactness = 1e-4;

function analysed(mesh: CavityMesh, levelsMm: number[] = []): CavityAnalysis {
  return unwrap(analyzeCavity(mesh, { levelsMm }));
}

/** The polygonal frustum: a regular N-gon inscribed in each circle has (N/2)ρ² sin(2π/N) of its area πρ² (CRC). */
function ngonFactor(segments: number): number {
  return (segments * Math.sin((2 * Math.PI) / segments)) / (2 * Math.PI);
}

/** Conical frustum V = πh(R² + Rr + r²)/3 (CRC Concise Encyclopedia of Mathematics). */
function frustum(height: number, bottomRadius: number, topRadius: number): number {
  return (Math.PI * height * (bottomRadius ** 2 + bottomRadius * topRadius + topRadius ** 2)) / 3;
}

describe('T-slot: air under flat ceilings slides to the slot and out', () => {
  // Cuboid V = lwh (CRC): the channel holds 60 × 80 × 20 = 96,000 mm³ up to its ceilings at
  // z 30, and every 0.1 mm above adds the slot's 20 × 80 × 0.1 = 160 mm³.
  const mesh = meshOf(tSlotBlock());
  const analysis = analysed(mesh, [30, 30.1]);

  it('rises from 30 mm to 30.1 mm, with no trapped air at either level', () => {
    const at30 = unwrap(fillAt(analysis, 30)),
      above = unwrap(fillAt(analysis, 30.1));
    expect(analysis.method).toBe('exact');
    expect(relative(at30.volumeMm3, 96_000)).toBeLessThan(1e-9);
    expect(relative(above.volumeMm3, 96_160)).toBeLessThan(1e-9);
    expect(above.volumeMm3).toBeGreaterThan(at30.volumeMm3);
    expect(at30.trappedAirMm3).toBe(0);
    expect(above.trappedAirMm3).toBe(0);
    expect(above.warnings.map((w) => w.code)).not.toContain('trapped_air');
  });

  it('equals manifold-3d’s box prism minus mould at every level, with either dam', () => {
    for (const level of [12, 20, 30, 30.1, 41, 50, 57]) {
      const reference = boxDamResin(kernel, mesh, level).volume();
      expect(relative(unwrap(fillAt(analysis, level, 'box')).volumeMm3, reference)).toBeLessThan(exactness);
      // The block fills its bounding box, so dams along its outline hold the same.
      expect(relative(unwrap(fillAt(analysis, level, 'outline')).volumeMm3, outlineDamResin(kernel, mesh, level).volume())).toBeLessThan(exactness);
    }
  });

  it('wets the channel’s floor, walls and ceilings and the slot walls up to the level', () => {
    // Floor 60 × 80, channel walls 2 × (60 + 80) × 20, ceilings either side 2 × 20 × 80, slot walls 2 × (20 + 80) × 0.1.
    expect(unwrap(fillAt(analysis, 30.1)).wettedAreaMm2).toBeCloseTo(4800 + 5600 + 3200 + 20, 6);
  });

  it('counts resin under the flanges in the depth map', () => {
    const f = unwrap(fillAt(analysis, 30.1));
    const { originMm, cellMm, nx, depthsMm } = f.depthMap;
    const at = (x: number, y: number): number => depthsMm[Math.floor((y - originMm[1]) / cellMm[1]) * nx + Math.floor((x - originMm[0]) / cellMm[0])]!;
    expect(at(80, 60)).toBeCloseTo(20, 4);
    expect(at(100, 60)).toBeCloseTo(20.1, 4);
    expect(at(40, 60)).toBe(0);
    expect(f.maxDepthMm).toBeCloseTo(20.1, 4);
  });
});

describe('dovetail recess: air escapes up the sloped wall', () => {
  // A round recess whose wall leans inward going up: radius 30 at the floor (z 10), 20 at the top (z 40).
  const segments = 64;
  const mesh = meshOf(
    revolvedPocketBlock({
      halfSide: 40,
      bottomZ: 0,
      topZ: 40,
      profile: [
        [0, 10],
        [30, 10],
        [20, 40],
      ],
      segments,
    }),
  );
  const analysis = analysed(mesh, [20, 40]);

  it('holds the polygonal frustum below the level, and no air', () => {
    for (const level of [20, 40]) {
      const f = unwrap(fillAt(analysis, level));
      const radius = 30 - (10 * (level - 10)) / 30;
      expect(relative(f.volumeMm3, ngonFactor(segments) * frustum(level - 10, 30, radius))).toBeLessThan(exactness);
      expect(f.trappedAirMm3).toBe(0);
      expect(relative(f.volumeMm3, outlineDamResin(kernel, mesh, level).volume())).toBeLessThan(exactness);
    }
  });
});

describe('bell: an inverted cup holds its air between the rim and its ceiling', () => {
  const segments = 64;
  const mesh = meshOf(bellOverPlate(segments));
  const pocket = meshOf(bellInside(segments));
  const analysis = analysed(mesh, [20]);
  const held = (level: number): number => {
    // The frustum inside the cup from the rim (radius 15, z 10) up to the level (radius shrinking to 12 at z 30).
    const top = Math.min(level, 30);
    return level > 10 ? ngonFactor(segments) * frustum(top - 10, 15, 15 - (3 * (top - 10)) / 20) : 0;
  };

  it('traps nothing until the level passes the rim, then the frustum above the rim', () => {
    for (const level of [8, 10, 20, 30, 40]) {
      const f = unwrap(fillAt(analysis, level, 'box'));
      if (level <= 10) expect(f.trappedAirMm3).toBe(0);
      else expect(relative(f.trappedAirMm3, held(level))).toBeLessThan(exactness);
    }
    expect(held(40)).toBeCloseTo(ngonFactor(segments) * ((Math.PI * 20 * (225 + 180 + 144)) / 3), 9);
    expect(unwrap(fillAt(analysis, 20, 'box')).warnings.map((w) => w.code)).toContain('trapped_air');
  });

  it('equals manifold-3d’s box prism minus mould minus the pocket’s own solid, with either dam', () => {
    for (const level of [8, 15, 20, 30, 40]) {
      const reference = boxDamResinWithoutPockets(kernel, mesh, level, [pocket]);
      expect(relative(unwrap(fillAt(analysis, level, 'box')).volumeMm3, reference)).toBeLessThan(exactness);
      // The plate is the widest part, so its outline is the bounding box.
      expect(relative(unwrap(fillAt(analysis, level, 'outline')).volumeMm3, reference)).toBeLessThan(exactness);
    }
  });

  it('counts the resin under the rim and above the cup in the depth map, not the air', () => {
    const f = unwrap(fillAt(analysis, 40, 'box'));
    const { originMm, cellMm, nx, depthsMm } = f.depthMap;
    const centre = depthsMm[Math.floor(-originMm[1] / cellMm[1]) * nx + Math.floor(-originMm[0] / cellMm[0])]!;
    // From the plate (z 4) to the rim (z 10), then from the cup's top (z 35) to 40.
    expect(centre).toBeCloseTo(6 + 5, 4);
  });
});

describe('board raised on legs in a box dam', () => {
  it('traps nothing under a flat underside: resin flows in from the sides', () => {
    const mesh = meshOf(boardOnLegs(false));
    const analysis = analysed(mesh);
    for (const level of [5, 10, 11, 20]) {
      const f = unwrap(fillAt(analysis, level, 'box'));
      expect(f.trappedAirMm3).toBe(0);
      expect(relative(f.volumeMm3, boxDamResin(kernel, mesh, level).volume())).toBeLessThan(exactness);
    }
    // The underside is wetted once the resin reaches it. From 9.99 to 11 mm: the underside (80 × 60
    // less four 10 × 10 legs), 1 mm of the board's edges (2 × (80 + 60) × 1) and the last 0.01 mm of
    // the legs' walls (4 legs × 40 mm round × 0.01).
    const gained = unwrap(fillAt(analysis, 11, 'box')).wettedAreaMm2 - unwrap(fillAt(analysis, 9.99, 'box')).wettedAreaMm2;
    expect(gained).toBeCloseTo(4400 + 280 + 1.6, 6);
  });

  it('holds air in a recess cut up into the underside: the recess up to the level', () => {
    const mesh = meshOf(boardOnLegs(true));
    const pocket = meshOf(boardRecess());
    const analysis = analysed(mesh, [11]);
    for (const level of [5, 10, 11, 12, 20]) {
      const f = unwrap(fillAt(analysis, level, 'box'));
      // Cuboid V = lwh (CRC): 60 × 40 × (height above the underside, up to the recess's 2 mm).
      expect(f.trappedAirMm3).toBeCloseTo(60 * 40 * Math.min(2, Math.max(0, level - 10)), 6);
      expect(relative(f.volumeMm3, boxDamResinWithoutPockets(kernel, mesh, level, [pocket]))).toBeLessThan(exactness);
    }
  });
});

describe('undercut: a shaft opening into a wider chamber with a flat ceiling', () => {
  // A 40 × 40 × 20 block: a 10 × 10 shaft from the top (z 10 → 20) opens into a 30 × 30 chamber (z 5 → 10).
  const xs = [0, 5, 15, 25, 35, 40];
  const mesh = meshOf(cellSolid(xs, xs, [0, 5, 10, 20], (i, j, k) => !((k === 2 && i === 2 && j === 2) || (k === 1 && i >= 1 && i <= 3 && j >= 1 && j <= 3))));
  const analysis = analysed(mesh);

  it('fills the whole chamber and the shaft: cuboids 30 × 30 × 5 + 10 × 10 × 10 (CRC)', () => {
    const f = unwrap(fillAt(analysis, 20));
    expect(f.volumeMm3).toBeCloseTo(4500 + 1000, 6);
    expect(f.trappedAirMm3).toBe(0);
    expect(relative(f.volumeMm3, boxDamResin(kernel, mesh, 20).volume())).toBeLessThan(exactness);
    // Floor 30 × 30, chamber walls 4 × 30 × 5, its ceiling 30 × 30 − 10 × 10, shaft walls 4 × 10 × 10.
    expect(f.wettedAreaMm2).toBeCloseTo(900 + 600 + 800 + 400, 6);
  });

  it('never falls as the level rises past the chamber’s ceiling', () => {
    const points = unwrap(curve(analysis, [8, 9.9, 10, 10.1, 12, 20]));
    for (let k = 1; k < points.length; k++) expect(points[k]!.volumeMm3).toBeGreaterThan(points[k - 1]!.volumeMm3);
  });
});

describe('a hollow sealed inside the wood', () => {
  // A 40 × 40 × 30 block with a 20 × 20 pocket from z 20 up, and a 10 × 10 × 5 hollow inside it
  // (z 8 → 13) that the pour never meets: neither resin nor held air.
  const xs = [0, 10, 15, 25, 30, 40];
  const mould = cellSolid(xs, xs, [0, 8, 13, 20, 30], (i, j, k) => !((k === 3 && i >= 1 && i <= 3 && j >= 1 && j <= 3) || (k === 1 && i === 2 && j === 2)));
  const hollow = meshOf(cellSolid([15, 25], [15, 25], [8, 13], () => true));
  const mesh = meshOf(mould);
  const analysis = analysed(mesh);

  it('holds the pocket alone: 20 × 20 × (h − 20) (cuboid, CRC), no trapped air', () => {
    for (const level of [10, 25, 30]) {
      const f = unwrap(fillAt(analysis, level));
      expect(f.volumeMm3).toBeCloseTo(400 * Math.max(0, level - 20), 6);
      expect(f.trappedAirMm3).toBe(0);
      // manifold-3d's prism minus mould keeps the hollow (it is outside the solid): take it out as a solid of its own.
      const reference = boxDamResinWithoutPockets(kernel, mesh, level, [hollow]);
      expect(Math.abs(f.volumeMm3 - reference)).toBeLessThanOrEqual(exactness * Math.max(reference, 1));
    }
  });
});

describe('a mould standing on the table far from the origin', () => {
  it('keeps the short way (nothing hangs over free space) and its exact pocket', () => {
    const pocket = mapped(
      cellSolid([0, 6, 26, 32], [0, 4, 20, 24], [0, 5, 12], (i, j, k) => !(i === 1 && j === 1 && k === 1)),
      (x, y, z) => [x + 700, y - 900, z + 850],
    );
    const analysis = analysed(meshOf(pocket), [860]);
    expect(analysis.exact!.overhangs).toBe(false);
    // 20 × 16 × 5 (cuboid, CRC), from float32 corners near 900 mm.
    expect(relative(unwrap(fillAt(analysis, 860)).volumeMm3, 1600)).toBeLessThan(1e-5);
  });
});

describe('meshes with holes: the columns keep the same physics, within their estimate', () => {
  function compare(exactMesh: CavityMesh, open: CavityMesh, level: number, dam: 'outline' | 'box'): { open: CavityFill; exact: CavityFill } {
    const exact = unwrap(fillAt(analysed(exactMesh, [level]), level, dam));
    const columns = unwrap(analyzeCavity(open, { levelsMm: [level], targetErrorPct: 0.2 }));
    expect(columns.method).toBe('columns');
    return { open: unwrap(fillAt(columns, level, dam)), exact };
  }

  it('a T-slot block with a hole in its base: no trapped air, the same fill', () => {
    const closed = tSlotBlock();
    const base = Array.from({ length: closed.triangleCount }, (_, t) => t).find((t) => [2, 5, 8].every((k) => closed.positions[9 * t + k] === 0))!;
    const { open, exact } = compare(meshOf(closed), meshOf(withoutTriangles(closed, [base])), 40, 'outline');
    expect(open.trappedAirMm3).toBe(0);
    expect(Math.abs(open.volumeMm3 - exact.volumeMm3)).toBeLessThanOrEqual((open.estimatedErrorPct / 100) * exact.volumeMm3);
  });

  it('a bell with a hole in the plate under it: the air in the cup, within the estimate', () => {
    const closed = bellOverPlate(64);
    const under = Array.from({ length: closed.triangleCount }, (_, t) => t).find((t) => [2, 5, 8].every((k) => closed.positions[9 * t + k] === 0))!;
    const { open, exact } = compare(meshOf(closed), meshOf(withoutTriangles(closed, [under])), 40, 'box');
    expect(Math.abs(open.volumeMm3 - exact.volumeMm3)).toBeLessThanOrEqual((open.estimatedErrorPct / 100) * exact.volumeMm3);
    expect(relative(open.trappedAirMm3, exact.trappedAirMm3)).toBeLessThan(0.02);
  });
});

describe('stored analyses of the earlier rule', () => {
  it('are refused with analysis_outdated, so the worker can analyse the mould again', () => {
    const analysis = analysed(meshOf(tSlotBlock()));
    const old = readAnalysis({ ...analysis, version: 1 });
    expect(old.ok ? '' : old.error.code).toBe('analysis_outdated');
    expect(old.ok ? '' : old.error.message).toMatch(/analyse the mould's STL again/);
    const viaFill = fillAt({ ...analysis, version: 1 as never }, 30);
    expect(viaFill.ok ? '' : viaFill.error.code).toBe('analysis_outdated');
    const future = readAnalysis({ ...analysis, version: 3 });
    expect(future.ok ? '' : future.error.code).toBe('analysis_invalid');
  });
});
