import { readFileSync } from 'node:fs';
import type pg from 'pg';

// Linux reports process CPU time in clock ticks; 100 per second on every kernel these machines run
// (getconf CLK_TCK).
const TICK_MS = 10;

/** utime + stime of a process in ms, from /proc/<pid>/stat (fields 14 and 15); 0 once it is gone. */
function cpuMsOf(pid: number): number {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    return (Number(fields[11]) + Number(fields[12])) * TICK_MS;
  } catch {
    return 0;
  }
}

export interface CpuSpent {
  apiMs: number;
  databaseMs: number;
}

/**
 * CPU time the API processes and their PostgreSQL backends spend between start() and stop(). On a
 * machine shared with other work, latency says how long requests queued; CPU per request says what
 * each one costs, whatever else was running.
 */
export class CpuMeter {
  private api = 0;
  private backends = new Map<number, number>();

  constructor(
    private readonly apiPids: number[],
    private readonly db: pg.Client,
  ) {}

  private async backendPids(): Promise<number[]> {
    const { rows } = await this.db.query<{ pid: number }>(
      `SELECT pid FROM pg_stat_activity WHERE datname = current_database() AND application_name = 'gelpoint-api'`,
    );
    return rows.map((r) => r.pid);
  }

  private apiMs(): number {
    return this.apiPids.reduce((sum, pid) => sum + cpuMsOf(pid), 0);
  }

  async start(): Promise<void> {
    this.api = this.apiMs();
    this.backends = new Map((await this.backendPids()).map((pid) => [pid, cpuMsOf(pid)]));
  }

  /** Backends opened during the run count from zero. */
  async stop(): Promise<CpuSpent> {
    const apiMs = this.apiMs() - this.api;
    let databaseMs = 0;
    for (const pid of await this.backendPids()) databaseMs += cpuMsOf(pid) - (this.backends.get(pid) ?? 0);
    return { apiMs, databaseMs };
  }
}
