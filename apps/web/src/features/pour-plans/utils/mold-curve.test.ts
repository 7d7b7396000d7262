import { planCavityFromMold } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { curveFromLayerVolumes, planCurveLevels } from './mold-curve';

describe('planCurveLevels', () => {
  it('samples evenly from the cavity floor to the fill level', () => {
    const levels = planCurveLevels(-2, 38, 5);
    expect(levels).toEqual([-2, 8, 18, 28, 38]);
    expect(planCurveLevels(0, 30)).toHaveLength(241);
    expect(planCurveLevels(0, 30).at(-1)).toBe(30);
  });

  it('asks for nothing when the level is not above the floor', () => {
    expect(planCurveLevels(10, 10)).toEqual([]);
    expect(planCurveLevels(10, 4)).toEqual([]);
  });

  it('fits the layers request the API accepts (at most 4000 characters)', () => {
    expect(planCurveLevels(-123.456789, 987.654321).join(',').length).toBeLessThanOrEqual(4000);
  });
});

describe('curveFromLayerVolumes', () => {
  // CRC prism volume: a 300 × 200 mm pocket holds 60 000 mm³ per millimetre of depth; its floor is 5 mm above the lowest point.
  it('adds the volumes up into the curve core plans with', () => {
    const layers = [
      { fromMm: 0, toMm: 5, volumeMm3: 0 },
      { fromMm: 5, toMm: 20, volumeMm3: 900_000 },
      { fromMm: 20, toMm: 35, volumeMm3: 900_000 },
    ];
    const curve = curveFromLayerVolumes(layers);
    expect(curve).toEqual([
      { levelMm: 0, volumeMm3: 0 },
      { levelMm: 5, volumeMm3: 0 },
      { levelMm: 20, volumeMm3: 900_000 },
      { levelMm: 35, volumeMm3: 1_800_000 },
    ]);
    const planned = planCavityFromMold({ curve, wettedAreaMm2: 90_000, maxDepthMm: 30 }, 35);
    expect(planned.ok && planned.value.fillLevelMm).toBe(30);
    expect(planned.ok && planned.value.cavity.curve.at(-1)?.volumeMm3).toBe(300 * 200 * 30);
  });

  it('is empty without layers', () => {
    expect(curveFromLayerVolumes([])).toEqual([]);
  });
});
