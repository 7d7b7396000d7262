import type { DepthMap } from '../types';
import { niceTicks } from './nice-ticks';

export interface DepthBand {
  /** Depths above fromMm up to and including toMm belong to the band. */
  fromMm: number;
  toMm: number;
  colour: string;
  cells: number;
  areaMm2: number;
  /** Share of the resin's footprint, 0..100. */
  sharePct: number;
}

export interface DepthCell {
  ix: number;
  iy: number;
  depthMm: number;
  /** Centre of the column, in the report frame. */
  xMm: number;
  yMm: number;
}

export interface DepthSummary {
  bands: DepthBand[];
  /** Where the resin stands deepest; null when there is no resin at all. */
  deepest: DepthCell | null;
  wetCells: number;
  footprintMm2: number;
}

// Light amber to dark walnut: depth reads as darkness, and each step stays apart for common colour-vision deficiencies.
const ramp = ['#f9e6b8', '#f1cd7a', '#e6b246', '#d69824', '#b67c13', '#8f600d', '#6b480b', '#3e2a17'];

/** The colour for band i of n, spread over the whole ramp. */
export function bandColour(index: number, count: number): string {
  if (count <= 1) return ramp[ramp.length - 1]!;
  return ramp[Math.round((index * (ramp.length - 1)) / (count - 1))]!;
}

/** Which band a depth falls in; -1 for dry columns. */
export function bandIndex(depthMm: number, edges: readonly number[]): number {
  if (!(depthMm > 0)) return -1;
  for (let i = 1; i < edges.length; i++) if (depthMm <= edges[i]!) return i - 1;
  return edges.length - 2;
}

/** The depth map grouped into bands of nice round depths, with the footprint each covers and the deepest spot. */
export function summariseDepthMap(map: DepthMap, bandsWanted = 5): DepthSummary & { edgesMm: number[] } {
  const cellAreaMm2 = map.cellMm[0] * map.cellMm[1];
  let deepest: DepthCell | null = null;
  let wetCells = 0;
  for (let iy = 0; iy < map.ny; iy++) {
    for (let ix = 0; ix < map.nx; ix++) {
      const depthMm = map.depthsMm[iy * map.nx + ix] ?? 0;
      if (!(depthMm > 0)) continue;
      wetCells++;
      if (!deepest || depthMm > deepest.depthMm) {
        deepest = { ix, iy, depthMm, xMm: map.originMm[0] + (ix + 0.5) * map.cellMm[0], yMm: map.originMm[1] + (iy + 0.5) * map.cellMm[1] };
      }
    }
  }
  const edgesMm = deepest ? niceTicks(0, deepest.depthMm, bandsWanted + 1).ticks : [0];
  const counts = new Array<number>(Math.max(0, edgesMm.length - 1)).fill(0);
  for (const depthMm of map.depthsMm) {
    const index = bandIndex(depthMm, edgesMm);
    if (index >= 0) counts[index]!++;
  }
  const bands = counts.map((cells, i) => ({
    fromMm: edgesMm[i]!,
    toMm: edgesMm[i + 1]!,
    colour: bandColour(i, counts.length),
    cells,
    areaMm2: cells * cellAreaMm2,
    sharePct: wetCells === 0 ? 0 : (100 * cells) / wetCells,
  }));
  return { bands, deepest, wetCells, footprintMm2: wetCells * cellAreaMm2, edgesMm };
}
