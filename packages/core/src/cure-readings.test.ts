import { describe, expect, it } from 'vitest';
import { parseCureReadingsCsv } from './cure-readings';

describe('parseCureReadingsCsv', () => {
  it('reads a log with a header, CRLF line ends, Z and offsets', () => {
    const csv = 'time,tempC\r\n2025-03-01T18:00:00Z,21.5\r\n2025-03-01T20:00:00+01:00,20\r\n"2025-03-01T21:30:00Z", 19.25\r\n';
    const result = parseCureReadingsCsv(csv);
    expect(result).toEqual({
      ok: true,
      value: [
        { at: '2025-03-01T18:00:00Z', tempC: 21.5 },
        { at: '2025-03-01T20:00:00+01:00', tempC: 20 },
        { at: '2025-03-01T21:30:00Z', tempC: 19.25 },
      ],
    });
  });

  it('reads a log without a header', () => {
    const result = parseCureReadingsCsv('2025-03-01T18:00:00Z,21\n2025-03-01T19:00:00Z,22');
    expect(result.ok && result.value.length).toBe(2);
  });

  it('returns every bad row and no readings', () => {
    const csv = [
      'time,tempC',
      '2025-03-01T18:00:00Z,21',
      '2025-03-01T19:00:00Z,21',
      '2025-03-01T20:00:00Z,warm',
      '2025-03-01T21:00:00Z,21',
      '2025-03-01T21:00:00Z,22',
      'yesterday,20',
      '2025-03-01T20:30:00Z,20',
      '2025-03-01T23:00:00,20',
    ].join('\n');
    const result = parseCureReadingsCsv(csv);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.error.code).toBe('readings_invalid');
    const messages = result.error.issues!.map((i) => i.message);
    expect(messages[0]).toBe('row 4: tempC "warm" is not a number');
    expect(messages[1]).toBe('row 6: time "2025-03-01T21:00:00Z" repeats the time of row 5');
    expect(messages[2]).toMatch(/^row 7: time "yesterday" is not an ISO date/);
    expect(messages[3]).toMatch(/^row 8: time "2025-03-01T20:30:00Z" is earlier than row 5/);
    expect(messages[4]).toMatch(/^row 9: time "2025-03-01T23:00:00" has no time zone/);
    expect(result.error.issues!.map((i) => i.row)).toEqual([4, 6, 7, 8, 9]);
    expect(result.error.message).toContain('row 7: time "yesterday" is not an ISO date');
  });

  it('refuses rows with the wrong number of columns and an empty file', () => {
    const wide = parseCureReadingsCsv('2025-03-01T18:00:00Z,21,60');
    expect(wide.ok || wide.error.issues?.[0]?.message).toBe('row 1: expected 2 columns (time,tempC), found 3');
    const empty = parseCureReadingsCsv('time,tempC\n\n');
    expect(empty.ok || empty.error.code).toBe('readings_empty');
  });
});
