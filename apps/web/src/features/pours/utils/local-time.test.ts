import { parseIsoInstant } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { localInputToIso, toLocalInput } from './local-time';

// Reference: ECMA-262 Date, whose local-time constructor and toISOString define the same instant.
describe('datetime-local values', () => {
  it('sends a typed wall-clock time as the same instant, with Z', () => {
    const iso = localInputToIso('2026-03-01T18:30');
    expect(iso).toBe(new Date(2026, 2, 1, 18, 30).toISOString());
    expect(iso?.endsWith('Z')).toBe(true);
    // The API (and core) accept it: an ISO date-time with its zone.
    expect(parseIsoInstant(iso!).ok).toBe(true);
  });

  it('reads back what it shows', () => {
    const now = new Date(2026, 10, 9, 7, 5);
    expect(toLocalInput(now)).toBe('2026-11-09T07:05');
    expect(localInputToIso(toLocalInput(now))).toBe(now.toISOString());
  });

  it('refuses half-typed and impossible dates', () => {
    expect(localInputToIso('')).toBeNull();
    expect(localInputToIso('2026-03-01')).toBeNull();
    expect(localInputToIso('2026-02-31T10:00')).toBeNull();
  });
});
