import { analyzeCavity, prepareMesh, readMouldFile } from '@gelpoint/mesh';
import { beforeAll, describe, expect, it } from 'vitest';
import { encode3mf } from '../../../../../packages/mesh/test/mould-files';
import { analyseQueuedMoulds } from '../../test-support/fixtures';
import { bearer, createShop, useHarness, type ShopFixture } from '../../test-support/harness';
import { binaryStl, pocketMouldTriangles } from '../../test-support/pocket-mould';

// The default: the API analyses an upload in its checking thread while the file is stored, so no worker runs here
// unless a test starts one.
const h = useHarness();

// Block 100 × 60 × 30 mm with an 80 × 40 mm pocket whose floor is at z = 10: a prism, so the fill to level z is
// 80 · 40 · (z − 10) mm³ (CRC Concise Encyclopedia of Mathematics, prism volume = base × height).
const pocket = pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 10 });
const prism = (z: number) => 80 * 40 * (z - 10);

let shop: ShopFixture;
let maker: Awaited<ReturnType<ShopFixture['member']>>;
beforeAll(async () => {
  shop = await createShop(h, 'Upload analysis shop');
  maker = await shop.member('maker');
});

const upload = (bytes: Buffer, fields: Record<string, string>, name = 'tray pocket.stl') => {
  const req = h.http().post('/api/molds').set(bearer(maker)).attach('file', bytes, name);
  for (const [k, v] of Object.entries(fields)) req.field(k, v);
  return req;
};

interface StoredRow {
  status: string;
  analysis: unknown;
  report: { fillToTop: { volumeMm3: number }; bboxMm: { min: number[]; max: number[] } } | null;
  depth_map: unknown;
  error_code: string | null;
}

/** The mould's row once it has left `queued`, or as it stands after `ms` (no worker runs to take it). */
async function settled(id: string, ms = 20_000): Promise<StoredRow> {
  const deadline = Date.now() + ms;
  for (;;) {
    const [row] = (await h.ds.query('SELECT status, analysis, report, depth_map, error_code FROM molds WHERE id = $1', [id])) as StoredRow[];
    if (row!.status !== 'queued' || Date.now() > deadline) return row!;
    await new Promise((r) => setTimeout(r, 50));
  }
}

describe('an upload analysed where it arrives', { timeout: 60_000 }, () => {
  it('is ready without a worker, with the analysis the engine gives the same file', async () => {
    const bytes = binaryStl(pocket);
    const res = await upload(bytes, { units: 'mm', up: 'z' }).expect(202);
    expect(['queued', 'ready']).toContain(res.body.status);
    const row = await settled(res.body.id as string);
    expect(row.status).toBe('ready');
    expect(row.error_code).toBeNull();
    // The engine run directly on the same bytes, as the worker runs it: the stored analysis is the same.
    const soup = readMouldFile(new Uint8Array(bytes));
    if (!soup.ok) throw new Error(soup.error.message);
    const mesh = prepareMesh(soup.value.soup, { units: 'mm', up: 'z' });
    if (!mesh.ok) throw new Error(mesh.error.message);
    const direct = analyzeCavity(mesh.value);
    if (!direct.ok) throw new Error(direct.error.message);
    expect(row.analysis).toEqual(JSON.parse(JSON.stringify(direct.value)));
    expect(row.report!.fillToTop.volumeMm3).toBeCloseTo(prism(30), -1);
    expect(row.depth_map).not.toBeNull();
    // The API answers fills from it at once.
    const fill = (await h.http().get(`/api/molds/${res.body.id}/fill`).query({ level: 20, from: 'mould' }).set(bearer(maker)).expect(200)).body;
    expect(fill.volumeMm3).toBeCloseTo(prism(20), -1);
    const view = (await h.http().get(`/api/molds/${res.body.id}`).set(bearer(maker)).expect(200)).body;
    expect(view).toMatchObject({ status: 'ready', format: 'stl', units: 'mm', error: null });
  });

  it('reads a 3MF in the unit it states when none is sent, and analyses it in that unit', async () => {
    // The pocket written in inches: 1 in = 25.4 mm (NIST SP 811), so the stored box is the block in mm again.
    const mesh = { positions: Float64Array.from(pocket.flat(2)), triangleCount: pocket.length };
    const res = await upload(Buffer.from(encode3mf(mesh, 'inch', 25.4)), { up: 'z' }, 'pocket.3mf').expect(202);
    const row = await settled(res.body.id as string);
    expect(row.status).toBe('ready');
    // Within the float32 rounding of the file's numbers.
    expect(row.report!.bboxMm.max[0]).toBeCloseTo(100, 4);
    expect(row.report!.fillToTop.volumeMm3).toBeCloseTo(prism(30), -1);
    const view = (await h.http().get(`/api/molds/${res.body.id}`).set(bearer(maker)).expect(200)).body;
    expect(view).toMatchObject({ format: '3mf', units: 'in', fileUnits: 'in' });
  });

  it('leaves a mesh the engine refuses to the worker, which records the refusal as before', async () => {
    // A single flat sheet of two triangles: the file reads, but a mould needs width, depth and height.
    const flat = binaryStl([
      [
        [0, 0, 0],
        [10, 0, 0],
        [10, 10, 0],
      ],
      [
        [0, 0, 0],
        [10, 10, 0],
        [0, 10, 0],
      ],
    ]);
    const res = await upload(flat, { units: 'mm', up: 'z' }).expect(202);
    const row = await settled(res.body.id as string, 1_500);
    expect(row.status).toBe('queued');
    analyseQueuedMoulds();
    const after = (await h.http().get(`/api/molds/${res.body.id}`).set(bearer(maker)).expect(200)).body;
    expect(after.status).toBe('failed');
    expect(after.error.code).toBe('mesh_degenerate');
  });
});
