import { spawn, spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { expect } from 'vitest';
import { testDatabaseUrl } from './harness';

/** A resin system as a lead types it from an (invented) data sheet; `over` changes single values. */
export const resinInput = (over: Record<string, unknown> = {}) => ({
  name: 'Stillwater Deep 50',
  use: 'deep_pour',
  mixRatio: { a: 2, b: 1, basis: 'volume' },
  densityAGPerMl: 1.16,
  densityBGPerMl: 0.98,
  potLifeMin: 45,
  gelTimeH: 8,
  tackFreeH: 16,
  recoatWindow: { earliestH: 12, latestH: 36 },
  demoldH: 48,
  fullCureH: 168,
  referenceTempC: 22,
  minWorkTempC: 16,
  maxWorkTempC: 30,
  maxLayerMm: 20,
  maxBatchG: 4000,
  pricePerKit: 120,
  kitSizeG: 4500,
  shelfLifeMonths: 12,
  ...over,
});

const workerOnce = {
  // The built worker (the database project's set-up builds it), as npm start runs it.
  args: ['apps/worker/dist/main.js', '--once'],
  options: () => ({
    cwd: join(import.meta.dirname, '../../../..'),
    env: { ...process.env, DATABASE_URL: testDatabaseUrl(), GELPOINT_WORKER_JOBS: 'molds', GELPOINT_LOG_LEVEL: 'silent' },
  }),
};

/** The worker, as its own process, analysing the queued moulds (as its cron tick does) and nothing else. */
export function analyseQueuedMoulds(): void {
  const r = spawnSync(process.execPath, workerOnce.args, { ...workerOnce.options(), encoding: 'utf8', timeout: 60_000 });
  expect(r.stderr).toBe('');
  expect(r.status).toBe(0);
}

/** The same, leaving this process's event loop free (to serve a stream that follows the analysis meanwhile). */
export async function analyseQueuedMouldsMeanwhile(): Promise<void> {
  const child = spawn(process.execPath, workerOnce.args, { ...workerOnce.options(), stdio: ['ignore', 'ignore', 'pipe'], timeout: 60_000 });
  let stderr = '';
  child.stderr.on('data', (b: Buffer) => (stderr += b.toString()));
  const code = await new Promise<number | null>((resolve) => child.once('exit', resolve));
  expect(stderr).toBe('');
  expect(code).toBe(0);
}
