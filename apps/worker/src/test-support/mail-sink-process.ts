import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const root = join(import.meta.dirname, '../../../..');

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as { port: number }).port;
      srv.close(() => resolve(port));
    });
  });
}

export interface SinkMessageView {
  id: string;
  to: string[];
  subject: string;
  text: string;
  messageId: string;
}

/** The real mail sink, as its own process: the worker talks to it over SMTP exactly as to a provider. */
export class MailSinkProcess {
  private child?: ChildProcess;
  readonly dataDir = mkdtempSync(join(tmpdir(), 'gelpoint-worker-sink-'));
  smtpPort = 0;
  httpPort = 0;

  async start(): Promise<void> {
    if (!this.smtpPort) {
      this.smtpPort = await freePort();
      this.httpPort = await freePort();
    }
    this.child = spawn(process.execPath, ['apps/mailsink/dist/main.js'], {
      cwd: root,
      env: { ...process.env, MAILSINK_SMTP_PORT: String(this.smtpPort), MAILSINK_HTTP_PORT: String(this.httpPort), MAILSINK_DATA_DIR: this.dataDir },
      stdio: 'ignore',
    });
    const deadline = Date.now() + 20_000;
    while (Date.now() < deadline) {
      try {
        if ((await fetch(`http://127.0.0.1:${this.httpPort}/api/messages`)).ok) return;
      } catch {
        // starting
      }
      await new Promise((r) => setTimeout(r, 100));
    }
    throw new Error('the mail sink did not start');
  }

  async stop(): Promise<void> {
    const child = this.child;
    if (!child || child.exitCode !== null) return;
    await new Promise<void>((resolve) => {
      child.once('exit', () => resolve());
      child.kill('SIGTERM');
    });
  }

  async messagesTo(address: string): Promise<SinkMessageView[]> {
    const r = await fetch(`http://127.0.0.1:${this.httpPort}/api/messages?to=${encodeURIComponent(address)}`);
    return (await r.json()) as SinkMessageView[];
  }

  async dispose(): Promise<void> {
    await this.stop();
    rmSync(this.dataDir, { recursive: true, force: true });
  }
}
