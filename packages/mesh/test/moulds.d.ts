/**
 * Closed, outward-wound test moulds built from exact geometry, so every test knows the true
 * answer of the very mesh it feeds the engine. Shared by the tests and the benchmark.
 */
export interface GeneratedMesh {
  /** Nine coordinates per triangle. */
  positions: Float64Array;
  triangleCount: number;
}
/** Same triangles, every one wound the other way (normals into the solid). */
export declare function inverted(mesh: GeneratedMesh): GeneratedMesh;
/** The mesh without the listed triangles (makes holes). */
export declare function withoutTriangles(mesh: GeneratedMesh, drop: number[]): GeneratedMesh;
/** Several meshes as one soup. */
export declare function combined(...meshes: GeneratedMesh[]): GeneratedMesh;
/** Maps every point through f (f must be a proper rotation/translation to keep the winding). */
export declare function mapped(mesh: GeneratedMesh, f: (x: number, y: number, z: number) => [number, number, number]): GeneratedMesh;
export interface RevolvedPocketBlock {
  /** Half the side of the square block, centred on the z axis. */
  halfSide: number;
  bottomZ: number;
  topZ: number;
  /**
   * The pocket's profile as [radius, z] from the floor centre (radius 0) out to the rim, whose
   * z must be topZ. Each point becomes a ring of `segments` vertices.
   */
  profile: [number, number][];
  /** Around the axis; a multiple of 8 so the square's corners fall on ring directions. */
  segments: number;
}
/**
 * A square block with a pocket of revolution cut into its top (bowl, cylinder, frustum). Every
 * pocket ring is a regular polygon inscribed in the true circle, so the pocket is a stack of
 * polygonal frusta whose volume and area have closed forms.
 */
export declare function revolvedPocketBlock(spec: RevolvedPocketBlock): GeneratedMesh;
/**
 * A solid of revolution from a closed profile given as [radius, z] points, walked counter-clockwise
 * around the solid's cross-section (radius to the right, z up) from one point on the axis to
 * another, e.g. a round tray: [0, 0] → [R, 0] → [R, H] → [r, H] → [r, f] → [0, f].
 */
export declare function revolvedSolid(profile: [number, number][], segments: number): GeneratedMesh;
export interface HeightFieldBlock {
  width: number;
  depth: number;
  bottomZ: number;
  /** Grid cells along x and y; the top gets 2 × nx × ny triangles. */
  nx: number;
  ny: number;
  /** Height of the top surface at (x, y), 0 ≤ x ≤ width, 0 ≤ y ≤ depth. */
  top: (x: number, y: number) => number;
}
/** A block whose top is the surface z = top(x, y) on a regular grid: a height-field cavity. */
export declare function heightFieldBlock(spec: HeightFieldBlock): GeneratedMesh;
/**
 * A solid made of the cells of a rectilinear grid (xs, ys, zs are the grid lines) for which
 * solid(i, j, k) holds: blocks with rectangular pockets, steps, shafts and undercuts. Faces are
 * emitted between solid and empty cells only, so the surface is closed; avoid cells that touch
 * only along an edge (that edge would be shared by four triangles).
 */
export declare function cellSolid(xs: number[], ys: number[], zs: number[], solid: (i: number, j: number, k: number) => boolean): GeneratedMesh;
/** A torus about the z axis: major radius R, tube radius r, n × m quads with corners on the true surface. */
export declare function torus(R: number, r: number, n: number, m: number): GeneratedMesh;
/**
 * A 200 × 120 × 50 block with a closed T-slot pocket: a 60 mm wide channel from z 10 to 30 under
 * a 20 mm wide slot from z 30 up to the top, both 80 mm long. The channel's ceilings either side
 * of the slot are flat at z 30: air under them slides to the slot and out.
 */
export declare function tSlotBlock(): GeneratedMesh;
/**
 * A 100 × 80 base plate (z 0 to 3) with a 80 × 60 board (z 10 to 15) standing on four 10 × 10
 * legs at its corners. With `recess`, the board's underside has a 60 × 40 pocket 2 mm deep
 * (z 10 to 12) cut up into it: a concave underside.
 */
export declare function boardOnLegs(recess: boolean): GeneratedMesh;
/** The held-air pocket of boardOnLegs(true): the recess itself. */
export declare function boardRecess(): GeneratedMesh;
/**
 * A bell: an inverted cup (outer radius 20, rim at z 10, top at z 35) whose inside is a cone
 * frustum, radius 15 at the rim narrowing to 12 at its ceiling (z 30), floating over a 60 × 60
 * plate (z 0 to 4) centred under it. Both are closed surfaces of `segments` sides.
 */
export declare function bellOverPlate(segments: number): GeneratedMesh;
/** The held-air pocket of bellOverPlate: the frustum inside the cup, from the rim (z 10) to its ceiling. */
export declare function bellInside(segments: number): GeneratedMesh;
