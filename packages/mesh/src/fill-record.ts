import type { CavityFill } from './cavity-analysis';

export interface FillRecord {
  levelMm: number;
  dam: CavityFill['dam'];
  volumeMm3: number;
  wettedAreaMm2: number;
  maxDepthMm: number;
  trappedAirMm3: number;
  warnings: { code: string; message: string }[];
  depthMap?: DepthMapRecord;
}

export interface DepthMapRecord {
  originMm: [number, number];
  cellMm: [number, number];
  nx: number;
  ny: number;
  depthsMm: number[];
}

/**
 * A fill as plain JSON, the form the cavity report stores and the API answers: the depth map's typed array becomes
 * an array rounded to the micrometre, which is all the screen draws and keeps the stored report small.
 */
export function fillRecord(f: CavityFill, withDepthMap: true): FillRecord & { depthMap: DepthMapRecord };
export function fillRecord(f: CavityFill, withDepthMap: boolean): FillRecord;
export function fillRecord(f: CavityFill, withDepthMap: boolean): FillRecord {
  return {
    levelMm: f.levelMm,
    dam: f.dam,
    volumeMm3: f.volumeMm3,
    wettedAreaMm2: f.wettedAreaMm2,
    maxDepthMm: f.maxDepthMm,
    trappedAirMm3: f.trappedAirMm3,
    warnings: f.warnings.map((w) => ({ code: w.code, message: w.message })),
    ...(withDepthMap
      ? {
          depthMap: {
            originMm: f.depthMap.originMm,
            cellMm: f.depthMap.cellMm,
            nx: f.depthMap.nx,
            ny: f.depthMap.ny,
            depthsMm: Array.from(f.depthMap.depthsMm, (d) => Math.round(d * 1000) / 1000),
          },
        }
      : {}),
  };
}
