import { describe, expect, it } from 'vitest';
import { forecastMould, type DepthGrid, type PlannedLayer } from './mould-forecast';
import { dgebaAmineDefaults, type ResinThermal } from './resin-thermal';

const resin: ResinThermal = { ...dgebaAmineDefaults, reactionHeatJPerG: 160, gelTimeMin: 600, refTempC: 22 };

function grid(nx: number, ny: number, depths: number[]): DepthGrid {
  return { nx, ny, cellMm: 10, depthsMm: Float32Array.from(depths) };
}

describe('whole-mould forecast', () => {
  const layers: PlannedLayer[] = [
    [0, 20],
    [20, 40],
  ];

  it('depth classes give the same peaks as forecasting every column on its own when depths sit on class edges', () => {
    // Columns 40 (deepest), 36, 20, 10 and 24 mm deep, and a dry one: whole-mm resin depths in the
    // first layer and cured depths of 0, 4, 16 and 20 mm under the second, all on class edges.
    const map = grid(3, 2, [40, 36, 20, 10, 0, 24]);
    const classes = forecastMould(resin, { ambient: 22 }, map, layers, { classStepMm: 1 });
    const each = forecastMould(resin, { ambient: 22 }, map, layers, { classStepMm: 0 });
    if (!classes.ok || !each.ok) throw new Error('forecast failed');
    for (let k = 0; k < 6; k++) {
      if (k === 4) {
        expect(classes.value.peakMap[k]).toBeNaN();
        continue;
      }
      expect(classes.value.peakMap[k]).toBeCloseTo(each.value.peakMap[k]!, 9);
    }
    expect(classes.value.layers.map((l) => l.peakC)).toEqual(each.value.layers.map((l) => l.peakC));
  });

  it('with depths off the class edges, classes err hot by a little', () => {
    const depths = [38.3, 31.7, 24.2, 17.9, 9.4, 3.3, 27.1, 12.6, 35.5];
    const map = grid(3, 3, depths);
    const classes = forecastMould(resin, { ambient: 22 }, map, layers, { classStepMm: 1 });
    const each = forecastMould(resin, { ambient: 22 }, map, layers, { classStepMm: 0 });
    if (!classes.ok || !each.ok) throw new Error('forecast failed');
    for (let k = 0; k < depths.length; k++) {
      expect(classes.value.peakMap[k]!).toBeGreaterThanOrEqual(each.value.peakMap[k]! - 1e-6);
      expect(classes.value.peakMap[k]! - each.value.peakMap[k]!).toBeLessThan(1.5);
    }
  });

  it('finds the hottest spot where the resin stands deepest in the first layer', () => {
    const map = grid(4, 1, [12, 40, 25, 5]);
    const r = forecastMould(resin, { ambient: 22 }, map, layers);
    if (!r.ok) throw new Error(r.error.message);
    const first = r.value.layers[0]!;
    // Layer 1 holds 20 mm at the 40 mm column (floor at 0) and only partial depths elsewhere.
    expect(first.hottest).toEqual({ i: 1, j: 0 });
    expect(r.value.hottest).not.toBeNull();
    expect(r.value.hottest!.tempC).toBe(Math.max(...r.value.layers.map((l) => l.peakC)));
    expect(Number.isNaN(r.value.peakMap[0]!)).toBe(false);
  });

  it('refuses a map and layers that do not fit', () => {
    const bad = forecastMould(resin, { ambient: 22 }, grid(2, 2, [1, 2, 3]), layers);
    expect(bad.ok).toBe(false);
    const overlap = forecastMould(resin, { ambient: 22 }, grid(1, 1, [10]), [
      [0, 10],
      [5, 20],
    ]);
    if (overlap.ok) throw new Error('accepted overlapping layers');
    expect(overlap.error.message).toMatch(/without overlapping/);
  });
});
