import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { createDataSource } from './data-source';
import { scriptsShell } from './scripts-shell';

const dir = mkdtempSync(join(tmpdir(), 'gelpoint-backup-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Row count and a checksum of every row's text, per table: equal means the same data. */
async function fingerprint(db: string): Promise<Record<string, { rows: number; md5: string }>> {
  const url = scriptsShell(`db_url ${db}`).trim();
  const ds = await createDataSource({ url, poolSize: 1 }).initialize();
  try {
    const tables: { tablename: string }[] = await ds.query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`);
    const out: Record<string, { rows: number; md5: string }> = {};
    for (const { tablename } of tables) {
      const [r] = await ds.query(`SELECT count(*)::int AS rows, md5(coalesce(string_agg(t::text, '|' ORDER BY t::text), '')) AS md5 FROM "${tablename}" t`);
      out[tablename] = r;
    }
    return out;
  } finally {
    await ds.destroy();
  }
}

describe('backup and restore scripts', () => {
  it('restore a pg_dump backup to the same rows, table by table', async () => {
    scriptsShell(`ensure_database gelpoint_backup_src --fresh
      DATABASE_URL="$(db_url gelpoint_backup_src)" node packages/db/dist/cli/migrate.js >/dev/null
      DATABASE_URL="$(db_url gelpoint_backup_src)" GELPOINT_SCRYPT_LOG_N=11 node packages/db/dist/cli/seed.js >/dev/null`);
    const file = join(dir, 'shop.dump');
    scriptsShell(`bash docker-free-scripts/backup.sh gelpoint_backup_src "${file}" >/dev/null`);
    scriptsShell(`bash docker-free-scripts/restore.sh "${file}" gelpoint_backup_dst >/dev/null`);
    const [before, after] = [await fingerprint('gelpoint_backup_src'), await fingerprint('gelpoint_backup_dst')];
    expect(Object.keys(before)).toContain('pours');
    expect(before.pours!.rows).toBeGreaterThan(0);
    expect(after).toEqual(before);
    scriptsShell(
      'PGOPTIONS="-c client_min_messages=warning" superuser_psql -c "DROP DATABASE gelpoint_backup_src WITH (FORCE)" -c "DROP DATABASE gelpoint_backup_dst WITH (FORCE)"',
    );
  });
});
