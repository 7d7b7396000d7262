import { volumeAtLevel, type VolumeCurve } from '@gelpoint/core';
import type { CavityReport, Dam, LayerVolumes, MoldFill } from '../types';

/**
 * Every level on the mould's page is the height of the resin surface above the cavity floor, the lowest point
 * where resin stands with the chosen dam, as a quick shape's depth is. The mould's own frame (where the file puts
 * its underside) is only shown beside it.
 */
export function floorOf(report: Pick<CavityReport, 'floorMm'>, dam: Dam): number {
  return report.floorMm[dam];
}

/** The highest fill level there is: the top of the mould, above the floor. */
export function rimAboveFloorMm(report: Pick<CavityReport, 'floorMm' | 'bboxMm'>, dam: Dam): number {
  return report.bboxMm.max[2] - floorOf(report, dam);
}

/** A curve in the mould's frame (absolute levels) from the floor up, levels measured from the floor. */
export function curveAboveFloor(curve: VolumeCurve, floorMm: number): VolumeCurve {
  const above = curve.filter((p) => p.levelMm > floorMm);
  if (curve.length === 0 || above.length === curve.length) return above.map((p) => ({ levelMm: p.levelMm - floorMm, volumeMm3: p.volumeMm3 }));
  return [{ levelMm: 0, volumeMm3: volumeAtLevel(curve, floorMm) }, ...above.map((p) => ({ levelMm: p.levelMm - floorMm, volumeMm3: p.volumeMm3 }))];
}

/** The curve from the volumes between consecutive levels (from the floor): nothing below the first, then running sums. */
export function curveFromLayers(volumes: Pick<LayerVolumes, 'layers'>): VolumeCurve {
  const first = volumes.layers[0];
  if (!first) return [];
  const curve: VolumeCurve = [{ levelMm: first.fromMm, volumeMm3: 0 }];
  let below = 0;
  for (const layer of volumes.layers) {
    below += layer.volumeMm3;
    curve.push({ levelMm: layer.toMm, volumeMm3: below });
  }
  return curve;
}

/** `count` evenly spaced heights from the floor to the rim, rounded to the micrometre and strictly rising. */
export function levelsToRim(rimMm: number, count: number): number[] {
  const levels: number[] = [];
  for (let i = 0; i < count; i++) {
    const level = Math.round(((rimMm * i) / (count - 1)) * 1000) / 1000;
    if (levels.length === 0 || level > levels[levels.length - 1]!) levels.push(level);
  }
  return levels;
}

/** The report's stored fill to the top, as the fill route would answer it from the floor: shown before any request. */
export function storedFillToTop(report: Pick<CavityReport, 'fillToTop' | 'floorMm'>): MoldFill {
  const floorMm = floorOf(report, report.fillToTop.dam);
  const levelInMouldMm = report.fillToTop.levelMm;
  const levelAboveFloorMm = Math.round((levelInMouldMm - floorMm) * 1000) / 1000;
  return { ...report.fillToTop, levelMm: levelAboveFloorMm, levelFrom: 'floor', floorMm, levelAboveFloorMm, levelInMouldMm };
}
