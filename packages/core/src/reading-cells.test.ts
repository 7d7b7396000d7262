import { describe, expect, it } from 'vitest';
import { parseDecimal, readDecimal } from './reading-cells';
import { unitSystemUnits } from './unit-systems';
import { convertLength, convertMass, convertTemperature, convertVolume } from './units';

describe('readDecimal, the one reader of typed numbers', () => {
  // What counts as a decimal literal: ECMAScript's StrDecimalLiteral (ECMA-262, 7.1.4.1.1) without "Infinity";
  // Number() also takes a hexadecimal, binary or octal literal (StrNonDecimalIntegerLiteral: 0x10 is 16), which no
  // scale or thermometer shows, so the reader refuses those.
  it('refuses 0x10 and the other non-decimal literals Number() would take', () => {
    expect(Number('0x10')).toBe(16);
    expect(readDecimal('0x10')).toBeNull();
    expect(readDecimal('0b101')).toBeNull();
    expect(readDecimal('0o17')).toBeNull();
    expect(readDecimal('Infinity')).toBeNull();
    expect(readDecimal('1e999')).toBeNull();
  });

  it('reads decimals typed with a point or a comma, blanks around them dropped', () => {
    expect(readDecimal('212.4')).toBe(212.4);
    expect(readDecimal(' 212,4 ')).toBe(212.4);
    expect(readDecimal('.5')).toBe(0.5);
    expect(readDecimal('-3')).toBe(-3);
    // U+2212 MINUS SIGN, what phones and copied text put in front of a negative number.
    expect(readDecimal('\u22123')).toBe(-3);
    expect(readDecimal('2.5e1')).toBe(25);
  });

  it('says "nothing" for an empty field and refuses what is not one plain number', () => {
    expect(readDecimal('')).toBeNull();
    expect(readDecimal('   ')).toBeNull();
    expect(readDecimal('12 g')).toBeNull();
    expect(readDecimal('1.2.3')).toBeNull();
    expect(readDecimal('1,2,3')).toBeNull();
    expect(readDecimal('1 000')).toBeNull();
  });

  it('keeps the comma out of imported cells, where it separates fields', () => {
    expect(Number.isNaN(parseDecimal('21,5'))).toBe(true);
    expect(parseDecimal('21.5')).toBe(21.5);
  });
});

describe('the unit-system map', () => {
  it('converts each kind with the unit its symbol names', () => {
    // NIST SP 811: 1 in = 25.4 mm, 1 oz (avoirdupois) = 28.349523125 g, 1 US fl oz = 29.5735295625 mL; °F = 1.8 °C + 32.
    const us = unitSystemUnits.us;
    expect(convertLength(1, us.length.unit, 'mm')).toBeCloseTo(25.4, 12);
    expect(convertMass(1, us.mass.unit, 'g')).toBeCloseTo(28.349523125, 9);
    expect(convertVolume(1, us.volume.unit, 'mL')).toBeCloseTo(29.5735295625, 9);
    expect(convertTemperature(100, 'C', us.temperature.unit)).toBeCloseTo(212, 12);
    expect([us.length.symbol, us.area.symbol, us.temperature.symbol, us.mass.symbol, us.volume.symbol]).toEqual(['in', 'in²', '°F', 'oz', 'fl oz']);
    const metric = unitSystemUnits.metric;
    expect(convertLength(1, metric.length.unit, 'mm')).toBe(1);
    expect([metric.length.symbol, metric.area.symbol, metric.temperature.symbol, metric.mass.symbol, metric.volume.symbol]).toEqual([
      'mm',
      'mm²',
      '°C',
      'g',
      'mL',
    ]);
  });
});
