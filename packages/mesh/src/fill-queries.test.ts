import { beforeAll, describe, expect, it } from 'vitest';
import { loadManifold, boxDamResin, outlineDamResin, type ManifoldKernel } from '../test/manifold-reference';
import { cellSolid, heightFieldBlock, revolvedPocketBlock, revolvedSolid } from '../test/moulds';
import { meshOf, relative, unwrap } from '../test/pipeline';
import { analyzeCavity } from './analyze-cavity';
import type { CavityFill } from './cavity-analysis';
import { fillAt } from './fill-queries';
import type { CavityMesh } from './prepare-mesh';

let kernel: ManifoldKernel;
beforeAll(async () => {
  kernel = await loadManifold();
});

function fill(mesh: CavityMesh, levelMm: number, dam: 'outline' | 'box' = 'outline', levels: number[] = [levelMm]): CavityFill {
  return unwrap(fillAt(unwrap(analyzeCavity(mesh, { levelsMm: levels })), levelMm, dam));
}

/** Both methods agree within the sum of their error estimates. */
function expectMethodsAgree(f: CavityFill): void {
  expect(f.exact).not.toBeNull();
  const allowed = ((f.exact!.estimatedErrorPct + f.columns.estimatedErrorPct) / 100) * f.volumeMm3;
  expect(Math.abs(f.exact!.volumeMm3 - f.columns.volumeMm3)).toBeLessThanOrEqual(allowed + 1e-9);
}

describe('spherical bowl: a spherical cap of resin', () => {
  // Hemispherical bowl of radius r = 10 mm cut into the top (z = 20) of a 30 × 30 × 20 block,
  // filled to h = 3 above its lowest point. CRC Concise Encyclopedia of Mathematics, spherical cap:
  // V = πh²(3r − h)/3 = 254.469 mm³ and curved area 2πrh = 188.496 mm² for r = 10, h = 3.
  const r = 10,
    h = 3,
    top = 20,
    level = top - r + h;
  const capVolume = (radius: number, height: number): number => (Math.PI * height * height * (3 * radius - height)) / 3;
  const capArea = (radius: number, height: number): number => 2 * Math.PI * radius * height;
  const segments = 256;
  const thetaLevel = Math.acos((r - h) / r);
  // Rings at even polar angles below and above the level, with one ring exactly on it.
  const below = 48,
    above = 32;
  const thetas = [
    ...Array.from({ length: below + 1 }, (_, k) => (thetaLevel * k) / below),
    ...Array.from({ length: above }, (_, k) => thetaLevel + ((Math.PI / 2 - thetaLevel) * (k + 1)) / above),
  ];
  const profile = thetas.map((t) => [r * Math.sin(t), top - r * Math.cos(t)] as [number, number]);
  let mesh: CavityMesh;
  let result: CavityFill;
  beforeAll(() => {
    mesh = meshOf(revolvedPocketBlock({ halfSide: 15, bottomZ: 0, topZ: top, profile, segments }));
    result = fill(mesh, level);
  });

  it('equals the mesh’s own polyhedral volume and area to 0.01 % (frustum stack, computed independently)', () => {
    // Between two rings the resin is a frustum of a regular pyramid: V = Δz (A1 + A2 + √(A1 A2)) / 3
    // with N-gon areas A = (N/2) ρ² sin(2π/N); the wetted band is N trapezoids (CRC).
    let volume = 0,
      area = 0;
    const ngon = (rho: number): number => (segments / 2) * rho * rho * Math.sin((2 * Math.PI) / segments);
    for (let k = 0; k < below; k++) {
      const [r0, z0] = profile[k]!,
        [r1, z1] = profile[k + 1]!;
      const a0 = ngon(r0),
        a1 = ngon(r1);
      volume += ((z1 - z0) * (a0 + a1 + Math.sqrt(a0 * a1))) / 3;
      const side0 = 2 * r0 * Math.sin(Math.PI / segments),
        side1 = 2 * r1 * Math.sin(Math.PI / segments);
      const slant = Math.hypot(z1 - z0, (r1 - r0) * Math.cos(Math.PI / segments));
      area += (segments * (side0 + side1) * slant) / 2;
    }
    expect(result.method).toBe('exact');
    expect(relative(result.volumeMm3, volume)).toBeLessThan(1e-4);
    expect(relative(result.wettedAreaMm2, area)).toBeLessThan(1e-4);
    expect(result.maxDepthMm).toBeCloseTo(h, 5);
    expect(result.trappedAirMm3).toBe(0);
    expect(result.warnings).toEqual([]);
  });

  it('lies within the bracket the tessellation allows around V = πh²(3r − h)/3 and A = 2πrh', () => {
    expect(capVolume(r, h)).toBeCloseTo(254.469, 3); // the CRC worked value
    expect(capArea(r, h)).toBeCloseTo(188.496, 3);
    // Every corner is on the sphere, so each flat triangle lies between the sphere and the sphere
    // of radius r cos α, α the largest angle from a point of a triangle to its nearest corner
    // (at most half the diagonal of a ring cell). The resin is then between the caps of those two
    // balls cut by the same plane, 7 mm below the centre.
    const dTheta = Math.max(thetaLevel / below, (Math.PI / 2 - thetaLevel) / above);
    const alpha = 0.5 * Math.hypot(dTheta, (2 * Math.PI) / segments);
    const inner = r * Math.cos(alpha),
      depthBelowCentre = r - h;
    expect(result.volumeMm3).toBeLessThanOrEqual(capVolume(r, h) * (1 + 1e-6));
    expect(result.volumeMm3).toBeGreaterThanOrEqual(capVolume(inner, inner - depthBelowCentre) * (1 - 1e-6));
    // Areas of nested convex bodies grow with the body (Cauchy's surface area formula), so the
    // wetted area plus the resin's polygonal top lies between the two caps' full surfaces.
    const topPolygon = (segments / 2) * profile[below]![0] ** 2 * Math.sin((2 * Math.PI) / segments);
    const surface = (radius: number): number => capArea(radius, radius - depthBelowCentre) + Math.PI * (radius ** 2 - depthBelowCentre ** 2);
    expect(result.wettedAreaMm2 + topPolygon).toBeLessThanOrEqual(surface(r) * (1 + 1e-6));
    expect(result.wettedAreaMm2 + topPolygon).toBeGreaterThanOrEqual(surface(inner) * (1 - 1e-6));
  });

  it('agrees with manifold-3d’s box prism minus mould, and with its own column method', () => {
    const reference = boxDamResin(kernel, mesh, level);
    expect(relative(result.volumeMm3, reference.volume())).toBeLessThan(1e-4);
    expectMethodsAgree(result);
    expectMethodsAgree(fill(mesh, level - 1.7, 'outline', []));
  });
});

