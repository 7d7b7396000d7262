import { describe, expect, it } from 'vitest';
import { cellSolid, combined, inverted, mapped, torus, withoutTriangles } from '../test/moulds';
import { meshOf, relative, unwrap } from '../test/pipeline';
import { prepareMesh } from './prepare-mesh';
import { encodeStlBinary } from './stl/encode-stl';
import { parseStl } from './stl/parse-stl';

const block = cellSolid([0, 40], [0, 30], [0, 20], () => true);
// A block with a pocket, on a grid of cells so the faces are split into many triangles.
const pocketBlock = cellSolid([0, 10, 30, 40], [0, 5, 25, 30], [0, 8, 20], (i, j, k) => !(i === 1 && j === 1 && k === 1));

describe('prepareMesh: welding and topology', () => {
  it('welds a closed box to 8 corners and finds it watertight', () => {
    const mesh = meshOf(block);
    expect(mesh.vertexCount).toBe(8);
    expect(mesh.triangleCount).toBe(12);
    expect(mesh.topology).toMatchObject({ watertight: true, openEdges: 0, nonManifoldEdges: 0, edges: 18 });
    // Euler's polyhedron formula V − E + F = 2 for a closed genus-0 surface.
    expect(mesh.vertexCount - mesh.topology.edges + mesh.triangleCount).toBe(2);
  });

  it('gives the enclosed volume by the divergence theorem: the box is 40 × 30 × 20 mm', () => {
    expect(meshOf(block).enclosedVolumeMm3).toBeCloseTo(40 * 30 * 20, 9);
    expect(meshOf(pocketBlock).enclosedVolumeMm3).toBeCloseTo(40 * 30 * 20 - 20 * 20 * 12, 9);
  });

  it('counts open edges and gives no enclosed volume for a surface with a hole', () => {
    const mesh = meshOf(withoutTriangles(pocketBlock, [3]));
    expect(mesh.topology.watertight).toBe(false);
    expect(mesh.topology.openEdges).toBe(3);
    expect(mesh.enclosedVolumeMm3).toBeNull();
    expect(mesh.warnings.map((w) => w.code)).toContain('open_mesh');
  });

  it('counts non-manifold edges: two boxes that share one edge', () => {
    const other = mapped(block, (x, y, z) => [x + 40, y + 30, z]);
    const mesh = meshOf(combined(block, other));
    expect(mesh.topology.nonManifoldEdges).toBe(1);
    expect(mesh.topology.watertight).toBe(false);
    expect(mesh.warnings.map((w) => w.code)).toContain('non_manifold_edges');
  });

  it('turns an inside-out surface and says so', () => {
    const mesh = meshOf(inverted(pocketBlock));
    expect(mesh.topology.invertedFixed).toBe(true);
    expect(mesh.enclosedVolumeMm3).toBeCloseTo(40 * 30 * 20 - 20 * 20 * 12, 9);
    expect(mesh.warnings.map((w) => w.code)).toContain('inverted_normals_fixed');
  });

  it('turns single backwards triangles to match their neighbours', () => {
    const flippedOne = inverted(
      withoutTriangles(
        pocketBlock,
        Array.from({ length: pocketBlock.triangleCount }, (_, t) => t).filter((t) => t !== 5),
      ),
    );
    const rest = withoutTriangles(pocketBlock, [5]);
    const mesh = meshOf(combined(rest, flippedOne));
    expect(mesh.topology.misorientedEdges).toBe(3);
    expect(mesh.topology.turnedTriangles).toBe(1);
    expect(mesh.topology.watertight).toBe(true);
    expect(mesh.enclosedVolumeMm3).toBeCloseTo(40 * 30 * 20 - 20 * 20 * 12, 9);
    expect(mesh.warnings.map((w) => w.code)).toContain('inconsistent_winding_fixed');
  });

  it('welds within a tolerance when asked, and only then', () => {
    const shifted = pocketBlock.positions.map((v, i) => (i % 7 === 0 ? v + 2e-4 : v));
    const soup = unwrap(parseStl(encodeStlBinary({ positions: shifted, triangleCount: pocketBlock.triangleCount })));
    expect(unwrap(prepareMesh(soup)).topology.watertight).toBe(false);
    expect(unwrap(prepareMesh(soup, { weldToleranceMm: 0.01 })).topology.watertight).toBe(true);
  });

  it('refuses flat meshes and bad options with a sentence', () => {
    const flat = cellSolid([0, 1], [0, 1], [0, 1], () => true);
    const squashed = { positions: flat.positions.map((v, i) => (i % 3 === 2 ? 0 : v)), triangleCount: flat.triangleCount };
    const r = prepareMesh(unwrap(parseStl(encodeStlBinary(squashed))));
    expect(r.ok ? '' : r.error.code).toBe('mesh_degenerate');
    const soup = unwrap(parseStl(encodeStlBinary(block)));
    const badUnits = prepareMesh(soup, { units: 'yd' as never });
    expect(badUnits.ok ? '' : badUnits.error.code).toBe('option_invalid');
    const badUp = prepareMesh(soup, { up: 'w' as never });
    expect(badUp.ok ? '' : badUp.error.message).toMatch(/x, y or z/);
  });
});

describe('prepareMesh: enclosed volume of a torus', () => {
  it('matches 2π²Rr² (CRC Concise Encyclopedia of Mathematics) up to the polygon factors of the tessellation', () => {
    const R = 30,
      r = 8;
    const analytic = 2 * Math.PI ** 2 * R * r ** 2; // CRC: torus V = 2π²Rr²
    // The generated torus has its n × m corners on the true surface. Each of its n segments is
    // a wedge of angle 2π/n whose cross-section is the regular m-gon of area (m/2) r² sin(2π/m)
    // (CRC: regular polygon area), centred at R, so by the wedge integral the mesh encloses
    // exactly n sin(2π/n) · R · (m/2) r² sin(2π/m).
    for (const [n, m] of [
      [24, 12],
      [96, 48],
      [256, 128],
    ] as const) {
      const polyhedral = n * Math.sin((2 * Math.PI) / n) * R * (m / 2) * r * r * Math.sin((2 * Math.PI) / m);
      const mesh = meshOf(torus(R, r, n, m));
      expect(mesh.topology.watertight).toBe(true);
      expect(relative(mesh.enclosedVolumeMm3!, polyhedral)).toBeLessThan(1e-6); // float32 corners
      // The polygon factors approach 1 as 1 − (2π/n)²/6: the tessellation error bound.
      const tessellation = ((2 * Math.PI) / n) ** 2 / 6 + ((2 * Math.PI) / m) ** 2 / 6;
      expect(relative(mesh.enclosedVolumeMm3!, analytic)).toBeLessThan(tessellation * 1.01 + 1e-6);
    }
  });
});
