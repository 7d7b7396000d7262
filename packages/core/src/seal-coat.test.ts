import { describe, expect, it } from 'vitest';
import { absorptionPresets, sealCoatVolume } from './seal-coat';

describe('seal coat volume', () => {
  it('is wetted area × film × absorption per coat', () => {
    // 46 000 mm² × 0.15 mm × 1.3 = 8970 mm³ = 8.97 mL per coat; two coats 17.94 mL.
    const volume = sealCoatVolume({ wettedAreaMm2: 46_000, filmThicknessMm: 0.15, coats: 2, absorptionFactor: absorptionPresets.open_grain });
    expect(volume.ok && volume.value.perCoatMl).toBeCloseTo(8.97, 10);
    expect(volume.ok && volume.value.totalMl).toBeCloseTo(17.94, 10);
  });

  it('presets are ordered from sealed to end grain and never below 1 (common practice values)', () => {
    const values = Object.values(absorptionPresets);
    expect(Math.min(...values)).toBe(1);
    expect([...values].sort((a, b) => a - b)).toEqual(values);
  });

  it('refuses an absorption factor below 1, zero film and fractional coats', () => {
    const base = { wettedAreaMm2: 1000, filmThicknessMm: 0.2, coats: 1, absorptionFactor: 1 };
    expect(sealCoatVolume({ ...base, absorptionFactor: 0.8 }).ok).toBe(false);
    expect(sealCoatVolume({ ...base, filmThicknessMm: 0 }).ok).toBe(false);
    const half = sealCoatVolume({ ...base, coats: 1.5 });
    expect(half.ok || half.error.code).toBe('coats_not_whole');
  });
});
