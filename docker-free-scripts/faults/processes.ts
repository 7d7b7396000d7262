import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { CheckFailed } from './verdict';

export const repoRoot = join(import.meta.dirname, '../..');

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

export const sleep = (ms: number) => new Promise<void>((r) => setTimeout(r, ms));

/** Thrown by a probe to stop waiting at once (the process it waits for has died, say). */
export class GiveUp extends Error {}

/**
 * Polls until `probe` gives a value (not undefined), or fails with `what` after `timeoutMs`; a probe
 * that throws is tried again (a server still starting), unless it throws GiveUp.
 */
export async function waitUntil<T>(what: string, timeoutMs: number, probe: () => Promise<T | undefined>, everyMs = 100): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  let last: unknown;
  while (Date.now() < deadline) {
    try {
      const v = await probe();
      if (v !== undefined) return v;
    } catch (err) {
      if (err instanceof GiveUp) throw err;
      last = err;
    }
    await sleep(everyMs);
  }
  throw new CheckFailed(`${what} did not happen within ${(timeoutMs / 1000).toFixed(0)} s${last ? ` (last error: ${(last as Error).message})` : ''}`);
}

export async function within<T>(what: string, timeoutMs: number, promise: Promise<T>): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new CheckFailed(`${what} did not happen within ${(timeoutMs / 1000).toFixed(0)} s`)), timeoutMs);
  });
  try {
    return await Promise.race([promise, late]);
  } finally {
    clearTimeout(timer);
  }
}

/** apps/<app>/src/main.ts → apps/<app>/dist/main.js, the build npm start runs (check-faults.sh builds it). */
function nodeArgs(entry: string): string[] {
  const built = entry.replace(/\/src\/main\.ts$/, '/dist/main.js');
  return built !== entry && existsSync(join(repoRoot, built)) ? [built] : ['--import', 'tsx', entry];
}

/**
 * One of the product's processes, started the way npm start starts it (the built entry, with
 * NODE_ENV=production), with its output kept so a failed check can show what the process said.
 */
export class AppProcess {
  private child?: ChildProcess;
  private tail = '';
  private lineListeners: ((line: string, self: AppProcess) => void)[] = [];

  constructor(
    readonly name: string,
    private readonly entry: string,
    private readonly env: NodeJS.ProcessEnv,
  ) {}

  start(): this {
    const child = spawn(process.execPath, nodeArgs(this.entry), {
      cwd: repoRoot,
      env: { NODE_ENV: 'production', ...this.env },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let partial = '';
    const keep = (b: Buffer) => {
      const text = b.toString();
      this.tail = (this.tail + text).slice(-8_000);
      partial += text;
      const lines = partial.split('\n');
      partial = lines.pop() ?? '';
      for (const line of lines) for (const l of this.lineListeners) l(line, this);
    };
    child.stdout?.on('data', keep);
    child.stderr?.on('data', keep);
    this.child = child;
    return this;
  }

  get pid(): number | undefined {
    return this.child?.pid;
  }

  /** True while the process has not exited since it was started. */
  get running(): boolean {
    return this.child !== undefined && this.child.exitCode === null && this.child.signalCode === null;
  }

  get output(): string {
    return this.tail;
  }

  /** Called with every whole line the process writes, from now on. */
  onLine(listener: (line: string, self: AppProcess) => void): void {
    this.lineListeners.push(listener);
  }

  /** Sends a signal and returns at once (SIGTERM to watch a shutdown, SIGSTOP/SIGCONT to pause a process). */
  send(sig: NodeJS.Signals): void {
    if (this.running) this.child!.kill(sig);
  }

  /** The exit code (null when a signal ended it), once the process has exited. */
  exited(): Promise<number | null> {
    const child = this.child;
    if (!child) return Promise.resolve(null);
    if (!this.running) return Promise.resolve(child.exitCode);
    return new Promise((resolve) => child.once('exit', (code) => resolve(code)));
  }

  /** SIGKILL: no shutdown handler runs, as when the machine or the container dies. */
  kill(): Promise<void> {
    return this.signal('SIGKILL');
  }

  /** SIGTERM, then SIGKILL after 10 s. */
  async stop(): Promise<void> {
    const child = this.child;
    if (!child || !this.running) return;
    const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
    await this.signal('SIGTERM');
    clearTimeout(timer);
  }

  private signal(sig: NodeJS.Signals): Promise<void> {
    const child = this.child;
    if (!child || !this.running) return Promise.resolve();
    return new Promise((resolve) => {
      child.once('exit', () => resolve());
      child.kill(sig);
    });
  }
}
