import { describe, expect, it } from 'vitest';
import { boardFeet, woodCost } from './cost';

describe('wood in board feet (NHLA rules: 1 board foot = 144 in³)', () => {
  it('12 in × 12 in × 1 in is one board foot', () => {
    // NIST SP 811: 1 in = 25.4 mm, so 304.8 × 304.8 × 25.4 mm.
    expect(boardFeet(304.8, 304.8, 25.4)).toBeCloseTo(1, 12);
  });

  it('a 2 in slab 8 in wide and 6 ft long is 8 board feet, priced per board foot', () => {
    // 72 × 8 × 2 = 1152 in³ / 144 = 8 BF; at 12.50 per BF = 100.
    const cost = woodCost({ lengthMm: 72 * 25.4, widthMm: 8 * 25.4, thicknessMm: 2 * 25.4, pricePerBoardFoot: 12.5 });
    expect(cost.ok && cost.value.boardFeet).toBeCloseTo(8, 10);
    expect(cost.ok && cost.value.cost).toBeCloseTo(100, 9);
  });

  it('refuses a blank without size', () => {
    expect(woodCost({ lengthMm: 0, widthMm: 10, thicknessMm: 10, pricePerBoardFoot: 1 }).ok).toBe(false);
  });
});
