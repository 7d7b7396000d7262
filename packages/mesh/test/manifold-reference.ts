/**
 * manifold-3d as an outside reference for the tests: an independent geometry kernel computes the
 * volume of "dam prism minus mould" below the level, which is the fill where no air is held, and
 * takes out the held air as a boolean of each pocket's own solid.
 */
import Module from 'manifold-3d';
import type { CavityMesh } from '../src/prepare-mesh';

export type ManifoldKernel = Awaited<ReturnType<typeof Module>>;
/** What the reference needs of a mesh: the engine's prepared mesh, or a file read on its own (stl-indexed.ts). */
export type ReferenceMesh = Pick<CavityMesh, 'positionsMm' | 'triangles' | 'bboxMm'>;

export async function loadManifold(): Promise<ManifoldKernel> {
  const kernel = await Module();
  kernel.setup();
  return kernel;
}

export function solidOf(kernel: ManifoldKernel, mesh: ReferenceMesh) {
  return kernel.Manifold.ofMesh(
    new kernel.Mesh({
      numProp: 3,
      vertProperties: Float32Array.from(mesh.positionsMm),
      triVerts: Uint32Array.from(mesh.triangles),
    }),
  );
}

/** Box dam: the bounding-box prism from the lowest z up to h, minus the mould. */
export function boxDamResin(kernel: ManifoldKernel, mesh: ReferenceMesh, levelMm: number) {
  const { min, max } = mesh.bboxMm;
  const prism = kernel.Manifold.cube([max[0] - min[0], max[1] - min[1], levelMm - min[2]]).translate([min[0], min[1], min[2]]);
  return prism.subtract(solidOf(kernel, mesh));
}

/** Outline dam: the mould's own shadow extruded from the lowest z up to h, minus the mould. */
export function outlineDamResin(kernel: ManifoldKernel, mesh: ReferenceMesh, levelMm: number) {
  const solid = solidOf(kernel, mesh);
  const prism = solid
    .project()
    .extrude(levelMm - mesh.bboxMm.min[2])
    .translate([0, 0, mesh.bboxMm.min[2]]);
  return prism.subtract(solid);
}

/**
 * The wetted area of a resin solid filled to a level: its whole surface less the free surface on top, which is the
 * solid's cross-section just under the level (a slice at the very top would be empty).
 */
export function wettedAreaOf(resin: ReturnType<typeof outlineDamResin>, levelMm: number): number {
  const top = resin.slice(levelMm - 1e-6);
  const area = resin.surfaceArea() - top.area();
  top.delete();
  return area;
}

/**
 * Box dam with air held in pockets: (bounding-box prism − mould) below h, minus each pocket's own
 * solid (the space between its ceiling and its spill height, built from its closed form) below h.
 */
export function boxDamResinWithoutPockets(kernel: ManifoldKernel, mesh: ReferenceMesh, levelMm: number, pockets: ReferenceMesh[]): number {
  const free = boxDamResin(kernel, mesh, levelMm);
  let volume = free.volume();
  for (const pocket of pockets) {
    const solid = solidOf(kernel, pocket);
    const below = solid.trimByPlane([0, 0, -1], -levelMm);
    volume -= below.volume();
    below.delete();
    solid.delete();
  }
  free.delete();
  return volume;
}
