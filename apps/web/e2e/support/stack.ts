import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const root = join(import.meta.dirname, '../../../..');

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as { port: number }).port;
      srv.close(() => resolve(port));
    });
  });
}

async function waitFor(url: string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // starting
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms`);
}

export interface SinkMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
}

/**
 * The whole product as separate built processes, as npm start runs it: the API serving the built web app,
 * the worker and the mail sink, on free ports, against the demo database that npm test seeded.
 */
export class E2eStack {
  private children: ChildProcess[] = [];
  private dataDir = '';
  apiPort = 0;
  mailHttpPort = 0;
  private output = '';

  /** The run's shared stack, started by the browser project's global set-up; this side only reads from it. */
  static shared(ports: { apiPort: number; mailHttpPort: number }): E2eStack {
    const stack = new E2eStack();
    stack.apiPort = ports.apiPort;
    stack.mailHttpPort = ports.mailHttpPort;
    return stack;
  }

  get baseUrl(): string {
    return `http://127.0.0.1:${this.apiPort}`;
  }

  /** Against the seeded demo database npm test made, unless a flow brings its own (see freshDemoDatabase). */
  async start(url = process.env.GELPOINT_E2E_DATABASE_URL): Promise<void> {
    if (!url) throw new Error('GELPOINT_E2E_DATABASE_URL is not set: run the browser tests through npm test');
    this.dataDir = mkdtempSync(join(tmpdir(), 'gelpoint-e2e-'));
    this.apiPort = await freePort();
    this.mailHttpPort = await freePort();
    const smtpPort = await freePort();
    const env = {
      ...process.env,
      DATABASE_URL: url,
      GELPOINT_API_PORT: String(this.apiPort),
      GELPOINT_PUBLIC_URL: this.baseUrl,
      GELPOINT_JWT_SECRET: 'e2e-secret-that-is-long-enough-for-hs256-0123456789',
      GELPOINT_LOG_LEVEL: 'warn',
      MAILSINK_SMTP_PORT: String(smtpPort),
      MAILSINK_HTTP_PORT: String(this.mailHttpPort),
      MAILSINK_DATA_DIR: join(this.dataDir, 'mailsink'),
      SMTP_PORT: String(smtpPort),
    };
    // The built processes (the browser project's set-up and bench-web.sh bring the builds up to date), as npm start runs them.
    for (const entry of ['apps/mailsink/dist/main.js', 'apps/api/dist/main.js', 'apps/worker/dist/main.js']) {
      const child = spawn(process.execPath, [entry], { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] });
      const keep = (b: Buffer) => {
        this.output = (this.output + b.toString()).slice(-20_000);
      };
      child.stdout?.on('data', keep);
      child.stderr?.on('data', keep);
      this.children.push(child);
    }
    try {
      // Generous: a busy 2-core machine may be running a browser and another stack meanwhile.
      await Promise.all([waitFor(`${this.baseUrl}/api/health`, 60_000), waitFor(`http://127.0.0.1:${this.mailHttpPort}/api/messages`, 60_000)]);
    } catch (err) {
      throw new Error(`${(err as Error).message}\n${this.output}`, { cause: err });
    }
  }

  /** Waits for the newest mail to an address (the worker sends it within a moment of the request). */
  async mailTo(address: string, timeoutMs = 15_000): Promise<SinkMail> {
    const deadline = Date.now() + timeoutMs;
    while (Date.now() < deadline) {
      const r = await fetch(`http://127.0.0.1:${this.mailHttpPort}/api/messages?to=${encodeURIComponent(address)}`);
      const list = (await r.json()) as SinkMail[];
      if (list[0]) return list[0];
      await new Promise((res) => setTimeout(res, 200));
    }
    throw new Error(`no mail to ${address} arrived within ${timeoutMs} ms\n${this.output}`);
  }

  async stop(): Promise<void> {
    await Promise.all(
      this.children.map(
        (c) =>
          new Promise<void>((resolve) => {
            if (c.exitCode !== null) return resolve();
            c.once('exit', () => resolve());
            c.kill('SIGTERM');
          }),
      ),
    );
    if (this.dataDir) rmSync(this.dataDir, { recursive: true, force: true });
  }
}
