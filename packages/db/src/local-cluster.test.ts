import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '../../..');

function bash(script: string): string {
  const r = spawnSync('bash', ['-c', `source docker-free-scripts/lib.sh; ${script}`], { cwd: root, encoding: 'utf8', timeout: 60_000, env: process.env });
  if (r.status !== 0) throw new Error(`${script} failed: ${r.stderr}`);
  return r.stdout.trim();
}

describe('the local PostgreSQL cluster the scripts start', () => {
  // Storing a 50 MB upload copies it through fresh 50 MB buffers in the server; with the allocator's huge pages a
  // binary COPY of the bench mould took 0.33 s instead of 0.78 s here (README, "Upload to report").
  it("runs with the allocator's huge-page setting", () => {
    const pid = Number(bash('superuser_psql -Atc "SELECT pg_backend_pid()"'));
    expect(pid).toBeGreaterThan(0);
    // A backend inherits the server's environment; the variable is set when pg_start started it.
    const environment = readFileSync(`/proc/${pid}/environ`, 'utf8').split('\0');
    expect(environment).toContain(`GLIBC_TUNABLES=${process.env.GLIBC_TUNABLES ?? 'glibc.malloc.hugetlb=1'}`);
  });
});
