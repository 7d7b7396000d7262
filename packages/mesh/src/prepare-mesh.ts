import { analyseEdges } from './edge-topology';
import { checkUnits, checkUpAxis, mmPerUnit, type FileUnits, type UpAxis } from './frame';
import { boundingBox, surfaceMeasures, type BoundingBox } from './mesh-measures';
import { fail, ok, type MeshWarning, type Result } from './result';
import type { TriangleSoup } from './stl/triangle-soup';
import { cleanMesh } from './mesh-cleanup';
import type { StreamedStl } from './stl/binary-stl-stream';
import { framedWeld, weldSoup, type WeldedMesh } from './weld';
import { repairWinding, turnAllTriangles } from './winding';

export interface PrepareMeshOptions {
  /** Units the file was exported in. Default mm. */
  units?: FileUnits;
  /** The file axis that points up out of the mould's opening. Default z. */
  up?: UpAxis;
  /**
   * 0 (default): weld bit-identical corners, then close the gaps a writer's rounding left along
   * open edges within 1e-6 of the model's diagonal. Above 0: weld corners within this cell size
   * (mm), and use it as that tolerance.
   */
  weldToleranceMm?: number;
}

/**
 * The weld tolerance, relative to the bounding box's diagonal. A float32 corner is off by at most
 * 2^-24 ≈ 6e-8 of its coordinate (IEEE 754 binary32), and a writer that prints seven significant
 * digits by up to 5e-7 of it, so two copies of one point a model's writer rounded apart land within
 * about 1e-6 of the model's size of each other (for coordinates no larger than the model). No
 * mould detail is that small: for a 300 mm tray it is 0.3 µm, a thirtieth or less of the finest CNC
 * or print resolution (about 0.01 to 0.05 mm, common practice). Only corners on open edges are
 * welded this way, so a closed surface is never changed by it.
 */
export const relativeWeldTolerance = 1e-6;

export interface MeshTopologyReport {
  /** Every edge used by exactly two triangles. */
  watertight: boolean;
  edges: number;
  openEdges: number;
  nonManifoldEdges: number;
  /** Edges whose two triangles were wound against each other as read from the file. */
  misorientedEdges: number;
  /** Triangles turned to agree with their neighbours. */
  turnedTriangles: number;
  /** Edges where no consistent winding exists. */
  windingConflicts: number;
  /** The whole closed surface was wound inside-out and has been turned. */
  invertedFixed: boolean;
  /** Triangles dropped for having no area at the weld tolerance (two corners one point, or all on a line). */
  degenerateDropped: number;
  /** Later copies of a face written twice (same corners, same winding), dropped. */
  duplicatesDropped: number;
  /** Vertices welded to a neighbour within the tolerance to close a gap along an open edge. */
  verticesWelded: number;
  /** The tolerance used for that weld and for "no area" (mm). */
  weldToleranceMm: number;
}

/** A welded, checked, outward-wound mesh in the Z-up millimetre frame. Typed arrays only: transferable. */
export interface CavityMesh {
  positionsMm: Float64Array;
  triangles: Uint32Array;
  vertexCount: number;
  triangleCount: number;
  bboxMm: BoundingBox;
  topology: MeshTopologyReport;
  /** Volume of the solid the closed surface encloses; null when the surface is not closed. */
  enclosedVolumeMm3: number | null;
  surfaceAreaMm2: number;
  warnings: MeshWarning[];
  /**
   * Memory nothing else uses any more (the bytes of a file read in place), which the first
   * analyzeCavity of this mesh takes for its working arrays instead of fresh ones; null when there
   * is none or it has been taken.
   */
  spareMemory?: Uint8Array | null;
}

