import { createHash, randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '@gelpoint/db';
import { ByteaCopyReader, readMoldFileBytes } from './mold-file-bytes';

let ds: DataSource;
let shop: string;

beforeAll(async () => {
  const url = process.env.GELPOINT_TEST_DATABASE_URL;
  if (!url) throw new Error('GELPOINT_TEST_DATABASE_URL is not set: run the tests through npm test');
  ds = await createDataSource({ url, poolSize: 2 }).initialize();
  [{ id: shop }] = (await ds.query(`INSERT INTO shops (name) VALUES ('File bytes shop') RETURNING id`)) as [{ id: string }];
});
afterAll(async () => {
  if (shop) await ds.query('DELETE FROM shops WHERE id = $1', [shop]);
  await ds?.destroy();
});

async function mouldWith(bytes: Buffer | null): Promise<string> {
  const [{ id }] = (await ds.query(
    `INSERT INTO molds (shop_id, name, file_name, units, up_axis, size_bytes, sha256, status) VALUES ($1, 'm', 'm.stl', 'mm', 'z', $2, 'x', 'queued') RETURNING id`,
    [shop, bytes?.length ?? 0],
  )) as [{ id: string }];
  if (bytes) await ds.query('INSERT INTO mold_files (mold_id, bytes) VALUES ($1, $2)', [id, bytes]);
  return id;
}

describe("reading a mould's stored file", () => {
  it('gives back the very bytes stored, across many chunks of the stream, as PostgreSQL itself reads them', async () => {
    // Random bytes do not compress, so the value is stored out of line in many TOAST chunks; an odd length.
    const bytes = randomBytes(3 * 1024 * 1024 + 17);
    const id = await mouldWith(bytes);
    const read = await readMoldFileBytes(ds, id);
    expect(read).not.toBeNull();
    expect(read!.length).toBe(bytes.length);
    expect(Buffer.from(read!).equals(bytes)).toBe(true);
    // PostgreSQL's own sha256() over the stored value, an implementation apart from Node's.
    const [{ hash }] = (await ds.query(`SELECT encode(sha256(bytes), 'hex') AS hash FROM mold_files WHERE mold_id = $1`, [id])) as [{ hash: string }];
    expect(createHash('sha256').update(read!).digest('hex')).toBe(hash);
  });

  it('reads an empty file as empty, and a mould without a file as null', async () => {
    expect(Array.from((await readMoldFileBytes(ds, await mouldWith(Buffer.alloc(0))))!)).toEqual([]);
    expect(await readMoldFileBytes(ds, await mouldWith(null))).toBeNull();
  });

  it('decodes the binary COPY format the manual describes, however the stream is cut', () => {
    // PostgreSQL manual, COPY, "Binary Format": signature, flags, extension length (here 3, with its bytes), then one
    // tuple of one field and the -1 trailer, integers big-endian.
    const value = Buffer.from('solid tray\nendsolid tray\n');
    const frame = Buffer.concat([
      Buffer.from('PGCOPY\n\xff\r\n\0', 'latin1'),
      Buffer.from([0, 0, 0, 0, 0, 0, 0, 3, 9, 9, 9, 0, 1]),
      Buffer.from([0, 0, 0, value.length]),
      value,
      Buffer.from([0xff, 0xff]),
    ]);
    for (const size of [1, 2, 7, 64]) {
      const reader = new ByteaCopyReader();
      for (let at = 0; at < frame.length; at += size) reader.push(frame.subarray(at, at + size));
      expect(Buffer.from(reader.result()!).toString()).toBe(value.toString());
    }
    const cut = new ByteaCopyReader();
    cut.push(frame.subarray(0, frame.length - 6));
    expect(() => cut.result()).toThrow(/ended after/);
    const alien = new ByteaCopyReader();
    expect(() => alien.push(Buffer.from('not a copy stream at all'))).toThrow(/unknown format/);
  });
});
