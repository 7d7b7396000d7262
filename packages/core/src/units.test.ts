import { describe, expect, it } from 'vitest';
import { convertLength, convertMass, convertTemperature, convertVolume, mlToMm3, mm3ToMl, readQuantity } from './units';

describe('unit conversions against NIST SP 811 (Appendix B)', () => {
  it('inch to millimetre is exact', () => {
    // NIST SP 811 B.8: 1 in = 2.54 cm exactly.
    expect(convertLength(1, 'in', 'mm')).toBe(25.4);
    expect(convertLength(254, 'mm', 'in')).toBeCloseTo(10, 12);
  });

  it('US gallon, cubic inch and litre agree', () => {
    // NIST SP 811 B.8: 1 gal (U.S.) = 231 in³ = 3.785 411 784 L exactly.
    expect(convertVolume(1, 'gal', 'in3')).toBeCloseTo(231, 10);
    expect(convertVolume(1, 'gal', 'L')).toBeCloseTo(3.785411784, 12);
  });

  it('US fluid ounce', () => {
    // NIST SP 811 B.8: 1 fl oz (U.S.) = 29.573 529 562 5 mL exactly (1/128 gal).
    expect(convertVolume(1, 'floz', 'mL')).toBeCloseTo(29.5735295625, 10);
    expect(convertVolume(128, 'floz', 'gal')).toBeCloseTo(1, 12);
  });

  it('cubic inch and cubic centimetre', () => {
    // NIST SP 811 B.8: 1 in³ = 16.387 064 cm³ exactly; 1 cm³ = 1 mL (SI).
    expect(convertVolume(1, 'in3', 'mL')).toBeCloseTo(16.387064, 10);
    expect(convertVolume(1, 'cm3', 'mL')).toBeCloseTo(1, 12);
    expect(convertVolume(2.5, 'L', 'mL')).toBeCloseTo(2500, 9);
  });

  it('pound and ounce (avoirdupois)', () => {
    // NIST SP 811 B.8: 1 lb = 0.453 592 37 kg exactly; 1 oz = 1/16 lb = 28.349 523 125 g.
    expect(convertMass(1, 'lb', 'g')).toBeCloseTo(453.59237, 10);
    expect(convertMass(1, 'oz', 'g')).toBeCloseTo(28.349523125, 10);
    expect(convertMass(2, 'kg', 'lb')).toBeCloseTo(2000 / 453.59237, 10);
  });

  it('Celsius and Fahrenheit', () => {
    // NIST SP 811 B.8 / 4.2.1.1: t/°F = 1.8·t/°C + 32.
    expect(convertTemperature(20, 'C', 'F')).toBeCloseTo(68, 10);
    expect(convertTemperature(-40, 'F', 'C')).toBeCloseTo(-40, 10);
    expect(convertTemperature(212, 'F', 'C')).toBeCloseTo(100, 10);
  });

  it('mm³ and mL', () => {
    // SI: 1 mL = 1 cm³ = 1000 mm³.
    expect(mm3ToMl(1000)).toBe(1);
    expect(mlToMm3(2.5)).toBe(2500);
  });
});

describe('readQuantity', () => {
  it('reads a kit size typed with a unit into grams', () => {
    // NIST SP 811 B.8: 1 lb = 453.59237 g, so a 1.5 lb kit is 680.388555 g.
    const kit = readQuantity('1.5 lb', 'mass');
    expect(kit.ok && kit.value).toBeCloseTo(680.388555, 9);
    const gallon = readQuantity('1 gal', 'volume');
    expect(gallon.ok && gallon.value).toBeCloseTo(3785.411784, 9);
    const fahrenheit = readQuantity('68 °F', 'temperature');
    expect(fahrenheit.ok && fahrenheit.value).toBeCloseTo(20, 10);
  });

  it('refuses a unit of the wrong dimension and text without a number', () => {
    const wrong = readQuantity('3 kg', 'volume');
    expect(wrong.ok).toBe(false);
    if (!wrong.ok) {
      expect(wrong.error.code).toBe('unit_unknown');
      expect(wrong.error.message).toContain('"kg"');
    }
    const garbage = readQuantity('lots', 'mass');
    expect(garbage.ok || garbage.error.code).toBe('quantity_unreadable');
  });
});
