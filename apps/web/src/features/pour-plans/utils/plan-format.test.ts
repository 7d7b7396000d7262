import { describe, expect, it } from 'vitest';
import { formatArea, formatHours } from './plan-format';

describe('plan formatting', () => {
  it('writes cure times in minutes, hours or days', () => {
    expect(formatHours(0.75)).toBe('45 min');
    expect(formatHours(8)).toBe('8 h');
    expect(formatHours(10.5)).toBe('10 h 30 min');
    expect(formatHours(168)).toBe('7 d');
    expect(formatHours(50)).toBe('2 d 2 h');
    expect(formatHours(Number.POSITIVE_INFINITY)).toBe('not reached');
  });

  // NIST SP 811: 1 ft = 0.3048 m exactly, so 1 ft² = 92 903.04 mm².
  it('writes the wetted area in m² or ft²', () => {
    expect(formatArea(90_000, 'metric')).toBe('0.090 m²');
    expect(formatArea(92_903.04, 'us')).toBe('1.00 ft²');
    expect(formatArea(929_030.4, 'us')).toBe('10.00 ft²');
  });
});
