import { Duration } from 'luxon';
import { describe, expect, it } from 'vitest';
import { relativeWords, spanWords } from './relative-time';

// Reference: luxon's Duration splits the same milliseconds into days, hours and minutes.
const ms = (parts: { days?: number; hours?: number; minutes?: number; seconds?: number }) => Duration.fromObject(parts).as('milliseconds');
const split = (value: number, units: ('days' | 'hours' | 'minutes')[]) =>
  Duration.fromMillis(value)
    .shiftTo(...units)
    .toObject();

describe('relative times', () => {
  it('writes 3 h 20 min ahead as "in 3 h 20 min"', () => {
    const span = ms({ hours: 3, minutes: 20 });
    expect(split(span, ['hours', 'minutes'])).toEqual({ hours: 3, minutes: 20 });
    expect(relativeWords(span, 0)).toBe('in 3 h 20 min');
  });

  it('writes past events with "ago"', () => {
    expect(relativeWords(0, ms({ minutes: 45 }))).toBe('45 min ago');
  });

  it('switches to days and hours past a day', () => {
    const span = ms({ days: 2, hours: 4, minutes: 10 });
    const parts = split(span, ['days', 'hours', 'minutes']);
    expect(spanWords(span)).toBe(`${parts.days} d ${parts.hours} h`);
  });

  it('leaves out a zero remainder', () => {
    expect(spanWords(ms({ hours: 5 }))).toBe('5 h');
    expect(spanWords(ms({ days: 3 }))).toBe('3 d');
  });

  it('rounds to the nearest minute and calls the next half minute "now"', () => {
    expect(spanWords(ms({ minutes: 59, seconds: 40 }))).toBe('1 h');
    expect(relativeWords(ms({ seconds: 20 }), 0)).toBe('now');
    expect(relativeWords(ms({ seconds: 40 }), 0)).toBe('in 1 min');
  });
});
