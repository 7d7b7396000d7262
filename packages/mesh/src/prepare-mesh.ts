import { analyseEdges } from './edge-topology';
import { checkUnits, checkUpAxis, mmPerUnit, type FileUnits, type UpAxis } from './frame';
import { boundingBox, surfaceMeasures, type BoundingBox } from './mesh-measures';
import { fail, ok, type MeshWarning, type Result } from './result';
import type { TriangleSoup } from './stl/triangle-soup';
import { weldSoup } from './weld';
import { repairWinding, turnAllTriangles } from './winding';

export interface PrepareMeshOptions {
  /** Units the file was exported in. Default mm. */
  units?: FileUnits;
  /** The file axis that points up out of the mould's opening. Default z. */
  up?: UpAxis;
  /** 0 (default): weld only bit-identical corners; above 0: weld corners within this cell size (mm). */
  weldToleranceMm?: number;
}

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
  /** Triangles dropped because welding collapsed them. */
  degenerateDropped: number;
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
      return fail('option_invalid', `A weld tolerance of ${toleranceMm} mm is too fine for coordinates up to ${(largest * scale).toPrecision(3)} mm; use at least ${((largest * scale) / 2 ** 30).toPrecision(2)} mm.`);
    }
  }
  const welded = weldSoup(soup, { up: up.value, scale, toleranceMm });
  if (welded.triangleCount === 0) {
    return fail('mesh_degenerate', 'Every triangle of the STL collapses to a line or a point after welding its corners; export the mould again at full precision.');
  }
  const bboxMm = boundingBox(welded.positionsMm, welded.vertexCount);
  const extent = [0, 1, 2].map((k) => bboxMm.max[k]! - bboxMm.min[k]!);
  if (extent.some((e) => !(e > 0))) {
    return fail('mesh_degenerate', `The mesh is flat (its size is ${extent.map((e) => e.toPrecision(4)).join(' × ')} mm); a mould needs width, depth and height, so check the units and the up axis.`);
  }

  const warnings: MeshWarning[] = [];
  const triangles = welded.triangles;
  const edges = analyseEdges(triangles, welded.vertexCount);
  let turnedTriangles = 0;
  let windingConflicts = 0;
  if (edges.misorientedEdges > 0) {
    const repair = repairWinding(triangles, analyseEdges(triangles, welded.vertexCount, true));
    turnedTriangles = repair.turned;
    windingConflicts = repair.conflicts;
    if (turnedTriangles > 0) {
      warnings.push({ code: 'inconsistent_winding_fixed', message: `${turnedTriangles} triangles were wound against their neighbours and have been turned to match; check the exporter's settings.` });
    }
  }
  const watertight = edges.openEdges === 0 && edges.nonManifoldEdges === 0;
  if (edges.openEdges > 0) {
    warnings.push({ code: 'open_mesh', message: `The surface has ${edges.openEdges} open edges (holes), so it encloses no volume; the fill is found column by column, taking the highest surface in each column as the mould. Close the holes in your CAD program for exact numbers.` });
  }
  if (edges.nonManifoldEdges > 0) {
    warnings.push({ code: 'non_manifold_edges', message: `${edges.nonManifoldEdges} edges are shared by three or more triangles; the fill is found column by column. Clean the mesh in your CAD program for exact numbers.` });
  }
  if (welded.degenerateDropped > 0) {
    warnings.push({ code: 'degenerate_triangles_dropped', message: `${welded.degenerateDropped} triangles collapsed to a line when their corners were welded and were left out.` });
  }

  let measures = surfaceMeasures(welded.positionsMm, triangles, bboxMm);
  let invertedFixed = false;
  const orientable = windingConflicts === 0;
  if (watertight && orientable && measures.signedVolumeMm3 < 0) {
    turnAllTriangles(triangles);
    measures = { signedVolumeMm3: -measures.signedVolumeMm3, surfaceAreaMm2: measures.surfaceAreaMm2 };
    invertedFixed = true;
    warnings.push({ code: 'inverted_normals_fixed', message: 'The surface was wound inside-out (its normals pointed into the wood); every triangle has been turned so the normals point out.' });
  }

  return ok({
    positionsMm: welded.positionsMm,
    triangles,
    vertexCount: welded.vertexCount,
    triangleCount: welded.triangleCount,
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
      degenerateDropped: welded.degenerateDropped,
    },
    enclosedVolumeMm3: watertight && orientable ? measures.signedVolumeMm3 : null,
    surfaceAreaMm2: measures.surfaceAreaMm2,
    warnings,
  });
}
