import { spawnSync } from 'node:child_process';
import { join } from 'node:path';

const root = join(import.meta.dirname, '../../..');

/**
 * Runs bash with docker-free-scripts/lib.sh sourced, from the repository's root (for the db package's tests of the
 * scripts): lib.sh knows the cluster, its port and the superuser's password. Returns stdout; a failure throws with
 * the script and its stderr.
 */
export function scriptsShell(script: string, timeoutMs = 120_000): string {
  const r = spawnSync('bash', ['-c', `source docker-free-scripts/lib.sh; ${script}`], { cwd: root, encoding: 'utf8', timeout: timeoutMs, env: process.env });
  if (r.status !== 0) throw new Error(`${script} failed: ${r.stderr}`);
  return r.stdout;
}
