import { forecastLayer } from '@gelpoint/thermal';
import { describe, expect, it } from 'vitest';
import { calibratedProduct, forecastPlanLayers, peakAtDepth } from './plan-exotherm';
import type { ResinSystem } from './shelf';
import { demoDeepPour } from './test-fixtures';

// An invented deep-pour product (demo numbers), as in the plan's forecast tests.
const product: ResinSystem = { ...demoDeepPour, maxBatchG: 100_000, acceptedPeakC: 55, thinFilmGelMin: 600 };
const shopTempC = 22;

// A demo 8 × 8 mould of 10 mm columns, every column wet, whole-millimetre depths from 12 mm at the rim to 18 mm in the middle.
const nx = 8;
const ny = 8;
const depthsMm = new Float32Array(nx * ny);
for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) depthsMm[j * nx + i] = 18 - 2 * Math.max(Math.abs(i - 3.5), Math.abs(j - 3.5)) + 1;
const fillLevelMm = 18;
const depthMap = { originMm: [100, 50] as [number, number], cellMm: [10, 10] as [number, number], nx, ny, depthsMm };
const slice = { index: 0, fromLevelMm: 0, toLevelMm: fillLevelMm, thicknessMm: fillLevelMm, fillVolumeMm3: 0, deepestResinMm: fillLevelMm };

describe('the mould’s peak map', () => {
  const result = forecastPlanLayers(product, { slices: [slice], fillLevelMm, shopTempC, depthMap });
  if (!result.ok) throw new Error(result.error.message);
  const map = result.value.peakMap!;
  const cal = calibratedProduct(product);
  if (!cal.ok) throw new Error(cal.error.message);
  const resin = cal.value.calibration.resin;

  it('paints each column with the single-layer forecast of its own depth', () => {
    // The reference is the thermal package's one-column forecast of a uniform layer of that depth on bare wood,
    // with the same plate length the whole-mould run uses: area / perimeter of the wet 80 × 80 mm square = 20 mm.
    const distinct = [...new Set(depthsMm)].sort((a, b) => a - b);
    expect(distinct.length).toBe(4);
    for (const d of distinct) {
      const single = forecastLayer(resin, { ambient: shopTempC, base: 'wood', curedResinBelowMm: 0, surfaceLengthMm: 20 }, d, { series: false });
      if (!single.ok) throw new Error(single.error.message);
      expect(peakAtDepth(map.bands, d), `${d} mm`).toBeCloseTo(single.value.peakC, 1);
    }
  });

  it('stays under the adiabatic rise and grows with depth', () => {
    // Adiabatic temperature rise = heat of reaction / heat capacity (Incropera, energy balance; the brief's ΔH/cp),
    // with the heat the calibration keeps: no column can get hotter than the shop plus that rise.
    const ceilingC = shopTempC + (resin.reactionHeatJPerG * (resin.heatScale ?? 1)) / resin.heatCapacityJPerGK;
    let last = -Infinity;
    for (const band of map.bands) {
      expect(band.peakC).toBeLessThanOrEqual(ceilingC);
      expect(band.peakC).toBeGreaterThan(shopTempC);
      // Deeper resin keeps more of its heat (a thicker slab's conduction path is longer): never cooler.
      expect(band.peakC).toBeGreaterThanOrEqual(last);
      last = band.peakC;
    }
  });

  it('names the hottest column where the deepest resin stands, in the mould’s frame', () => {
    expect(map.hottest.layerIndex).toBe(0);
    expect(map.hottest.peakC).toBeCloseTo(Math.max(...map.bands.map((b) => b.peakC)), 1);
    // The four 18 mm columns are i, j ∈ {3, 4}: centres at 100 + 35 or 45 mm and 50 + 35 or 45 mm.
    expect([135, 145]).toContain(map.hottest.xMm);
    expect([85, 95]).toContain(map.hottest.yMm);
    expect(result.value.layers[0]!.peakC).toBeCloseTo(map.hottest.peakC, 6);
  });

  it('paints nothing where no resin stands or deeper than the plan’s map', () => {
    expect(peakAtDepth(map.bands, 0)).toBeNull();
    expect(peakAtDepth(map.bands, 40)).toBeNull();
    // A float depth a hair off a whole millimetre (a client's Float32 map) still falls in its band.
    expect(peakAtDepth(map.bands, Math.fround(7.0000001))).toBe(peakAtDepth(map.bands, 7));
  });
});
