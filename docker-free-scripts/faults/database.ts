import { spawnSync } from 'node:child_process';
import pg from 'pg';
import { repoRoot } from './processes';

/** The checks' own connection to the fault-check database, beside the processes under test. */
export function checkPool(): pg.Pool {
  const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 4, application_name: 'gelpoint-fault-check' });
  // While PostgreSQL is stopped on purpose, idle connections die; the pool drops them and reconnects.
  pool.on('error', () => undefined);
  return pool;
}

const SHARED_PG_PORT = '54329';

/** Stops or starts the fault checks' own PostgreSQL through lib.sh, never the everyday one. */
export function postgres(action: 'stop' | 'start'): void {
  const port = process.env.GELPOINT_FAULTS_PG_PORT;
  if (!port || port === SHARED_PG_PORT || port !== process.env.GELPOINT_PG_PORT) {
    throw new Error('refusing to stop or start PostgreSQL: run the checks through npm run check:faults, which gives them a cluster of their own');
  }
  const r = spawnSync('bash', ['-c', `source docker-free-scripts/lib.sh && pg_${action}`], {
    cwd: repoRoot,
    env: { ...process.env, GELPOINT_PG_ROOT: '' },
    encoding: 'utf8',
  });
  if (r.status !== 0) throw new Error(`pg_${action} failed: ${r.stderr || r.stdout}`);
}

export interface DueReminders {
  reminderIds: string[];
  recipients: string[];
  /** The subject every one of these reminders' mails carries, to find them in the sink. */
  subjectPrefix: string;
}

/**
 * Opens `count` pours on the demo shop, copied from a seeded one, each with one demold-check reminder
 * that is already due and notifies every active member: count × members mails to send.
 */
export async function makeDueReminders(pool: pg.Pool, count: number, tag: string): Promise<DueReminders> {
  const subjectPrefix = `Fault check ${tag}:`;
  const client = await pool.connect();
  try {
    await client.query('BEGIN');
    const [template] = (await client.query<{ id: string; shop_id: string }>(`SELECT id, shop_id FROM pours ORDER BY created_at LIMIT 1`)).rows;
    if (!template) throw new Error('the fault-check database has no seeded pour');
    const members = (
      await client.query<{ id: string; email: string }>(
        `SELECT u.id, u.email FROM users u JOIN memberships ms ON ms.user_id = u.id WHERE ms.shop_id = $1 AND ms.status = 'active' ORDER BY u.email`,
        [template.shop_id],
      )
    ).rows;
    const pours = (
      await client.query<{ id: string }>(
        `INSERT INTO pours (shop_id, piece_id, pour_plan_id, status, assumed_temp_c, notify_user_ids, started_by_id)
         SELECT shop_id, piece_id, pour_plan_id, 'open', assumed_temp_c, $2::uuid[], started_by_id FROM pours, generate_series(1, $3)
          WHERE id = $1
         RETURNING id`,
        [template.id, members.map((m) => m.id), count],
      )
    ).rows;
    const reminders = (
      await client.query<{ id: string }>(
        `INSERT INTO reminders (shop_id, pour_id, kind, step, due_at, event_at, assumed, title)
         SELECT $1, p.id, 'demold_check', 'layer:1', now() - interval '1 minute', now() - interval '1 minute', false, $3 || ' demold check ' || p.n
           FROM unnest($2::uuid[]) WITH ORDINALITY AS p(id, n)
         RETURNING id`,
        [template.shop_id, pours.map((p) => p.id), subjectPrefix],
      )
    ).rows;
    await client.query('COMMIT');
    return { reminderIds: reminders.map((r) => r.id), recipients: members.map((m) => m.email), subjectPrefix };
  } catch (err) {
    await client.query('ROLLBACK').catch(() => undefined);
    throw err;
  } finally {
    client.release();
  }
}

export interface OutboxRow {
  reminder_id: string;
  to_address: string;
  message_id: string;
  status: string;
  attempts: number;
}

/** The outbound mail rows these reminders produced (the dispatcher keys them reminder:<id>:<user>). */
export async function outboxOf(pool: pg.Pool, reminderIds: string[]): Promise<OutboxRow[]> {
  return (
    await pool.query<OutboxRow>(
      `SELECT split_part(dedupe_key, ':', 2)::uuid AS reminder_id, to_address, message_id, status, attempts
         FROM outbound_mail WHERE dedupe_key LIKE 'reminder:%' AND split_part(dedupe_key, ':', 2) = ANY($1::text[])`,
      [reminderIds],
    )
  ).rows;
}

export async function reminderStatuses(pool: pg.Pool, reminderIds: string[]): Promise<Map<string, number>> {
  const rows = (
    await pool.query<{ status: string; n: number }>(`SELECT status, count(*)::int AS n FROM reminders WHERE id = ANY($1) GROUP BY status`, [reminderIds])
  ).rows;
  return new Map(rows.map((r) => [r.status, r.n]));
}
