// Upload to report, against the CLI on the same file, in one run: started by bench-upload.sh, which provides a
// fresh database (migrated, demo shop seeded) and the built API, worker and CLI.
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { signIn } from '../faults/api-client';
import { AppProcess, freePort, GiveUp, repoRoot, waitUntil } from '../faults/processes';
import { BENCH_LEVEL_MM, writeBenchMould } from './bench-mould';
import { readEvents, type TimedEvent } from './event-reader';
import { allocatorSettings } from '../allocator-settings';

const runs = Number(process.env.GELPOINT_BENCH_RUNS ?? 3);

interface UploadRun {
  answeredMs: number;
  readyMs: number;
  events: TimedEvent[];
}

const ms = (v: number) => `${Math.round(v)} ms`;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)]!;

/** The whole `gelpoint mold` process on the file, as a person runs it: node's start, reading, analysis, printing. */
function cliRun(file: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const started = performance.now();
    // The bin itself, through its #! line, as the installed command runs.
    const child = spawn('apps/cli/bin/gelpoint.mjs', ['mold', file, '--level', String(BENCH_LEVEL_MM)], {
      cwd: repoRoot,
      stdio: ['ignore', 'ignore', 'pipe'],
    });
    let err = '';
    child.stderr.on('data', (b: Buffer) => (err += b.toString()));
    child.once('exit', (code) => (code === 0 ? resolve(performance.now() - started) : reject(new Error(`gelpoint mold exited ${code}: ${err}`))));
  });
}

/**
 * Sends the file as a browser's form does (multipart/form-data, the units field first) with node:http, which puts
 * the first bytes on the wire at once and the file after them in 1 MB writes. fetch is not used for the upload:
 * handed a 48 MB body it sent nothing for 0.27 s (a Buffer) to 0.39 s (FormData) before the headers left, time the
 * server never sees (measured on this machine against a bare node:http server, 5 December 2026).
 */
