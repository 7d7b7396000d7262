import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createTransport, type Transporter } from 'nodemailer';
import type SMTPTransport from 'nodemailer/lib/smtp-transport';
import { createMailSink, type MailSink } from './mail-sink';

export const HOST = '127.0.0.1';

export interface RunningSink {
  sink: MailSink;
  dataDir: string;
  baseUrl: string;
  transport: Transporter<SMTPTransport.SentMessageInfo>;
}

/** Test-only helpers: every sink gets port 0 and is torn down by `closeAll`. */
export function sinkHarness() {
  const sinks: MailSink[] = [];
  const folders: string[] = [];

  async function tempFolder(): Promise<string> {
    const folder = await mkdtemp(join(tmpdir(), 'gelpoint-mailsink-'));
    folders.push(folder);
    return folder;
  }

  async function start(dataDir?: string): Promise<RunningSink> {
    const folder = dataDir ?? (await tempFolder());
    const sink = await createMailSink({ host: HOST, smtpPort: 0, httpPort: 0, dataDir: folder });
    sinks.push(sink);
    return {
      sink,
      dataDir: folder,
      baseUrl: `http://${HOST}:${sink.httpPort}`,
      // The same client settings the worker uses against a plain-text provider port.
      transport: createTransport({ host: HOST, port: sink.smtpPort, secure: false, ignoreTLS: true }),
    };
  }

  async function closeAll(): Promise<void> {
    await Promise.all(sinks.splice(0).map((sink) => sink.close()));
    await Promise.all(folders.splice(0).map((folder) => rm(folder, { recursive: true, force: true })));
  }

  return { start, tempFolder, closeAll };
}

export async function getJson(url: string): Promise<{ status: number; body: unknown }> {
  const response = await fetch(url);
  return { status: response.status, body: await response.json() };
}
