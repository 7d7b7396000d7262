import { curve, fillAt, fillRecord, type CavityAnalysis } from '@gelpoint/mesh';
import type { CavityReport } from '@gelpoint/contracts';

const CURVE_POINTS = 101;

/** What people read about a mould, kept beside the analysis so the screen needs no engine call. */
export function cavityReport(analysis: CavityAnalysis): CavityReport {
  const bottom = analysis.bboxMm.min[2];
  const top = analysis.bboxMm.max[2];
  const levels = Array.from({ length: CURVE_POINTS }, (_, i) => bottom + ((top - bottom) * i) / (CURVE_POINTS - 1));
  // The floor is where the curve bends; sampling it exactly keeps layer plans from starting too high.
  const floor = analysis.exact?.lowestFloorMm;
  if (floor !== undefined && floor > bottom && floor < top) levels.push(floor);
  const points = curve(analysis, [...new Set(levels)].sort((a, b) => a - b), 'outline');
  const full = fillAt(analysis, top, 'outline');
  if (!points.ok) throw new Error(points.error.message);
  if (!full.ok) throw new Error(full.error.message);
  const f = full.value;
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
    curve: points.value,
    fillToTop: fillRecord(f, true),
  };
}
