import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '../../..');

describe('the worker process', () => {
  it('starts its tick, and on SIGTERM finishes the pass it is in and exits cleanly', async () => {
    const url = process.env.GELPOINT_TEST_DATABASE_URL;
    if (!url) throw new Error('GELPOINT_TEST_DATABASE_URL is not set: run the tests through npm test');
    const child = spawn(process.execPath, ['apps/worker/dist/main.js'], {
      cwd: root,
      env: { ...process.env, DATABASE_URL: url, GELPOINT_WORKER_JOBS: 'molds', GELPOINT_LOG_LEVEL: 'info' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let out = '';
    child.stdout.on('data', (b: Buffer) => (out += b.toString()));
    child.stderr.on('data', (b: Buffer) => (out += b.toString()));
    const deadline = Date.now() + 20_000;
    while (!out.includes('worker started') && Date.now() < deadline) await new Promise((r) => setTimeout(r, 100));
    expect(out).toContain('worker started');
    const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
    child.kill('SIGTERM');
    const code = await Promise.race([exited, new Promise<'hung'>((r) => setTimeout(() => r('hung'), 15_000))]);
    expect(code).toBe(0);
    expect(out).toContain('worker stopping');
    expect(out).toContain('worker stopped');
  });

  it('refuses a bad cron expression with one line, not a stack trace', async () => {
    const child = spawn(process.execPath, ['apps/worker/dist/main.js'], {
      cwd: root,
      env: { ...process.env, GELPOINT_WORKER_CRON: 'every tuesday', GELPOINT_LOG_LEVEL: 'silent' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let err = '';
    child.stderr.on('data', (b: Buffer) => (err += b.toString()));
    const code = await new Promise<number | null>((resolve) => child.once('exit', resolve));
    expect(code).toBe(1);
    expect(err.trim()).toBe('worker: GELPOINT_WORKER_CRON "every tuesday" is not a cron expression');
  });
});
