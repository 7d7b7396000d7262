import { prepareLayerModel, runLayer, type Numerics, type PourConditions } from './layer-model';
import type { ResinThermal } from './resin-thermal';
import { fail, ok, type Result } from './result';

/** Resin depth per column at the fill level, row-major (index j·nx + i), as the cavity report gives it. */
export interface DepthGrid {
  depthsMm: Float32Array;
  nx: number;
  ny: number;
  /** Column size, mm: one number for square columns or [x, y]. */
  cellMm: number | [number, number];
}

/** A planned layer: [bottomMm, topMm], levels above the cavity floor (the deepest column's floor is 0). */
export type PlannedLayer = [number, number];

export interface MouldLayerForecast {
  index: number;
  bottomMm: number;
  topMm: number;
  peakC: number;
  /** Minutes from mixing this layer to its peak. */
  timeToPeakMin: number;
  /** Column where this layer peaks. */
  hottest: { i: number; j: number };
  runaway: boolean;
  /** Forecasts run for this layer (one per depth class). */
  classes: number;
}

export interface MouldForecast {
  layers: MouldLayerForecast[];
  /** Hottest forecast temperature of each column over all layers, same grid; NaN where no resin stands. */
  peakMap: Float32Array;
  /** The hottest spot of the whole pour, null when no column holds resin. */
  hottest: { i: number; j: number; layerIndex: number; tempC: number; timeToPeakMin: number } | null;
}

export interface MouldOptions extends Numerics {
  /**
   * Width of a depth class, mm. A column whose floor lies inside a layer is forecast at its resin
   * depth rounded up to a whole class (deeper is hotter, so rounding up errs hot); 0 forecasts every
   * distinct column exactly. 1 mm by default.
   */
  classStepMm?: number;
}

type MouldConditions = Omit<PourConditions, 'curedResinBelowMm' | 'surfaceLengthMm'>;

function checkInput(map: DepthGrid, layers: PlannedLayer[], step: number): string | null {
  if (!Number.isInteger(map.nx) || !Number.isInteger(map.ny) || map.nx <= 0 || map.ny <= 0)
    return `The depth map needs whole positive column counts, got ${map.nx} × ${map.ny}.`;
  if (!(map.depthsMm instanceof Float32Array) || map.depthsMm.length !== map.nx * map.ny)
    return `The depth map must hold nx × ny = ${map.nx * map.ny} depths, got ${map.depthsMm?.length ?? 0}.`;
  const [cx, cy] = typeof map.cellMm === 'number' ? [map.cellMm, map.cellMm] : map.cellMm;
  if (!(cx > 0 && cy > 0 && Number.isFinite(cx) && Number.isFinite(cy))) return "The depth map's column size must be above zero (mm).";
  if (!(step >= 0 && Number.isFinite(step))) return `The depth class width must be zero or more mm, got ${String(step)}.`;
  if (layers.length === 0) return 'Plan at least one layer ([bottomMm, topMm] above the cavity floor).';
  for (let k = 0; k < layers.length; k++) {
    const [b, t] = layers[k]!;
    if (!(Number.isFinite(b) && Number.isFinite(t) && b >= 0 && t > b))
      return `Layer ${k + 1} must run from a level of 0 mm or more up to a higher level, got [${b}, ${t}].`;
    if (k > 0 && b < layers[k - 1]![1] - 1e-9)
      return `Layer ${k + 1} starts at ${b} mm, below the top of layer ${k} (${layers[k - 1]![1]} mm); layers go up in order without overlapping.`;
  }
  return null;
}

/** Area / perimeter of the wet columns, the length the hot-plate correlation wants. */
function surfaceLengthMm(wet: Uint8Array, nx: number, ny: number, cx: number, cy: number): number {
  let count = 0;
  let perimeter = 0;
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      if (!wet[j * nx + i]) continue;
      count++;
      if (i === 0 || !wet[j * nx + i - 1]) perimeter += cy;
      if (i === nx - 1 || !wet[j * nx + i + 1]) perimeter += cy;
      if (j === 0 || !wet[(j - 1) * nx + i]) perimeter += cx;
      if (j === ny - 1 || !wet[(j + 1) * nx + i]) perimeter += cx;
    }
  }
  return (count * cx * cy) / perimeter;
}

/** Cured-resin classes under full-thickness columns: 0, then doubling from one class width, then the layer's bottom. */
function curedEdges(bottomMm: number, step: number): number[] {
  const edges = [0];
  for (let e = Math.max(step, 0.5); e < bottomMm; e *= 2) edges.push(e);
  if (bottomMm > 0) edges.push(bottomMm);
  return edges;
}

