import fc from 'fast-check';
import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { maxReadingIssues, parseCureReadingsCsv, type CureReading } from './cure-readings';
import { readTimeCell } from './reading-cells';
import type { Result } from './result';

// Generous for a loaded 2-core machine; a quadratic pass over the rows blows well past them.
const smallBudgetMs = 250;
const largeBudgetMs = 8000;
// The API reads the body of POST /pours/:id/readings/csv with express.text({ limit: '2mb' }).
const apiBodyLimitBytes = 2 * 1024 * 1024;

function timedParse(text: string): { result: Result<CureReading[]>; ms: number } {
  const start = performance.now();
  const result = parseCureReadingsCsv(text);
  return { result, ms: performance.now() - start };
}

/** Rows as the parser counts them: the line breaks a spreadsheet accepts. */
function lineCount(text: string): number {
  return text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/).length;
}

/** All or nothing: every content row read, or a typed refusal naming rows that exist, in order. */
function expectAllOrNothing(text: string, result: Result<CureReading[]>): void {
  if (result.ok) {
    expect(result.value.length).toBeGreaterThan(0);
    for (const r of result.value) {
      expect(Number.isFinite(r.tempC)).toBe(true);
      // Zero kelvin is −273.15 °C (SI Brochure, 9th ed., 2019): nothing colder can be logged.
      expect(r.tempC).toBeGreaterThan(-273.15);
      // Every accepted time names the instant luxon (the reference reader) finds in it.
      const time = readTimeCell(r.at);
      expect(time.ok && time.value).toBe(DateTime.fromISO(r.at, { setZone: true }).toMillis());
    }
    const ms = result.value.map((r) => readTimeCell(r.at)).map((t) => (t.ok ? t.value : Number.NaN));
    for (let i = 1; i < ms.length; i++) expect(ms[i]!).toBeGreaterThan(ms[i - 1]!);
    return;
  }
  expect(['readings_invalid', 'readings_empty']).toContain(result.error.code);
  expect(result.error.message).toMatch(/[.]$/);
  expect(result.error.message.length).toBeLessThan(2000);
  expect(result).not.toHaveProperty('value');
  if (result.error.code === 'readings_empty') return;
  const issues = result.error.issues ?? [];
  expect(issues.length).toBeGreaterThan(0);
  expect(issues.length).toBeLessThanOrEqual(maxReadingIssues);
  const rows = lineCount(text);
  let last = 0;
  for (const issue of issues) {
    expect(issue.row).toBeGreaterThanOrEqual(Math.max(1, last));
    expect(issue.row).toBeLessThanOrEqual(rows);
    expect(issue.message.startsWith(`row ${issue.row}: `)).toBe(true);
    last = issue.row!;
  }
}

/** Pieces a damaged or foreign log is made of. */
const logPiece = fc.oneof(
  fc.constantFrom(
    'time,tempC',
    '2025-03-01T18:00:00Z,21.5',
    '2025-03-01T17:00:00Z,21',
    '"2025-03-01T19:00:00+01:00","20"',
    '2025-03-01T18:00:00,20',
    '2025-W09-6T18:00Z,20',
    '2025-060T18:00Z,20',
    '20250301T180000Z,20',
    '+002025-03-01T18:00Z,20',
    '2025-02-29T18:00Z,20',
    '2025-03-01T18:00:00+16:00,20',
    '0000-03-01T18:00:00Z,20',
    '2025-03-01T18:00:00Z,0x10',
    '2025-03-01T18:00:00Z,-300',
    '2025-03-01T18:00:00Z,Infinity',
    '2025-03-01T18:00:00Z,1e999',
    '2025-03-01T18:00:00Z,"21,5"',
    '""',
    '"',
    ',',
    ',,,',
    '\uFEFF',
    '\r\n',
    '\r',
    '\n',
    '\u2028',
    '\u00a0',
    '١٢',
    '温度',
    '🌡️',
    '\0',
  ),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.string({ unit: 'grapheme', maxLength: 20 }),
);
const separator = fc.constantFrom('\n', '\r\n', '\r', ',', '');

