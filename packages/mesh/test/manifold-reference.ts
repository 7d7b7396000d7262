/**
 * manifold-3d as an outside reference for the tests: an independent geometry kernel computes the
 * volume of "dam prism minus mould", which for a mould without overhangs is the fill.
 */
import Module from 'manifold-3d';
import type { CavityMesh } from '../src/prepare-mesh';

export type ManifoldKernel = Awaited<ReturnType<typeof Module>>;

export async function loadManifold(): Promise<ManifoldKernel> {
  const kernel = await Module();
  kernel.setup();
  return kernel;
}

export function solidOf(kernel: ManifoldKernel, mesh: CavityMesh) {
  return kernel.Manifold.ofMesh(new kernel.Mesh({
    numProp: 3, vertProperties: Float32Array.from(mesh.positionsMm), triVerts: Uint32Array.from(mesh.triangles),
  }));
}

/** Box dam: the bounding-box prism from the lowest z up to h, minus the mould. */
export function boxDamResin(kernel: ManifoldKernel, mesh: CavityMesh, levelMm: number) {
  const { min, max } = mesh.bboxMm;
  const prism = kernel.Manifold.cube([max[0] - min[0], max[1] - min[1], levelMm - min[2]]).translate([min[0], min[1], min[2]]);
  return prism.subtract(solidOf(kernel, mesh));
}

/** Outline dam: the mould's own shadow extruded from the lowest z up to h, minus the mould. */
export function outlineDamResin(kernel: ManifoldKernel, mesh: CavityMesh, levelMm: number) {
  const solid = solidOf(kernel, mesh);
  const prism = solid.project().extrude(levelMm - mesh.bboxMm.min[2]).translate([0, 0, mesh.bboxMm.min[2]]);
  return prism.subtract(solid);
}
