import autocannon, { type BenchRequest, type Result } from 'autocannon';
import pg from 'pg';
import { CpuMeter, type CpuSpent } from './cpu-meter';

export const CONNECTIONS = 50;

export interface LoadSpec {
  endpoint: string;
  kind: 'read' | 'write';
  token: string;
  method: 'GET' | 'POST';
  path: string;
  /** Called for each request when paths or bodies must differ (each write valid once). */
  next?: (seq: number) => { path: string; body?: unknown };
  durationS: number;
  /** A cap on the number of requests; the run still ends after `durationS`. */
  amount?: number;
}

export interface LoadRow {
  endpoint: string;
  kind: 'read' | 'write';
  requests: number;
  reqPerS: number;
  p50Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
  codes: string;
  /** CPU ms per request sent, in the API processes and in their PostgreSQL backends. */
  apiCpuMs: number;
  databaseCpuMs: number;
}

export interface LoadTarget {
  apiUrls: string[];
  apiPids: number[];
  databaseUrl: string;
}

/**
 * One endpoint under CONNECTIONS connections, split evenly between the API instances (autocannon
 * gives connection i the URL i mod n), then a wait until the instances have finished what was in flight.
 */
export async function measure(target: LoadTarget, spec: LoadSpec): Promise<LoadRow> {
  const db = new pg.Client({ connectionString: target.databaseUrl, application_name: 'gelpoint-bench' });
  await db.connect();
  try {
    const meter = new CpuMeter(target.apiPids, db);
    await meter.start();
    const result = await autocannonRun(target.apiUrls, spec);
    await settle(db);
    return rowOf(spec, result, await meter.stop());
  } finally {
    await db.end();
  }
}

function autocannonRun(apiUrls: string[], spec: LoadSpec): Promise<Result> {
  let seq = 0;
  const headers: Record<string, string> = { authorization: `Bearer ${spec.token}` };
  if (spec.method === 'POST') headers['content-type'] = 'application/json';
  const request: BenchRequest = { method: spec.method, path: spec.path, headers };
  if (spec.next) {
    const next = spec.next;
    request.setupRequest = (req) => {
      const r = next(seq++);
      return { ...req, path: r.path, ...(r.body === undefined ? {} : { body: JSON.stringify(r.body) }) };
    };
  }
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url: apiUrls,
        connections: CONNECTIONS,
        ...(spec.amount ? { amount: spec.amount } : { duration: spec.durationS }),
        timeout: 10,
        requests: [request],
        title: spec.endpoint,
      },
      (err, result) => {
        clearTimeout(cap);
        if (err) reject(err);
        else resolve(result);
      },
    );
    const cap = setTimeout(() => instance.stop(), spec.durationS * 1000);
  });
}

/**
 * Autocannon closes its sockets at the end, but each instance still answers the requests it had
 * read; waiting until no API query of this database runs (twice in a row) keeps one endpoint's
 * backlog out of the next one's latency.
 */
async function settle(db: pg.Client, timeoutMs = 30_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let quiet = 0;
  while (quiet < 2 && Date.now() < deadline) {
    const { rows } = await db.query<{ n: number }>(
      `SELECT count(*)::int AS n FROM pg_stat_activity WHERE datname = current_database() AND application_name = 'gelpoint-api' AND state <> 'idle'`,
    );
    quiet = rows[0]!.n === 0 ? quiet + 1 : 0;
    await new Promise((r) => setTimeout(r, 100));
  }
}

function rowOf(spec: LoadSpec, r: Result, cpu: CpuSpent): LoadRow {
  const codes = Object.entries(r.statusCodeStats)
    .filter(([code]) => !code.startsWith('2'))
    .map(([code, { count }]) => `${count}×${code}`)
    .join(' ');
  const sent = Math.max(1, r.requests.sent ?? r.requests.total);
  return {
    endpoint: spec.endpoint,
    kind: spec.kind,
    requests: r.requests.total,
    reqPerS: r.requests.total / r.duration,
    p50Ms: r.latency.p50,
    p99Ms: r.latency.p99,
    errors: r.errors,
    non2xx: r.non2xx,
    codes,
    apiCpuMs: cpu.apiMs / sent,
    databaseCpuMs: cpu.databaseMs / sent,
  };
}

export function table(rows: LoadRow[]): string {
  return [
    '| endpoint | requests | req/s | p50 | p99 | errors / non-2xx | CPU per request (API + PostgreSQL) |',
    '| --- | ---: | ---: | ---: | ---: | --- | ---: |',
    ...rows.map(
      (r) =>
        `| ${r.endpoint} | ${r.requests} | ${r.reqPerS.toFixed(0)} | ${r.p50Ms.toFixed(0)} ms | ${r.p99Ms.toFixed(0)} ms | ${r.errors} / ${r.non2xx}${r.codes ? ` (${r.codes})` : ''} | ${r.apiCpuMs.toFixed(1)} + ${r.databaseCpuMs.toFixed(1)} ms |`,
    ),
  ].join('\n');
}
