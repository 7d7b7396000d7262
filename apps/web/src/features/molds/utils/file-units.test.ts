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
  });
});
