import { parseIsoInstant } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { localInputToIso, toLocalInput } from './local-time';

// Reference: ECMA-262 Date, whose local-time constructor and toISOString define the same instant.
describe('datetime-local values', () => {
  it('sends a typed wall-clock time as the same instant, with Z', () => {
    const iso = localInputToIso('2026-03-01T18:30');
    expect(iso).toBe(new Date(2026, 2, 1, 18, 30).toISOString().replace('.000Z', 'Z'));
    expect(iso?.endsWith('Z')).toBe(true);
    // The API (and core) accept it: an ISO date-time with its zone.
    expect(parseIsoInstant(iso!).ok).toBe(true);
  });

  it('reads back what it shows', () => {
    const now = new Date(2026, 10, 9, 7, 5);
    expect(toLocalInput(now)).toBe('2026-11-09T07:05');
    expect(localInputToIso(toLocalInput(now))).toBe(now.toISOString().replace('.000Z', 'Z'));
  });

  it('refuses half-typed and impossible dates', () => {
    expect(localInputToIso('')).toBeNull();
    expect(localInputToIso('2026-03-01')).toBeNull();
    expect(localInputToIso('2026-02-31T10:00')).toBeNull();
  });
});

describe('datetime-local values in the shop’s zone', () => {
  it('reads a typed time as the shop’s wall clock, and refuses a time skipped by daylight saving', async () => {
    const { setDisplayTimeZone } = await import('../../../lib/display-zone');
    setDisplayTimeZone('America/Los_Angeles');
    try {
      // IANA tz: Los Angeles is UTC−8 (PST) on 1 March 2026 and UTC−7 (PDT) from 02:00 on 8 March 2026.
      expect(localInputToIso('2026-03-01T18:30')).toBe('2026-03-02T02:30:00Z');
      expect(localInputToIso('2026-03-09T18:30')).toBe('2026-03-10T01:30:00Z');
      expect(localInputToIso('2026-03-08T02:30')).toBeNull();
      expect(toLocalInput(new Date('2026-03-02T02:30:00Z'))).toBe('2026-03-01T18:30');
    } finally {
      setDisplayTimeZone(undefined);
    }
  });
});
