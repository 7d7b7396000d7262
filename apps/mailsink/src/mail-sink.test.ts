import { writeFile } from 'node:fs/promises';
import { createServer, type Server } from 'node:net';
import { createTransport } from 'nodemailer';
import { afterEach, describe, expect, it } from 'vitest';
import { createMailSink } from './mail-sink';
import { MailSinkError } from './sink-error';
import type { SinkMessage } from './sink-message';
import { getJson, HOST, sinkHarness } from './test-sink';

const harness = sinkHarness();
afterEach(() => harness.closeAll());

const ISO_8601 = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;

async function listMessages(baseUrl: string, query = ''): Promise<SinkMessage[]> {
  const { status, body } = await getJson(`${baseUrl}/api/messages${query}`);
  expect(status).toBe(200);
  return body as SinkMessage[];
}

describe('receiving mail over SMTP', () => {
  it('serves a plain-text mail with the fields the sender set', async () => {
    const { transport, baseUrl } = await harness.start();
    const sentAt = new Date('2024-03-05T06:07:08Z');
    const before = Date.now();
    const info = await transport.sendMail({
      from: 'Gelpoint <reminders@gelpoint.test>',
      to: 'maker@example.com',
      subject: 'Seal coat on the walnut tray is tacky',
      text: 'The pour window is open until 18:40.',
      date: sentAt,
    });

    const [message, ...rest] = await listMessages(baseUrl);
    expect(rest).toEqual([]);
    expect(message).toMatchObject({
      from: 'reminders@gelpoint.test',
      to: ['maker@example.com'],
      subject: 'Seal coat on the walnut tray is tacky',
      text: 'The pour window is open until 18:40.',
      html: null,
      // RFC 5322 §3.3: the Date header carries the instant; nodemailer wrote it from `sentAt`.
      date: sentAt.toISOString(),
      // RFC 5322 §3.6.4: msg-id includes its angle brackets; nodemailer reports the one it sent.
      messageId: info.messageId,
    });
    expect(info.messageId).toMatch(/^<.+@.+>$/);
    expect(message?.id).toEqual(expect.any(String));
    expect(message?.receivedAt).toMatch(ISO_8601);
    expect(Date.parse(message?.receivedAt ?? '')).toBeGreaterThanOrEqual(before - 1000);
  });

  it('keeps both parts of a multipart text + HTML mail', async () => {
    const { transport, baseUrl } = await harness.start();
    const html = '<p>Layer 2 of <b>River table</b> can be poured.</p>';
    await transport.sendMail({
      from: 'reminders@gelpoint.test',
      to: 'maker@example.com',
      subject: 'Next layer window',
      text: 'Layer 2 of River table can be poured.',
      html,
    });

    const [message] = await listMessages(baseUrl);
    expect(message?.text).toBe('Layer 2 of River table can be poured.');
    expect(message?.html).toBe(html);
  });

  it('lists every recipient and filters by any of them, ignoring case', async () => {
    const { transport, baseUrl } = await harness.start();
    const info = await transport.sendMail({
      from: 'reminders@gelpoint.test',
      to: ['Lead <lead@shop.test>', 'apprentice@shop.test'],
      cc: 'owner@shop.test',
      bcc: 'audit@shop.test',
      subject: 'Ready to machine',
      text: 'Piece 14 is released.',
    });
    await transport.sendMail({ from: 'reminders@gelpoint.test', to: 'maker@example.com', subject: 'Other', text: 'x' });

    // nodemailer's own report of the envelope is the outside check of who was addressed.
    const accepted = info.accepted.map((entry: unknown) => (typeof entry === 'string' ? entry : (entry as { address: string }).address)).sort();
    expect(accepted).toEqual(['apprentice@shop.test', 'audit@shop.test', 'lead@shop.test', 'owner@shop.test']);
    const [forLead] = await listMessages(baseUrl, '?to=LEAD@Shop.Test');
    expect(forLead?.to).toEqual(['lead@shop.test', 'apprentice@shop.test']);
    expect(forLead?.cc).toEqual(['owner@shop.test']);
    expect([...(forLead?.envelope.rcptTo ?? [])].sort()).toEqual(accepted);

    expect((await listMessages(baseUrl, '?to=audit@shop.test')).map((m) => m.subject)).toEqual(['Ready to machine']);
    expect((await listMessages(baseUrl, '?to=maker@example.com')).map((m) => m.subject)).toEqual(['Other']);
    expect(await listMessages(baseUrl, '?to=nobody@example.com')).toEqual([]);
  });

  it('lists newest first and serves each message by id', async () => {
    const { transport, baseUrl } = await harness.start();
    for (const subject of ['first', 'second', 'third']) {
      await transport.sendMail({ from: 'a@gelpoint.test', to: 'b@example.com', subject, text: subject });
    }
    const listed = await listMessages(baseUrl);
    expect(listed.map((m) => m.subject)).toEqual(['third', 'second', 'first']);
    expect(new Set(listed.map((m) => m.id)).size).toBe(3);

    const one = await getJson(`${baseUrl}/api/messages/${listed[1]?.id}`);
    expect(one.status).toBe(200);
    expect(one.body).toEqual(listed[1]);
  });

  it('answers an unknown id and a repeated filter with a JSON error', async () => {
    const { baseUrl } = await harness.start();
    const missing = await getJson(`${baseUrl}/api/messages/no-such-id`);
    expect(missing.status).toBe(404);
    expect(missing.body).toEqual({ error: { code: 'MESSAGE_NOT_FOUND', message: expect.stringContaining('no-such-id') } });

    const repeated = await getJson(`${baseUrl}/api/messages?to=a@x.test&to=b@x.test`);
    expect(repeated.status).toBe(400);
    expect(repeated.body).toMatchObject({ error: { code: 'INVALID_FILTER' } });
  });

  it('clears everything on DELETE, also for the next start', async () => {
    const { transport, baseUrl, dataDir, sink } = await harness.start();
    await transport.sendMail({ from: 'a@gelpoint.test', to: 'b@example.com', subject: 'gone soon', text: 'x' });
    expect(await listMessages(baseUrl)).toHaveLength(1);

    const response = await fetch(`${baseUrl}/api/messages`, { method: 'DELETE' });
    expect(response.status).toBe(204);
    expect(await listMessages(baseUrl)).toEqual([]);

    await sink.close();
    const again = await harness.start(dataDir);
    expect(again.sink.messages()).toEqual([]);
  });

  it('accepts a client that logs in over plain text', async () => {
    const { sink, baseUrl } = await harness.start();
    const withLogin = createTransport({
      host: HOST,
      port: sink.smtpPort,
      secure: false,
      ignoreTLS: true,
      auth: { user: 'provider-user', pass: 'provider-secret' },
    });
    await withLogin.sendMail({ from: 'a@gelpoint.test', to: 'b@example.com', subject: 'with auth', text: 'x' });
    expect((await listMessages(baseUrl)).map((m) => m.subject)).toEqual(['with auth']);
  });

  it('refuses a message over 10 MB with 552 and keeps nothing of it', async () => {
    const { transport, sink } = await harness.start();
    const line = `${'g'.repeat(998)}\r\n`;
    const body = line.repeat(Math.ceil((10 * 1024 * 1024 + 1) / line.length));
    const raw = `From: a@gelpoint.test\r\nTo: b@example.com\r\nSubject: too big\r\n\r\n${body}`;
    const refusal = await transport.sendMail({ envelope: { from: 'a@gelpoint.test', to: ['b@example.com'] }, raw }).then(
      () => null,
      (error: { responseCode?: number }) => error,
    );
    // RFC 1870 §4: a message larger than the advertised SIZE is rejected with a permanent 552.
    expect(refusal?.responseCode).toBe(552);
    expect(sink.messages()).toEqual([]);
  });
});

