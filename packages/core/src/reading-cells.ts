import { fail, ok, type Result } from './result';

/**
 * The two cells of an imported temperature log. Their grammar is narrower than everything a
 * date library would take: each accepted value must mean the same instant to the database that
 * stores it (week dates, ordinal dates, years past 9999 and offsets past ±14:00 are refused there),
 * and a log of 2 MB must be read in well under a second.
 */

const absoluteZeroC = -273.15;
// The offsets of the world's time zones run from −12:00 to +14:00 (IANA tz database, from memory).
const largestOffsetMinutes = 14 * 60;
const maxQuotedChars = 40;

const logTime = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,9}))?)?(Z|([+-])(\d{2})(?::?(\d{2}))?)?$/i;
// One way to match each digit: `\d+\.?\d*` would backtrack quadratically on a long run of digits.
const decimal = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

/** A cell as messages quote it: long enough to find in the file, short enough to read. */
export function quotedCell(text: string): string {
  return `"${text.length > maxQuotedChars ? `${text.slice(0, maxQuotedChars)}…` : text}"`;
}

function daysInMonth(year: number, month: number): number {
  // Gregorian leap years: every 4th, except centuries not divisible by 400.
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][month - 1]!;
}

/** Epoch milliseconds of a log time: YYYY-MM-DDThh:mm[:ss[.fraction]] with Z or ±hh[:mm]. */
export function readTimeCell(text: string): Result<number> {
  const m = logTime.exec(text);
  if (!m) return fail('time_not_iso', `time ${quotedCell(text)} is not an ISO date; write it like 2025-03-01T18:30:00Z.`);
  if (m[8] === undefined) return fail('time_without_offset', `time ${quotedCell(text)} has no time zone; add Z or an offset such as +01:00.`);
  const [year, month, day, hour, minute] = [m[1], m[2], m[3], m[4], m[5]].map(Number) as [number, number, number, number, number];
  const second = m[6] === undefined ? 0 : Number(m[6]);
  // The same rounding as the date library that reads these times again later, so both agree to the millisecond.
  const millis = m[7] === undefined ? 0 : Math.floor(parseFloat(`0.${m[7]}`) * 1000);
  const endOfDay = hour === 24 && minute === 0 && second === 0 && millis === 0;
  if (year < 1 || month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month) || (hour > 23 && !endOfDay) || minute > 59 || second > 59) {
    return fail('time_not_iso', `time ${quotedCell(text)} is not a real date and time; check the year, month, day and clock.`);
  }
  const offsetMinutes = m[8].toUpperCase() === 'Z' ? 0 : (m[9] === '-' ? -1 : 1) * (Number(m[10]) * 60 + Number(m[11] ?? 0));
  if (Number(m[11] ?? 0) > 59 || Math.abs(offsetMinutes) > largestOffsetMinutes) {
    return fail('time_offset_invalid', `time ${quotedCell(text)} has the offset ${m[8]}, but offsets run from −12:00 to +14:00; write the shop's offset or Z.`);
  }
  const date = new Date(0);
  // setUTCFullYear, because Date.UTC reads years 0–99 as 1900–1999.
  date.setUTCFullYear(year, month - 1, day);
  date.setUTCHours(hour, minute, second, millis);
  return ok(date.getTime() - offsetMinutes * 60_000);
}

/**
 * A plain decimal number (optional sign, digits, point, exponent), or NaN: no hex (0x10), no
 * "Infinity", no blanks. The minus sign may be the typographic one (U+2212) that phones and copied
 * text produce. The one reader of typed and imported numbers.
 */
export function parseDecimal(text: string): number {
  const plain = text.trim().replace(/^\u2212/, '-');
  return decimal.test(plain) ? Number(plain) : Number.NaN;
}

/**
 * A number as a person types it in a form field, read by parseDecimal's grammar: blanks around it are dropped and
 * one decimal comma is read as a point (212,4). Null for an empty field and for anything that is not a plain finite
 * decimal: 0x10, 1e999, 12 g, 1.2.3. Imported files use parseDecimal itself, where a comma separates fields.
 */
export function readDecimal(text: string): number | null {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  const value = parseDecimal(trimmed.replace(',', '.'));
  return Number.isFinite(value) ? value : null;
}

/** A temperature in °C written as a plain decimal (no hex, no "Infinity"), above absolute zero. */
export function readTempCell(text: string): Result<number> {
  const tempC = parseDecimal(text);
  if (!Number.isFinite(tempC)) return fail('temperature_invalid', `tempC ${quotedCell(text)} is not a number`);
  if (tempC <= absoluteZeroC) {
    // Zero kelvin is −273.15 °C exactly (SI Brochure, 9th ed., 2019); the cure rate is undefined there.
    return fail('temperature_invalid', `tempC ${quotedCell(text)} is at or below absolute zero (−273.15 °C); check the column holds °C`);
  }
  return ok(tempC);
}
