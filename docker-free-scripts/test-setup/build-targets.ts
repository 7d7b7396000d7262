import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

/**
 * Brings build targets up to date (docker-free-scripts/build.mjs: a no-op for a target whose inputs did not change,
 * as after npm test's own build). Tests start the built API, worker and mail sink, as npm start does, so a run of
 * one test file still runs what its sources say.
 */
export function buildTargets(...targets: string[]): void {
  execFileSync(process.execPath, [fileURLToPath(new URL('../build.mjs', import.meta.url)), ...targets], { stdio: ['ignore', 'ignore', 'inherit'] });
}

/** What the database and browser projects start as processes: the migrations and the seed, the API, worker and mail sink. */
export const serverTargets = ['db', 'api', 'worker', 'mailsink'];
