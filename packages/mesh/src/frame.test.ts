import { describe, expect, it } from 'vitest';
import { mmPerUnit, toZUpMm } from './frame';

describe('units and up axis', () => {
  it('uses the exact inch (NIST SP 811: 1 in = 25.4 mm) and the centimetre', () => {
    expect(mmPerUnit.in).toBe(25.4); // NIST SP 811, appendix B: 1 in = 2.54 cm exactly
    expect(mmPerUnit.cm).toBe(10);
    expect(mmPerUnit.mm).toBe(1);
  });

  it('knows the other units a 3MF may state: micron, metre and the exact foot (NIST SP 811: 1 ft = 0.3048 m)', () => {
    expect(mmPerUnit.um).toBe(0.001);
    expect(mmPerUnit.m).toBe(1000);
    expect(mmPerUnit.ft).toBe(304.8);
    expect(mmPerUnit.ft).toBeCloseTo(12 * mmPerUnit.in, 12); // NIST SP 811, appendix B: 1 ft = 12 in
  });

  it('turns each up axis into z with a proper rotation (determinant +1, linear algebra)', () => {
    for (const up of ['x', 'y', 'z'] as const) {
      const columns = [
        [1, 0, 0],
        [0, 1, 0],
        [0, 0, 1],
      ].map(([x, y, z]) => {
        const out = new Float64Array(3);
        toZUpMm(x!, y!, z!, up, 1, out, 0);
        return Array.from(out);
      });
      const [a, b, c] = columns as [number[], number[], number[]];
      // det[a b c] = a · (b × c)
      const det = a[0]! * (b[1]! * c[2]! - b[2]! * c[1]!) - a[1]! * (b[0]! * c[2]! - b[2]! * c[0]!) + a[2]! * (b[0]! * c[1]! - b[1]! * c[0]!);
      expect(det).toBe(1);
      const upVector = { x: [1, 0, 0], y: [0, 1, 0], z: [0, 0, 1] }[up];
      const out = new Float64Array(3);
      toZUpMm(upVector[0]!, upVector[1]!, upVector[2]!, up, 1, out, 0);
      expect(Array.from(out, (v) => v + 0)).toEqual([0, 0, 1]);
    }
  });

  it('scales into millimetres', () => {
    const out = new Float64Array(3);
    toZUpMm(1, 2, 3, 'y', mmPerUnit.in, out, 0);
    expect(Array.from(out)).toEqual([25.4, -3 * 25.4, 2 * 25.4]);
  });
});
