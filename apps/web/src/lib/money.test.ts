import { describe, expect, it } from 'vitest';
import { formatMoney } from './money';

describe('formatMoney', () => {
  // ISO 4217 minor units: USD, CAD and MXN have 2 decimals, JPY none, BHD and KWD 3.
  it('writes each currency with its own number of decimals', () => {
    expect(formatMoney(1234.5, 'USD', 'en-US')).toBe('$1,234.50');
    expect(formatMoney(1234.5, 'JPY', 'en-US')).toBe('¥1,235');
    expect(formatMoney(1.2345, 'BHD', 'en-US')).toMatch(/^BHD\s1\.235$/);
  });

  // The symbol depends on the reader: a Canadian reads "$" for CAD, anyone else "CA$" (CLDR); the code never gets lost.
  it('names the currency by a symbol the reader can tell apart from their own', () => {
    expect(formatMoney(12.5, 'CAD', 'en-CA')).toBe('$12.50');
    expect(formatMoney(12.5, 'CAD', 'en-US')).toBe('CA$12.50');
    expect(formatMoney(12.5, 'MXN', 'en-US')).toBe('MX$12.50');
    expect(formatMoney(12.5, 'USD', 'en-CA')).toBe('US$12.50');
  });

  it('keeps the amount readable when the code is unknown to the browser, and refuses to show a non-number as money', () => {
    expect(formatMoney(3, 'ZZZ', 'en-US')).toMatch(/3\.00/);
    expect(formatMoney(Number.NaN, 'USD', 'en-US')).toBe('—');
  });
});
