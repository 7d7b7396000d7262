import { convertVolume, formatVolume, mm3ToMl, volumeAtLevel, type UnitSystem, type VolumeCurve, type VolumeUnit } from '@gelpoint/core';
import { mmToShopLength, shopLengthUnit } from './length-input';
import { niceTicks } from './nice-ticks';

export interface PlotBox {
  width: number;
  height: number;
  /** Room for the axis labels on each side, in the SVG's own units. */
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export interface PlotTick {
  value: number;
  at: number;
}

export interface VolumePlot {
  path: string;
  xTicks: PlotTick[];
  yTicks: PlotTick[];
  xUnit: string;
  yUnit: string;
  marker: { x: number; y: number; height: number; volume: number } | null;
}

// core's formatVolume names its units for people; the converter wants its own spelling.
const converterUnit: Record<string, VolumeUnit> = { mL: 'mL', L: 'L', 'fl oz': 'floz', gal: 'gal' };

/** The volume unit an axis up to this many millilitres reads best in, as core's formatter would print its top. */
export function plotVolumeUnit(maxVolumeMl: number, unitSystem: UnitSystem): { label: string; unit: VolumeUnit } {
  const label = formatVolume(maxVolumeMl, unitSystem).unit;
  return { label, unit: converterUnit[label] ?? 'mL' };
}

/**
 * The volume-versus-level curve laid out in an SVG box: heights above `lowestMm` (the datum the fill level is
 * measured from) on x (shop length unit), volume on y (shop volume unit), nice ticks on both, and a marker at the
 * chosen level with the volume the curve holds there.
 */
export function volumePlot(curve: VolumeCurve, lowestMm: number, unitSystem: UnitSystem, markerLevelMm: number | null, box: PlotBox): VolumePlot {
  const topVolumeMl = mm3ToMl(curve[curve.length - 1]?.volumeMm3 ?? 0);
  const yUnit = plotVolumeUnit(topVolumeMl, unitSystem);
  const xOf = (levelMm: number) => mmToShopLength(levelMm - lowestMm, unitSystem);
  const yOf = (volumeMm3: number) => convertVolume(mm3ToMl(volumeMm3), 'mL', yUnit.unit);

  const xs = curve.map((p) => xOf(p.levelMm));
  const ys = curve.map((p) => yOf(p.volumeMm3));
  const xAxis = niceTicks(Math.min(0, ...xs), Math.max(...xs));
  const yAxis = niceTicks(0, Math.max(...ys));
  const x0 = xAxis.ticks[0]!;
  const x1 = xAxis.ticks[xAxis.ticks.length - 1]!;
  const y1 = yAxis.ticks[yAxis.ticks.length - 1]!;
  const innerWidth = box.width - box.left - box.right;
  const innerHeight = box.height - box.top - box.bottom;
  const px = (x: number) => box.left + ((x - x0) / (x1 - x0)) * innerWidth;
  const py = (y: number) => box.top + innerHeight - (y / y1) * innerHeight;

  const path = xs.map((x, i) => `${i === 0 ? 'M' : 'L'}${px(x).toFixed(2)},${py(ys[i]!).toFixed(2)}`).join(' ');
  let marker: VolumePlot['marker'] = null;
  if (markerLevelMm !== null && curve.length > 0) {
    const height = xOf(markerLevelMm);
    const volume = yOf(volumeAtLevel(curve, markerLevelMm));
    marker = { x: px(height), y: py(volume), height, volume };
  }
  return {
    path,
    xTicks: xAxis.ticks.map((value) => ({ value, at: px(value) })),
    yTicks: yAxis.ticks.map((value) => ({ value, at: py(value) })),
    xUnit: shopLengthUnit(unitSystem),
    yUnit: yUnit.label,
    marker,
  };
}

export interface CurveRow {
  heightMm: number;
  volumeMm3: number;
}

/** The curve at evenly spaced heights, for a table that says what the plot draws. */
export function curveRows(curve: VolumeCurve, lowestMm: number, rows = 11): CurveRow[] {
  if (curve.length === 0) return [];
  const first = curve[0]!.levelMm;
  const last = curve[curve.length - 1]!.levelMm;
  return Array.from({ length: rows }, (_, i) => {
    const levelMm = first + ((last - first) * i) / Math.max(1, rows - 1);
    return { heightMm: levelMm - lowestMm, volumeMm3: volumeAtLevel(curve, levelMm) };
  });
}
