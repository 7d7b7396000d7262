import { describe, expect, it } from 'vitest';
import { dewPointC, surfaceDewPointCheck } from './dew-point';

describe('dew point, Magnus form (Alduchov & Eskridge 1996 constants, as in Lawrence 2005, BAMS 86:225)', () => {
  const cases: [number, number, number][] = [
    [25, 60, 16.7],
    [20, 50, 9.26],
    [20, 85, 17.4],
  ];
  for (const [airTempC, rhPct, expected] of cases) {
    it(`${airTempC} °C at ${rhPct} % → ${expected} °C`, () => {
      const dew = dewPointC(airTempC, rhPct);
      expect(dew.ok).toBe(true);
      if (dew.ok) expect(Math.abs(dew.value - expected)).toBeLessThanOrEqual(0.005);
    });
  }

  it('at 100 % the dew point is the air temperature', () => {
    const dew = dewPointC(17, 100);
    expect(dew.ok && dew.value).toBeCloseTo(17, 10);
  });

  it('refuses humidity outside 0–100 %', () => {
    expect(dewPointC(20, 0).ok).toBe(false);
    expect(dewPointC(20, 101).ok).toBe(false);
  });
});

describe('surface check (ISO 8502-4 practice: surface at least 3 °C above the dew point)', () => {
  it('warns when the surface is within 3 °C of the dew point', () => {
    // 20 °C air at 85 % → dew point 17.40 °C; a 19 °C surface is 1.6 °C above it.
    const check = surfaceDewPointCheck(19, 20, 85);
    expect(check.ok).toBe(true);
    if (check.ok) {
      expect(check.value.marginC).toBeCloseTo(19 - 17.4, 2);
      expect(check.value.clear).toBe(false);
      expect(check.value.caution?.code).toBe('surface_near_dew_point');
      expect(check.value.caution?.severity).toBe('warning');
    }
  });

  it('is clear with a wide margin', () => {
    // 20 °C air at 50 % → dew point 9.26 °C; a 20 °C surface is 10.7 °C above it.
    const check = surfaceDewPointCheck(20, 20, 50);
    expect(check.ok && check.value.clear).toBe(true);
    expect(check.ok && check.value.caution).toBeNull();
  });
});
