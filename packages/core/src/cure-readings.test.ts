import { describe, expect, it } from 'vitest';
import { parseCureReadingsCsv, readCureLog } from './cure-readings';

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

describe('parseCureReadingsCsv: cells the rest of the product would read differently', () => {
  const rowsOf = (csv: string): (string | number | undefined)[] => {
    const result = parseCureReadingsCsv(csv);
    return result.ok ? [] : result.error.issues!.map((i) => `${i.row}:${i.field}`);
  };

  it('refuses temperatures at or below absolute zero, which would make the cure rate infinite', () => {
    // Zero kelvin is −273.15 °C exactly (SI Brochure, 9th ed., 2019).
    expect(rowsOf('2025-03-01T18:00:00Z,-300\n2025-03-01T19:00:00Z,-273.15\n2025-03-01T20:00:00Z,-273.14\n')).toEqual(['1:tempC', '2:tempC']);
    const result = parseCureReadingsCsv('2025-03-01T18:00:00Z,-300');
    expect(!result.ok && result.error.issues![0]!.message).toBe('row 1: tempC "-300" is at or below absolute zero (−273.15 °C); check the column holds °C');
  });

  it('refuses hexadecimal, binary and other spellings that are not plain decimals', () => {
    expect(rowsOf('2025-03-01T18:00:00Z,0x10\n2025-03-01T19:00:00Z,0b101\n2025-03-01T20:00:00Z,1_0\n2025-03-01T21:00:00Z,-Infinity\n')).toEqual([
      '1:tempC',
      '2:tempC',
      '3:tempC',
      '4:tempC',
    ]);
    const plain = parseCureReadingsCsv('2025-03-01T18:00:00Z,+.5\n2025-03-01T19:00:00Z,2.\n2025-03-01T20:00:00Z,2.5E1\n');
    expect(plain.ok && plain.value.map((r) => r.tempC)).toEqual([0.5, 2, 25]);
  });

  it('refuses ISO forms the database refuses: week and ordinal dates, basic format, expanded years, year 0, offsets past ±14:00', () => {
    // Each of these made PostgreSQL 15 refuse the timestamptz (checked against its date/time input
    // on this project's server), so the import ended in a 500 instead of naming the row.
    const foreign = [
      '2025-W09-6T18:00Z',
      '2025-060T18:00Z',
      '20250301T180000Z',
      '+002025-03-01T18:00Z',
      '0000-03-01T18:00:00Z',
      '2025-03-01T18:00:00+16:00',
      '2025-03-01T18Z',
    ];
    const csv = foreign.map((t) => `${t},20`).join('\n');
    expect(rowsOf(csv)).toEqual(foreign.map((_, i) => `${i + 1}:time`));
    const accepted = ['2025-03-01T18:00Z', '2025-03-01t18:00:00.5z', '2025-03-01T20:00:00+0130', '2025-03-01T22:00:00-12', '2025-03-03T24:00:00+14:00'];
    const ok = parseCureReadingsCsv(accepted.map((t) => `${t},20`).join('\n'));
    expect(ok.ok && ok.value.map((r) => r.at)).toEqual(accepted);
  });

  it('refuses dates that do not exist', () => {
    // Gregorian calendar: 2025 is not a leap year, 2024 is, 1900 is not, 2000 is.
    expect(
      rowsOf(
        '1900-02-29T00:00Z,20\n2000-02-29T00:00Z,20\n2024-02-29T18:00Z,20\n2025-02-29T18:00Z,20\n2025-04-31T18:00Z,20\n2025-05-01T23:60Z,20\n2025-05-01T24:00:01Z,20\n',
      ),
    ).toEqual(['1:time', '4:time', '5:time', '6:time', '7:time']);
  });

  it('quotes at most 40 characters of a cell, so a 2 MB cell makes a short message, and reads a long run of digits at once', () => {
    const result = parseCureReadingsCsv(`2025-03-01T18:00:00Z,${'9'.repeat(100_000)}x`);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.error.issues![0]!.message).toBe(`row 1: tempC "${'9'.repeat(40)}…" is not a number`);
    expect(result.error.message.length).toBeLessThan(300);
    // The number pattern once backtracked quadratically here (about 17 s for these 100,000 digits).
    const start = performance.now();
    parseCureReadingsCsv(`2025-03-01T18:00:00Z,${'9'.repeat(1_000_000)}x`);
    expect(performance.now() - start).toBeLessThan(1000);
  });

  it('counts a row with thousands of commas without splitting it', () => {
    const result = parseCureReadingsCsv(`time,tempC\n${','.repeat(50_000)}\n`);
    expect(!result.ok && result.error.issues![0]!.message).toBe('row 2: expected 2 columns (time,tempC), found 50001');
  });
});

describe('a log in °F', () => {
  it('converts a column headed tempF to °C (NIST SP 811: t/°C = (t/°F − 32)/1.8) and says so', () => {
    const log = readCureLog('time,tempF\n2026-11-01T10:00:00Z,70\n2026-11-01T11:00:00Z,68\n');
    expect(log.ok).toBe(true);
    if (!log.ok) return;
    expect(log.value.unit).toBe('F');
    expect(log.value.readings[0]!.tempC).toBeCloseTo(21.111111, 5);
    expect(log.value.readings[1]!.tempC).toBeCloseTo(20, 12);
  });

  it('reads tempC, temp_c and a bare second column as °C, and refuses a column it cannot name', () => {
    for (const header of ['time,tempC', 'time,temp_c', 'time,Temperature (°C)', 'time,temperature']) {
      const log = readCureLog(`${header}\n2026-11-01T10:00:00Z,21\n`);
      expect(log.ok && log.value.unit, header).toBe('C');
    }
    const odd = readCureLog('time,kelvin\n2026-11-01T10:00:00Z,294\n');
    expect(odd.ok || odd.error.code).toBe('readings_invalid');
    expect(odd.ok || odd.error.message).toContain('row 1: the temperature column is headed "kelvin"');
  });
});
