import { describe, expect, it } from 'vitest';
import { inputUnitsOf, massToGrams, scaleStepOf, temperatureFromC, temperatureToC } from './shop-units';

describe('shop units at the form edge', () => {
  it('labels metric and US shops', () => {
    expect(inputUnitsOf('metric')).toEqual({ mass: 'g', temperature: '°C' });
    expect(inputUnitsOf('us')).toEqual({ mass: 'oz', temperature: '°F' });
  });

  it('turns ounces off a US scale into grams', () => {
    // NIST SP 811: 1 lb = 453.59237 g exactly and 1 oz = 1/16 lb, so 1 oz = 28.349523125 g.
    expect(massToGrams(1, 'us')).toBeCloseTo(28.349523125, 9);
    expect(massToGrams(16, 'us')).toBeCloseTo(453.59237, 9);
    expect(massToGrams(250, 'metric')).toBe(250);
  });

  it('turns °F into °C and back', () => {
    // NIST SP 811: t/°C = (t/°F − 32)/1.8; 68 °F = 20 °C, 32 °F = 0 °C.
    expect(temperatureToC(68, 'us')).toBeCloseTo(20, 9);
    expect(temperatureToC(32, 'us')).toBeCloseTo(0, 9);
    expect(temperatureFromC(25, 'us')).toBeCloseTo(77, 9);
    expect(temperatureToC(21.5, 'metric')).toBe(21.5);
  });

  it('reads the scale step the shop set', () => {
    expect(scaleStepOf(1)).toBe(1);
    expect(scaleStepOf(0.1)).toBe(0.1);
  });
});
