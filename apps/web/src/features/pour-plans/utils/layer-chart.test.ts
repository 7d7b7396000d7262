import { describe, expect, it } from 'vitest';
import { curveFromLayers, layerChartGeometry } from './layer-chart';

// A straight-walled 300 × 200 mm pocket, 30 mm deep, in two 15 mm layers: CRC prism volume V = base × height,
// so each layer holds 300 × 200 × 15 mm³ = 900 mL and the volume grows linearly with the level.
const layers = [
  { fromLevelMm: 0, toLevelMm: 15, fillVolumeMl: 900 },
  { fromLevelMm: 15, toLevelMm: 30, fillVolumeMl: 900 },
];
const margin = { left: 0, right: 0, top: 0, bottom: 0 };

describe('layerChartGeometry', () => {
  const chart = layerChartGeometry({ layers, width: 300, height: 300, margin })!;

  it('draws one band per layer, stacked from the floor up', () => {
    expect(chart.bands).toHaveLength(2);
    expect(chart.bands[0]).toMatchObject({ yBottom: 300, yTop: 150 });
    expect(chart.bands[1]).toMatchObject({ yBottom: 150, yTop: 0 });
    expect(chart.levelTicks.map((t) => t.levelMm)).toEqual([0, 15, 30]);
  });

  it('runs the curve from nothing at the floor to the whole fill at the top', () => {
    expect(chart.maxVolumeMl).toBe(1800);
    expect(chart.curvePoints).toBe('0,300 150,150 300,0');
  });

  it('bounds each band by the level axis and the curve', () => {
    expect(chart.bands[0]!.points).toBe('0,300 0,300 150,150 0,150');
    expect(chart.bands[1]!.points).toBe('0,150 150,150 300,0 0,0');
  });

  it('follows a cavity’s own curve between the layer boundaries', () => {
    // A pocket that widens upward: half the volume sits in the top third.
    const curve = [
      { levelMm: 0, volumeMm3: 0 },
      { levelMm: 20, volumeMm3: 900_000 },
      { levelMm: 30, volumeMm3: 1_800_000 },
    ];
    const shaped = layerChartGeometry({ layers, curve, width: 300, height: 300, margin })!;
    expect(shaped.curvePoints).toBe('0,300 150,100 300,0');
    // Linear between samples: at 15 mm, 15/20 of 900 mL = 675 mL, which is 112.5 of the 300 units for 1800 mL.
    expect(shaped.bands[0]!.points).toBe('0,300 0,300 112.5,150 0,150');
    expect(shaped.bands[1]!.points).toBe('0,150 112.5,150 150,100 300,0 0,0');
  });

  it('draws nothing without layers', () => {
    expect(layerChartGeometry({ layers: [], width: 300, height: 300 })).toBeNull();
  });

  it('derives the curve from the layers when there is no other', () => {
    expect(curveFromLayers(layers)).toEqual([
      { levelMm: 0, volumeMm3: 0 },
      { levelMm: 15, volumeMm3: 900_000 },
      { levelMm: 30, volumeMm3: 1_800_000 },
    ]);
  });
});
