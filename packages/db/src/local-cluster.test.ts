import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { scriptsShell } from './scripts-shell';

describe('the local PostgreSQL cluster the scripts start', () => {
  // Storing a 50 MB upload copies it through fresh 50 MB buffers in the server; with the allocator's huge pages a
  // binary COPY of the bench mould took 0.33 s instead of 0.78 s here (README, "Upload to report").
  it("runs with the allocator's huge-page setting", () => {
    // The server's own process (the first line of its pid file), which every backend takes its environment from; a
    // backend's would do, but one that answers a query is gone as soon as the query's client is.
    const pid = Number(scriptsShell('head -n 1 "$GP_PGDATA/postmaster.pid"', 60_000).trim());
    expect(pid).toBeGreaterThan(0);
    // The variable is set when pg_start started the server. Only that variable is compared: a failure must not print
    // the rest of the environment, which may hold secrets.
    const tunables = readFileSync(`/proc/${pid}/environ`, 'utf8')
      .split('\0')
      .filter((entry) => entry.startsWith('GLIBC_TUNABLES='));
    expect(tunables).toEqual([`GLIBC_TUNABLES=${process.env.GLIBC_TUNABLES ?? 'glibc.malloc.hugetlb=1'}`]);
  });
});