describe('parseCureReadingsCsv on hostile input: all rows or per-row errors, never a throw or a hang', () => {
  it('answers arbitrary unicode text', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 600 }), (text) => {
        const { result, ms } = timedParse(text);
        expectAllOrNothing(text, result);
        expect(ms).toBeLessThan(smallBudgetMs);
      }),
      { numRuns: 400 },
    );
  });

  it('answers logs stitched from valid rows, foreign dates, quotes, BOMs, line breaks of every kind and garbage', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(logPiece, separator), { maxLength: 30 }), fc.boolean(), (parts, bom) => {
        const text = (bom ? '\uFEFF' : '') + parts.map(([piece, sep]) => piece + sep).join('');
        const { result, ms } = timedParse(text);
        expectAllOrNothing(text, result);
        expect(ms).toBeLessThan(smallBudgetMs);
      }),
      { numRuns: 500 },
    );
  });

  it('answers one huge line, with a bounded message, in bounded time', () => {
    const filler = fc.constantFrom('1', ',', '"', ' ', 'x', 'T', '2025-03-01T18:00:00Z,', '\u00e9');
    const tail = fc.constantFrom('', 'x', '.', 'e', ',', '"');
    fc.assert(
      fc.property(
        filler,
        fc.integer({ min: 100_000, max: 400_000 }),
        fc.constantFrom('', '2025-03-01T', '2025-03-01T18:00:00Z,'),
        tail,
        (unit, repeat, head, end) => {
          const text = head + unit.repeat(repeat) + end;
          const { result, ms } = timedParse(text);
          expectAllOrNothing(text, result);
          expect(ms).toBeLessThan(largeBudgetMs);
        },
      ),
      { numRuns: 12 },
    );
  });
});

interface GeneratedRow {
  epochMs: number;
  timeText: string;
  tempText: string;
}

/** Offsets in 15-minute steps from −12:00 to +14:00, written the ways the grammar allows. */
const offsetMinutes = fc.integer({ min: -48, max: 56 }).map((q) => q * 15);
const offsetStyle = fc.constantFrom('colon', 'compact', 'zulu');

function offsetText(minutes: number, style: string): string {
  if (style === 'zulu' && minutes === 0) return 'Z';
  const sign = minutes < 0 ? '-' : '+';
  const h = String(Math.floor(Math.abs(minutes) / 60)).padStart(2, '0');
  const m = String(Math.abs(minutes) % 60).padStart(2, '0');
  return style === 'compact' ? `${sign}${h}${m}` : `${sign}${h}:${m}`;
}

/** The wall-clock time at that offset, with seconds and milliseconds written only when needed or wanted. */
function timeText(epochMs: number, minutes: number, style: string, longForm: boolean): string {
  const local = new Date(epochMs + minutes * 60_000).toISOString(); // YYYY-MM-DDTHH:mm:ss.sssZ
  let clock = local.slice(0, 23);
  if (!longForm && clock.endsWith('.000')) clock = clock.slice(0, 19);
  if (!longForm && clock.endsWith(':00') && clock.length === 19) clock = clock.slice(0, 16);
  return clock + offsetText(minutes, style);
}

const tempText = fc.oneof(
  fc.double({ min: -30, max: 80, noNaN: true }).map(String),
  fc.tuple(fc.double({ min: -30, max: 80, noNaN: true }), fc.integer({ min: 0, max: 3 })).map(([v, d]) => v.toFixed(d)),
  fc.integer({ min: -30, max: 80 }).map(String),
  fc.double({ min: -30, max: 80, noNaN: true }).map((v) => v.toExponential(4)),
);

/** Strictly later readings, 1 ms to 3 days apart, from 1970 to about 2100. */
const generatedLog: fc.Arbitrary<GeneratedRow[]> = fc
  .tuple(
    fc.integer({ min: 0, max: 4_000_000_000_000 }),
    fc.array(fc.tuple(fc.integer({ min: 1, max: 3 * 86_400_000 }), offsetMinutes, offsetStyle, fc.boolean(), tempText), { minLength: 1, maxLength: 60 }),
  )
  .map(([start, steps]) => {
    let at = start;
    return steps.map(([step, minutes, style, longForm, temp]) => {
      at += step;
      return { epochMs: at, timeText: timeText(at, minutes, style, longForm), tempText: temp };
    });
  });

const layout = fc.record({
  header: fc.constantFrom('', 'time,tempC', 'Time,TempC', '"time","tempC"'),
  bom: fc.boolean(),
  eol: fc.constantFrom('\n', '\r\n', '\r'),
  quote: fc.boolean(),
  padding: fc.constantFrom('', ' ', '\t', '  '),
  blankEvery: fc.integer({ min: 0, max: 5 }),
  trailingEol: fc.boolean(),
});
type Layout = typeof layout extends fc.Arbitrary<infer L> ? L : never;

