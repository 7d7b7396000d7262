import type pg from 'pg';
import { binaryStl, pocketMouldTriangles } from '../../apps/api/src/test-support/pocket-mould';
import { call, describe, isApiError, signIn, type Answer } from './api-client';
import { must } from './verdict';
import { waitUntil } from './processes';
import type { FaultStack } from './stack';

const READINGS = 400;

async function count(pool: pg.Pool, sql: string, params: unknown[] = []): Promise<number> {
  return (await pool.query<{ n: number }>(`SELECT count(*)::int AS n FROM ${sql}`, params)).rows[0]!.n;
}

/**
 * `READINGS` sorted readings a minute apart from `hoursAgo` hours back, at 17 s past the minute so they meet no
 * seeded one; recent, so they fall inside the seeded pour's cure and pass the log's date guard.
 */
function readingsCsv(hoursAgo: number, badRow?: number): string {
  const start = Math.floor((Date.now() - hoursAgo * 3_600_000) / 60_000) * 60_000;
  const lines = ['time,tempC'];
  for (let i = 0; i < READINGS; i++) {
    const at = new Date(start + i * 60_000 + 17_000).toISOString();
    lines.push(i === badRow ? `${at},warm` : `${at},${(20 + (i % 7) * 0.25).toFixed(2)}`);
  }
  return `${lines.join('\n')}\n`;
}

/**
 * Sends a write and cuts its database connection while its transaction is half done. Every service
 * transaction writes its audit row last, so while this holds a SHARE lock on audit_events the API's
 * write waits there with its other rows written but not committed; then its backend is terminated.
 */
async function cutMidWrite(pool: pg.Pool, wroteTable: string, send: () => Promise<Answer>): Promise<Answer> {
  const gate = await pool.connect();
  let pending: Promise<Answer> | undefined;
  try {
    await gate.query('BEGIN');
    await gate.query('LOCK TABLE audit_events IN SHARE MODE');
    pending = send();
    const pid = await waitUntil(
      `the API's write to ${wroteTable} waiting before its audit row`,
      20_000,
      async () => {
        const rows = (
          await pool.query<{ pid: number }>(
            `SELECT a.pid FROM pg_stat_activity a
            WHERE a.application_name = 'gelpoint-api' AND a.wait_event_type = 'Lock'
              AND EXISTS (SELECT 1 FROM pg_locks l JOIN pg_class c ON c.oid = l.relation WHERE l.pid = a.pid AND c.relname = $1 AND l.mode = 'RowExclusiveLock')`,
            [wroteTable],
          )
        ).rows;
        return rows[0]?.pid;
      },
      20,
    );
    await pool.query('SELECT pg_terminate_backend($1)', [pid]);
  } finally {
    await gate.query('ROLLBACK').catch(() => undefined);
    gate.release();
  }
  return pending;
}

function mustBeCut(what: string, a: Answer): void {
  must(
    a.status === 503 && isApiError(a.body) && a.body.error.code === 'database_unavailable',
    `${what} cut off from the database should answer 503 database_unavailable; got ${describe(a)}`,
  );
}

/**
 * Uploads and forms that fail part-way leave nothing behind: a CSV log with one bad row, a CSV log and
 * a mould upload whose database connection dies mid-transaction, a batch whose second lot is refused
 * after the first was drawn down.
 */
