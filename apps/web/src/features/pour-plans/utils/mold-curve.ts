import type { VolumeCurve } from '@gelpoint/core';

/** As many samples as the server takes when it saves a plan cast in a mould, so both see the same curve. */
export const planCurvePoints = 241;

// A thousandth of a millimetre is far below any mesh's accuracy and keeps the request short.
const roundLevel = (levelMm: number) => Math.round(levelMm * 1000) / 1000;

/** Levels from `bottomMm` (the cavity floor, 0) up to the fill level, evenly spaced, strictly rising. */
export function planCurveLevels(bottomMm: number, fillLevelMm: number, points: number = planCurvePoints): number[] {
  if (!(fillLevelMm > bottomMm) || points < 2) return [];
  const levels: number[] = [];
  for (let i = 0; i < points; i++) {
    const level = roundLevel(bottomMm + ((fillLevelMm - bottomMm) * i) / (points - 1));
    if (levels.length === 0 || level > levels[levels.length - 1]!) levels.push(level);
  }
  return levels;
}

/** The volume-vs-level curve from the volumes between consecutive levels: nothing below the first, then running sums. */
export function curveFromLayerVolumes(layers: readonly { fromMm: number; toMm: number; volumeMm3: number }[]): VolumeCurve {
  const first = layers[0];
  if (!first) return [];
  const curve: VolumeCurve = [{ levelMm: first.fromMm, volumeMm3: 0 }];
  let below = 0;
  for (const layer of layers) {
    below += layer.volumeMm3;
    curve.push({ levelMm: layer.toMm, volumeMm3: below });
  }
  return curve;
}
