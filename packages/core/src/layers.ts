import { fail, ok, type Result } from './result';
import { checkVolumeCurve, curveStartLevelMm, curveTopLevelMm, volumeAtLevel, type VolumeCurve } from './volume-curve';

export interface LayerSlice {
  /** 0-based, from the floor up. */
  index: number;
  fromLevelMm: number;
  toLevelMm: number;
  thicknessMm: number;
  /** Resin this layer holds between its levels (the first layer also takes anything below the curve's start). */
  fillVolumeMm3: number;
  /** The deepest resin this layer puts down at any one spot, which is what drives its exotherm. */
  deepestResinMm: number;
}

export interface LayerSplitInput {
  curve: VolumeCurve;
  fillLevelMm: number;
  maxLayerMm: number;
  /** Resin depth at the cavity's deepest point when filled to fillLevelMm; absent when the curve starts at that point. */
  maxDepthMm?: number;
}

// A level a hair above a whole number of layers is float noise, not a reason for one more layer.
const levelToleranceMm = 1e-9;

/** The fewest equal layers, floor to fill level, none thicker than the product allows. */
export function splitIntoLayers(input: LayerSplitInput): Result<LayerSlice[]> {
  const curve = checkVolumeCurve(input.curve);
  if (!curve.ok) return curve;
  if (!Number.isFinite(input.maxLayerMm) || input.maxLayerMm <= 0) {
    return fail(
      'max_layer_not_positive',
      `The product's maximum layer thickness must be above zero (in mm), got ${String(input.maxLayerMm)}; take it from the data sheet.`,
    );
  }
  const startMm = curveStartLevelMm(input.curve);
  const topMm = curveTopLevelMm(input.curve);
  const fillLevelMm = input.fillLevelMm;
  if (!Number.isFinite(fillLevelMm) || fillLevelMm <= startMm) {
    return fail(
      'fill_level_below_floor',
      `The fill level (${String(fillLevelMm)} mm) must be above the cavity floor (${startMm} mm); choose a level inside the cavity.`,
    );
  }
  if (fillLevelMm > topMm + levelToleranceMm) {
    return fail(
      'fill_level_above_curve',
      `The fill level (${fillLevelMm} mm) is above the top of the cavity's volume curve (${topMm} mm); lower it, or extend the curve to that level.`,
    );
  }
  if (input.maxDepthMm !== undefined && (!Number.isFinite(input.maxDepthMm) || input.maxDepthMm <= 0)) {
    return fail(
      'max_depth_not_positive',
      `The deepest resin depth must be above zero (in mm), got ${String(input.maxDepthMm)}; take it from the cavity report's depth map.`,
    );
  }
  const heightMm = fillLevelMm - startMm;
  const count = Math.max(1, Math.ceil(heightMm / input.maxLayerMm - levelToleranceMm));
  const thicknessMm = heightMm / count;
  const pocketBelowStartMm = Math.max(0, (input.maxDepthMm ?? heightMm) - heightMm);
  const layers: LayerSlice[] = [];
  for (let index = 0; index < count; index++) {
    const fromLevelMm = startMm + index * thicknessMm;
    const toLevelMm = index === count - 1 ? fillLevelMm : startMm + (index + 1) * thicknessMm;
    const below = index === 0 ? 0 : volumeAtLevel(input.curve, fromLevelMm);
    layers.push({
      index,
      fromLevelMm,
      toLevelMm,
      thicknessMm,
      fillVolumeMm3: volumeAtLevel(input.curve, toLevelMm) - below,
      deepestResinMm: index === 0 ? thicknessMm + pocketBelowStartMm : thicknessMm,
    });
  }
  return ok(layers);
}
