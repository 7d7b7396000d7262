const calendarDate = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/**
 * A lot's dates are calendar days ("2026-12-01"), not instants: read as UTC midnight they would show the day before
 * west of Greenwich, so they are read as that day wherever the browser is.
 */
export function calendarDateOf(isoDate: string): Date | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  if (!match) return null;
  const date = new Date(Number(match[1]), Number(match[2]) - 1, Number(match[3]));
  return date.getMonth() === Number(match[2]) - 1 ? date : null;
}

export function formatCalendarDate(isoDate: string, format: Intl.DateTimeFormat = calendarDate): string {
  const date = calendarDateOf(isoDate);
  return date ? format.format(date) : isoDate;
}

/** Today in the browser's own calendar, as the API's date fields write it. */
export function todayIsoDate(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