export async function allOrNothing(stack: FaultStack, pool: pg.Pool): Promise<string> {
  await stack.startApi();
  const { token, answer } = await signIn(stack.baseUrl, 'lead@gelpoint.test');
  must(token, `signing in should work; got ${describe(answer)}`);
  const [pour] = (
    await pool.query<{ id: string; shop_id: string; pour_plan_id: string }>(
      `SELECT id, shop_id, pour_plan_id FROM pours WHERE status = 'open' ORDER BY created_at LIMIT 1`,
    )
  ).rows;
  must(pour, 'the seeded shop should have an open pour');
  const readingsOf = () => count(pool, 'temperature_readings WHERE pour_id = $1', [pour.id]);
  const auditOf = () => count(pool, 'audit_events WHERE shop_id = $1', [pour.shop_id]);
  const csv = (body: string) => () => call(stack.baseUrl, 'POST', `/api/pours/${pour.id}/readings/csv`, { token, body, contentType: 'text/csv' });

  // A log with one bad row among good ones.
  const readings0 = await readingsOf();
  const audit0 = await auditOf();
  const bad = await csv(readingsCsv(20, 250))();
  must(
    bad.status === 422 && isApiError(bad.body) && bad.body.error.code === 'csv_invalid',
    `a log with a bad row should be refused with 422 csv_invalid; got ${describe(bad)}`,
  );
  must((await readingsOf()) === readings0, `a refused log should add no readings; ${(await readingsOf()) - readings0} were added`);

  // A good log whose connection is cut after its readings were written.
  const log = readingsCsv(12);
  mustBeCut('a log import', await cutMidWrite(pool, 'temperature_readings', csv(log)));
  must((await readingsOf()) === readings0, `a log cut off mid-write should leave no readings; ${(await readingsOf()) - readings0} were left`);
  must((await auditOf()) === audit0, 'a log cut off mid-write should leave no audit event');
  const again = await csv(log)();
  must(
    again.status === 200 && (again.body as { added?: number }).added === READINGS,
    `the same log sent again should import all ${READINGS} rows; got ${describe(again)}`,
  );
  must((await readingsOf()) === readings0 + READINGS, 'the log sent again should be there in full');

  // A mould upload whose connection is cut after the mould and its file were written.
  const moulds0 = await count(pool, 'molds WHERE shop_id = $1', [pour.shop_id]);
  const files0 = await count(pool, 'mold_files');
  const audit1 = await auditOf();
  const stl = binaryStl(pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 10 }));
  const upload = () => {
    const form = new FormData();
    form.set('file', new Blob([new Uint8Array(stl)]), 'fault-check tray.stl');
    form.set('units', 'mm');
    return call(stack.baseUrl, 'POST', '/api/molds', { token, body: form });
  };
  mustBeCut('a mould upload', await cutMidWrite(pool, 'mold_files', upload));
  must((await count(pool, 'molds WHERE shop_id = $1', [pour.shop_id])) === moulds0, 'a mould upload cut off mid-write should leave no mould');
  must((await count(pool, 'mold_files')) === files0, 'a mould upload cut off mid-write should leave no stored file');
  must((await auditOf()) === audit1, 'a mould upload cut off mid-write should leave no audit event');

  // A batch whose part A lot is drawn down before its part B lot turns out to be a part A lot.
  const started = await call(stack.baseUrl, 'POST', '/api/pours', { token, json: { pourPlanId: pour.pour_plan_id } });
  must(started.status === 201, `starting a pour should work; got ${describe(started)}`);
  const newPour = (started.body as { id: string }).id;
  const [lotA] = (
    await pool.query<{ id: string; remaining_g: number }>(
      `SELECT id, remaining_g FROM lots WHERE shop_id = $1 AND part = 'A' AND remaining_g > 100 ORDER BY created_at LIMIT 1`,
      [pour.shop_id],
    )
  ).rows;
  must(lotA, 'the seeded shelf should have a part A lot with stock');
  const audit2 = await auditOf();
  const batch = await call(stack.baseUrl, 'POST', `/api/pours/${newPour}/batches`, {
    token,
    json: { planBatchIndex: 0, lotAId: lotA.id, lotBId: lotA.id, weighedAG: 100, weighedBG: 50, confirmUnusual: true },
  });
  must(batch.status === 400, `a batch with a part A lot in the part B slot should be refused with 400; got ${describe(batch)}`);
  const [lotAfter] = (await pool.query<{ remaining_g: number }>('SELECT remaining_g FROM lots WHERE id = $1', [lotA.id])).rows;
  must(
    lotAfter?.remaining_g === lotA.remaining_g,
    `the refused batch should not draw down the part A lot (${lotA.remaining_g} g before, ${lotAfter?.remaining_g} g after)`,
  );
  must((await count(pool, 'pour_batches WHERE pour_id = $1', [newPour])) === 0, 'the refused batch should leave no batch row');
  must((await auditOf()) === audit2, 'the refused batch should leave no audit event');

  return `bad CSV row: nothing added; ${READINGS}-row log and mould upload cut mid-transaction: 503, nothing left, resend whole; refused second lot: first lot not drawn`;
}
