import fc from 'fast-check';
import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { checkZone, formatIsoInstant, parseIsoInstant } from './iso-time';

// Reference: luxon's ISO 8601 reader (DateTime.fromISO with setZone), the library the slow path uses.
const luxonMs = (text: string) => DateTime.fromISO(text, { setZone: true }).toMillis();

describe('parseIsoInstant', () => {
  it('reads canonical UTC instants exactly as luxon does', () => {
    fc.assert(
      fc.property(fc.integer({ min: Date.UTC(1900, 0, 1), max: Date.UTC(2999, 11, 31) }), fc.boolean(), (ms, withMs) => {
        const iso = new Date(ms).toISOString();
        const text = withMs ? iso : `${iso.slice(0, 19)}Z`;
        const r = parseIsoInstant(text);
        expect(r.ok && r.value).toBe(luxonMs(text));
      }),
      { numRuns: 500 },
    );
  });

  it('still refuses dates that do not exist and agrees with luxon on hour 24 and short fractions', () => {
    expect(parseIsoInstant('2026-02-30T10:00:00Z').ok).toBe(false);
    expect(parseIsoInstant('2026-02-29T10:00:00Z').ok).toBe(false);
    // 2024 is a leap year (Gregorian rule: divisible by 4, not by 100 unless by 400).
    expect(parseIsoInstant('2024-02-29T10:00:00Z')).toEqual({ ok: true, value: Date.UTC(2024, 1, 29, 10) });
    expect(parseIsoInstant('2026-11-01T10:60:00Z').ok).toBe(false);
    expect(parseIsoInstant('2026-13-01T10:00:00Z').ok).toBe(false);
    for (const text of ['2026-11-01T10:00:00.5Z', '2026-11-01T10:00:00.25Z', '2026-11-01T23:59:59.999Z']) {
      const r = parseIsoInstant(text);
      expect(r.ok && r.value, text).toBe(luxonMs(text));
    }
    const midnight = parseIsoInstant('2026-11-01T24:00:00Z');
    const luxonMidnight = DateTime.fromISO('2026-11-01T24:00:00Z', { setZone: true });
    expect(midnight.ok).toBe(luxonMidnight.isValid);
    if (midnight.ok) expect(midnight.value).toBe(luxonMidnight.toMillis());
  });

  it('keeps offsets and refuses times without one', () => {
    const r = parseIsoInstant('2026-11-01T10:00:00+02:00');
    expect(r.ok && r.value).toBe(Date.UTC(2026, 10, 1, 8));
    expect(parseIsoInstant('2026-11-01T10:00:00').ok).toBe(false);
  });
});

describe('formatIsoInstant', () => {
  it('writes UTC exactly as luxon does, with or without milliseconds', () => {
    fc.assert(
      fc.property(fc.integer({ min: Date.UTC(1000, 0, 1), max: Date.UTC(9999, 11, 31) }), fc.boolean(), (ms, whole) => {
        const at = whole ? ms - (ms % 1000) : ms;
        expect(formatIsoInstant(at)).toBe(DateTime.fromMillis(at, { zone: 'utc' }).toISO({ suppressMilliseconds: true }));
        expect(formatIsoInstant(at, 'UTC')).toBe(DateTime.fromMillis(at, { zone: 'utc' }).toISO({ suppressMilliseconds: true }));
      }),
      { numRuns: 500 },
    );
  });

  it('leaves other zones and odd instants to luxon', () => {
    expect(formatIsoInstant(Date.UTC(2026, 10, 1, 12), 'Europe/Berlin')).toBe('2026-11-01T13:00:00+01:00');
    expect(formatIsoInstant(0.5)).toBe(DateTime.fromMillis(0.5, { zone: 'utc' }).toISO({ suppressMilliseconds: true }));
  });
});

describe('checkZone', () => {
  it('accepts IANA zones and keeps refusing unknown ones, asked once or many times', () => {
    for (let i = 0; i < 3; i++) {
      expect(checkZone('Europe/Berlin')).toEqual({ ok: true, value: 'Europe/Berlin' });
      expect(checkZone('Mars/Olympus').ok).toBe(false);
    }
  });
});
