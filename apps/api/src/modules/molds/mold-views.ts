import type { Mold } from '@gelpoint/db';
import type { CavityFill as FillView, CavityReport, MoldView } from '@gelpoint/contracts';
import type { CavityFill } from '@gelpoint/mesh';

export function moldView(m: Mold): MoldView {
  return {
    id: m.id,
    name: m.name,
    fileName: m.fileName,
    units: m.units,
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
  return {
    levelMm: f.levelMm,
    dam: f.dam,
    volumeMm3: f.volumeMm3,
    wettedAreaMm2: f.wettedAreaMm2,
    maxDepthMm: f.maxDepthMm,
    trappedAirMm3: f.trappedAirMm3,
    warnings: f.warnings.map((w) => ({ code: w.code, message: w.message })),
    ...(withDepthMap
      ? { depthMap: { originMm: f.depthMap.originMm, cellMm: f.depthMap.cellMm, nx: f.depthMap.nx, ny: f.depthMap.ny, depthsMm: Array.from(f.depthMap.depthsMm, (d) => Math.round(d * 1000) / 1000) } }
      : {}),
  };
}
