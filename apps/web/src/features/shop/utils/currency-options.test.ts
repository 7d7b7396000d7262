import { describe, expect, it } from 'vitest';
import { currencyOptions } from './currency-options';

describe('currencyOptions', () => {
  // ISO 4217 codes and entity names: USD US Dollar, CAD Canadian Dollar, MXN Mexican Peso, BRL Brazilian Real.
  it('lists the currencies of the Americas by code and name, in code order', () => {
    const options = currencyOptions('USD', 'en');
    const byCode = new Map(options.map((o) => [o.value, o.label]));
    expect(byCode.get('CAD')).toBe('CAD · Canadian Dollar');
    expect(byCode.get('MXN')).toBe('MXN · Mexican Peso');
    expect(byCode.get('BRL')).toBe('BRL · Brazilian Real');
    expect(byCode.get('USD')).toMatch(/^USD · US Dollar$/);
    const codes = options.map((o) => o.value);
    expect(codes).toEqual([...codes].sort());
    expect(new Set(codes).size).toBe(codes.length);
    expect(codes.every((c) => /^[A-Z]{3}$/.test(c))).toBe(true);
  });

  it('keeps the shop’s own code in the list even when the browser does not know it', () => {
    const options = currencyOptions('XTS', 'en');
    expect(options.some((o) => o.value === 'XTS')).toBe(true);
  });
});
