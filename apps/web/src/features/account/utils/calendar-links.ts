/**
 * The feed behind the webcal scheme, which a calendar app takes as "subscribe to this and keep it fresh" where an
 * https link would only download the file once. IANA's provisional registration of webcal (2012) gives its meaning as
 * subscribing to iCalendar data with HTTP as the transport, e.g. webcal://example.com/calendar.ics. Null for anything
 * that is not an http(s) address, so the page offers no link rather than a broken one.
 */
export function subscribeLinkOf(feedUrl: string): string | null {
  let url: URL;
  try {
    url = new URL(feedUrl);
  } catch {
    return null;
  }
  if (url.protocol !== 'https:' && url.protocol !== 'http:') return null;
  return `webcal://${url.host}${url.pathname}${url.search}`;
}

export type CopyOutcome = { ok: true } | { ok: false; code: 'copy_unavailable' | 'copy_refused'; message: string };

/**
 * Puts the text on the clipboard. The async clipboard exists only on secure pages (https, or this machine) and the
 * browser may refuse it; either way the person is told to copy by hand from the field.
 */
export async function copyText(text: string, clipboard: Pick<Clipboard, 'writeText'> | undefined): Promise<CopyOutcome> {
  if (!clipboard)
    return { ok: false, code: 'copy_unavailable', message: 'This browser cannot copy from here: select the link in the field and copy it yourself.' };
  try {
    await clipboard.writeText(text);
    return { ok: true };
  } catch {
    return { ok: false, code: 'copy_refused', message: 'The browser did not allow copying: select the link in the field and copy it yourself.' };
  }
}
