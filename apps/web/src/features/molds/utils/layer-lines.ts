import { ok, planCavityFromMold, splitIntoLayers, type LayerSlice, type Result, type VolumeCurve } from '@gelpoint/core';

export interface LayerLinesInput {
  /** The cavity's curve with the chosen dam; levels in any one frame (the page gives them from the cavity floor). */
  curve: VolumeCurve;
  wettedAreaMm2: number;
  maxDepthMm: number;
  fillLevelMm: number;
  maxLayerMm: number;
}

export interface LayerLines {
  /** The cavity floor, where the first layer starts (in the curve's frame, mm). */
  floorMm: number;
  /** Layers with levels in the curve's frame, from the floor up. */
  layers: LayerSlice[];
  /** Every boundary from the floor to the fill level: what the layer-volume query asks for. */
  levelsMm: number[];
}

/**
 * Where the layers of a deep pour would meet, in the curve's frame: core splits the cavity from its
 * floor to the fill level into the fewest equal layers the thickness allows, exactly as the pour plan
 * will, and the levels are shifted back into the curve's frame.
 */
export function layerLines(input: LayerLinesInput): Result<LayerLines> {
  const planned = planCavityFromMold({ curve: input.curve, wettedAreaMm2: input.wettedAreaMm2, maxDepthMm: input.maxDepthMm }, input.fillLevelMm);
  if (!planned.ok) return planned;
  const { cavity, fillLevelMm: heightMm } = planned.value;
  const split = splitIntoLayers({
    curve: cavity.curve,
    fillLevelMm: heightMm,
    maxLayerMm: input.maxLayerMm,
    ...(cavity.maxDepthMm === undefined ? {} : { maxDepthMm: cavity.maxDepthMm }),
  });
  if (!split.ok) return split;
  const floorMm = input.fillLevelMm - heightMm;
  const layers = split.value.map((layer) => ({ ...layer, fromLevelMm: layer.fromLevelMm + floorMm, toLevelMm: layer.toLevelMm + floorMm }));
  return ok({ floorMm, layers, levelsMm: [floorMm, ...layers.map((layer) => layer.toLevelMm)] });
}