/** Writes the rows as a log; returns the text and the spreadsheet row number of each reading. */
function written(rows: GeneratedRow[], l: Layout): { text: string; rowOf: number[] } {
  const lines: string[] = [];
  const rowOf: number[] = [];
  if (l.header) lines.push(l.header);
  const cell = (s: string): string => l.padding + (l.quote ? `"${s}"` : s) + l.padding;
  rows.forEach((r, i) => {
    if (l.blankEvery > 0 && i % l.blankEvery === 0) lines.push(l.padding);
    lines.push(`${cell(r.timeText)},${cell(r.tempText)}`);
    rowOf.push(lines.length);
  });
  return { text: (l.bom ? '\uFEFF' : '') + lines.join(l.eol) + (l.trailingEol ? l.eol : ''), rowOf };
}

describe('parseCureReadingsCsv on generated valid logs', () => {
  it('gives back every reading: the time as written, the instant it names, the temperature it says', () => {
    fc.assert(
      fc.property(generatedLog, layout, (rows, l) => {
        const { text } = written(rows, l);
        const { result, ms } = timedParse(text);
        expect(ms).toBeLessThan(smallBudgetMs);
        expect(result.ok).toBe(true);
        if (!result.ok) return;
        expect(result.value.map((r) => r.at)).toEqual(rows.map((r) => r.timeText));
        expect(result.value.map((r) => r.tempC)).toEqual(rows.map((r) => Number(r.tempText)));
        const instants = result.value.map((r) => readTimeCell(r.at));
        expect(instants.map((t) => t.ok && t.value)).toEqual(rows.map((r) => r.epochMs));
      }),
      { numRuns: 200 },
    );
  });

  it('reads each time as the same instant as luxon and as ECMAScript Date.parse do', () => {
    // Reference libraries: luxon's ISO 8601 reader and the ECMAScript date-time string format
    // (ECMA-262 §21.4.1.32), both of which the product's other time checks rely on.
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 4_000_000_000_000 }), offsetMinutes, offsetStyle, fc.boolean(), (epochMs, minutes, style, longForm) => {
        const text = timeText(epochMs, minutes, style, longForm);
        const ours = readTimeCell(text);
        expect(ours.ok && ours.value).toBe(DateTime.fromISO(text, { setZone: true }).toMillis());
        if (style !== 'compact') expect(ours.ok && ours.value).toBe(Date.parse(text));
      }),
      { numRuns: 500 },
    );
  });

  it('names exactly the rows that were damaged, and imports none of them', () => {
    const damage = fc.constantFrom('warm', '0x1A', '-300', 'Infinity', '', '21,5', '2l');
    fc.assert(
      fc.property(generatedLog, layout, fc.array(fc.tuple(fc.nat(), damage), { minLength: 1, maxLength: 8 }), (rows, l, hits) => {
        const broken = rows.map((r) => ({ ...r }));
        for (const [pick, bad] of hits) broken[pick % rows.length]!.tempText = bad;
        const { text, rowOf } = written(broken, l);
        const { result } = timedParse(text);
        expectAllOrNothing(text, result);
        expect(result.ok).toBe(false);
        if (result.ok) return;
        const damaged = [...new Set(hits.map(([pick]) => rowOf[pick % rows.length]!))].sort((a, b) => a - b);
        expect([...new Set(result.error.issues!.map((i) => i.row))]).toEqual(damaged);
      }),
      { numRuns: 200 },
    );
  });
});

describe('parseCureReadingsCsv at the size the API lets through', () => {
  it('reads a 2 MB log of good rows in bounded time', () => {
    const rows: string[] = [];
    let bytes = 0;
    for (let i = 0; bytes < apiBodyLimitBytes - 40; i++) {
      const row = `${new Date(Date.UTC(2025, 0, 1) + i * 60_000).toISOString()},${(15 + (i % 100) / 10).toFixed(1)}`;
      rows.push(row);
      bytes += row.length + 1;
    }
    const { result, ms } = timedParse(rows.join('\n'));
    expect(result.ok && result.value.length).toBe(rows.length);
    expect(ms).toBeLessThan(largeBudgetMs);
  });

  it('refuses a 2 MB log of bad rows with a short message, the first problems one by one and the rest counted', () => {
    const text = 'a,b\n'.repeat(apiBodyLimitBytes / 4);
    const { result, ms } = timedParse(text);
    expect(ms).toBeLessThan(largeBudgetMs);
    expectAllOrNothing(text, result);
    expect(!result.ok && result.error.issues!.length).toBe(maxReadingIssues);
    // Two problems (time and tempC) on each of the 524,288 rows, five of them spelled out.
    expect(!result.ok && result.error.message).toContain(`and ${2 * (apiBodyLimitBytes / 4) - 5} more`);
  });
});