export function prepareMesh(soup: TriangleSoup, options: PrepareMeshOptions = {}): Result<CavityMesh> {
  const units = checkUnits(options.units ?? 'mm');
  if (!units.ok) return units;
  const up = checkUpAxis(options.up ?? 'z');
  if (!up.ok) return up;
  const toleranceMm = options.weldToleranceMm ?? 0;
  if (!Number.isFinite(toleranceMm) || toleranceMm < 0) {
    return fail('option_invalid', `The weld tolerance must be 0 or a positive number of millimetres, got ${String(toleranceMm)}.`);
  }

  const scale = mmPerUnit[units.value];
  if (toleranceMm > 0) {
    let largest = 0;
    for (let i = 0; i < soup.positions.length; i++) largest = Math.max(largest, Math.abs(soup.positions[i]!));
    // Cell numbers must stay within 32 bits for the weld's keys.
    if ((largest * scale) / toleranceMm >= 2 ** 31 - 1) {
      return fail(
        'option_invalid',
        `A weld tolerance of ${toleranceMm} mm is too fine for coordinates up to ${(largest * scale).toPrecision(3)} mm; use at least ${((largest * scale) / 2 ** 30).toPrecision(2)} mm.`,
      );
    }
  }
  // The soup's corners are read for the last time by the weld: a file read in place is spare then.
  return preparedWeld(weldSoup(soup, { up: up.value, scale, toleranceMm }), toleranceMm, soup.warnings, soup.spareBytes ?? null);
}

/**
 * prepareMesh for a binary STL whose corners were welded as it was read (BinaryStlStream): the
 * same mesh prepareMesh gives the whole file's soup, bit for bit. Welds bit-identical corners only
 * (no weldToleranceMm).
 */
export function prepareStreamedStl(read: StreamedStl, options: Omit<PrepareMeshOptions, 'weldToleranceMm'> = {}): Result<CavityMesh> {
  const units = checkUnits(options.units ?? 'mm');
  if (!units.ok) return units;
  const up = checkUpAxis(options.up ?? 'z');
  if (!up.ok) return up;
  const welded = framedWeld(read.weld, read.triangleCount, { up: up.value, scale: mmPerUnit[units.value] });
  return preparedWeld(welded, 0, read.warnings, read.weld.spare);
}

