import { spawn } from 'node:child_process';
import { mkdtemp, rm } from 'node:fs/promises';
import { createServer, type Server } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createTransport } from 'nodemailer';
import { afterEach, describe, expect, it } from 'vitest';

const REPO_ROOT = fileURLToPath(new URL('../../..', import.meta.url));
const MAIN = fileURLToPath(new URL('./main.ts', import.meta.url));
const HOST = '127.0.0.1';

interface Run {
  stdout: () => string;
  stderr: () => string;
  exited: Promise<number | null>;
  signal: (name: NodeJS.Signals) => void;
}

function runMain(env: Record<string, string>): Run {
  const child = spawn(process.execPath, ['--import', 'tsx', MAIN], {
    cwd: REPO_ROOT,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (chunk: Buffer) => (stdout += chunk.toString()));
  child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  return {
    stdout: () => stdout,
    stderr: () => stderr,
    exited: new Promise((resolve) => child.once('exit', (code) => resolve(code))),
    signal: (name) => child.kill(name),
  };
}

async function waitFor<T>(probe: () => T | undefined, what: string, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = probe();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

const folders: string[] = [];
let occupier: Server | undefined;
afterEach(async () => {
  await new Promise<void>((resolve) => (occupier ? occupier.close(() => resolve()) : resolve()));
  occupier = undefined;
  await Promise.all(folders.splice(0).map((folder) => rm(folder, { recursive: true, force: true })));
});

async function tempFolder(): Promise<string> {
  const folder = await mkdtemp(join(tmpdir(), 'gelpoint-mailsink-main-'));
  folders.push(folder);
  return folder;
}

describe('main', () => {
  it('says in one line that the SMTP port is taken and exits with 1', async () => {
    occupier = createServer();
    await new Promise<void>((resolve) => occupier?.listen(0, HOST, resolve));
    const port = (occupier.address() as { port: number }).port;

    const run = runMain({
      MAILSINK_HOST: HOST,
      MAILSINK_SMTP_PORT: String(port),
      MAILSINK_HTTP_PORT: '0',
      MAILSINK_DATA_DIR: await tempFolder(),
    });
    expect(await run.exited).toBe(1);
    expect(run.stderr()).toBe(`mail sink: port ${port} on ${HOST} is already in use — stop the other process or set MAILSINK_SMTP_PORT\n`);
  });

  it('refuses a port setting that is not a number', async () => {
    const run = runMain({ MAILSINK_SMTP_PORT: 'twenty-five', MAILSINK_DATA_DIR: await tempFolder() });
    expect(await run.exited).toBe(1);
    expect(run.stderr().trim().split('\n')).toEqual([
      'mail sink: MAILSINK_SMTP_PORT is "twenty-five", which is not a port — set it to a whole number from 0 to 65535',
    ]);
  });

  it('logs one line per message, stops cleanly on SIGTERM and keeps what it received', async () => {
    const dataDir = await tempFolder();
    const env = { MAILSINK_HOST: HOST, MAILSINK_SMTP_PORT: '0', MAILSINK_HTTP_PORT: '0', MAILSINK_DATA_DIR: dataDir };
    const run = runMain(env);
    const [, smtpPort, httpPort] = await waitFor(
      () => /SMTP on [\d.]+:(\d+), mail at http:\/\/[\d.]+:(\d+)\//.exec(run.stdout()) ?? undefined,
      'the start-up line',
    );

    const transport = createTransport({ host: HOST, port: Number(smtpPort), secure: false, ignoreTLS: true });
    await transport.sendMail({ from: 'a@gelpoint.test', to: 'maker@example.com', subject: 'Ready to machine', text: 'x' });
    await transport.sendMail({ from: 'a@gelpoint.test', to: 'lead@shop.test', subject: 'Demold check', text: 'y' });
    const received = await waitFor(() => {
      const lines = run
        .stdout()
        .split('\n')
        .filter((line) => line.includes('received'));
      return lines.length === 2 ? lines : undefined;
    }, 'two received lines');
    expect(received[0]).toMatch(/to maker@example\.com — "Ready to machine"$/);
    expect(received[1]).toMatch(/to lead@shop\.test — "Demold check"$/);
    expect(((await (await fetch(`http://${HOST}:${httpPort}/api/messages`)).json()) as unknown[]).length).toBe(2);

    run.signal('SIGTERM');
    expect(await run.exited).toBe(0);
    expect(run.stdout()).toContain('mail sink: stopped');
    expect(run.stderr()).toBe('');

    const again = runMain(env);
    await waitFor(() => (/\(2 kept in /.test(again.stdout()) ? true : undefined), 'the restart line');
    again.signal('SIGINT');
    expect(await again.exited).toBe(0);
  });
});
