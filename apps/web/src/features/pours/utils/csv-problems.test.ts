import { parseCureReadingsCsv } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { csvRowProblems } from './csv-problems';

describe('csvRowProblems', () => {
  it('lists every bad row in file order, whatever order the answer holds them in', () => {
    const problems = csvRowProblems({ 'row 12': 'tempC "warm" is not a number', 'row 3': 'time is not ISO', 'row 10': 'repeats row 9' });
    expect(problems.map((p) => p.row)).toEqual([3, 10, 12]);
    expect(problems[0]?.message).toBe('time is not ISO');
  });

  it('keeps messages about no particular row, after the rows', () => {
    expect(csvRowProblems({ file: 'empty', 'row 2': 'bad' }).map((p) => p.label)).toEqual(['row 2', 'file']);
  });

  // Reference: the rows the API's own parser (core) flags in a log, numbered as a spreadsheet shows them.
  it('matches the rows the log parser numbers', () => {
    const parsed = parseCureReadingsCsv('time,tempC\n2026-03-01T18:00:00Z,21\nyesterday,20\n2026-03-01T19:00:00Z,warm\n');
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    const fields = Object.fromEntries((parsed.error.issues ?? []).map((i) => [`row ${i.row}`, i.message]));
    const problems = csvRowProblems(fields);
    expect(problems.map((p) => p.row)).toEqual([3, 4]);
    // The row number is said once, by the list.
    expect(problems[0]?.message.startsWith('time "yesterday"')).toBe(true);
  });
});
