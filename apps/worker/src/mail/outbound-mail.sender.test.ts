import { randomUUID } from 'node:crypto';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { pino } from 'pino';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '@gelpoint/db';
import { MailSinkProcess } from '../test-support/mail-sink-process';
import { claimDueMail, drainOutboundMail, retryDelayS, type MailSenderSettings } from './outbound-mail.sender';
import { smtpTransport } from './smtp-transport';

const logger = pino({ level: 'silent' });
const settings: MailSenderSettings = { from: 'Gelpoint <no-reply@gelpoint.test>', batch: 5, retryBaseS: 30, maxAttempts: 5, leaseS: 120 };
const sink = new MailSinkProcess();
let ds: DataSource;

function testUrl(): string {
  const url = process.env.GELPOINT_TEST_DATABASE_URL;
  if (!url) throw new Error('GELPOINT_TEST_DATABASE_URL is not set: run the tests through npm test');
  return url;
}

beforeAll(async () => {
  ds = createDataSource({ url: testUrl(), poolSize: 4 });
  await ds.initialize();
  await sink.start();
});
afterAll(async () => {
  await sink.dispose();
  await ds?.destroy();
});

async function queue(to: string, n = 1): Promise<string[]> {
  const ids: string[] = [];
  for (let i = 0; i < n; i++) {
    const id = randomUUID();
    await ds.query(`INSERT INTO outbound_mail (id, dedupe_key, message_id, to_address, subject, body_text) VALUES ($1, $2, $3, $4, $5, $6)`, [
      id,
      `test:${id}`,
      `<${id}@gelpoint.test>`,
      to,
      `Demold check ${i + 1}`,
      `Check the pour, mail ${i + 1}.`,
    ]);
    ids.push(id);
  }
  return ids;
}

const statusOf = async (ids: string[]) =>
  (await ds.query(`SELECT status, attempts FROM outbound_mail WHERE id = ANY($1) ORDER BY created_at`, [ids])) as { status: string; attempts: number }[];

const transport = () => smtpTransport({ host: '127.0.0.1', port: sink.smtpPort, secure: false });

describe('outbound mail', () => {
  it('sends what is due once, with the Message-ID fixed when it was queued', async () => {
    const to = `once-${randomUUID().slice(0, 8)}@example.test`;
    const [id] = await queue(to);
    await drainOutboundMail(ds, transport(), settings, logger);
    await drainOutboundMail(ds, transport(), settings, logger);
    const got = await sink.messagesTo(to);
    expect(got).toHaveLength(1);
    expect(got[0]).toMatchObject({ subject: 'Demold check 1', messageId: `<${id}@gelpoint.test>` });
    expect(got[0]!.text).toContain('Check the pour');
    expect(await statusOf([id!])).toEqual([{ status: 'sent', attempts: 1 }]);
  });

  it('sends each message once when two workers drain the queue at the same time', async () => {
    const to = `pair-${randomUUID().slice(0, 8)}@example.test`;
    const ids = await queue(to, 24);
    const second = createDataSource({ url: testUrl(), poolSize: 4 });
    await second.initialize();
    try {
      await Promise.all([drainOutboundMail(ds, transport(), settings, logger), drainOutboundMail(second, transport(), settings, logger)]);
    } finally {
      await second.destroy();
    }
    const got = await sink.messagesTo(to);
    expect(got).toHaveLength(24);
    expect(new Set(got.map((m) => m.messageId)).size).toBe(24);
    expect((await statusOf(ids)).every((r) => r.status === 'sent' && r.attempts === 1)).toBe(true);
  });

  it('does not deliver twice when a worker died between sending and recording', async () => {
    const to = `crash-${randomUUID().slice(0, 8)}@example.test`;
    const [id] = await queue(to);
    // The dead worker: it claimed the row and sent the message, then never recorded the send.
    const claimed = (await claimDueMail(ds, settings)).filter((m) => m.id === id);
    expect(claimed).toHaveLength(1);
    await transport().sendMail({ from: settings.from, to, subject: claimed[0]!.subject, text: claimed[0]!.body_text, messageId: claimed[0]!.message_id });
    // Its lease runs out; another worker picks the row up and sends it again under the same Message-ID.
    await ds.query(`UPDATE outbound_mail SET locked_until = now() - interval '1 second' WHERE id = $1`, [id]);
    await drainOutboundMail(ds, transport(), settings, logger);
    expect(await statusOf([id!])).toEqual([{ status: 'sent', attempts: 2 }]);
    expect(await sink.messagesTo(to)).toHaveLength(1);
  });

  it('keeps mail through an outage of the mail provider and sends it when it is back', async () => {
    const to = `outage-${randomUUID().slice(0, 8)}@example.test`;
    await sink.stop();
    const [id] = await queue(to);
    await drainOutboundMail(ds, transport(), settings, logger);
    const [row] = await ds.query(`SELECT status, attempts, last_error, next_attempt_at > now() AS later FROM outbound_mail WHERE id = $1`, [id]);
    expect(row).toMatchObject({ status: 'pending', attempts: 1, later: true });
    expect(row.last_error).toMatch(/ECONNREFUSED|connect/i);
    await sink.start();
    // Not due yet: the backoff holds it back.
    await drainOutboundMail(ds, transport(), settings, logger);
    expect(await sink.messagesTo(to)).toHaveLength(0);
    await ds.query(`UPDATE outbound_mail SET next_attempt_at = now() WHERE id = $1`, [id]);
    await drainOutboundMail(ds, transport(), settings, logger);
    expect(await sink.messagesTo(to)).toHaveLength(1);
    expect(await statusOf([id!])).toEqual([{ status: 'sent', attempts: 2 }]);
  });

  it('backs off by doubling, capped at an hour', () => {
    expect([1, 2, 3, 4].map((a) => retryDelayS(a, 30))).toEqual([30, 60, 120, 240]);
    expect(retryDelayS(30, 30)).toBe(3600);
  });

  it('runs once from the command line and exits', () => {
    const root = join(import.meta.dirname, '../../../..');
    const r = spawnSync(process.execPath, ['apps/worker/dist/main.js', '--once'], {
      cwd: root,
      env: { ...process.env, DATABASE_URL: testUrl(), SMTP_HOST: '127.0.0.1', SMTP_PORT: String(sink.smtpPort), GELPOINT_LOG_LEVEL: 'silent' },
      encoding: 'utf8',
      timeout: 30_000,
    });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^worker: sent \d+ mail, \d+ failed/);
  });
});
