import { describe, expect, it } from 'vitest';
import { layerLines } from './layer-lines';

// The 80 × 40 × 20 mm pocket in a 30 mm block, floor at z = 10. CRC Concise Encyclopedia of
// Mathematics: a right prism holds base area × height, so each h mm of layer holds 80 × 40 × h mm³.
const pocket = {
  curve: [
    { levelMm: 0, volumeMm3: 0 },
    { levelMm: 10, volumeMm3: 0 },
    { levelMm: 30, volumeMm3: 64_000 },
  ],
  wettedAreaMm2: 80 * 40 + 2 * (80 + 40) * 20,
  maxDepthMm: 20,
};

describe('layerLines', () => {
  it('splits a 20 mm pocket with a 6 mm limit into four 5 mm layers from the floor', () => {
    const lines = layerLines({ ...pocket, fillLevelMm: 30, maxLayerMm: 6 });
    expect(lines.ok).toBe(true);
    if (!lines.ok) return;
    expect(lines.value.floorMm).toBe(10);
    expect(lines.value.levelsMm).toEqual([10, 15, 20, 25, 30]);
    for (const layer of lines.value.layers) {
      expect(layer.thicknessMm).toBeCloseTo(5, 9);
      expect(layer.fillVolumeMm3).toBeCloseTo(80 * 40 * 5, 6);
    }
  });

  it('needs one layer when the limit is deeper than the pour', () => {
    const lines = layerLines({ ...pocket, fillLevelMm: 20, maxLayerMm: 25 });
    expect(lines.ok && lines.value.levelsMm).toEqual([10, 20]);
    expect(lines.ok && lines.value.layers[0]!.fillVolumeMm3).toBeCloseTo(80 * 40 * 10, 6);
  });

  it('passes on core’s sentence for a level below the floor', () => {
    const lines = layerLines({ ...pocket, fillLevelMm: 5, maxLayerMm: 6 });
    expect(lines.ok).toBe(false);
    if (lines.ok) return;
    expect(lines.error.code).toBe('fill_below_floor');
  });

  it('refuses a layer thickness of zero with core’s sentence', () => {
    const lines = layerLines({ ...pocket, fillLevelMm: 30, maxLayerMm: 0 });
    expect(!lines.ok && lines.error.code).toBe('max_layer_not_positive');
  });
});