describe('keeping mail across restarts', () => {
  it('reloads what it received after a close and re-create on the same data folder', async () => {
    const first = await harness.start();
    await first.transport.sendMail({ from: 'a@gelpoint.test', to: 'b@example.com', subject: 'one', text: '1' });
    await first.transport.sendMail({ from: 'a@gelpoint.test', to: 'c@example.com', subject: 'two', text: '2', html: '<i>2</i>' });
    const before = first.sink.messages();
    await first.sink.close();

    const second = await harness.start(first.dataDir);
    expect(second.sink.messages()).toEqual(before);
    expect(await listMessages(second.baseUrl)).toEqual(before);
    await second.transport.sendMail({ from: 'a@gelpoint.test', to: 'd@example.com', subject: 'three', text: '3' });
    expect(second.sink.messages().map((m) => m.subject)).toEqual(['three', 'two', 'one']);
  });
});

describe('page', () => {
  it('escapes a hostile subject in the list', async () => {
    const { transport, baseUrl } = await harness.start();
    await transport.sendMail({ from: 'a@gelpoint.test', to: 'b@example.com', subject: '<script>alert(1)</script>', text: 'x' });
    const response = await fetch(`${baseUrl}/`);
    const page = await response.text();
    expect(response.headers.get('content-type')).toMatch(/^text\/html/);
    expect(page).toContain('<title>Gelpoint mail sink</title>');
    expect(page).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(page).not.toContain('<script');
  });

  it('serves each message as a page of its own, behind a policy that loads nothing from outside', async () => {
    const { transport, baseUrl } = await harness.start();
    await transport.sendMail({
      from: 'a@gelpoint.test',
      to: 'b@example.com',
      subject: 'Invitation',
      text: 'Join: https://gelpoint.test/join/abc',
      html: '<a href="https://gelpoint.test/join/abc">Join</a>',
    });
    const [listed] = await listMessages(baseUrl);
    const response = await fetch(`${baseUrl}/messages/${listed?.id}`);
    expect(response.status).toBe(200);
    expect(response.headers.get('content-security-policy')).toContain("default-src 'none'");
    const page = await response.text();
    expect(page).toContain('<a href="https://gelpoint.test/join/abc" rel="noreferrer noopener">');
    expect(page).toContain('sandbox="" srcdoc="&lt;a href=&quot;https://gelpoint.test/join/abc&quot;&gt;Join&lt;/a&gt;"');

    const unknown = await fetch(`${baseUrl}/messages/nope`);
    expect(unknown.status).toBe(404);
    expect(await unknown.json()).toMatchObject({ error: { code: 'MESSAGE_NOT_FOUND' } });
  });
});

