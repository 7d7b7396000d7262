import { describe, expect, it } from 'vitest';
import { formatArea, shopAreaToMm2 } from './area-format';

describe('formatArea', () => {
  it('shows a pocket floor in cm² and a table top in m²', () => {
    // SI: 1 cm² = 100 mm², 1 m² = 10⁶ mm².
    expect(formatArea(3200, 'metric').text).toBe('32.0 cm²');
    expect(formatArea(1_800_000, 'metric').text).toBe('1.800 m²');
  });

  it('shows square inches at 645.16 mm² each and square feet at 144 in²', () => {
    // NIST SP 811: 1 in² = 6.4516 × 10⁻⁴ m² = 645.16 mm² and 1 ft² = 9.290304 × 10⁻² m² (= 144 in²), both exact.
    expect(formatArea(645.16, 'us').text).toBe('1.00 in²');
    expect(formatArea(645.16 * 144 * 2.5, 'us').text).toBe('2.500 ft²');
  });
});

describe('shopAreaToMm2', () => {
  it('reads typed areas back to mm²', () => {
    // NIST SP 811: 1 in² = 645.16 mm².
    expect(shopAreaToMm2(10, 'us')).toBeCloseTo(6451.6, 6);
    expect(shopAreaToMm2(12.5, 'metric')).toBe(1250);
  });
});
