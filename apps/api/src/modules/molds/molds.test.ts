import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { zipSync } from 'fflate';
import { beforeAll, describe, expect, it } from 'vitest';
import { encode3mf, encodeObj } from '../../../../../packages/mesh/test/mould-files';
import { analyseQueuedMoulds } from '../../test-support/fixtures';
import { bearer, createShop, useHarness, type ShopFixture } from '../../test-support/harness';
import { binaryStl, pocketMouldTriangles } from '../../test-support/pocket-mould';

// A 3MF may unpack to 4 MB here, so the zip-bomb limits can be reached with small uploads.
// Uploads are left to the worker here (GELPOINT_ANALYSE_ON_UPLOAD=false): these tests follow its path.
const h = useHarness({ GELPOINT_MAX_STL_MB: '1', GELPOINT_MAX_UNPACKED_MB: '4', GELPOINT_ANALYSE_ON_UPLOAD: 'false' });

// Block 100 × 60 × 30 mm with an 80 × 40 mm pocket whose floor is at z = 10: a prism, so the fill to
// level z is 80 · 40 · (z − 10) mm³ (CRC Concise Encyclopedia of Mathematics, prism volume = base × height).
const pocket = pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 10 });
const prism = (z: number) => 80 * 40 * (z - 10);
const pocketMesh = { positions: Float64Array.from(pocket.flat(2)), triangleCount: pocket.length };

let shop: ShopFixture;
let maker: Awaited<ReturnType<ShopFixture['member']>>;
beforeAll(async () => {
  shop = await createShop(h, 'Mould shop');
  maker = await shop.member('maker');
});

const upload = (session: { token: string }, bytes: Buffer, fields: Record<string, string>, name = 'tray pocket.stl') => {
  const req = h.http().post('/api/molds').set(bearer(session)).attach('file', bytes, name);
  for (const [k, v] of Object.entries(fields)) req.field(k, v);
  return req;
};

