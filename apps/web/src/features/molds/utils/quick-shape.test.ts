import { describe, expect, it } from 'vitest';
import { quickShapeCavity } from './quick-shape';

// CRC Concise Encyclopedia of Mathematics: a right prism holds base × height; a right circular
// cylinder of radius r and height h holds πr²h and has lateral area 2πrh.
describe('quickShapeCavity', () => {
  it('works out a rectangle pocket in millimetres', () => {
    const result = quickShapeCavity('rectangle', { length: '80', width: '40', depth: '20' }, 'metric');
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.fillVolumeMl).toBeCloseTo(64, 9);
    expect(result.value.wettedAreaMm2).toBeCloseTo(80 * 40 + 2 * (80 + 40) * 20, 9);
    expect(result.value.maxDepthMm).toBe(20);
  });

  it('reads a round pocket typed in inches', () => {
    // NIST SP 811: 1 in = 25.4 mm, 1 in³ = 16.387064 mL. A 4 in × 1 in cylinder holds π·2²·1 in³.
    const result = quickShapeCavity('cylinder', { diameter: '4', depth: '1' }, 'us');
    expect(result.ok && result.value.fillVolumeMl).toBeCloseTo(Math.PI * 4 * 16.387064, 6);
    const wettedIn2 = Math.PI * 2 ** 2 + 2 * Math.PI * 2 * 1;
    expect(result.ok && result.value.wettedAreaMm2).toBeCloseTo(wettedIn2 * 645.16, 6);
  });

  it('leaves the dammed ends of a river channel out of the wetted area', () => {
    const result = quickShapeCavity('channel', { length: '1800', width: '150', depth: '40' }, 'metric');
    expect(result.ok && result.value.wettedAreaMm2).toBeCloseTo(1800 * 150 + 2 * 1800 * 40, 6);
  });

  it('estimates an irregular cavity from its area in cm² and average depth', () => {
    // Prism rule (CRC): 250 cm² × 12 mm = 25 000 mm² × 12 mm = 300 mL; walls from a circle of the same area, 2√(πA).
    const result = quickShapeCavity('areaDepth', { area: '250', averageDepth: '12' }, 'metric');
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.fillVolumeMl).toBeCloseTo(300, 9);
    expect(result.value.wettedAreaMm2).toBeCloseTo(25_000 + 2 * Math.sqrt(Math.PI * 25_000) * 12, 6);
    expect(result.value.wettedAreaEstimated).toBe(true);
  });

  it('asks for a missing measurement by name', () => {
    const result = quickShapeCavity('rectangle', { length: '80', width: '', depth: '20' }, 'metric');
    expect(!result.ok && result.error.message).toBe('Enter the width to work out the cavity.');
  });

  it('refuses a negative measurement', () => {
    const result = quickShapeCavity('cylinder', { diameter: '-3', depth: '1' }, 'metric');
    expect(!result.ok && result.error.code).toBe('shape_dimension_not_positive');
  });

  it('passes on core’s check that the deepest point is not shallower than the average', () => {
    const result = quickShapeCavity('areaDepth', { area: '100', averageDepth: '20', maxDepth: '10' }, 'metric');
    expect(!result.ok && result.error.code).toBe('shape_depth_inconsistent');
  });
});
