import { describe, expect, it } from 'vitest';
import { areaDepthCavity, channelCavity, cylinderCavity, rectangleCavity } from './quick-shapes';
import { volumeAtLevel } from './volume-curve';

function value<T>(result: { ok: true; value: T } | { ok: false; error: { message: string } }): T {
  if (!result.ok) throw new Error(result.error.message);
  return result.value;
}

describe('quick shapes', () => {
  it('rectangle: V = l·w·h, wetted = floor + four walls', () => {
    // CRC Concise Encyclopedia of Mathematics: rectangular parallelepiped V = abc.
    // 300 × 100 × 20 mm: V = 600 000 mm³ = 600 mL; wetted = 30 000 + 2·(300 + 100)·20 = 46 000 mm².
    const pocket = value(rectangleCavity({ lengthMm: 300, widthMm: 100, depthMm: 20 }));
    expect(pocket.fillVolumeMm3).toBe(600_000);
    expect(pocket.fillVolumeMl).toBe(600);
    expect(pocket.wettedAreaMm2).toBe(46_000);
    expect(pocket.maxDepthMm).toBe(20);
    expect(volumeAtLevel(pocket.curve, 5)).toBeCloseTo(150_000, 6);
  });

  it('channel: the dammed ends take no seal coat', () => {
    // 1000 × 150 × 40 mm: wetted = 150 000 + 2·1000·40 = 230 000 mm²; V = 6 L.
    const river = value(channelCavity({ lengthMm: 1000, widthMm: 150, depthMm: 40 }));
    expect(river.wettedAreaMm2).toBe(230_000);
    expect(river.fillVolumeMl).toBe(6000);
  });

  it('cylinder: V = πr²h, wetted = πr² + 2πrh', () => {
    // CRC Concise Encyclopedia of Mathematics: cylinder V = πr²h, lateral area 2πrh.
    // d = 80, h = 25: V = π·1600·25 = 125 663.7 mm³; wetted = π·1600 + π·80·25 = 11 309.7 mm².
    const round = value(cylinderCavity({ diameterMm: 80, depthMm: 25 }));
    expect(round.fillVolumeMm3).toBeCloseTo(125_663.706, 3);
    expect(round.wettedAreaMm2).toBeCloseTo(11_309.734, 3);
    expect(volumeAtLevel(round.curve, 10)).toBeCloseTo(Math.PI * 1600 * 10, 6);
  });

  it('area × average depth: flat floor when the deepest point is the average', () => {
    // 20 000 mm² at 15 mm: 300 mL; the walls of a circle of that area: 2√(π·20 000) = 501.3 mm.
    const flat = value(areaDepthCavity({ areaMm2: 20_000, averageDepthMm: 15 }));
    expect(flat.fillVolumeMl).toBe(300);
    expect(flat.wettedAreaEstimated).toBe(true);
    expect(flat.wettedAreaMm2).toBeCloseTo(20_000 + 2 * Math.sqrt(Math.PI * 20_000) * 15, 6);
    expect(flat.curve).toHaveLength(2);
  });

  it('area × average depth with a deeper point: the curve still holds A·d at the rim and rises monotonically', () => {
    const landscape = value(areaDepthCavity({ areaMm2: 20_000, averageDepthMm: 10, maxDepthMm: 30, perimeterMm: 600 }));
    expect(landscape.maxDepthMm).toBe(30);
    expect(landscape.wettedAreaEstimated).toBe(false);
    expect(landscape.wettedAreaMm2).toBe(20_000 + 600 * 10);
    const top = landscape.curve[landscape.curve.length - 1]!;
    expect(top).toEqual({ levelMm: 30, volumeMm3: 200_000 });
    for (let i = 1; i < landscape.curve.length; i++) {
      expect(landscape.curve[i]!.volumeMm3).toBeGreaterThanOrEqual(landscape.curve[i - 1]!.volumeMm3);
    }
    // The floor model's wetted area at the rim is the outline: dV/dh at h = H is A·d·(H/d)/H = A.
    const last = landscape.curve.at(-1)!;
    const before = landscape.curve.at(-2)!;
    const slope = (last.volumeMm3 - before.volumeMm3) / (last.levelMm - before.levelMm);
    expect(slope).toBeGreaterThan(20_000 * 0.9);
    expect(slope).toBeLessThanOrEqual(20_000);
  });

  it('refuses zero or negative sizes and a deepest point above the average', () => {
    expect(rectangleCavity({ lengthMm: 0, widthMm: 10, depthMm: 10 }).ok).toBe(false);
    expect(cylinderCavity({ diameterMm: 10, depthMm: -1 }).ok).toBe(false);
    const inconsistent = areaDepthCavity({ areaMm2: 100, averageDepthMm: 10, maxDepthMm: 5 });
    expect(inconsistent.ok || inconsistent.error.code).toBe('shape_depth_inconsistent');
  });
});