/**
 * The whole pour, layer by layer, from the cavity's depth map. Each column is forecast as its own
 * 1-D column: ignoring sideways conduction keeps the heat of the deepest spot in it, erring hot
 * there. Columns are grouped into depth classes and each class is forecast once per layer; each
 * layer is poured on the earlier layers, cured and back at the base temperature.
 * A column whose floor is above a layer's bottom gets part of that layer on wood (its depth rounded
 * up to a class); one below gets the full layer on cured resin, forecast at the class edges on
 * either side of its cured depth, keeping the hotter (the peak moves steadily between them).
 */
export function forecastMould(
  resin: ResinThermal,
  conditions: MouldConditions,
  map: DepthGrid,
  layers: PlannedLayer[],
  options: MouldOptions = {},
): Result<MouldForecast> {
  const step = options.classStepMm ?? 1;
  const bad = checkInput(map, layers, step);
  if (bad) return fail('mould_forecast_invalid', bad);
  const { nx, ny, depthsMm } = map;
  const [cx, cy] = typeof map.cellMm === 'number' ? [map.cellMm, map.cellMm] : map.cellMm;
  let fillMm = 0;
  for (let k = 0; k < depthsMm.length; k++) if (depthsMm[k]! > fillMm) fillMm = depthsMm[k]!;
  const peakMap = new Float32Array(nx * ny).fill(NaN);
  const out: MouldLayerForecast[] = [];
  let hottest: MouldForecast['hottest'] = null;
  const wet = new Uint8Array(nx * ny);
  const columnPeak = new Float64Array(nx * ny);
  const columnTime = new Float64Array(nx * ny);

  for (let li = 0; li < layers.length; li++) {
    const [bottom, top] = layers[li]!;
    wet.fill(0);
    let wetCount = 0;
    for (let k = 0; k < depthsMm.length; k++) {
      const d = depthsMm[k]!;
      if (d > 0 && fillMm - d < top) {
        wet[k] = 1;
        wetCount++;
      }
    }
    if (wetCount === 0) {
      out.push({ index: li, bottomMm: bottom, topMm: top, peakC: NaN, timeToPeakMin: NaN, hottest: { i: -1, j: -1 }, runaway: false, classes: 0 });
      continue;
    }
    const prepared = prepareLayerModel(resin, { ...conditions, surfaceLengthMm: surfaceLengthMm(wet, nx, ny, cx, cy) });
    if (!prepared.ok) return prepared;
    const model = prepared.value;
    const cache = new Map<string, { peakC: number; timeS: number; runaway: boolean }>();
    const forecast = (resinMm: number, curedMm: number) => {
      const key = `${resinMm}|${curedMm}`;
      let hit = cache.get(key);
      if (!hit) {
        const { run } = runLayer(model, resinMm, { ...options, curedResinBelowMm: curedMm });
        hit = { peakC: run.peakC, timeS: run.peakTimeS, runaway: run.runaway };
        cache.set(key, hit);
      }
      return hit;
    };
    const full = top - bottom;
    const edges = curedEdges(bottom, step);
    let layerRunaway = false;
    let best = -1;
    for (let k = 0; k < depthsMm.length; k++) {
      if (!wet[k]) continue;
      const floor = fillMm - depthsMm[k]!;
      let result: { peakC: number; timeS: number; runaway: boolean };
      if (floor > bottom) {
        const resinMm = top - floor;
        result = forecast(step > 0 ? Math.min(full, Math.ceil(resinMm / step - 1e-9) * step) : resinMm, 0);
      } else if (step === 0) {
        result = forecast(full, bottom - floor);
      } else {
        const cured = bottom - floor;
        let e = 0;
        while (e + 1 < edges.length && edges[e + 1]! <= cured) e++;
        const below = forecast(full, edges[e]!);
        const above = edges[e]! === cured || e + 1 >= edges.length ? below : forecast(full, edges[e + 1]!);
        result = above.peakC > below.peakC ? above : below;
      }
      columnPeak[k] = result.peakC;
      columnTime[k] = result.timeS;
      layerRunaway ||= result.runaway;
      if (!(peakMap[k]! >= result.peakC)) peakMap[k] = result.peakC;
      if (best < 0 || result.peakC > columnPeak[best]!) best = k;
    }
    const offsetMin = conditions.minutesMixedBeforePour ?? 0;
    const layer: MouldLayerForecast = {
      index: li,
      bottomMm: bottom,
      topMm: top,
      peakC: columnPeak[best]!,
      timeToPeakMin: columnTime[best]! / 60 + offsetMin,
      hottest: { i: best % nx, j: Math.floor(best / nx) },
      runaway: layerRunaway,
      classes: cache.size,
    };
    out.push(layer);
    if (!hottest || layer.peakC > hottest.tempC) {
      hottest = { i: layer.hottest.i, j: layer.hottest.j, layerIndex: li, tempC: layer.peakC, timeToPeakMin: layer.timeToPeakMin };
    }
  }
  return ok({ layers: out, peakMap, hottest });
}
