import { mm3ToMl, mlToMm3, volumeAtLevel, type VolumeCurve } from '@gelpoint/core';

export interface ChartLayer {
  fromLevelMm: number;
  toLevelMm: number;
  fillVolumeMl: number;
}

export interface ChartBand {
  index: number;
  /** SVG polygon points: the resin of this layer, between the level axis and the volume curve. */
  points: string;
  yTop: number;
  yBottom: number;
  /** Where the band's label sits (the middle of the band, right of the curve). */
  labelX: number;
  labelY: number;
}

export interface LayerChartGeometry {
  plot: { left: number; top: number; width: number; height: number };
  curvePoints: string;
  bands: ChartBand[];
  levelTicks: { levelMm: number; y: number }[];
  topLevelMm: number;
  maxVolumeMl: number;
}

export interface LayerChartInput {
  layers: readonly ChartLayer[];
  /** The cavity's curve, levels from the floor; without it the curve runs straight between the layer boundaries. */
  curve?: VolumeCurve;
  width: number;
  height: number;
  margin?: { left: number; right: number; top: number; bottom: number };
}

const defaultMargin = { left: 64, right: 16, top: 12, bottom: 28 };

/** The curve the layers imply: zero at the floor, then what sits below each layer's top. */
export function curveFromLayers(layers: readonly ChartLayer[]): VolumeCurve {
  const first = layers[0];
  if (!first) return [];
  const curve: VolumeCurve = [{ levelMm: first.fromLevelMm, volumeMm3: 0 }];
  let below = 0;
  for (const layer of layers) {
    below += mlToMm3(layer.fillVolumeMl);
    curve.push({ levelMm: layer.toLevelMm, volumeMm3: below });
  }
  return curve;
}

const round = (n: number) => Math.round(n * 10) / 10;

/**
 * Volume against level, the way the cavity fills: level up the side, volume along the bottom, each layer a band
 * of the area under the curve. Pure geometry in SVG units, so it can be checked without a browser.
 */
export function layerChartGeometry(input: LayerChartInput): LayerChartGeometry | null {
  const { layers } = input;
  const first = layers[0];
  const last = layers[layers.length - 1];
  if (!first || !last) return null;
  const margin = input.margin ?? defaultMargin;
  const plot = { left: margin.left, top: margin.top, width: input.width - margin.left - margin.right, height: input.height - margin.top - margin.bottom };
  const curve = input.curve && input.curve.length >= 2 ? input.curve : curveFromLayers(layers);
  const bottomMm = first.fromLevelMm;
  const topLevelMm = last.toLevelMm;
  const volumeMlAt = (levelMm: number) => mm3ToMl(volumeAtLevel(curve, levelMm));
  const maxVolumeMl = Math.max(volumeMlAt(topLevelMm), Number.MIN_VALUE);
  const span = topLevelMm - bottomMm || 1;
  const x = (volumeMl: number) => round(plot.left + (volumeMl / maxVolumeMl) * plot.width);
  const y = (levelMm: number) => round(plot.top + plot.height - ((levelMm - bottomMm) / span) * plot.height);

  const pointsBetween = (fromMm: number, toMm: number): [number, number][] => {
    const inner = curve.filter((p) => p.levelMm > fromMm && p.levelMm < toMm).map((p) => p.levelMm);
    return [fromMm, ...inner, toMm].map((level) => [x(volumeMlAt(level)), y(level)]);
  };

  const bands = layers.map((layer, index) => {
    const edge = pointsBetween(layer.fromLevelMm, layer.toLevelMm);
    const outline: [number, number][] = [[plot.left, y(layer.fromLevelMm)], ...edge, [plot.left, y(layer.toLevelMm)]];
    const yTop = y(layer.toLevelMm);
    const yBottom = y(layer.fromLevelMm);
    const midLevel = (layer.fromLevelMm + layer.toLevelMm) / 2;
    return {
      index,
      points: outline.map(([px, py]) => `${px},${py}`).join(' '),
      yTop,
      yBottom,
      labelX: round(Math.min(x(volumeMlAt(midLevel)) + 8, plot.left + plot.width - 4)),
      labelY: round((yTop + yBottom) / 2),
    };
  });

  return {
    plot,
    curvePoints: pointsBetween(bottomMm, topLevelMm)
      .map(([px, py]) => `${px},${py}`)
      .join(' '),
    bands,
    levelTicks: [bottomMm, ...layers.map((l) => l.toLevelMm)].map((levelMm) => ({ levelMm, y: y(levelMm) })),
    topLevelMm,
    maxVolumeMl,
  };
}
