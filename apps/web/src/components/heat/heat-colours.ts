import { peakAtDepth, type PlanPeakMap } from '@gelpoint/core';

/** A depth map as the planner has it: resin depth per column, row-major from the mould's min x, min y corner. */
export interface HeatDepthMap {
  originMm: readonly [number, number];
  cellMm: readonly [number, number];
  nx: number;
  ny: number;
  depthsMm: ArrayLike<number>;
}

type Rgb = readonly [number, number, number];

// Our scale, warm by steps: sand at the shop's temperature, amber, brick at the accepted peak, and a deep plum above
// it so "over the limit" is a colour of its own (and the legend and sentence say it in words as well).
const sand: Rgb = [240, 228, 200];
const amber: Rgb = [222, 150, 52];
const brick: Rgb = [176, 58, 36];
const plum: Rgb = [82, 16, 58];

const mix = (a: Rgb, b: Rgb, t: number): Rgb => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t];
const clamp01 = (t: number) => Math.min(1, Math.max(0, t));

/** The colour of a forecast peak between the shop's temperature and the accepted peak; anything over it is plum. */
export function heatColour(peakC: number, shopTempC: number, limitC: number): Rgb {
  if (peakC > limitC) return plum;
  const t = clamp01((peakC - shopTempC) / Math.max(1e-9, limitC - shopTempC));
  return t < 0.5 ? mix(sand, amber, t / 0.5) : mix(amber, brick, (t - 0.5) / 0.5);
}

export const cssColour = ([r, g, b]: Rgb) => `rgb(${Math.round(r)} ${Math.round(g)} ${Math.round(b)})`;

/** What it takes to paint the forecast over a mould: its depth map, the plan's peak table and the scale's two ends. */
export interface ForecastHeat {
  map: HeatDepthMap;
  peakMap: PlanPeakMap;
  shopTempC: number;
  limitC: number;
}

/**
 * The map painted as RGBA pixels in the depth map's own order: one per column, row 0 the mould's near edge (smallest
 * y), x to the right. Columns without resin stay transparent.
 */
export function heatColumns(map: HeatDepthMap, bands: PlanPeakMap['bands'], shopTempC: number, limitC: number): Uint8ClampedArray<ArrayBuffer> {
  const pixels = new Uint8ClampedArray(map.nx * map.ny * 4);
  for (let k = 0; k < map.nx * map.ny; k++) {
    const peak = peakAtDepth(bands, map.depthsMm[k]!);
    if (peak === null) continue;
    const [r, g, b] = heatColour(peak, shopTempC, limitC);
    pixels.set([r, g, b, 255], k * 4);
  }
  return pixels;
}

/**
 * The map painted as RGBA pixels, one per column, row 0 at the top (the mould's far edge, largest y), so it reads as
 * seen from above with x to the right. Columns without resin stay transparent.
 */
export function heatPixels(map: HeatDepthMap, bands: PlanPeakMap['bands'], shopTempC: number, limitC: number): Uint8ClampedArray<ArrayBuffer> {
  const columns = heatColumns(map, bands, shopTempC, limitC);
  const pixels = new Uint8ClampedArray(columns.length);
  const rowBytes = map.nx * 4;
  for (let j = 0; j < map.ny; j++) pixels.set(columns.subarray(j * rowBytes, (j + 1) * rowBytes), (map.ny - 1 - j) * rowBytes);
  return pixels;
}
