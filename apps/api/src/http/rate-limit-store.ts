import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import type { DataSource } from 'typeorm';

interface CounterRow {
  hits: number;
  reset_at: Date;
}

const SWEEP_EVERY_MS = 10 * 60_000;

/**
 * Hit counters for express-rate-limit kept in PostgreSQL, so that two API instances behind one address
 * share one count (a guesser cannot double the allowance by landing on the other instance). One upsert
 * per hit: a window that has run out starts again at 1.
 */
export class PostgresRateLimitStore implements Store {
  readonly localKeys = false;
  private windowMs = 60_000;
  private sweptAt = 0;

  constructor(
    private readonly ds: DataSource,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const rows = (await this.ds.query('SELECT hits, reset_at FROM rate_limit_counters WHERE key = $1 AND reset_at > now()', [
      this.prefix + key,
    ])) as CounterRow[];
    return rows[0] ? { totalHits: rows[0].hits, resetTime: rows[0].reset_at } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    this.sweepNowAndThen();
    const rows = (await this.ds.query(
      `INSERT INTO rate_limit_counters AS c (key, hits, reset_at)
       VALUES ($1, 1, now() + make_interval(secs => $2::double precision / 1000))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN c.reset_at <= now() THEN 1 ELSE c.hits + 1 END,
         reset_at = CASE WHEN c.reset_at <= now() THEN EXCLUDED.reset_at ELSE c.reset_at END
       RETURNING hits, reset_at`,
      [this.prefix + key, this.windowMs],
    )) as CounterRow[];
    const row = rows[0]!;
    return { totalHits: row.hits, resetTime: row.reset_at };
  }

  async decrement(key: string): Promise<void> {
    await this.ds.query('UPDATE rate_limit_counters SET hits = greatest(hits - 1, 0) WHERE key = $1 AND reset_at > now()', [this.prefix + key]);
  }

  async resetKey(key: string): Promise<void> {
    await this.ds.query('DELETE FROM rate_limit_counters WHERE key = $1', [this.prefix + key]);
  }

  /** Rows of windows that have run out are dead; a sweep every few minutes per limit keeps the table small. */
  private sweepNowAndThen(): void {
    if (Date.now() - this.sweptAt < SWEEP_EVERY_MS) return;
    this.sweptAt = Date.now();
    this.ds.query('DELETE FROM rate_limit_counters WHERE key LIKE $1 AND reset_at < now()', [`${this.prefix}%`]).catch(() => undefined);
  }
}
