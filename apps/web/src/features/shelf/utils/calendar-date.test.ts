import { describe, expect, it } from 'vitest';
import { calendarDateOf, formatCalendarDate, todayIsoDate } from './calendar-date';

describe('calendar dates', () => {
  // Reference: ECMA-402 formatToParts reads the day back in the browser's own zone.
  it('shows the day that was written, in any time zone', () => {
    const format = new Intl.DateTimeFormat('en-US', { year: 'numeric', month: 'numeric', day: 'numeric' });
    expect(formatCalendarDate('2026-12-01', format)).toBe('12/1/2026');
    const parts = new Intl.DateTimeFormat('en-US', { day: 'numeric' }).formatToParts(calendarDateOf('2027-03-01')!);
    expect(parts.find((p) => p.type === 'day')?.value).toBe('1');
  });

  it('refuses days that do not exist and leaves odd text as it is', () => {
    expect(calendarDateOf('2026-02-30')).toBeNull();
    expect(formatCalendarDate('soon')).toBe('soon');
  });

  it('writes today as the API does, reading back as the same day', () => {
    const now = new Date(2026, 0, 9, 23, 59);
    expect(todayIsoDate(now)).toBe('2026-01-09');
    expect(calendarDateOf(todayIsoDate(now))?.getDate()).toBe(9);
  });
});
