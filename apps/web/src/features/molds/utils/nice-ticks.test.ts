import { describe, expect, it } from 'vitest';
import { niceTicks } from './nice-ticks';

// Heckbert, "Nice numbers for graph labels", Graphics Gems (1990): range = nice(max − min),
// step = rounded nice(range / (n − 1)), ticks from floor(min/step)·step to ceil(max/step)·step.
// Each expected list below is that algorithm worked by hand.
describe('niceTicks', () => {
  it('labels 0 to 64 mL with steps of 20', () => {
    // nice(64) = 100; 100 / 4 = 25 → rounds to 20; ceil(64 / 20) · 20 = 80.
    expect(niceTicks(0, 64)).toEqual({ step: 20, ticks: [0, 20, 40, 60, 80] });
  });

  it('labels 10 to 30 mm with steps of 5', () => {
    // nice(20) = 20; 20 / 4 = 5 → 5.
    expect(niceTicks(10, 30).ticks).toEqual([10, 15, 20, 25, 30]);
  });

  it('labels a fraction of an inch without float noise', () => {
    // nice(1.181) = 2; 2 / 4 = 0.5 → 0.5; ceil(1.181 / 0.5) · 0.5 = 1.5.
    expect(niceTicks(0, 1.181).ticks).toEqual([0, 0.5, 1, 1.5]);
    // nice(0.3) = 0.5; 0.5 / 4 = 0.125 → 0.1.
    expect(niceTicks(0, 0.3).ticks).toEqual([0, 0.1, 0.2, 0.3]);
  });

  it('always encloses the data', () => {
    for (const [min, max] of [
      [3, 97],
      [0.2, 7.7],
      [120, 980],
    ] as const) {
      const { ticks } = niceTicks(min, max);
      expect(ticks[0]).toBeLessThanOrEqual(min);
      expect(ticks[ticks.length - 1]).toBeGreaterThanOrEqual(max);
    }
  });

  it('still gives an axis when all data sit at one value', () => {
    const { ticks } = niceTicks(0, 0);
    expect(ticks).toContain(0);
    expect(ticks.length).toBeGreaterThan(1);
  });
});
