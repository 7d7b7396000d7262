import { describe, expect, it } from 'vitest';
import { planCavityFromMold } from './mold-cavity';

// A straight-walled pocket 100 × 50 mm with its floor at z = 10 and rim at z = 30: volume is
// base × height (CRC Concise Encyclopedia of Mathematics, prism), so V(z) = 5000 · (z − 10) mm³.
const pocket = [
  { levelMm: 0, volumeMm3: 0 },
  { levelMm: 5, volumeMm3: 0 },
  { levelMm: 10, volumeMm3: 0 },
  { levelMm: 20, volumeMm3: 50_000 },
  { levelMm: 30, volumeMm3: 100_000 },
];

describe('a mould report in the pour plan’s terms', () => {
  it('measures levels from the floor and cuts the curve at the fill level', () => {
    const r = planCavityFromMold({ curve: pocket, wettedAreaMm2: 9000, maxDepthMm: 15 }, 25);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.fillLevelMm).toBe(15);
    expect(r.value.cavity.curve).toEqual([
      { levelMm: 0, volumeMm3: 0 },
      { levelMm: 10, volumeMm3: 50_000 },
      { levelMm: 15, volumeMm3: 75_000 },
    ]);
    expect(r.value.cavity).toMatchObject({ wettedAreaMm2: 9000, maxDepthMm: 15 });
  });

  it('refuses a level above the report or at the floor', () => {
    const above = planCavityFromMold({ curve: pocket, wettedAreaMm2: 1, maxDepthMm: 1 }, 31);
    expect(!above.ok && above.error.code).toBe('fill_above_report');
    const floor = planCavityFromMold({ curve: pocket, wettedAreaMm2: 1, maxDepthMm: 0 }, 10);
    expect(!floor.ok && floor.error.code).toBe('fill_below_floor');
  });
});