// Each analysis runs in a cold worker process of its own: on a busy machine that alone can take most of 30 s.
describe('mould upload and cavity report', { timeout: 90_000 }, () => {
  it('analyses an uploaded STL in the worker and answers fills from what it stored', async () => {
    const res = await upload(maker, binaryStl(pocket), { units: 'mm', up: 'z' }).expect(202);
    expect(res.body).toMatchObject({ name: 'tray pocket', status: 'queued', format: 'stl', units: 'mm', fileUnits: null, upAxis: 'z', report: null });
    expect(res.body.sha256).toMatch(/^[0-9a-f]{64}$/);
    analyseQueuedMoulds();
    const mold = (await h.http().get(`/api/molds/${res.body.id}`).set(bearer(maker)).expect(200)).body;
    expect(mold.status).toBe('ready');
    expect(mold.report.watertight).toBe(true);
    expect(mold.report.bboxMm).toEqual({ min: [0, 0, 0], max: [100, 60, 30] });
    // The pocket's floor, with dams along the outline or a box dam round the (rectangular) blank alike.
    expect(mold.report.floorMm).toEqual({ outline: 10, box: 10 });
    expect(mold.report.fillToTop.volumeMm3).toBeCloseTo(prism(30), -1);
    expect(mold.report.fillToTop.maxDepthMm).toBeCloseTo(20, 3);
    expect(mold.report.fillToTop.trappedAirMm3).toBeCloseTo(0, 3);
    // Wetted area: floor 80 × 40 plus walls 2 · (80 + 40) · 20 (rectangle areas).
    expect(mold.report.fillToTop.wettedAreaMm2).toBeCloseTo(80 * 40 + 2 * (80 + 40) * 20, -1);
    const fill = (await h.http().get(`/api/molds/${res.body.id}/fill`).query({ level: 20, from: 'mould', dam: 'outline' }).set(bearer(shop.lead)).expect(200))
      .body;
    expect(fill.volumeMm3).toBeCloseTo(prism(20), -1);
    expect(fill).toMatchObject({ levelMm: 20, levelFrom: 'mould', floorMm: 10, levelAboveFloorMm: 10, levelInMouldMm: 20 });
    expect(fill.depthMap).toBeUndefined();
    // By default the level is the resin's height above the pocket floor: 10 mm of resin is the same fill.
    const withMap = (await h.http().get(`/api/molds/${res.body.id}/fill`).query({ level: 10, depthMap: 'true' }).set(bearer(maker)).expect(200)).body;
    expect(withMap).toMatchObject({ levelMm: 10, levelFrom: 'floor', floorMm: 10, levelAboveFloorMm: 10, levelInMouldMm: 20 });
    expect(withMap.volumeMm3).toBeCloseTo(prism(20), -1);
    expect(Math.max(...withMap.depthMap.depthsMm)).toBeCloseTo(10, 3);
    const layers = (await h.http().get(`/api/molds/${res.body.id}/layers`).query({ levels: '0,10,20' }).set(bearer(maker)).expect(200)).body;
    expect(layers).toMatchObject({ levelFrom: 'floor', floorMm: 10 });
    expect(layers.layers.map((l: { fromMm: number; toMm: number }) => [l.fromMm, l.toMm])).toEqual([
      [0, 10],
      [10, 20],
    ]);
    expect(layers.layers.map((l: { volumeMm3: number }) => Math.round(l.volumeMm3))).toEqual([prism(20), prism(20)]);
    const list = (await h.http().get('/api/molds').set(bearer(maker)).expect(200)).body;
    expect(list.items.find((m: { id: string }) => m.id === res.body.id).fillVolumeToTopMm3).toBeCloseTo(prism(30), -1);
    const stl = await h.http().get(`/api/molds/${res.body.id}/stl`).set(bearer(maker)).buffer(true).expect(200);
    expect(stl.headers['content-type']).toBe('application/octet-stream');
    expect(stl.headers['content-disposition']).toMatch(/^attachment;/);
    expect(Buffer.compare(stl.body as Buffer, binaryStl(pocket))).toBe(0);
  });

  it('shows a new analysis at once though the report is kept between views', async () => {
    const own = await createShop(h, 'Report cache shop');
    const res = await upload(own.lead, binaryStl(pocket), { units: 'mm', up: 'z' }).expect(202);
    analyseQueuedMoulds();
    const view = async () => (await h.http().get(`/api/molds/${res.body.id}`).set(bearer(own.lead)).expect(200)).body;
    const first = await view();
    expect(first.status).toBe('ready');
    expect(await view()).toEqual(first);
    // What a fresh analysis leaves behind: another report and another analysed_at.
    await h.ds.query(
      `UPDATE molds SET report = jsonb_set(report, '{fillToTop,maxDepthMm}', '21.5'), analysed_at = analysed_at + interval '1 second' WHERE id = $1`,
      [res.body.id],
    );
    expect((await view()).report.fillToTop.maxDepthMm).toBe(21.5);
    await h.http().get(`/api/molds/${res.body.id}`).set(bearer(shop.lead)).expect(404);
  });

  it('gives the same numbers as the gelpoint mold command for the same file', async () => {
    const stl = binaryStl(pocket);
    const dir = mkdtempSync(join(tmpdir(), 'gelpoint-cli-'));
    const file = join(dir, 'pocket.stl');
    writeFileSync(file, stl);
    const cli = spawnSync(process.execPath, ['apps/cli/bin/gelpoint.mjs', 'mold', file, '--level', '25', '--dam', 'box', '--json'], {
      cwd: join(import.meta.dirname, '../../../../..'),
      encoding: 'utf8',
      timeout: 60_000,
    });
    rmSync(dir, { recursive: true, force: true });
    expect(cli.stderr).toBe('');
    const report = JSON.parse(cli.stdout);
    const res = await upload(maker, stl, { units: 'mm' }).expect(202);
    analyseQueuedMoulds();
    // The command reads levels in the file's own frame, as a CAD program shows them.
    const fill = (await h.http().get(`/api/molds/${res.body.id}/fill`).query({ level: 25, from: 'mould', dam: 'box' }).set(bearer(maker)).expect(200)).body;
    expect(report.fill.levelAboveFloorMm).toBeCloseTo(fill.levelAboveFloorMm, 9);
    expect(fill.volumeMm3).toBeCloseTo(report.fill.volumeMm3, 6);
    expect(fill.wettedAreaMm2).toBeCloseTo(report.fill.wettedAreaMm2, 6);
    expect(fill.maxDepthMm).toBeCloseTo(report.fill.maxDepthMm, 6);
    expect(fill.trappedAirMm3).toBeCloseTo(report.fill.trappedAirMm3, 6);
  });

  it('turns units into millimetres: the same numbers in centimetres hold 1000 times the volume', async () => {
    const res = await upload(maker, binaryStl(pocket, 0.1), { units: 'cm' }).expect(202);
    analyseQueuedMoulds();
    const mold = (await h.http().get(`/api/molds/${res.body.id}`).set(bearer(maker)).expect(200)).body;
    // 1 cm = 10 mm (NIST SP 811): coordinates scaled by 0.1 and read as cm are the same mould.
    expect(mold.report.fillToTop.volumeMm3).toBeCloseTo(prism(30), -1);
  });

  it('reads a 3MF in the unit it states when no units are sent, and keeps the format and that unit', async () => {
    // The pocket written in inches (NIST SP 811: 1 in = 25.4 mm) comes back in millimetres.
    const res = await upload(maker, Buffer.from(encode3mf(pocketMesh, 'inch', 25.4)), { up: 'z' }, 'tray.3mf').expect(202);
    expect(res.body).toMatchObject({ name: 'tray', format: '3mf', units: 'in', fileUnits: 'in' });
    analyseQueuedMoulds();
    const mold = (await h.http().get(`/api/molds/${res.body.id}`).set(bearer(maker)).expect(200)).body;
    expect(mold.status).toBe('ready');
    expect(mold.report.bboxMm.max[0]).toBeCloseTo(100, 3);
    expect(mold.report.fillToTop.volumeMm3).toBeCloseTo(prism(30), -1);
    const listed = (await h.http().get('/api/molds').set(bearer(maker)).expect(200)).body.items.find((m: { id: string }) => m.id === res.body.id);
    expect(listed).toMatchObject({ format: '3mf', units: 'in', fileUnits: 'in' });
    const file = await h.http().get(`/api/molds/${res.body.id}/stl`).set(bearer(maker)).buffer(true).expect(200);
    expect(file.headers['content-disposition']).toMatch(/filename="tray\.3mf"/);
  });

  it('lets the units sent override a 3MF’s own', async () => {
    const res = await upload(maker, Buffer.from(encode3mf(pocketMesh, 'inch', 1)), { units: 'mm' }, 'mislabelled.3mf').expect(202);
    expect(res.body).toMatchObject({ format: '3mf', units: 'mm', fileUnits: 'in' });
    analyseQueuedMoulds();
    const mold = (await h.http().get(`/api/molds/${res.body.id}`).set(bearer(maker)).expect(200)).body;
    expect(mold.report.fillToTop.volumeMm3).toBeCloseTo(prism(30), -1);
  });

  it('reads an OBJ of quads with corners counted from the end', async () => {
    const obj = Buffer.from(encodeObj(pocketMesh, { quads: true, negative: true, corner: 'v//vn' }));
    const res = await upload(maker, obj, { units: 'mm' }, 'tray.obj').expect(202);
    expect(res.body).toMatchObject({ name: 'tray', format: 'obj', units: 'mm', fileUnits: null });
    analyseQueuedMoulds();
    const fill = (await h.http().get(`/api/molds/${res.body.id}/fill`).query({ level: 20, from: 'mould' }).set(bearer(maker)).expect(200)).body;
    expect(fill.volumeMm3).toBeCloseTo(prism(20), -1);
  });

  it('refuses zip bombs: 413 for a 3MF that unpacks past the limit, 422 for one packed far past any model', async () => {
    const spaces = (bytes: number) => {
      const model = new Uint8Array(bytes).fill(0x20);
      model.set(new TextEncoder().encode('<model xmlns="http://schemas.microsoft.com/3dmanufacturing/core/2015/02">'));
      return Buffer.from(zipSync({ '3D/3dmodel.model': model }));
    };
    const big = spaces(8 * 2 ** 20);
    expect(big.length).toBeLessThan(64 * 1024);
    const tooLarge = await upload(maker, big, {}, 'bomb.3mf').expect(413);
    expect(tooLarge.body.error.code).toBe('threemf_too_large');
    expect(tooLarge.body.error.message).toMatch(/unpacks to more than 4 MB.*zip bombs/);
    const dense = await upload(maker, spaces(3 * 2 ** 20), {}, 'dense.3mf').expect(422);
    expect(dense.body.error.code).toBe('threemf_compression_ratio');
    expect(dense.body.error.message).toMatch(/more than 100 times its packed size/);
  });

  it('refuses bad files with the reader’s sentence, over-size files with 413, and apprentices with 403', async () => {
    const bad = await upload(maker, Buffer.from('this is not a mesh at all, just words'), {}).expect(422);
    expect(bad.body.error.code).toBe('file_not_mould');
    expect(bad.body.error.message).toMatch(/neither an ASCII STL .* nor an OBJ/);
    const obj = await upload(maker, Buffer.from('v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 7\n'), {}, 'broken.obj').expect(422);
    expect(obj.body.error.message).toMatch(/^Line 4 of the OBJ uses vertex 7/);
    const truncated = binaryStl(pocket).subarray(0, 84 + 50 * 3 + 7);
    expect((await upload(maker, truncated, {}).expect(422)).body.error.code).toBe('stl_truncated');
    expect((await upload(maker, binaryStl(pocket), {}, 'mould.exe').expect(422)).body.error.code).toBe('not_a_mould_file_name');
    const huge = Buffer.alloc(1024 * 1024 + 10);
    expect((await upload(maker, huge, {}).expect(413)).body.error.code).toBe('file_too_large');
    await upload(maker, binaryStl(pocket), { units: 'furlongs' }).expect(400);
    await h.http().post('/api/molds').set(bearer(maker)).send({ file: 'x' }).expect(400);
    const apprentice = await shop.member('apprentice');
    await upload(apprentice, binaryStl(pocket), {}).expect(403);
    const n = await h.ds.query('SELECT count(*)::int AS n FROM molds WHERE shop_id = $1', [shop.shopId]);
    expect(n[0].n).toBe(6);
  });
});
