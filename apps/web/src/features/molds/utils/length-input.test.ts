import { describe, expect, it } from 'vitest';
import { lengthInputValue, mmToShopLength, readLengthInput, readOptionalLength, shopLengthToMm } from './length-input';

const rim = { minMm: 0, maxMm: 30 };

describe('shop lengths', () => {
  it('shows millimetres as they are and inches at 25.4 mm each', () => {
    // NIST SP 811: 1 in = 25.4 mm exactly.
    expect(mmToShopLength(25.4, 'us')).toBeCloseTo(1, 12);
    expect(shopLengthToMm(2, 'us')).toBeCloseTo(50.8, 12);
    expect(mmToShopLength(17.5, 'metric')).toBe(17.5);
  });

  it('prints a length for a form control with the decimals core prints', () => {
    // 30 mm / 25.4 mm per inch = 1.18110… in (NIST SP 811).
    expect(lengthInputValue(30, 'us')).toBe('1.181');
    expect(lengthInputValue(20, 'metric')).toBe('20.0');
  });
});

describe('readLengthInput', () => {
  it('reads a typed inch value back to millimetres', () => {
    const read = readLengthInput('0.5', 'us', rim, 'Fill level');
    expect(read.ok && read.value).toBeCloseTo(12.7, 9);
  });

  it('takes the printed rim in inches as the rim itself', () => {
    const read = readLengthInput('1.181', 'us', rim, 'Fill level');
    expect(read.ok && read.value).toBeCloseTo(29.9974, 3);
    const above = readLengthInput('1.1815', 'us', rim, 'Fill level');
    expect(above.ok && above.value).toBe(30);
  });

  it('refuses a level above the mould, saying the range in the shop’s unit', () => {
    const read = readLengthInput('31', 'metric', rim, 'Fill level');
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.error.code).toBe('length_out_of_range');
    expect(read.error.message).toContain('between 0.0 mm and 30.0 mm');
  });

  it('refuses text that is not a number', () => {
    const read = readLengthInput('half', 'metric', rim, 'Fill level');
    expect(!read.ok && read.error.code).toBe('length_unreadable');
    const blank = readLengthInput('  ', 'metric', rim, 'Fill level');
    expect(blank.ok).toBe(false);
    // Number('0x10') is 16 (ECMA-262 reads a hexadecimal literal); 16 mm would fit this rim, yet nobody types a hex length.
    const hex = readLengthInput('0x10', 'metric', rim, 'Fill level');
    expect(!hex.ok && hex.error.code).toBe('length_unreadable');
    expect(readOptionalLength('0x10', 'metric', 'Layer thickness').ok).toBe(false);
  });
});

describe('readOptionalLength', () => {
  it('takes empty as not given and reads inches to millimetres', () => {
    expect(readOptionalLength(' ', 'us', 'Layer thickness')).toEqual({ ok: true, value: null });
    // NIST SP 811: 1 in = 25.4 mm, so a quarter inch is 6.35 mm.
    const read = readOptionalLength('0.25', 'us', 'Layer thickness');
    expect(read.ok && read.value).toBeCloseTo(6.35, 12);
  });

  it('refuses zero and words', () => {
    expect(readOptionalLength('0', 'metric', 'Layer thickness').ok).toBe(false);
    const read = readOptionalLength('thin', 'metric', 'Layer thickness');
    expect(!read.ok && read.error.message).toContain('Layer thickness must be a number above zero in mm');
  });
});