describe('frustum pocket', () => {
  // A pocket with a 6 mm floor radius widening to 10 mm over 8 mm. CRC, conical frustum:
  // V = πh(R² + Rr + r²)/3 = 1642.006 mm³ for R = 10, r = 6, h = 8.
  const R = 10,
    r = 6,
    h = 8,
    floor = 10;
  const frustum = (Math.PI * h * (R * R + R * r + r * r)) / 3;

  it('holds exactly the polygonal frustum: the N-gon area factor N sin(2π/N)/(2π) times the cone’s', () => {
    expect(frustum).toBeCloseTo(1642.006, 3);
    for (const segments of [32, 128, 512]) {
      const mesh = meshOf(
        revolvedPocketBlock({
          halfSide: 15,
          bottomZ: 0,
          topZ: floor + h,
          profile: [
            [0, floor],
            [r, floor],
            [R, floor + h],
          ],
          segments,
        }),
      );
      const f = fill(mesh, floor + h);
      // Regular N-gon inscribed in a circle: area (N/2) ρ² sin(2π/N) (CRC), so every cross-section
      // of the polygonal frustum is the circle's times that factor, and so is its volume.
      const factor = (segments * Math.sin((2 * Math.PI) / segments)) / (2 * Math.PI);
      expect(relative(f.volumeMm3, factor * frustum)).toBeLessThan(1e-5);
      expect(relative(f.volumeMm3, frustum)).toBeLessThan(1 - factor + 1e-5);
      expectMethodsAgree(f);
      expect(f.maxDepthMm).toBeCloseTo(h, 5);
    }
  });
});

