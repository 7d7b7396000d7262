// Runs the fault checks one after another, each with a stack of its own, and prints one line per
// check ("ok - …" / "not ok - …", with what went wrong below as "#" lines) and a totals line.
// Arguments pick checks by name. Started by check-faults.sh, which provides the database.
import type pg from 'pg';
import { allOrNothing } from './check-all-or-nothing';
import { databaseRestart } from './check-database-restart';
import { apiDrainsOnSigterm, workerStopsCleanly } from './check-graceful-stop';
import { mailSinkDown } from './check-mail-sink-down';
import { twoWorkers } from './check-two-workers';
import { workerKilledMidWork } from './check-worker-killed';
import { checkPool } from './database';
import { FaultStack } from './stack';
import { CheckFailed } from './verdict';

interface FaultCheck {
  name: string;
  title: string;
  run(stack: FaultStack, pool: pg.Pool): Promise<string>;
}

const checks: FaultCheck[] = [
  { name: 'database-restart', title: 'database restart under a running API and worker', run: databaseRestart },
  { name: 'worker-killed', title: 'worker killed while sending reminders', run: workerKilledMidWork },
  { name: 'two-workers', title: 'two workers side by side', run: twoWorkers },
  { name: 'mail-sink-down', title: 'mail sink down for a while', run: mailSinkDown },
  { name: 'all-or-nothing', title: 'uploads and forms are all or nothing', run: allOrNothing },
  { name: 'api-sigterm', title: 'API stopped (SIGTERM) during slow uploads', run: apiDrainsOnSigterm },
  { name: 'worker-sigterm', title: 'worker stopped (SIGTERM) during a mail send', run: workerStopsCleanly },
];

const wanted = process.argv.slice(2);
const unknown = wanted.filter((w) => !checks.some((c) => c.name === w));
if (unknown.length) {
  process.stderr.write(`unknown check ${unknown.join(', ')}; the checks are ${checks.map((c) => c.name).join(', ')}\n`);
  process.exit(2);
}
const chosen = wanted.length ? checks.filter((c) => wanted.includes(c.name)) : checks;

const pool = checkPool();
let passed = 0;
let failed = 0;
const startedAll = performance.now();
for (const c of chosen) {
  const stack = await FaultStack.create();
  const started = performance.now();
  try {
    const note = await c.run(stack, pool);
    passed++;
    console.log(`ok - ${c.title} (${((performance.now() - started) / 1000).toFixed(1)} s): ${note}`);
  } catch (err) {
    failed++;
    console.log(`not ok - ${c.title} (${((performance.now() - started) / 1000).toFixed(1)} s)`);
    // A failed expectation speaks for itself; anything else is a fault in the check, shown with its stack.
    const detail = `${err instanceof CheckFailed ? err.message : ((err as Error).stack ?? String(err))}\n${stack.outputs()}`;
    console.log(
      detail
        .split('\n')
        .map((l) => `#   ${l}`)
        .join('\n'),
    );
  } finally {
    await stack.stop();
  }
}
await pool.end();
console.log(`${passed} passed, ${failed} failed (${((performance.now() - startedAll) / 1000).toFixed(0)} s)`);
process.exit(failed ? 1 : 0);
