import { describe, expect, it } from 'vitest';
import { copyText, subscribeLinkOf } from './calendar-links';

describe('subscribeLinkOf', () => {
  // IANA, provisional URI scheme "webcal" (registered 2012-09-23): subscribing to iCalendar data over HTTP, with
  // webcal://example.com/calendar.ics as its example. The WHATWG URL parser reads the result back.
  it('gives the same host, path and query under webcal', () => {
    const link = subscribeLinkOf('https://shop.example:8443/api/calendar/AbC_dEf-123.ics?x=1');
    expect(link).toBe('webcal://shop.example:8443/api/calendar/AbC_dEf-123.ics?x=1');
    const read = new URL(link!);
    expect([read.protocol, read.host, read.pathname, read.search]).toEqual(['webcal:', 'shop.example:8443', '/api/calendar/AbC_dEf-123.ics', '?x=1']);
  });

  it('takes a plain http address as well (a shop server on the local network)', () => {
    expect(subscribeLinkOf('http://127.0.0.1:3000/api/calendar/t.ics')).toBe('webcal://127.0.0.1:3000/api/calendar/t.ics');
  });

  it.each(['', 'not a url', 'javascript:alert(1)', 'ftp://shop.example/feed.ics', '/api/calendar/t.ics'])('offers no link for %j', (input) => {
    expect(subscribeLinkOf(input)).toBeNull();
  });
});

describe('copyText', () => {
  it('writes the whole text to the clipboard', async () => {
    const written: string[] = [];
    const outcome = await copyText('https://shop.example/api/calendar/t.ics', { writeText: async (text) => void written.push(text) });
    expect(outcome).toEqual({ ok: true });
    expect(written).toEqual(['https://shop.example/api/calendar/t.ics']);
  });

  it('says how to copy by hand when the browser has no clipboard here (a page that is not secure)', async () => {
    const outcome = await copyText('x', undefined);
    expect(outcome).toMatchObject({ ok: false, code: 'copy_unavailable' });
    if (!outcome.ok) expect(outcome.message).toMatch(/copy it yourself/);
  });

  it('says how to copy by hand when the browser refuses', async () => {
    const outcome = await copyText('x', {
      writeText: () => Promise.reject(new DOMException('Write permission denied.', 'NotAllowedError')),
    });
    expect(outcome).toMatchObject({ ok: false, code: 'copy_refused' });
  });
});