function postForm(url: string, token: string, bytes: Buffer): Promise<{ status: number; text: string }> {
  const boundary = `gelpoint-bench-${randomBytes(12).toString('hex')}`;
  const head = Buffer.from(
    `--${boundary}\r\nContent-Disposition: form-data; name="units"\r\n\r\nmm\r\n` +
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="bench mould 1M.stl"\r\nContent-Type: application/octet-stream\r\n\r\n`,
  );
  const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
  return new Promise((resolve, reject) => {
    const req = request(url, {
      method: 'POST',
      headers: {
        Authorization: `Bearer ${token}`,
        'Content-Type': `multipart/form-data; boundary=${boundary}`,
        'Content-Length': head.length + bytes.length + tail.length,
      },
    });
    req.once('error', reject);
    req.once('response', (res) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => (text += chunk));
      res.once('end', () => resolve({ status: res.statusCode ?? 0, text }));
    });
    const send = async () => {
      req.write(head);
      for (let at = 0; at < bytes.length; at += 2 ** 20) {
        if (!req.write(bytes.subarray(at, at + 2 ** 20))) await new Promise((drained) => req.once('drain', drained));
      }
      req.end(tail);
    };
    send().catch(reject);
  });
}

async function uploadRun(base: string, token: string, bytes: Buffer): Promise<UploadRun> {
  const started = performance.now();
  const res = await postForm(`${base}/api/molds`, token, bytes);
  const answeredMs = performance.now() - started;
  const body = JSON.parse(res.text) as { id?: string; error?: { message: string } };
  if (res.status !== 202 || !body.id) throw new Error(`the upload answered ${res.status}: ${res.text.slice(0, 300)}`);
  // The browser's way of hearing the analysis: the event stream, opened once the upload has answered.
  const events = await readEvents(`${base}/api/molds/${body.id}/events`, { Authorization: `Bearer ${token}` }, started, 120_000);
  const last = events.at(-1);
  if (last?.event !== 'ready') throw new Error(`the analysis ended with ${last ? `${last.event} ${last.data}` : 'no event'}`);
  return { answeredMs, readyMs: last.atMs, events };
}

const dir = mkdtempSync(join(tmpdir(), 'gelpoint-upload-bench-'));
const file = join(dir, 'bench mould 1M.stl');
const processes: AppProcess[] = [];
let status = 0;
try {
  const size = writeBenchMould(file);
  const bytes = readFileSync(file);
  const triangles = bytes.readUInt32LE(80);

  const cli: number[] = [];
  for (let r = 0; r < runs; r++) cli.push(await cliRun(file));

  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const env = {
    // The allocator's settings npm start gives the API and the worker.
    ...allocatorSettings,
    ...process.env,
    GELPOINT_API_PORT: String(port),
    GELPOINT_PUBLIC_URL: base,
    GELPOINT_JWT_SECRET: randomBytes(48).toString('base64url'),
    GELPOINT_LOG_LEVEL: 'warn',
    GELPOINT_UPLOAD_QUOTA_MB: String(Math.ceil(((runs + 1) * size) / 2 ** 20) + 64),
    GELPOINT_UPLOADS_PER_HOUR: '1000',
    // Only the mould analyses: no mail sink runs here.
    GELPOINT_WORKER_JOBS: 'molds',
  };
  const api = new AppProcess('api', 'apps/api/src/main.ts', env).start();
  const worker = new AppProcess('worker', 'apps/worker/src/main.ts', { ...env, GELPOINT_LOG_LEVEL: 'info' }).start();
  processes.push(api, worker);
  await waitUntil('the API answering', 60_000, async () => {
    if (!api.running) throw new GiveUp(`the API exited:\n${api.output}`);
    return (await fetch(`${base}/api/health`)).ok || undefined;
  });
  await waitUntil('the worker starting', 60_000, async () => {
    if (!worker.running) throw new GiveUp(`the worker exited:\n${worker.output}`);
    return worker.output.includes('worker started') || undefined;
  });
  const { token, answer } = await signIn(base, 'lead@gelpoint.test');
  if (!token) throw new Error(`signing in failed: ${answer.status}`);

  const uploads: UploadRun[] = [];
  for (let r = 0; r < runs; r++) uploads.push(await uploadRun(base, token, bytes));

  const fastest = uploads.reduce((a, b) => (b.readyMs < a.readyMs ? b : a));
  const cliBest = Math.min(...cli);
  const readyBest = fastest.readyMs;
  const lines = [
    `upload to report: ${triangles.toLocaleString('en')} triangles, ${(size / 2 ** 20).toFixed(1)} MB binary STL, ${runs} runs each (fastest | median)`,
    `  gelpoint mold (whole CLI process)   ${ms(cliBest)} | ${ms(median(cli))}`,
    `  upload answered (202)               ${ms(Math.min(...uploads.map((u) => u.answeredMs)))} | ${ms(median(uploads.map((u) => u.answeredMs)))}`,
    `  first byte to status ready          ${ms(readyBest)} | ${ms(median(uploads.map((u) => u.readyMs)))}`,
    `  ratio ready / CLI                   ${(readyBest / cliBest).toFixed(2)}× | ${(median(uploads.map((u) => u.readyMs)) / median(cli)).toFixed(2)}×`,
    `  fastest run, as the event stream told it (ms from the first byte):`,
    `    ${fastest.events.map((e) => `${e.event === 'progress' ? `${e.status} ${e.progress}` : e.event} @${Math.round(e.atMs)}`).join(' → ')}`,
  ];
  process.stdout.write(`${lines.join('\n')}\n`);
} catch (err) {
  status = 1;
  process.stderr.write(`bench:upload failed: ${(err as Error).message}\n${processes.map((p) => `--- ${p.name}\n${p.output.slice(-3000)}`).join('\n')}\n`);
} finally {
  await Promise.all(processes.map((p) => p.stop()));
  rmSync(dir, { recursive: true, force: true });
}
process.exit(status);
