import { describe, expect, it } from 'vitest';
import { parseMessage } from './parse';

const stamp = { id: 'sink-1', receivedAt: new Date('2024-06-01T12:00:00.000Z') };
const envelope = { mailFrom: 'sender@gelpoint.test', rcptTo: ['c@a.test'] };

function raw(lines: string[]): Buffer {
  return Buffer.from(`${lines.join('\r\n')}\r\n`, 'utf8');
}

describe('parseMessage', () => {
  it('reads the members of named groups as recipients', async () => {
    // RFC 5322 Appendix A.1.3 (from memory): a group with three members and an empty group.
    const message = await parseMessage(
      raw([
        'From: Pete <pete@silly.example>',
        'To: A Group:Ed Jones <c@a.test>,joe@where.test,John <jdoe@one.test>;',
        'Cc: Undisclosed recipients:;',
        'Date: Thu, 13 Feb 1969 23:32:54 -0330',
        'Message-ID: <testabcd.1234@silly.example>',
        'Subject: Groups',
        '',
        'Testing.',
      ]),
      envelope,
      stamp,
    );
    expect(message.to).toEqual(['c@a.test', 'joe@where.test', 'jdoe@one.test']);
    expect(message.cc).toEqual([]);
    expect(message.from).toBe('pete@silly.example');
    expect(message.messageId).toBe('<testabcd.1234@silly.example>');
    // RFC 5322 §3.3: -0330 is 3 h 30 min behind UTC, so 23:32:54 local is 03:02:54 UTC next day.
    expect(message.date).toBe('1969-02-14T03:02:54.000Z');
    expect(message.text).toBe('Testing.');
  });

  it('falls back to the receive time and empty fields when headers are missing', async () => {
    const message = await parseMessage(raw(['To: c@a.test', '', 'body']), envelope, stamp);
    expect(message.date).toBe('2024-06-01T12:00:00.000Z');
    expect(message.receivedAt).toBe('2024-06-01T12:00:00.000Z');
    expect(message.messageId).toBeNull();
    expect(message.subject).toBe('');
    expect(message.from).toBe('');
    expect(message.html).toBeNull();
    expect(message.envelope).toEqual(envelope);
  });

  it('decodes an encoded-word subject and a quoted-printable body', async () => {
    // RFC 2047 §2 encoded-word and RFC 2045 §6.7 quoted-printable; "°" is U+00B0, UTF-8 C2 B0.
    const message = await parseMessage(
      raw([
        'To: c@a.test',
        'Subject: =?UTF-8?Q?Shop_at_12_=C2=B0C?=',
        'MIME-Version: 1.0',
        'Content-Type: text/plain; charset=utf-8',
        'Content-Transfer-Encoding: quoted-printable',
        '',
        'Too cold: 12 =C2=B0C, dew point 9 =C2=B0C.',
      ]),
      envelope,
      stamp,
    );
    expect(message.subject).toBe('Shop at 12 °C');
    expect(message.text).toBe('Too cold: 12 °C, dew point 9 °C.');
  });

  it('counts the size of the message as received', async () => {
    const source = raw(['To: c@a.test', 'Subject: size', '', 'abc']);
    const message = await parseMessage(source, envelope, stamp);
    expect(message.sizeBytes).toBe(source.byteLength);
  });
});
