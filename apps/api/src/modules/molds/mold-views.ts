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
    report: (m.report as CavityReport | null) ?? null,
    createdAt: m.createdAt.toISOString(),
    analysedAt: m.analysedAt?.toISOString() ?? null,
  };
}

export function fillView(f: CavityFill, withDepthMap: boolean): FillView {
  return fillRecord(f, withDepthMap);
}
