const pad = (n: number) => String(n).padStart(2, '0');

/** A moment as a datetime-local field shows it: the browser's own wall clock, to the minute. */
export function toLocalInput(date: Date): string {
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}T${pad(date.getHours())}:${pad(date.getMinutes())}`;
}

/**
 * What a datetime-local field holds (no zone) as the instant it means on this device, written with Z as the API
 * requires. Null for anything that is not a full date and time.
 */
export function localInputToIso(value: string): string | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2}))?$/.exec(value.trim());
  if (!match) return null;
  const [year, month, day, hour, minute, second] = match.slice(1).map((part) => Number(part ?? 0)) as [number, number, number, number, number, number];
  const date = new Date(year, month - 1, day, hour, minute, second);
  // new Date rolls 31 February over into March; a date that moved was not a real one.
  if (date.getFullYear() !== year || date.getMonth() !== month - 1 || date.getDate() !== day || date.getHours() !== hour) return null;
  return date.toISOString();
}
