import { describe, expect, it } from 'vitest';
import { mmPerFileUnit } from './file-units';

describe('mmPerFileUnit', () => {
  it('reads an inch file at 25.4 mm per unit', () => {
    // NIST SP 811: 1 in = 25.4 mm exactly.
    expect(mmPerFileUnit('in')).toBeCloseTo(25.4, 12);
  });

  it('reads centimetres and millimetres by their SI prefixes', () => {
    // SI Brochure (BIPM, 9th ed.), prefixes centi = 10⁻² and milli = 10⁻³: 1 cm = 10 mm.
    expect(mmPerFileUnit('cm')).toBe(10);
    expect(mmPerFileUnit('mm')).toBe(1);
    expect(mmPerFileUnit('m')).toBe(1000);
    expect(mmPerFileUnit('um')).toBe(0.001);
  });

  it('reads a foot, which a 3MF may state, as 304.8 mm', () => {
    // NIST SP 811, appendix B: 1 ft = 0.3048 m exactly.
    expect(mmPerFileUnit('ft')).toBeCloseTo(304.8, 10);
  });
});
