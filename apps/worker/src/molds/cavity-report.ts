import { cavityFloorMm, curve, fillAt, fillRecord, readAnalysis, type CavityAnalysis, type Result } from '@gelpoint/mesh';
import type { CavityReport } from '@gelpoint/contracts';

const CURVE_POINTS = 101;

function valueOf<T>(r: Result<T>): T {
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

/** What people read about a mould, kept beside the analysis so the screen needs no engine call. */
export function cavityReport(analysis: CavityAnalysis): CavityReport {
  const model = valueOf(readAnalysis(analysis));
  const bottom = analysis.bboxMm.min[2];
  const top = analysis.bboxMm.max[2];
  const floorMm = { outline: valueOf(cavityFloorMm(model, 'outline')), box: valueOf(cavityFloorMm(model, 'box')) };
  const levels = Array.from({ length: CURVE_POINTS }, (_, i) => bottom + ((top - bottom) * i) / (CURVE_POINTS - 1));
  // The floor is where the curve bends; sampling it exactly keeps layer plans from starting too high.
  if (floorMm.outline > bottom && floorMm.outline < top) levels.push(floorMm.outline);
  const points = valueOf(curve(model, [...new Set(levels)].sort((a, b) => a - b), 'outline'));
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
