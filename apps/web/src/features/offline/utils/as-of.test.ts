import { describe, expect, it } from 'vitest';
import { shownAsOf } from './as-of';
import { clockTime } from './clock-time';

describe('shownAsOf', () => {
  it('is the oldest answer the page shows, ignoring what no page shows and what has no data', () => {
    expect(
      shownAsOf([
        { observed: true, hasData: true, dataUpdatedAt: 5_000 },
        { observed: true, hasData: true, dataUpdatedAt: 3_000 },
        { observed: false, hasData: true, dataUpdatedAt: 1_000 },
        { observed: true, hasData: false, dataUpdatedAt: 0 },
      ]),
    ).toBe(3_000);
  });

  it('is null when the page shows nothing from the server', () => {
    expect(shownAsOf([])).toBeNull();
    expect(shownAsOf([{ observed: false, hasData: true, dataUpdatedAt: 9 }])).toBeNull();
  });
});

describe('clockTime', () => {
  // 2026-01-15T13:05:00Z is 14:05 in Berlin (CET, UTC+1 in winter) and 08:05 in New York (EST, UTC−5), per the IANA
  // time zone database the browser's Intl reads.
  it('writes HH:MM on a 24-hour clock in the shop’s zone', () => {
    const at = Date.UTC(2026, 0, 15, 13, 5);
    expect(clockTime(at, 'Europe/Berlin')).toBe('14:05');
    expect(clockTime(at, 'America/New_York')).toBe('08:05');
  });
});
