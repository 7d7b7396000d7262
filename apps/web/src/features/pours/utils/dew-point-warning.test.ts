import { describe, expect, it } from 'vitest';
import { dewPointReadout } from './dew-point-warning';

// Dew points: Magnus form with the Alduchov & Eskridge (1996) constants, as tabulated by Lawrence (2005, BAMS 86:225):
// 20 °C / 85 % → 17.40 °C; 25 °C / 60 % → 16.70 °C. The 3 °C surface margin is coatings practice (ISO 8502-4).
describe('dewPointReadout', () => {
  it('warns when a surface at 19 °C meets 20 °C air at 85 %', () => {
    const readout = dewPointReadout(20, 19, 85, 'metric');
    expect(readout?.dewPointC).toBeCloseTo(17.4, 1);
    expect(readout?.marginC).toBeCloseTo(1.6, 1);
    expect(readout?.clear).toBe(false);
    expect(readout?.warning).toContain('17.4 °C');
    expect(readout?.warning).toContain('at least 3.0 °C');
  });

  it('clears a surface 3 °C or more above the dew point', () => {
    const readout = dewPointReadout(25, 20, 60, 'metric');
    expect(readout?.dewPointC).toBeCloseTo(16.7, 1);
    expect(readout?.clear).toBe(true);
    expect(readout?.warning).toBeNull();
  });

  it('says condensation outright when the surface is below the dew point', () => {
    expect(dewPointReadout(20, 16, 85, 'metric')?.warning).toMatch(/at or below the dew point/);
  });

  it('words a US shop in °F', () => {
    // 17.40 °C = 63.3 °F, and the 3 °C margin is 5.4 °F (NIST SP 811: a difference of 1 °C is 1.8 °F).
    const readout = dewPointReadout(20, 19, 85, 'us');
    expect(readout?.warning).toContain('63.3 °F');
    expect(readout?.warning).toContain('5.4 °F');
    expect(readout?.warning).not.toContain('°C');
  });

  it('waits until all three readings are typed', () => {
    expect(dewPointReadout(20, null, 85, 'metric')).toBeNull();
    expect(dewPointReadout(20, 19, null, 'metric')).toBeNull();
  });
});