describe('start-up failures', () => {
  let occupier: Server | undefined;
  afterEach(async () => {
    await new Promise<void>((resolve) => (occupier ? occupier.close(() => resolve()) : resolve()));
    occupier = undefined;
  });

  async function occupyPort(): Promise<number> {
    occupier = createServer();
    await new Promise<void>((resolve) => occupier?.listen(0, HOST, resolve));
    const address = occupier.address();
    if (typeof address !== 'object' || address === null) throw new Error('no port');
    return address.port;
  }

  it('rejects with an error naming the SMTP port that is taken', async () => {
    const port = await occupyPort();
    const dataDir = await harness.tempFolder();
    const failure = await createMailSink({ host: HOST, smtpPort: port, httpPort: 0, dataDir }).catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(MailSinkError);
    expect(failure).toMatchObject({ code: 'PORT_IN_USE', listener: { role: 'smtp', host: HOST, port } });
    expect((failure as Error).message).toContain(`port ${port} on ${HOST} is already in use`);
  });

  it('rejects on a taken HTTP port and lets go of the SMTP port it had opened', async () => {
    const httpPort = await occupyPort();
    const dataDir = await harness.tempFolder();
    const probe = createServer();
    await new Promise<void>((resolve) => probe.listen(0, HOST, resolve));
    const smtpPort = (probe.address() as { port: number }).port;
    await new Promise<void>((resolve) => probe.close(() => resolve()));

    const failure = await createMailSink({ host: HOST, smtpPort, httpPort, dataDir }).catch((e: unknown) => e);
    expect(failure).toMatchObject({ code: 'PORT_IN_USE', listener: { role: 'http', port: httpPort } });
    expect((failure as Error).message).toContain(String(httpPort));

    const reuse = createServer();
    await new Promise<void>((resolve, reject) => {
      reuse.once('error', reject);
      reuse.listen(smtpPort, HOST, resolve);
    });
    await new Promise<void>((resolve) => reuse.close(() => resolve()));
  });

  it('rejects a data folder that is a file', async () => {
    const folder = await harness.tempFolder();
    const notAFolder = `${folder}/plain-file`;
    await writeFile(notAFolder, 'x');
    const failure = await createMailSink({ host: HOST, smtpPort: 0, httpPort: 0, dataDir: notAFolder }).catch((e: unknown) => e);
    expect(failure).toMatchObject({ code: 'DATA_DIR_UNUSABLE' });
    expect((failure as Error).message).toContain('MAILSINK_DATA_DIR');
  });
});
