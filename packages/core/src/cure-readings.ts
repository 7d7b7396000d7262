import { parseIsoInstant } from './iso-time';
import { fail, ok, type CoreIssue, type Result } from './result';

/** One logged temperature; it holds until the next reading. */
export interface CureReading {
  /** ISO 8601 with Z or an offset. */
  at: string;
  tempC: number;
}

function splitCells(line: string): string[] {
  return line.split(',').map((cell) => cell.trim().replace(/^"(.*)"$/, '$1').trim());
}

function isHeader(cells: string[]): boolean {
  return cells[0]?.toLowerCase() === 'time';
}

/**
 * Reads a `time,tempC` log. Rows are numbered as a spreadsheet shows them (the header, if any, is
 * row 1; blank lines count but are skipped). Either every row is good and all readings come back,
 * or every problem comes back and no readings do: a half-imported log would silently bend the cure.
 */
export function parseCureReadingsCsv(text: string): Result<CureReading[]> {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const readings: CureReading[] = [];
  const issues: CoreIssue[] = [];
  let previous: { ms: number; row: number; at: string } | null = null;
  let seenContent = false;
  lines.forEach((line, i) => {
    const row = i + 1;
    if (line.trim() === '') return;
    const cells = splitCells(line);
    if (!seenContent) {
      seenContent = true;
      if (isHeader(cells)) return;
    }
    if (cells.length !== 2) {
      issues.push({ row, message: `row ${row}: expected 2 columns (time,tempC), found ${cells.length}` });
      return;
    }
    const [timeText, tempText] = cells as [string, string];
    const time = parseIsoInstant(timeText);
    const tempC = Number(tempText);
    const tempOk = tempText !== '' && Number.isFinite(tempC);
    if (!time.ok) issues.push({ row, field: 'time', message: `row ${row}: ${time.error.message}` });
    if (!tempOk) issues.push({ row, field: 'tempC', message: `row ${row}: tempC "${tempText}" is not a number` });
    if (!time.ok || !tempOk) return;
    if (previous && time.value === previous.ms) {
      issues.push({ row, field: 'time', message: `row ${row}: time "${timeText}" repeats the time of row ${previous.row}` });
      return;
    }
    if (previous && time.value < previous.ms) {
      issues.push({ row, field: 'time', message: `row ${row}: time "${timeText}" is earlier than row ${previous.row} ("${previous.at}"); sort the log by time` });
      return;
    }
    previous = { ms: time.value, row, at: timeText };
    readings.push({ at: timeText, tempC });
  });
  if (issues.length > 0) {
    const shown = issues.slice(0, 5).map((issue) => issue.message).join('; ');
    const more = issues.length > 5 ? `; and ${issues.length - 5} more` : '';
    return fail('readings_invalid', `The temperature log was not imported: ${shown}${more}. Fix these rows and import it again.`, issues);
  }
  if (readings.length === 0) {
    return fail('readings_empty', 'The temperature log holds no readings; it needs rows of time,tempC such as 2025-03-01T18:30:00Z,21.5.');
  }
  return ok(readings);
}
