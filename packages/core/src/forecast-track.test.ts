import { describe, expect, it } from 'vitest';
import { forecastTrack } from './forecast-track';

const h = 3_600_000;

describe('the forecast track drawn after now', () => {
  it('runs from now to the last stage ahead, cutting the open-ended last piece', () => {
    const ahead = [
      { fromMs: 0, toMs: 10 * h, tempC: 21 },
      { fromMs: 10 * h, toMs: 20 * h, tempC: 15 },
      { fromMs: 20 * h, toMs: Infinity, tempC: 21 },
    ];
    const stages = [
      { reached: true, predictedAt: null },
      { reached: false, predictedAt: new Date(30 * h).toISOString() },
      { reached: false, predictedAt: new Date(26 * h).toISOString() },
    ];
    expect(forecastTrack(ahead, stages, 0)).toEqual([
      { fromMs: 0, toMs: 10 * h, tempC: 21 },
      { fromMs: 10 * h, toMs: 20 * h, tempC: 15 },
      { fromMs: 20 * h, toMs: 30 * h, tempC: 21 },
    ]);
  });

  it('shows a day when nothing is ahead, and never more than a week', () => {
    const ahead = [{ fromMs: 0, toMs: Infinity, tempC: 20 }];
    expect(forecastTrack(ahead, [], 5 * h)).toEqual([{ fromMs: 5 * h, toMs: 29 * h, tempC: 20 }]);
    expect(forecastTrack(ahead, [{ reached: false, predictedAt: new Date(1000 * h).toISOString() }], 0)).toEqual([{ fromMs: 0, toMs: 168 * h, tempC: 20 }]);
  });
});
