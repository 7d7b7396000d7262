import { formatLength, formatTemperature, type ExothermSettingField, type PlanForecast, type UnitSystem } from '@gelpoint/core';
import { formatHours } from './plan-format';

type Available = Extract<PlanForecast, { available: true }>;

const settingWords: Record<ExothermSettingField, string> = {
  reactionHeatJPerG: 'heat of reaction',
  thinFilmGelMin: 'thin-film gel time',
  heatCapacityJPerGK: 'heat capacity',
  conductivityWPerMK: 'thermal conductivity',
  acceptedPeakC: 'accepted peak',
  activationEnergyKJPerMol: 'activation energy',
};

export interface ForecastLayerWords {
  index: number;
  /** "Layer 2: peaks at 48.3 °C about 6 h 10 min after mixing, 12 mm below the surface." */
  sentence: string;
  overLimit: boolean;
}

export interface ForecastWords {
  layers: ForecastLayerWords[];
  /** One plain sentence per layer over the limit; empty when every layer stays under. */
  warnings: string[];
  /** Why the layers are as thick as they are. */
  basis: string;
  calibration: string;
  /** The empty shelf settings the forecast took defaults for, or null. */
  defaults: string | null;
}

export function forecastWords(f: Available, unitSystem: UnitSystem, spotWords?: (xMm: number, yMm: number) => string): ForecastWords {
  const temp = (c: number) => formatTemperature(c, unitSystem).text;
  const length = (mm: number) => formatLength(mm, unitSystem).text;
  const layers = f.layers.map((l) => {
    const where = l.hottest && spotWords ? `, hottest ${spotWords(l.hottest.xMm, l.hottest.yMm)}` : '';
    return {
      index: l.index,
      sentence: `Layer ${l.index + 1}: peaks at ${temp(l.peakC)} about ${formatHours(l.timeToPeakMin / 60)} after mixing, ${length(l.peakDepthMm)} below the surface${where}.`,
      overLimit: l.overLimit,
    };
  });
  const warnings = f.layers
    .filter((l) => l.overLimit)
    .map((l) =>
      l.runaway
        ? `Layer ${l.index + 1} is forecast to run away: it would heat until it smokes. Pour it thinner, in a cooler shop, or with a slower product.`
        : `Layer ${l.index + 1} is forecast to reach ${temp(l.peakC)}, over the ${temp(f.limitC)} the shop accepts: pour it thinner or when the shop is cooler.`,
    );
  const basis =
    f.limitedBy === 'forecast'
      ? `At ${temp(f.shopTempC)} the forecast keeps a single layer under ${temp(f.limitC)} only up to ${length(f.maxLayerMm)}, thinner than the data sheet's ${length(f.calibration.maxLayerMm)}; the layers follow the forecast.`
      : `At ${temp(f.shopTempC)} the data sheet's ${length(f.calibration.maxLayerMm)} is the tighter limit; the forecast never makes a layer thicker than that.`;
  const defaults =
    f.defaultsUsed.length > 0 ? `Defaults used for what the shelf leaves empty: ${f.defaultsUsed.map((d) => settingWords[d]).join(', ')}.` : null;
  return { layers, warnings, basis, calibration: `An estimate. ${f.calibratedTo}`, defaults };
}

export interface CurveGeometry {
  points: string;
  /** y of the accepted peak, when it falls inside the plot. */
  limitY: number | null;
  peak: { x: number; y: number };
  maxTimeMin: number;
  lowC: number;
  highC: number;
}

/** Temperature against time in a box of width × height (y grows downwards), scaled to hold the curve and the limit. */
export function forecastCurveGeometry(
  curve: readonly { timeMin: number; tempC: number }[],
  limitC: number,
  width: number,
  height: number,
): CurveGeometry | null {
  if (curve.length < 2) return null;
  const maxTimeMin = curve.at(-1)!.timeMin;
  if (!(maxTimeMin > 0)) return null;
  let lowC = Infinity;
  let highC = -Infinity;
  for (const p of curve) {
    lowC = Math.min(lowC, p.tempC);
    highC = Math.max(highC, p.tempC);
  }
  highC = Math.max(highC, limitC) + 2;
  lowC -= 2;
  const x = (t: number) => (t / maxTimeMin) * width;
  const y = (c: number) => height - ((c - lowC) / (highC - lowC)) * height;
  let peak = curve[0]!;
  for (const p of curve) if (p.tempC > peak.tempC) peak = p;
  return {
    points: curve.map((p) => `${x(p.timeMin).toFixed(1)},${y(p.tempC).toFixed(1)}`).join(' '),
    limitY: limitC <= highC ? y(limitC) : null,
    peak: { x: x(peak.timeMin), y: y(peak.tempC) },
    maxTimeMin,
    lowC,
    highC,
  };
}
