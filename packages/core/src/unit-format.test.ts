import { describe, expect, it } from 'vitest';
import { formatLength, formatMass, formatTemperature, formatVolume, formatWeighedMass, roundToScale } from './unit-format';

describe('roundToScale', () => {
  it('rounds to what a 0.1 g or a 1 g scale shows', () => {
    expect(roundToScale(12.345, 0.1)).toBe(12.3);
    expect(roundToScale(12.35, 0.1)).toBe(12.4);
    expect(roundToScale(0.3, 0.1)).toBe(0.3);
    expect(roundToScale(12.5, 1)).toBe(13);
    expect(roundToScale(12.49, 1)).toBe(12);
  });
});

describe('shop unit systems', () => {
  it('metric shows mL below a litre and L above', () => {
    expect(formatVolume(250, 'metric').text).toBe('250.0 mL');
    expect(formatVolume(1500, 'metric').text).toBe('1.50 L');
  });

  it('us shows fl oz and gal (NIST SP 811: 1 fl oz = 29.5735295625 mL; 1 gal = 3785.411784 mL)', () => {
    expect(formatVolume(29.5735295625 * 10, 'us').text).toBe('10.00 fl oz');
    expect(formatVolume(3785.411784 * 2, 'us').text).toBe('2.000 gal');
  });

  it('masses in g/kg and oz/lb (NIST SP 811: 1 lb = 453.59237 g)', () => {
    expect(formatMass(850, 'metric').text).toBe('850.0 g');
    expect(formatMass(2500, 'metric').text).toBe('2.500 kg');
    expect(formatMass(453.59237 * 3, 'us').text).toBe('3.000 lb');
    expect(formatMass(28.349523125 * 4, 'us').text).toBe('4.00 oz');
  });

  it('weighed masses follow the scale resolution', () => {
    expect(formatWeighedMass(1234.56, 'metric', 0.1).text).toBe('1234.6 g');
    expect(formatWeighedMass(1234.56, 'metric', 1).text).toBe('1235 g');
    // NIST SP 811: 1 oz = 28.349523125 g, so 1235 g shown on a 1 g scale is 43.56 oz.
    expect(formatWeighedMass(1234.56, 'us', 1).text).toBe('43.56 oz');
  });

  it('lengths and temperatures (NIST SP 811: 1 in = 25.4 mm; °F = 1.8·°C + 32)', () => {
    expect(formatLength(50.8, 'us').text).toBe('2.000 in');
    expect(formatLength(12.34, 'metric').text).toBe('12.3 mm');
    expect(formatTemperature(21, 'us').text).toBe('69.8 °F');
    expect(formatTemperature(21, 'metric').text).toBe('21.0 °C');
  });
});
