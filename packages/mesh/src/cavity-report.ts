import type { BoundingBox } from './mesh-measures';
import type { CavityAnalysis, CavityMethod, CurvePoint } from './cavity-analysis';
import { readAnalysis } from './analysis-codec';
import { cavityFloorMm } from './cavity-floor';
import { curve, fillAt } from './fill-queries';
import { fillRecord, type DepthMapRecord, type FillRecord } from './fill-record';
import type { Result } from './result';

const CURVE_POINTS = 101;

function valueOf<T>(r: Result<T>): T {
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

/** What people read about a mould, as plain JSON: the worker stores it, and so does the demo seed. */
export interface CavityReportRecord {
  triangles: number;
  watertight: boolean;
  bboxMm: BoundingBox;
  enclosedVolumeMm3: number | null;
  method: CavityMethod;
  estimatedErrorPct: number;
  resolutionMm: number | null;
  warnings: { code: string; message: string }[];
  /** Volume below each level (outline dam), from the lowest to the highest point of the mould. */
  curve: CurvePoint[];
  /** The fill to the top of the mould, with its depth map. */
  fillToTop: FillRecord & { depthMap: DepthMapRecord };
  /** The cavity floor with each dam: the lowest point where resin stands, in the mould's frame (mm). */
  floorMm: { outline: number; box: number };
}

/** What people read about a mould, kept beside the analysis so the screen needs no engine call. */
export function cavityReport(analysis: CavityAnalysis): CavityReportRecord {
  const model = valueOf(readAnalysis(analysis));
  const bottom = analysis.bboxMm.min[2];
  const top = analysis.bboxMm.max[2];
  const floorMm = { outline: valueOf(cavityFloorMm(model, 'outline')), box: valueOf(cavityFloorMm(model, 'box')) };
  const levels = Array.from({ length: CURVE_POINTS }, (_, i) => bottom + ((top - bottom) * i) / (CURVE_POINTS - 1));
  // The floor is where the curve bends; sampling it exactly keeps layer plans from starting too high.
  if (floorMm.outline > bottom && floorMm.outline < top) levels.push(floorMm.outline);
  const points = valueOf(
    curve(
      model,
      [...new Set(levels)].sort((a, b) => a - b),
      'outline',
    ),
  );
  const f = valueOf(fillAt(model, top, 'outline'));
  const seen = new Set<string>();
  const warnings = [...analysis.warnings, ...f.warnings].filter((w) => (seen.has(w.code) ? false : (seen.add(w.code), true)));
  return {
    triangles: analysis.triangles,
    watertight: analysis.watertight,
    bboxMm: analysis.bboxMm,
    enclosedVolumeMm3: analysis.enclosedVolumeMm3,
    method: f.method,
    estimatedErrorPct: f.estimatedErrorPct,
    resolutionMm: f.resolutionMm,
    warnings: warnings.map((w) => ({ code: w.code, message: w.message })),
    curve: points,
    fillToTop: fillRecord(f, true),
    floorMm,
  };
}

/** An analysis as the database keeps it, each part as JSON text: written in the thread that analysed it. */
export interface StoredAnalysisJson {
  analysisJson: string;
  /** The report without its depth map, which is kept (and served) apart. */
  reportJson: string;
  depthMapJson: string;
  triangles: number;
}

/** The report without its depth map, as it is stored and answered. */
export type StoredCavityReport = Omit<CavityReportRecord, 'fillToTop'> & { fillToTop: Omit<CavityReportRecord['fillToTop'], 'depthMap'> };

export function storedAnalysisJson(analysis: CavityAnalysis): StoredAnalysisJson {
  const {
    fillToTop: { depthMap, ...fillToTop },
    ...summary
  } = cavityReport(analysis);
  const report: StoredCavityReport = { ...summary, fillToTop };
  return {
    analysisJson: JSON.stringify(analysis),
    reportJson: JSON.stringify(report),
    depthMapJson: JSON.stringify(depthMap),
    triangles: analysis.triangles,
  };
}
