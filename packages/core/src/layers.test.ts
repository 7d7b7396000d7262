import { describe, expect, it } from 'vitest';
import { splitIntoLayers } from './layers';
import type { VolumeCurve } from './volume-curve';

// CRC Concise Encyclopedia of Mathematics: conical frustum V = πh(R² + Rr + r²)/3.
function frustumVolume(bottomRadius: number, radiusAt: (h: number) => number, h: number): number {
  const top = radiusAt(h);
  return (Math.PI * h * (bottomRadius ** 2 + bottomRadius * top + top ** 2)) / 3;
}

describe('splitIntoLayers', () => {
  it('a 100 mm prism under a 40 mm limit takes three layers of 33.3 mm', () => {
    const curve: VolumeCurve = [
      { levelMm: 0, volumeMm3: 0 },
      { levelMm: 120, volumeMm3: 120 * 5000 },
    ];
    const layers = splitIntoLayers({ curve, fillLevelMm: 100, maxLayerMm: 40 });
    expect(layers.ok).toBe(true);
    if (!layers.ok) return;
    expect(layers.value).toHaveLength(3);
    for (const layer of layers.value) {
      expect(layer.thicknessMm).toBeCloseTo(100 / 3, 12);
      expect(layer.fillVolumeMm3).toBeCloseTo((100 / 3) * 5000, 6);
    }
    expect(layers.value[2]!.toLevelMm).toBe(100);
  });

  it('exactly a whole number of layers needs no extra layer', () => {
    const curve: VolumeCurve = [
      { levelMm: 0, volumeMm3: 0 },
      { levelMm: 80, volumeMm3: 8000 },
    ];
    const layers = splitIntoLayers({ curve, fillLevelMm: 80, maxLayerMm: 40 });
    expect(layers.ok && layers.value.length).toBe(2);
  });

  it('a bowl widening upward: each layer holds its own frustum, layers add up to the fill', () => {
    // Radius 10 mm at the floor, widening 0.5 mm per mm: the R = 10, r = 6, h = 8 frustum of CRC is
    // 1642.006 mm³; here the sampled curve is the exact frustum volume at each millimetre.
    expect(frustumVolume(10, (h) => 10 - 0.5 * h, 8)).toBeCloseTo(1642.006, 3);
    const radiusAt = (h: number) => 10 + 0.5 * h;
    const curve: VolumeCurve = Array.from({ length: 61 }, (_, h) => ({ levelMm: h, volumeMm3: frustumVolume(10, radiusAt, h) }));
    const layers = splitIntoLayers({ curve, fillLevelMm: 60, maxLayerMm: 25 });
    expect(layers.ok).toBe(true);
    if (!layers.ok) return;
    expect(layers.value).toHaveLength(3);
    const total = layers.value.reduce((sum, l) => sum + l.fillVolumeMm3, 0);
    expect(total).toBeCloseTo(frustumVolume(10, radiusAt, 60), 6);
    // The top layer, from 40 to 60 mm, is the difference of two frusta (points fall on whole mm, so exact).
    expect(layers.value[2]!.fillVolumeMm3).toBeCloseTo(frustumVolume(10, radiusAt, 60) - frustumVolume(10, radiusAt, 40), 6);
    expect(layers.value[2]!.fillVolumeMm3).toBeGreaterThan(layers.value[0]!.fillVolumeMm3);
  });

  it('a pocket deeper than the curve start deepens the first layer', () => {
    const curve: VolumeCurve = [
      { levelMm: 0, volumeMm3: 500 },
      { levelMm: 60, volumeMm3: 60_500 },
    ];
    // Depth map: 70 mm of resin at the deepest point when filled to 60 mm, 10 mm below the curve's start.
    const layers = splitIntoLayers({ curve, fillLevelMm: 60, maxLayerMm: 30, maxDepthMm: 70 });
    expect(layers.ok).toBe(true);
    if (!layers.ok) return;
    expect(layers.value.map((l) => l.deepestResinMm)).toEqual([40, 30]);
    // The volume below the curve's start goes into the first layer.
    expect(layers.value[0]!.fillVolumeMm3).toBe(30_500);
  });

  it('refuses a fill level outside the curve and a curve that does not rise', () => {
    const curve: VolumeCurve = [
      { levelMm: 0, volumeMm3: 0 },
      { levelMm: 50, volumeMm3: 5000 },
    ];
    const above = splitIntoLayers({ curve, fillLevelMm: 60, maxLayerMm: 20 });
    expect(above.ok || above.error.code).toBe('fill_level_above_curve');
    const below = splitIntoLayers({ curve, fillLevelMm: 0, maxLayerMm: 20 });
    expect(below.ok || below.error.code).toBe('fill_level_below_floor');
    const flat = splitIntoLayers({
      curve: [
        { levelMm: 0, volumeMm3: 0 },
        { levelMm: 0, volumeMm3: 10 },
      ],
      fillLevelMm: 0,
      maxLayerMm: 20,
    });
    expect(flat.ok || flat.error.code).toBe('curve_not_rising');
    const shrinking = splitIntoLayers({
      curve: [
        { levelMm: 0, volumeMm3: 10 },
        { levelMm: 5, volumeMm3: 5 },
      ],
      fillLevelMm: 5,
      maxLayerMm: 20,
    });
    expect(shrinking.ok || shrinking.error.code).toBe('curve_volume_falls');
  });
});
