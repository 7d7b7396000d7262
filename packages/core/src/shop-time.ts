import { DateTime } from 'luxon';

// Intl knows a zone's letters only in the locales where people use them: PST in en-US, CET in en-GB, AEST in en-AU.
const abbreviationLocales = ['en-US', 'en-GB', 'en-AU', 'en-IN', 'en-NZ', 'en-CA', 'en-ZA'];

/** The zone's abbreviation at an instant (PST, PDT, CET, AEDT…), or its offset from GMT where it has none. */
export function zoneAbbreviation(ms: number, zone: string): string {
  let fallback = '';
  for (const locale of abbreviationLocales) {
    const name =
      new Intl.DateTimeFormat(locale, { timeZone: zone, timeZoneName: 'short' }).formatToParts(new Date(ms)).find((p) => p.type === 'timeZoneName')?.value ??
      '';
    if (name && !/^GMT[+-−]/.test(name)) return name;
    fallback ||= name;
  }
  return fallback || DateTime.fromMillis(ms, { zone }).toFormat('ZZ');
}

/** A moment as the shop reads it: "Thu 3 Dec 2026, 17:15 PST". The zone is one checkZone accepted. */
export function shopTimeWords(ms: number, zone: string): string {
  return `${DateTime.fromMillis(ms, { zone }).toFormat('ccc d LLL yyyy, HH:mm', { locale: 'en-GB' })} ${zoneAbbreviation(ms, zone)}`;
}

/** Only the clock time, for a list within one day: "17:15 PST". */
export function shopClockWords(ms: number, zone: string): string {
  return `${DateTime.fromMillis(ms, { zone }).toFormat('HH:mm')} ${zoneAbbreviation(ms, zone)}`;
}

/** The shop's calendar date at an instant, as YYYY-MM-DD. */
export function shopLocalDate(ms: number, zone: string): string {
  return DateTime.fromMillis(ms, { zone }).toISODate() ?? new Date(ms).toISOString().slice(0, 10);
}
