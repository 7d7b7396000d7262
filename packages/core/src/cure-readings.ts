import { quotedCell, readTempCell, readTimeCell } from './reading-cells';
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
  return cell.trim().replace(/^"(.*)"$/, '$1').trim();
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

/**
 * Reads a `time,tempC` log. Rows are numbered as a spreadsheet shows them (the header, if any, is
 * row 1; blank lines count but are skipped). Either every row is good and all readings come back,
 * or the problems come back (the first `maxReadingIssues` of them one by one, all of them counted
 * in the message) and no readings do: a half-imported log would silently bend the cure.
 */
export function parseCureReadingsCsv(text: string): Result<CureReading[]> {
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
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!;
    const row = i + 1;
    if (line.trim() === '') continue;
    if (!seenContent) {
      seenContent = true;
      if (isHeader(line)) continue;
    }
    const cells = splitCells(line);
    if (typeof cells === 'number') {
      report(row, undefined, () => `expected 2 columns (time,tempC), found ${cells}`);
      continue;
    }
    const [timeText, tempText] = cells;
    const time = readTimeCell(timeText);
    const temp = readTempCell(tempText);
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
    const shown = issues.slice(0, 5).map((issue) => issue.message).join('; ');
    const more = issueCount > 5 ? `; and ${issueCount - 5} more` : '';
    return fail('readings_invalid', `The temperature log was not imported: ${shown}${more}. Fix these rows and import it again.`, issues);
  }
  if (readings.length === 0) {
    return fail('readings_empty', 'The temperature log holds no readings; it needs rows of time,tempC such as 2025-03-01T18:30:00Z,21.5.');
  }
  return ok(readings);
}
