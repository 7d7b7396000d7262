import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { AppProcess, freePort, GiveUp, waitUntil } from './processes';

export interface SinkMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  messageId: string | null;
}

/** The worker's settings a check may change; every one is a documented worker variable. */
export interface WorkerSettings {
  /** GELPOINT_WORKER_CRON: node-cron, six fields for seconds. */
  cron: string;
  /** GELPOINT_MAIL_LEASE_S: how long a claimed mail stays claimed by a worker that died. */
  mailLeaseS?: number;
  /** GELPOINT_MAIL_RETRY_BASE_S: first retry delay after a failed send (then doubling). */
  mailRetryBaseS?: number;
}

/**
 * The product as separate processes on free ports against the fault-check database: the mail sink,
 * the API and any number of workers, each of which a check may stop, kill or start again.
 */
export class FaultStack {
  private readonly dataDir = mkdtempSync(join(tmpdir(), 'gelpoint-faults-'));
  private readonly processes: AppProcess[] = [];
  private sinkProcess?: AppProcess;
  apiPort = 0;
  smtpPort = 0;
  mailHttpPort = 0;
  api?: AppProcess;

  private constructor(private readonly databaseUrl: string) {}

  static async create(): Promise<FaultStack> {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error('DATABASE_URL is not set: run the checks through npm run check:faults');
    const s = new FaultStack(url);
    s.apiPort = await freePort();
    s.smtpPort = await freePort();
    s.mailHttpPort = await freePort();
    return s;
  }

  get baseUrl(): string {
    return `http://127.0.0.1:${this.apiPort}`;
  }

  private env(extra: Record<string, string>): NodeJS.ProcessEnv {
    return {
      ...process.env,
      DATABASE_URL: this.databaseUrl,
      GELPOINT_API_PORT: String(this.apiPort),
      GELPOINT_PUBLIC_URL: this.baseUrl,
      GELPOINT_JWT_SECRET: jwtSecret,
      GELPOINT_LOG_LEVEL: 'info',
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(this.smtpPort),
      MAILSINK_SMTP_PORT: String(this.smtpPort),
      MAILSINK_HTTP_PORT: String(this.mailHttpPort),
      MAILSINK_DATA_DIR: join(this.dataDir, 'mailsink'),
      ...extra,
    };
  }

  private spawn(name: string, entry: string, extra: Record<string, string> = {}, onLine?: (line: string, self: AppProcess) => void): AppProcess {
    const p = new AppProcess(name, entry, this.env(extra));
    if (onLine) p.onLine(onLine);
    p.start();
    this.processes.push(p);
    return p;
  }

  // The start timeouts are generous: on a busy two-core machine one tsx start can take half a minute.

  /** Starts the mail sink (again, on the same ports and store) and waits until it answers. */
  async startSink(): Promise<void> {
    this.sinkProcess = this.spawn('mailsink', 'apps/mailsink/src/main.ts');
    const sink = this.sinkProcess;
    await waitUntil('the mail sink answering', 60_000, async () => {
      if (!sink.running) throw new GiveUp(`the mail sink exited:\n${sink.output}`);
      return (await fetch(`http://127.0.0.1:${this.mailHttpPort}/api/messages`)).ok || undefined;
    });
  }

  async stopSink(): Promise<void> {
    await this.sinkProcess?.stop();
  }

  /** The mail sink's process, to pause (SIGSTOP) and resume (SIGCONT) it mid-delivery. */
  get sink(): AppProcess | undefined {
    return this.sinkProcess;
  }

  async startApi(extra: Record<string, string> = {}): Promise<AppProcess> {
    const api = this.spawn('api', 'apps/api/src/main.ts', extra);
    this.api = api;
    await waitUntil('the API answering /api/health', 60_000, async () => {
      if (!api.running) throw new GiveUp(`the API exited:\n${api.output}`);
      return (await fetch(`${this.baseUrl}/api/health`)).ok || undefined;
    });
    return api;
  }

  /** Starts a worker and waits for its "worker started" line; `onLine` hears every line from the first. */
  async startWorker(s: WorkerSettings, onLine?: (line: string, self: AppProcess) => void): Promise<AppProcess> {
    const extra: Record<string, string> = { GELPOINT_WORKER_CRON: s.cron };
    if (s.mailLeaseS !== undefined) extra.GELPOINT_MAIL_LEASE_S = String(s.mailLeaseS);
    if (s.mailRetryBaseS !== undefined) extra.GELPOINT_MAIL_RETRY_BASE_S = String(s.mailRetryBaseS);
    const worker = this.spawn(`worker ${this.processes.filter((p) => p.name.startsWith('worker')).length + 1}`, 'apps/worker/src/main.ts', extra, onLine);
    await waitUntil('the worker starting', 60_000, async () => {
      if (worker.output.includes('worker started')) return true;
      if (!worker.running) throw new GiveUp(`the worker exited:\n${worker.output}`);
      return undefined;
    });
    return worker;
  }

  /** Everything the sink holds (it keeps one copy per Message-ID, as a provider does). */
  async sinkMail(): Promise<SinkMail[]> {
    const r = await fetch(`http://127.0.0.1:${this.mailHttpPort}/api/messages`);
    if (!r.ok) throw new Error(`the mail sink answered ${r.status}`);
    return (await r.json()) as SinkMail[];
  }

  /** What the processes said last, for a failed check's report. */
  outputs(): string {
    return this.processes.map((p) => `--- ${p.name} (pid ${p.pid}${p.running ? '' : ', exited'})\n${p.output.slice(-2_000)}`).join('\n');
  }

  async stop(): Promise<void> {
    await Promise.all(this.processes.map((p) => p.stop()));
    rmSync(this.dataDir, { recursive: true, force: true });
  }
}

// One throwaway signing key for every API the checks start.
const jwtSecret = randomBytes(48).toString('base64url');
