import type { Mold } from '@gelpoint/db';
import type { CavityFill as FillView, CavityReport, MoldView } from '@gelpoint/contracts';
import { fillRecord, type CavityFill } from '@gelpoint/mesh';

export function moldView(m: Mold): MoldView {
  return {
    id: m.id,
    name: m.name,
    fileName: m.fileName,
    format: m.format,
    units: m.units,
    fileUnits: m.fileUnits,
    upAxis: m.upAxis,
    sizeBytes: m.sizeBytes,
    sha256: m.sha256,
    pieceId: m.pieceId,
    status: m.status,
    progress: m.progress,
    error: m.errorCode ? { code: m.errorCode, message: m.errorMessage ?? '' } : null,
    report: reportWithoutDepthMap(m.report),
    createdAt: m.createdAt.toISOString(),
    analysedAt: m.analysedAt?.toISOString() ?? null,
  };
}

/** A report an older worker wrote may still hold its depth map, which is served on its own. */
function reportWithoutDepthMap(report: Mold['report']): CavityReport | null {
  if (!report) return null;
  const { depthMap: _apart, ...fillToTop } = (report as { fillToTop: CavityReport['fillToTop'] & { depthMap?: unknown } }).fillToTop;
  return { ...(report as CavityReport), fillToTop };
}

export function fillView(f: CavityFill, withDepthMap: boolean): FillView {
  return fillRecord(f, withDepthMap);
}
