import { findAll, getAttributeValue, textContent } from 'domutils';
import { parseDocument } from 'htmlparser2';
import { describe, expect, it } from 'vitest';
import { renderInboxPage, renderMessagePage } from './page';
import type { SinkMessage } from './sink-message';

const smtp = { host: '127.0.0.1', port: 2525 };

function message(overrides: Partial<SinkMessage>): SinkMessage {
  return {
    id: 'm-1',
    receivedAt: '2024-03-05T06:07:08.000Z',
    messageId: '<m-1@gelpoint.test>',
    date: '2024-03-05T06:07:08.000Z',
    from: 'reminders@gelpoint.test',
    to: ['maker@example.com'],
    cc: [],
    subject: 'Demold check',
    text: 'Open https://gelpoint.test/pours/9 to log it.',
    html: null,
    envelope: { mailFrom: 'reminders@gelpoint.test', rcptTo: ['maker@example.com'] },
    sizeBytes: 100,
    ...overrides,
  };
}

// htmlparser2 (registry package, installed at the root) reads the page the way a browser tokenizer would.
const elements = (html: string, name: string) => findAll((node) => node.name === name, parseDocument(html).children);

describe('inbox page', () => {
  it('lists when, to and subject, newest first as given, each linking to its message', () => {
    const page = renderInboxPage([message({ id: 'm-2', subject: 'Second', to: ['a@x.test', 'b@x.test'] }), message({ id: 'm-1', subject: 'First' })], smtp, '');
    expect(textContent(elements(page, 'title'))).toBe('Gelpoint mail sink');
    const rows = elements(page, 'tbody').flatMap((tbody) => findAll((node) => node.name === 'tr', tbody.children));
    expect(rows.map((row) => findAll((node) => node.name === 'td', row.children).map((cell) => textContent(cell).trim()))).toEqual([
      ['2024-03-05 06:07:08 UTC', 'a@x.test, b@x.test', 'Second'],
      ['2024-03-05 06:07:08 UTC', 'maker@example.com', 'First'],
    ]);
    expect(elements(page, 'a').map((a) => getAttributeValue(a, 'href'))).toContain('/messages/m-2');
  });

  it('shows a hostile subject as text, with no script element in the page', () => {
    const subject = '<script>alert(1)</script>';
    const page = renderInboxPage([message({ subject })], smtp, '');
    expect(elements(page, 'script')).toEqual([]);
    expect(elements(page, 'a').map((a) => textContent(a))).toContain(subject);
  });

  it('labels the recipient filter and keeps its value escaped', () => {
    const page = renderInboxPage([], smtp, '"><b>x</b>');
    const [input] = elements(page, 'input');
    expect(getAttributeValue(input!, 'value')).toBe('"><b>x</b>');
    const [label] = elements(page, 'label');
    expect(getAttributeValue(label!, 'for')).toBe(getAttributeValue(input!, 'id'));
    expect(elements(page, 'b')).toEqual([]);
  });

  it('loads nothing from outside the page', () => {
    const page = renderInboxPage([message({})], smtp, '');
    expect(elements(page, 'link')).toEqual([]);
    expect(elements(page, 'script')).toEqual([]);
    expect(page).not.toMatch(/(src|href)="(https?:)?\/\//);
  });
});

describe('message page', () => {
  it('shows the text in a pre with its links clickable', () => {
    const page = renderMessagePage(message({}), smtp);
    const [pre] = elements(page, 'pre');
    expect(textContent(pre!)).toBe('Open https://gelpoint.test/pours/9 to log it.');
    expect(findAll((node) => node.name === 'a', pre!.children).map((a) => getAttributeValue(a, 'href'))).toEqual(['https://gelpoint.test/pours/9']);
  });

  it('puts an HTML body only inside a fully sandboxed srcdoc frame', () => {
    const html = '<p onclick="steal()">Hi</p><script>steal()</script><img src="https://tracker.test/p.gif">';
    const page = renderMessagePage(message({ html, subject: '<img src=x onerror=alert(1)>' }), smtp);
    // HTML Living Standard, the iframe element (from memory): an empty sandbox attribute applies every restriction.
    const frames = elements(page, 'iframe');
    expect(frames).toHaveLength(1);
    expect(getAttributeValue(frames[0]!, 'sandbox')).toBe('');
    expect(getAttributeValue(frames[0]!, 'srcdoc')).toBe(html);
    expect(elements(page, 'script')).toEqual([]);
    expect(elements(page, 'img')).toEqual([]);
    expect(elements(page, 'p').some((p) => getAttributeValue(p, 'onclick') !== undefined)).toBe(false);
  });

  it('has no frame when the mail has no HTML body', () => {
    expect(elements(renderMessagePage(message({ html: null }), smtp), 'iframe')).toEqual([]);
  });
});
