import { pino } from 'pino';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '@gelpoint/db';
import { cavityAnalysisVersion } from '@gelpoint/mesh';
import { requeueOutdatedMolds } from './mold-analysis.job';

let ds: DataSource;

beforeAll(async () => {
  const url = process.env.GELPOINT_TEST_DATABASE_URL;
  if (!url) throw new Error('GELPOINT_TEST_DATABASE_URL is not set: run the tests through npm test');
  ds = await createDataSource({ url, poolSize: 2 }).initialize();
});
afterAll(async () => {
  await ds?.destroy();
});

describe('moulds analysed by an older engine', () => {
  it('go back in the queue, and current ones stay as they are', async () => {
    const [{ id: shop }] = (await ds.query(`INSERT INTO shops (name) VALUES ('Requeue shop') RETURNING id`)) as [{ id: string }];
    const mould = async (version: number) =>
      (
        (await ds.query(
          `INSERT INTO molds (shop_id, name, file_name, units, up_axis, size_bytes, sha256, status, analysis, analysed_at)
         VALUES ($1, 'm', 'm.stl', 'mm', 'z', 84, 'x', 'ready', $2, now()) RETURNING id`,
          [shop, { kind: 'gelpoint-cavity-analysis', version }],
        )) as [{ id: string }]
      )[0].id;
    const old = await mould(cavityAnalysisVersion - 1);
    const current = await mould(cavityAnalysisVersion);
    expect(await requeueOutdatedMolds(ds, pino({ level: 'silent' }))).toBeGreaterThanOrEqual(1);
    const status = async (id: string) => ((await ds.query('SELECT status FROM molds WHERE id = $1', [id])) as [{ status: string }])[0].status;
    expect(await status(old)).toBe('queued');
    expect(await status(current)).toBe('ready');
    await ds.query('DELETE FROM shops WHERE id = $1', [shop]);
  });
});