describe('analytic terrain: a height-field cavity', () => {
  // Top surface z = T − d sin(πx/a) sin(πy/b) over a × b: filled to T the resin holds
  // ∫∫ d sin sin = 4abd/π² (calculus: ∫₀ᵃ sin(πx/a) dx = 2a/π).
  const a = 60,
    b = 40,
    d = 5,
    T = 20;
  const analytic = (4 * a * b * d) / Math.PI ** 2;

  it('matches the trapezoid-rule closed form of the triangulated surface, and tends to 4abd/π²', () => {
    for (const [nx, ny] of [
      [12, 8],
      [60, 40],
      [240, 160],
    ] as const) {
      const mesh = meshOf(
        heightFieldBlock({ width: a, depth: b, bottomZ: 0, nx, ny, top: (x, y) => T - d * Math.sin((Math.PI * x) / a) * Math.sin((Math.PI * y) / b) }),
      );
      const f = fill(mesh, T);
      // Two triangles per grid square integrate like the 2-D trapezoid rule; with the depth zero
      // on the rim that is d (a/nx) Σ sin(πi/nx) · (b/ny) Σ sin(πj/ny), and
      // Σ_{k=1}^{n−1} sin(kπ/n) = cot(π/2n) (CRC, finite sum of sines).
      const trapezoid = (((d * (a / nx)) / Math.tan(Math.PI / (2 * nx))) * (b / ny)) / Math.tan(Math.PI / (2 * ny));
      expect(relative(f.volumeMm3, trapezoid)).toBeLessThan(1e-5);
      // The trapezoid rule's ratio to the integral is [(π/2n) cot(π/2n)]² per axis, derived above.
      const ratio = (Math.PI / (2 * nx) / Math.tan(Math.PI / (2 * nx))) * (Math.PI / (2 * ny) / Math.tan(Math.PI / (2 * ny)));
      expect(relative(f.volumeMm3, analytic * ratio)).toBeLessThan(1e-5);
      expect(f.maxDepthMm).toBeCloseTo(d, 4);
      expectMethodsAgree(f);
      expectMethodsAgree(fill(mesh, T - 2.2, 'box', []));
    }
  });
});

describe('against manifold-3d booleans', () => {
  it('box dam: bounding-box prism minus mould, for moulds without overhangs', () => {
    const moulds = [
      heightFieldBlock({ width: 50, depth: 30, bottomZ: -4, nx: 40, ny: 30, top: (x, y) => 10 - 3 * Math.cos(x / 6) * Math.sin(y / 4) }),
      revolvedSolid(
        [
          [0, 0],
          [30, 0],
          [30, 20],
          [25, 20],
          [25, 5],
          [0, 5],
        ],
        64,
      ),
      cellSolid([0, 10, 30, 40], [0, 15, 30], [0, 6, 14], (i, j, k) => k === 0 || i === 0 || (j === 0 && i !== 1)),
    ];
    for (const generated of moulds) {
      const mesh = meshOf(generated);
      const { min, max } = mesh.bboxMm;
      for (const share of [0.3, 0.75, 1, 1.2]) {
        const level = min[2] + share * (max[2] - min[2]);
        const f = fill(mesh, level, 'box');
        const reference = boxDamResin(kernel, mesh, level).volume();
        expect(f.method).toBe('exact');
        expect(Math.abs(f.volumeMm3 - reference)).toBeLessThanOrEqual(1e-6 * reference + 1e-9);
        expectMethodsAgree(f);
      }
    }
  });

  it('outline dam: the mould’s own shadow extruded, minus the mould (a round tray, an L-shaped block)', () => {
    const tray = meshOf(
      revolvedSolid(
        [
          [0, 0],
          [30, 0],
          [30, 20],
          [25, 20],
          [25, 5],
          [0, 5],
        ],
        64,
      ),
    );
    const ell = meshOf(cellSolid([0, 2, 8, 10, 30], [0, 2, 8, 12, 30], [0, 4, 9], (i, j, k) => (i <= 2 || j <= 2) && !(k === 1 && i === 1 && j === 1)));
    expect(ell.topology.watertight).toBe(true);
    for (const mesh of [tray, ell]) {
      for (const level of [3, 6, 15, 25]) {
        const f = fill(mesh, level, 'outline');
        const reference = outlineDamResin(kernel, mesh, level).volume();
        expect(Math.abs(f.volumeMm3 - reference)).toBeLessThan(1e-6 * reference + 1e-9);
        expectMethodsAgree(f);
      }
    }
  });

  it('outline and box dams agree where the outline is the bounding box', () => {
    const mesh = meshOf(
      revolvedPocketBlock({
        halfSide: 20,
        bottomZ: 0,
        topZ: 12,
        profile: [
          [0, 4],
          [9, 4],
          [15, 12],
        ],
        segments: 64,
      }),
    );
    for (const level of [6, 12, 14]) {
      const outline = fill(mesh, level, 'outline'),
        box = fill(mesh, level, 'box');
      expect(relative(outline.volumeMm3, box.volumeMm3)).toBeLessThan(1e-12);
      expect(relative(outline.volumeMm3, boxDamResin(kernel, mesh, level).volume())).toBeLessThan(1e-6);
    }
  });
});

