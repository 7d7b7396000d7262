import { describe, expect, it } from 'vitest';
import { guessUnits, plausibleMouldSpanMm, readAs } from './units-guess';

describe('guessUnits', () => {
  it('questions millimetres for a tray that is 15 units long and offers inches first, then centimetres', () => {
    const guess = guessUnits([15, 8, 1.25], 'mm');
    expect(guess.doubt).toBe('too_small');
    expect(guess.alternatives.map((r) => r.units)).toEqual(['in', 'cm']);
    // NIST SP 811: 1 in = 25.4 mm exactly, so 15 × 8 × 1.25 in = 381 × 203.2 × 31.75 mm.
    const inches = guess.alternatives[0]!;
    expect(inches.sizeMm[0]).toBeCloseTo(381, 9);
    expect(inches.sizeMm[1]).toBeCloseTo(203.2, 9);
    expect(inches.sizeMm[2]).toBeCloseTo(31.75, 9);
  });

  it('questions inches for a file that would be a 6.35 m table and offers millimetres', () => {
    const guess = guessUnits([250, 120, 30], 'in');
    expect(guess.doubt).toBe('too_large');
    expect(guess.alternatives.map((r) => r.units)).toEqual(['mm', 'cm']);
  });

  it('leaves a plausible reading alone', () => {
    const guess = guessUnits([100, 60, 30], 'mm');
    expect(guess.doubt).toBeNull();
    expect(guess.alternatives).toEqual([]);
  });

  it('keeps the bounds inclusive (common practice bounds, 60 mm to 3 m)', () => {
    expect(readAs([plausibleMouldSpanMm.smallest, 1, 1], 'mm').plausible).toBe(true);
    expect(readAs([plausibleMouldSpanMm.largest / 10, 1, 1], 'cm').plausible).toBe(true);
    expect(readAs([59.9, 1, 1], 'mm').plausible).toBe(false);
  });
});
