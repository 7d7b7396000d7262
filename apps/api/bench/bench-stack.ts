import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const root = join(import.meta.dirname, '../../..');

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

async function waitFor(url: string, timeoutMs: number, output: () => string): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // still starting
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms\n${output()}`);
}

export interface BenchProcess {
  name: string;
  child: ChildProcess;
  /** Everything it printed, newest 200 kB. */
  output: string;
}

export interface StackSettings {
  databaseUrl: string;
  jwtSecret: string;
  authRatePer15Min: number;
}

/**
 * Two API instances, two workers and the mail sink, each its own process on free loopback ports,
 * all against one database: the shape of a deployment behind a load balancer.
 */
export class BenchStack {
  readonly processes: BenchProcess[] = [];
  readonly apiUrls: string[] = [];
  mailUrl = '';
  private readonly dataDir = mkdtempSync(join(tmpdir(), 'gelpoint-bench-'));

  constructor(private readonly settings: StackSettings) {}

  private launch(name: string, entry: string, env: NodeJS.ProcessEnv): BenchProcess {
    const child = spawn(process.execPath, ['--import', 'tsx', entry], { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] });
    const p: BenchProcess = { name, child, output: '' };
    const keep = (b: Buffer) => {
      p.output = (p.output + b.toString()).slice(-200_000);
    };
    child.stdout?.on('data', keep);
    child.stderr?.on('data', keep);
    this.processes.push(p);
    return p;
  }

  private outputs(): string {
    return this.processes.map((p) => `--- ${p.name}\n${p.output.slice(-3000)}`).join('\n');
  }

  async start(): Promise<void> {
    const [api1, api2, smtp, mailHttp] = await Promise.all([freePort(), freePort(), freePort(), freePort()]);
    this.apiUrls.push(`http://127.0.0.1:${api1}`, `http://127.0.0.1:${api2}`);
    this.mailUrl = `http://127.0.0.1:${mailHttp}`;
    const common = {
      ...process.env,
      DATABASE_URL: this.settings.databaseUrl,
      GELPOINT_DATA_DIR: this.dataDir,
      // Links in mail point at one public address, as behind a load balancer.
      GELPOINT_PUBLIC_URL: this.apiUrls[0],
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtp),
    };
    this.launch('mail sink', 'apps/mailsink/src/main.ts', {
      ...common,
      MAILSINK_HOST: '127.0.0.1',
      MAILSINK_SMTP_PORT: String(smtp),
      MAILSINK_HTTP_PORT: String(mailHttp),
      MAILSINK_DATA_DIR: join(this.dataDir, 'mailsink'),
    });
    [api1, api2].forEach((port, i) =>
      this.launch(`api ${i + 1}`, 'apps/api/src/main.ts', {
        ...common,
        GELPOINT_HOST: '127.0.0.1',
        GELPOINT_API_PORT: String(port),
        GELPOINT_JWT_SECRET: this.settings.jwtSecret,
        GELPOINT_AUTH_RATE_PER_15MIN: String(this.settings.authRatePer15Min),
        // Request logs at info would put a JSON line per request on a 2-core machine's pipe.
        GELPOINT_LOG_LEVEL: 'warn',
      }),
    );
    for (const n of [1, 2]) {
      this.launch(`worker ${n}`, 'apps/worker/src/main.ts', {
        ...common,
        // Both tick every 2 s, at the same instants, so they race for the same due work.
        GELPOINT_WORKER_CRON: '*/2 * * * * *',
        GELPOINT_LOG_LEVEL: 'info',
      });
    }
    await Promise.all([
      ...this.apiUrls.map((u) => waitFor(`${u}/api/health`, 120_000, () => this.outputs())),
      waitFor(`${this.mailUrl}/api/messages`, 120_000, () => this.outputs()),
      this.workersStarted(120_000),
    ]);
  }

  private async workersStarted(timeoutMs: number): Promise<void> {
    const deadline = Date.now() + timeoutMs;
    const workers = this.processes.filter((p) => p.name.startsWith('worker'));
    while (!workers.every((w) => w.output.includes('worker started'))) {
      const dead = workers.find((w) => w.child.exitCode !== null);
      if (dead || Date.now() > deadline) throw new Error(`the workers did not start\n${this.outputs()}`);
      await new Promise((r) => setTimeout(r, 200));
    }
  }

  get apiPids(): number[] {
    return this.processes.filter((p) => p.name.startsWith('api')).map((p) => p.child.pid!);
  }

  /** Log lines (pino JSON) of one process whose message is `msg`. */
  logLines(name: string, msg: string): Record<string, unknown>[] {
    const p = this.processes.find((x) => x.name === name);
    if (!p) return [];
    return p.output
      .split('\n')
      .filter((l) => l.startsWith('{'))
      .map((l) => {
        try {
          return JSON.parse(l) as Record<string, unknown>;
        } catch {
          return {};
        }
      })
      .filter((o) => o.msg === msg);
  }

  async stop(): Promise<void> {
    await Promise.all(
      this.processes.map(
        ({ child }) =>
          new Promise<void>((resolve) => {
            if (child.exitCode !== null) return resolve();
            child.once('exit', () => resolve());
            child.kill('SIGTERM');
          }),
      ),
    );
    rmSync(this.dataDir, { recursive: true, force: true });
  }
}