describe('air held under an overhang', () => {
  // A 40 × 40 × 20 block: a 10 × 10 shaft from the top (z 10 → 20) opens into a 30 × 30 chamber
  // (z 5 → 10) whose flat ceiling has a 5 × 5 recess 2 mm deep (z 10 → 12) in one corner, away
  // from the shaft. Resin flows into the whole chamber; only the recess holds air once the level
  // passes the ceiling, 5 × 5 × 2 = 50 mm³ at most (cuboid, CRC).
  const xs = [0, 5, 10, 15, 25, 35, 40];
  const mould = cellSolid(xs, xs, [0, 5, 10, 12, 20], (i, j, k) => {
    const chamber = k === 1 && i >= 1 && i <= 4 && j >= 1 && j <= 4;
    const shaft = k >= 2 && i === 3 && j === 3;
    const recess = k === 2 && i === 1 && j === 1;
    return !(chamber || shaft || recess);
  });
  const mesh = meshOf(mould);
  const analysis = unwrap(analyzeCavity(mesh, { levelsMm: [20] }));

  it('reports the recess as trapped air and everything else below the level as fill', () => {
    expect(analysis.method).toBe('exact');
    const f = unwrap(fillAt(analysis, 20));
    expect(f.trappedAirMm3).toBeCloseTo(50, 6);
    // Resin: the chamber (30 × 30 × 5) and the shaft (10 × 10 × 10).
    expect(f.volumeMm3).toBeCloseTo(4500 + 1000, 6);
    expect(f.warnings.map((w) => w.code)).toContain('trapped_air');
  });

  it('holds manifold’s prism-minus-mould volume as fill plus trapped air', () => {
    const f = unwrap(fillAt(analysis, 20, 'box'));
    const reference = boxDamResin(kernel, mesh, 20).volume();
    expect(Math.abs(f.volumeMm3 + f.trappedAirMm3 - reference)).toBeLessThanOrEqual(1e-6 * reference);
  });

  it('has no trapped air while the level is still below the ceiling, and part of the recess between', () => {
    const f = unwrap(fillAt(analysis, 8));
    expect(f.trappedAirMm3).toBe(0);
    expect(f.volumeMm3).toBeCloseTo(30 * 30 * 3, 6);
    expect(f.warnings.map((w) => w.code)).not.toContain('trapped_air');
    expect(unwrap(fillAt(analysis, 11)).trappedAirMm3).toBeCloseTo(25, 6);
  });

  it('wets the floor, walls and ceiling the resin reaches, not the recess held by air', () => {
    // Floor 30 × 30, chamber walls 4 × 30 × 5, ceiling 30 × 30 − shaft 10 × 10 − recess 5 × 5,
    // shaft walls 4 × 10 × 10; the recess's walls and its top stay dry.
    expect(unwrap(fillAt(analysis, 20)).wettedAreaMm2).toBeCloseTo(900 + 600 + 775 + 400, 6);
    // At 8 mm: the chamber floor 30 × 30 and its walls 4 × 30 × 3.
    expect(unwrap(fillAt(analysis, 8)).wettedAreaMm2).toBeCloseTo(900 + 360, 6);
  });
});

describe('fillAt: refusals', () => {
  const analysis = unwrap(analyzeCavity(meshOf(cellSolid([0, 1, 2], [0, 1, 2], [0, 1, 2], (i, j, k) => !(i === 1 && j === 1 && k === 1)))));
  it('refuses a level that is not a finite number, and an unknown dam', () => {
    const nan = fillAt(analysis, Number.NaN);
    expect(nan.ok ? '' : nan.error.code).toBe('level_invalid');
    const dam = fillAt(analysis, 1, 'moat' as never);
    expect(dam.ok ? '' : dam.error.code).toBe('dam_invalid');
  });
});
