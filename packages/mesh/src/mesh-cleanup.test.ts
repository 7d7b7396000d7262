import { describe, expect, it } from 'vitest';
import { combined, revolvedPocketBlock, type GeneratedMesh } from '../test/moulds';
import { meshOf, relative, unwrap } from '../test/pipeline';
import { fillAt } from './fill-queries';
import { analyzeCavity } from './analyze-cavity';
import { relativeWeldTolerance } from './prepare-mesh';

const mould = revolvedPocketBlock({
  halfSide: 15,
  bottomZ: 0,
  topZ: 18,
  profile: [
    [0, 10],
    [6, 10],
    [10, 18],
  ],
  segments: 48,
});
const plain = meshOf(mould);
const diagonalMm = Math.hypot(30, 30, 18);
const toleranceMm = relativeWeldTolerance * diagonalMm;

/** Each corner of each triangle moved by its own small step, as separate roundings of one point leave it. */
function jittered(mesh: GeneratedMesh, stepMm: number): GeneratedMesh {
  const p = mesh.positions.slice();
  for (let i = 0; i < p.length; i++) p[i] = p[i]! + stepMm * ((((i * 2654435761) >>> 0) % 3) - 1);
  return { positions: p, triangleCount: mesh.triangleCount };
}

describe('prepareMesh clean-up: gaps a writer’s rounding leaves', () => {
  it('ties the tolerance to the model: 1e-6 of the bounding box diagonal', () => {
    expect(plain.topology.weldToleranceMm).toBeCloseTo(toleranceMm, 15);
    expect(plain.topology).toMatchObject({ verticesWelded: 0, duplicatesDropped: 0, degenerateDropped: 0, watertight: true });
  });

  it('welds corners a few tenths of the tolerance apart and closes the surface', () => {
    // Each coordinate moves by −s, 0 or +s with s = 0.1 tolerance, so two copies of a corner are at
    // most 2√3·s ≈ 0.35 tolerance apart (plus float32 rounding, 2^-24 of 15 mm ≈ 0.02 tolerance).
    const mesh = meshOf(jittered(mould, 0.1 * toleranceMm));
    expect(mesh.topology.verticesWelded).toBeGreaterThan(0);
    expect(mesh.topology.watertight).toBe(true);
    expect(mesh.vertexCount).toBe(plain.vertexCount);
    expect(mesh.warnings.map((w) => w.code)).toContain('vertices_welded');
    expect(mesh.warnings.map((w) => w.code)).not.toContain('open_mesh');
    expect(relative(mesh.enclosedVolumeMm3!, plain.enclosedVolumeMm3!)).toBeLessThan(1e-6);
    const level = 15;
    const jitteredFill = unwrap(fillAt(unwrap(analyzeCavity(mesh)), level)).volumeMm3;
    const plainFill = unwrap(fillAt(unwrap(analyzeCavity(plain)), level)).volumeMm3;
    expect(relative(jitteredFill, plainFill)).toBeLessThan(1e-5);
  });

  it('leaves gaps wider than the tolerance open, and says so', () => {
    const mesh = meshOf(jittered(mould, 10 * toleranceMm));
    expect(mesh.topology.watertight).toBe(false);
    expect(mesh.warnings.map((w) => w.code)).toContain('open_mesh');
  });
});

describe('prepareMesh clean-up: faces written twice and faces with no area', () => {
  it('drops exact duplicate faces and counts them', () => {
    const first10 = { positions: mould.positions.slice(0, 90), triangleCount: 10 };
    const mesh = meshOf(combined(mould, first10));
    expect(mesh.topology.duplicatesDropped).toBe(10);
    expect(mesh.topology.watertight).toBe(true);
    expect(mesh.warnings.find((w) => w.code === 'duplicate_triangles_dropped')?.message).toMatch(/^10 triangles were written twice/);
    expect(relative(mesh.enclosedVolumeMm3!, plain.enclosedVolumeMm3!)).toBeLessThan(1e-12);
  });

  it('drops a triangle with no area hanging on an edge, and one whose corners nearly meet', () => {
    const p = mould.positions;
    const a = [p[0]!, p[1]!, p[2]!],
      b = [p[3]!, p[4]!, p[5]!];
    const mid = a.map((v, i) => (v + b[i]!) / 2);
    const near = a.map((v, i) => (i === 0 ? v + 0.2 * toleranceMm : v));
    const extra = { positions: Float64Array.from([...a, ...b, ...mid, ...a, ...b, ...near]), triangleCount: 2 };
    const mesh = meshOf(combined(mould, extra));
    expect(mesh.topology.degenerateDropped).toBe(2);
    expect(mesh.topology.watertight).toBe(true);
    expect(mesh.warnings.find((w) => w.code === 'zero_area_triangles_dropped')?.message).toMatch(/^2 triangles had no area/);
  });

  it('keeps a triangle with no area that stitches a closed surface at a T-junction', () => {
    // A unit cube whose top face has an extra corner M in the middle of the edge AB it shares with
    // the front face; the flat triangle (A, B, M) makes every edge meet exactly one other.
    const [P000, P100, P110, P010] = [
      [0, 0, 0],
      [1, 0, 0],
      [1, 1, 0],
      [0, 1, 0],
    ];
    const [A, B, C, D, M] = [
      [0, 0, 1],
      [1, 0, 1],
      [1, 1, 1],
      [0, 1, 1],
      [0.5, 0, 1],
    ];
    const faces = [
      [P000, P010, P110],
      [P000, P110, P100],
      [A, M, D],
      [M, C, D],
      [M, B, C],
      [P000, P100, B],
      [P000, B, A],
      [P010, D, C],
      [P010, C, P110],
      [P000, A, D],
      [P000, D, P010],
      [P100, P110, C],
      [P100, C, B],
      [A, B, M],
    ];
    const mesh = meshOf({ positions: Float64Array.from(faces.flat(2) as number[]), triangleCount: faces.length });
    expect(mesh.topology.watertight).toBe(true);
    expect(mesh.topology.degenerateDropped).toBe(0);
    expect(mesh.enclosedVolumeMm3).toBeCloseTo(1, 12); // cube V = a³ (CRC)
  });
});