function preparedWeld(welded: WeldedMesh, toleranceMm: number, readWarnings: MeshWarning[], spare: Uint8Array | null): Result<CavityMesh> {
  if (welded.triangleCount === 0) {
    return fail(
      'mesh_degenerate',
      'Every triangle of the mesh collapses to a line or a point after welding its corners; export the mould again at full precision.',
    );
  }
  const weldedBox = boundingBox(welded.positionsMm, welded.vertexCount);
  const diagonalMm = Math.hypot(...[0, 1, 2].map((k) => weldedBox.max[k]! - weldedBox.min[k]!));
  const cleanToleranceMm = toleranceMm > 0 ? toleranceMm : relativeWeldTolerance * diagonalMm;
  const cleaned = cleanMesh(welded.positionsMm, welded.triangles, welded.vertexCount, cleanToleranceMm, spare);
  const triangles = cleaned.triangles;
  const triangleCount = triangles.length / 3;
  if (triangleCount === 0) {
    return fail(
      'mesh_degenerate',
      'Every triangle of the mesh has no area (its corners lie on a line or at one point); export the mould again at full precision.',
    );
  }
  const bboxMm = cleaned.vertexCount === welded.vertexCount ? weldedBox : boundingBox(cleaned.positionsMm, cleaned.vertexCount);
  const extent = [0, 1, 2].map((k) => bboxMm.max[k]! - bboxMm.min[k]!);
  if (extent.some((e) => !(e > 0))) {
    return fail(
      'mesh_degenerate',
      `The mesh is flat (its size is ${extent.map((e) => e.toPrecision(4)).join(' × ')} mm); a mould needs width, depth and height, so check the units and the up axis.`,
    );
  }

  const warnings: MeshWarning[] = [...readWarnings];
  const edges = cleaned.edges;
  const vertexCount = cleaned.vertexCount;
  let turnedTriangles = 0;
  let windingConflicts = 0;
  if (edges.misorientedEdges > 0) {
    const repair = repairWinding(triangles, analyseEdges(triangles, vertexCount, true, spare));
    turnedTriangles = repair.turned;
    windingConflicts = repair.conflicts;
    if (turnedTriangles > 0) {
      warnings.push({
        code: 'inconsistent_winding_fixed',
        message: `${turnedTriangles} triangles were wound against their neighbours and have been turned to match; check the exporter's settings.`,
      });
    }
  }
  const watertight = edges.openEdges === 0 && edges.nonManifoldEdges === 0;
  if (cleaned.verticesWelded > 0) {
    warnings.push({
      code: 'vertices_welded',
      message: `${cleaned.verticesWelded} corners lay a hair apart (within ${formatMm(cleanToleranceMm)}) from where their neighbours meet, as a writer's rounding leaves them, and were welded to close the gaps.`,
    });
  }
  const zeroArea = welded.degenerateDropped + cleaned.zeroAreaDropped;
  if (zeroArea > 0) {
    warnings.push({
      code: 'zero_area_triangles_dropped',
      message: `${zeroArea} triangles had no area (their corners at one point or on a line) and were left out.`,
    });
  }
  if (cleaned.duplicatesDropped > 0) {
    warnings.push({
      code: 'duplicate_triangles_dropped',
      message: `${cleaned.duplicatesDropped} triangles were written twice and their copies were left out.`,
    });
  }
  if (edges.openEdges > 0) {
    warnings.push({
      code: 'open_mesh',
      message: `The surface has ${edges.openEdges} open edges (holes), so it encloses no volume; the fill is found column by column, taking the highest surface in each column as the mould. Close the holes in your CAD program for exact numbers.`,
    });
  }
  if (edges.nonManifoldEdges > 0) {
    warnings.push({
      code: 'non_manifold_edges',
      message: `${edges.nonManifoldEdges} edges are shared by three or more triangles; the fill is found column by column. Clean the mesh in your CAD program for exact numbers.`,
    });
  }

  let measures = surfaceMeasures(cleaned.positionsMm, triangles, bboxMm);
  let invertedFixed = false;
  const orientable = windingConflicts === 0;
  if (watertight && orientable && measures.signedVolumeMm3 < 0) {
    turnAllTriangles(triangles);
    measures = { signedVolumeMm3: -measures.signedVolumeMm3, surfaceAreaMm2: measures.surfaceAreaMm2 };
    invertedFixed = true;
    warnings.push({
      code: 'inverted_normals_fixed',
      message: 'The surface was wound inside-out (its normals pointed into the wood); every triangle has been turned so the normals point out.',
    });
  }

  return ok({
    positionsMm: cleaned.positionsMm,
    triangles,
    vertexCount,
    triangleCount,
    bboxMm,
    topology: {
      watertight,
      edges: edges.edgeCount,
      openEdges: edges.openEdges,
      nonManifoldEdges: edges.nonManifoldEdges,
      misorientedEdges: edges.misorientedEdges,
      turnedTriangles,
      windingConflicts,
      invertedFixed,
      degenerateDropped: zeroArea,
      duplicatesDropped: cleaned.duplicatesDropped,
      verticesWelded: cleaned.verticesWelded,
      weldToleranceMm: cleanToleranceMm,
    },
    enclosedVolumeMm3: watertight && orientable ? measures.signedVolumeMm3 : null,
    surfaceAreaMm2: measures.surfaceAreaMm2,
    warnings,
    spareMemory: spare,
  });
}

/** A length for people: 0.3 µm, 0.012 mm, 2.5 mm. */
function formatMm(mm: number): string {
  return mm < 0.001 ? `${(mm * 1000).toPrecision(2)} µm` : `${mm.toPrecision(2)} mm`;
}
