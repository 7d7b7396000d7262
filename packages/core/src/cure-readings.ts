import { parseDecimal, quotedCell, readTempCell, readTimeCell } from './reading-cells';
import { fail, ok, type CoreIssue, type Result } from './result';

/** One logged temperature; it holds until the next reading. */
export interface CureReading {
  /** ISO 8601 with Z or an offset. */
  at: string;
  tempC: number;
}

/** Problems kept one by one; beyond this a log is wrong throughout and only the count is useful. */
export const maxReadingIssues = 1000;

function unquoted(cell: string): string {
  return cell
    .trim()
    .replace(/^"(.*)"$/, '$1')
    .trim();
}

/** The cells of a row, or how many there are when that is not two (without splitting a huge row). */
function splitCells(line: string): [string, string] | number {
  const first = line.indexOf(',');
  if (first < 0) return 1;
  let count = 2;
  for (let at = line.indexOf(',', first + 1); at >= 0; at = line.indexOf(',', at + 1)) count++;
  if (count !== 2) return count;
  return [unquoted(line.slice(0, first)), unquoted(line.slice(first + 1))];
}

function isHeader(line: string): boolean {
  return unquoted(line.split(',', 1)[0]!).toLowerCase() === 'time';
}

export type LogTemperatureUnit = 'C' | 'F';

// A header names its temperature column; one named for °F (tempF, temp_f, °F, fahrenheit) is read as °F.
const fahrenheitColumn = /^(?:temp(?:erature)?[ _-]?(?:f|°f|degf|deg_f|\(°?f\))|°f|f|fahrenheit|temp(?:erature)?[ _-]?fahrenheit)$/i;
const celsiusColumn = /^(?:temp(?:erature)?(?:[ _-]?(?:c|°c|degc|deg_c|\(°?c\)))?|°c|c|celsius|temp(?:erature)?[ _-]?celsius)$/i;

/** The unit a header's second column names, or an error naming what it says instead. */
function headerUnit(line: string): Result<LogTemperatureUnit> {
  const second = unquoted(line.slice(line.indexOf(',') + 1));
  if (line.indexOf(',') < 0 || celsiusColumn.test(second)) return ok('C');
  if (fahrenheitColumn.test(second)) return ok('F');
  return fail(
    'readings_unit_unknown',
    `the temperature column is headed ${quotedCell(second)}; head it tempC (degrees Celsius) or tempF (degrees Fahrenheit) so Gelpoint knows the unit`,
  );
}

export interface CureLog {
  readings: CureReading[];
  /** The unit the file's temperature column was in; the readings are in °C either way. */
  unit: LogTemperatureUnit;
}

/** NIST SP 811: t/°C = (t/°F − 32)/1.8, kept exact here so a °F log reads the same everywhere. */
function fahrenheitToCelsius(tempF: number): number {
  return (tempF - 32) / 1.8;
}

/**
 * Reads a `time,tempC` log. Rows are numbered as a spreadsheet shows them (the header, if any, is
 * row 1; blank lines count but are skipped). Either every row is good and all readings come back,
 * or the problems come back (the first `maxReadingIssues` of them one by one, all of them counted
 * in the message) and no readings do: a half-imported log would silently bend the cure.
 */
export function parseCureReadingsCsv(text: string): Result<CureReading[]> {
  const log = readCureLog(text);
  return log.ok ? ok(log.value.readings) : log;
}

/**
 * Reads a `time,tempC` (or `time,tempF`) log, as parseCureReadingsCsv does, and says which unit its
 * temperature column was in. A column headed for °F is converted to °C, and its values are checked
 * against absolute zero in °F.
 */
export function readCureLog(text: string): Result<CureLog> {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const readings: CureReading[] = [];
  const issues: CoreIssue[] = [];
  let issueCount = 0;
  // The sentence is written only for problems that are kept: a 2 MB log can hold a million.
  const report = (row: number, field: string | undefined, message: () => string): void => {
    issueCount++;
    if (issues.length >= maxReadingIssues) return;
    issues.push(field === undefined ? { row, message: `row ${row}: ${message()}` } : { row, field, message: `row ${row}: ${message()}` });
  };
  let previous: { ms: number; row: number; at: string } | null = null;
  let seenContent = false;
  let unit: LogTemperatureUnit = 'C';
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!;
    const row = i + 1;
    if (line.trim() === '') continue;
    if (!seenContent) {
      seenContent = true;
      if (isHeader(line)) {
        const named = headerUnit(line);
        if (named.ok) unit = named.value;
        else report(row, 'tempC', () => named.error.message);
        continue;
      }
    }
    const cells = splitCells(line);
    if (typeof cells === 'number') {
      report(row, undefined, () => `expected 2 columns (time,tempC), found ${cells}`);
      continue;
    }
    const [timeText, tempText] = cells;
    const time = readTimeCell(timeText);
    const temp = unit === 'C' ? readTempCell(tempText) : readFahrenheitCell(tempText);
    if (!time.ok) report(row, 'time', () => time.error.message);
    if (!temp.ok) report(row, 'tempC', () => temp.error.message);
    if (!time.ok || !temp.ok) continue;
    if (previous && time.value === previous.ms) {
      const earlier = previous.row;
      report(row, 'time', () => `time ${quotedCell(timeText)} repeats the time of row ${earlier}`);
      continue;
    }
    if (previous && time.value < previous.ms) {
      const { row: earlier, at } = previous;
      report(row, 'time', () => `time ${quotedCell(timeText)} is earlier than row ${earlier} (${quotedCell(at)}); sort the log by time`);
      continue;
    }
    previous = { ms: time.value, row, at: timeText };
    readings.push({ at: timeText, tempC: temp.value });
  }
  if (issueCount > 0) {
    const shown = issues
      .slice(0, 5)
      .map((issue) => issue.message)
      .join('; ');
    const more = issueCount > 5 ? `; and ${issueCount - 5} more` : '';
    return fail('readings_invalid', `The temperature log was not imported: ${shown}${more}. Fix these rows and import it again.`, issues);
  }
  if (readings.length === 0) {
    return fail('readings_empty', 'The temperature log holds no readings; it needs rows of time,tempC such as 2025-03-01T18:30:00Z,21.5.');
  }
  return ok({ readings, unit });
}

function readFahrenheitCell(text: string): Result<number> {
  const tempF = parseDecimal(text);
  if (!Number.isFinite(tempF)) return fail('temperature_invalid', `tempF ${quotedCell(text)} is not a number`);
  const tempC = fahrenheitToCelsius(tempF);
  // Zero kelvin is −459.67 °F (SI Brochure, 9th ed., 2019, with NIST SP 811's conversion).
  if (tempC <= -273.15) return fail('temperature_invalid', `tempF ${quotedCell(text)} is at or below absolute zero (−459.67 °F); check the column holds °F`);
  return ok(tempC);
}
