import { displayTimeZone, onDisplayTimeZoneChange } from './display-zone';

let dateTime: Intl.DateTimeFormat | null = null;
let dateOnly: Intl.DateTimeFormat | null = null;
onDisplayTimeZoneChange(() => {
  dateTime = null;
  dateOnly = null;
});

/** Date and time in the shop's zone, with the zone's abbreviation (PST, CET…). */
function dateTimeFormat(): Intl.DateTimeFormat {
  dateTime ??= new Intl.DateTimeFormat(undefined, {
    year: 'numeric',
    month: 'short',
    day: 'numeric',
    hour: 'numeric',
    minute: '2-digit',
    timeZoneName: 'short',
    timeZone: displayTimeZone(),
  });
  return dateTime;
}

function dateFormat(): Intl.DateTimeFormat {
  dateOnly ??= new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone: displayTimeZone() });
  return dateOnly;
}

export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTimeFormat().format(date);
}

export function formatDate(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateFormat().format(date);
}
