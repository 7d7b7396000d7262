import { describe, expect, it } from 'vitest';
import { instant, text } from './common';

describe('instant', () => {
  const at = instant('at');
  it('takes ISO 8601 times with Z or an offset up to ±14:00 (IANA tz database: Pacific/Kiritimati is +14:00)', () => {
    for (const ok of ['2026-11-01T14:30:00Z', '2026-11-01T14:30:00.125+14:00', '2026-11-01T14:30:00-12:00', '1900-01-01T00:00:00Z', '2999-12-31T23:59:59Z']) {
      expect(at.safeParse(ok).success, ok).toBe(true);
    }
  });

  it('refuses what PostgreSQL cannot store or no shop record needs: year 0000, offsets past ±14:00, far years', () => {
    // PostgreSQL 15 answers "date/time field value out of range" for year 0000 and "time zone displacement
    // out of range" past ±15:59 (checked with psql on the project's server).
    for (const bad of [
      '0000-01-01T00:00:00Z',
      '2026-01-01T00:00:00+16:00',
      '2026-01-01T00:00:00-14:30',
      '1899-12-31T23:59:59Z',
      '3000-01-01T00:00:00Z',
      '2026-02-30T00:00:00Z',
      '2026-11-01 14:30',
    ]) {
      const r = at.safeParse(bad);
      expect(r.success, bad).toBe(false);
      expect(r.error?.issues[0]?.message).toMatch(/^at must/);
    }
  });
});

describe('text', () => {
  it('refuses NUL, which PostgreSQL text cannot hold, naming the field', () => {
    const r = text(100, 'notes').safeParse('before\u0000after');
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.message).toBe('notes contains a NUL character (U+0000); remove it');
    expect(text(100, 'notes').parse('  plain  ')).toBe('plain');
  });
});
