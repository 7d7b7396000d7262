import { beforeAll, describe, expect, it } from 'vitest';
import { analyseQueuedMoulds, resinInput } from '../../test-support/fixtures';
import { bearer, createShop, useHarness, type ShopFixture } from '../../test-support/harness';
import { binaryStl, pocketMouldTriangles } from '../../test-support/pocket-mould';

const h = useHarness();

// A 100 × 60 × 30 mm block with an 80 × 40 mm pocket floored at z = 10: a prism of 80 × 40 × 20 mm³ = 64 mL (CRC).
const pocket = pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 10 });

let shop: ShopFixture;
let maker: Awaited<ReturnType<ShopFixture['member']>>;
let resinId: string;

beforeAll(async () => {
  shop = await createShop(h, 'Links shop');
  maker = await shop.member('maker');
  resinId = (await h.http().post('/api/shelf/resin-systems').set(bearer(shop.lead)).send(resinInput()).expect(201)).body.id;
});

const newPiece = async (name: string) => (await h.http().post('/api/pieces').set(bearer(maker)).send({ name }).expect(201)).body.id as string;
const upload = async (bytes: Buffer, fields: Record<string, string> = {}) => {
  const req = h.http().post('/api/molds').set(bearer(maker)).attach('file', bytes, 'pocket.stl');
  for (const [k, v] of Object.entries(fields)) req.field(k, v);
  return (await req.expect(202)).body.id as string;
};
const planOn = (pieceId: string, moldId: string, name: string) => ({
  pieceId,
  name,
  cavity: { source: 'mold', moldId },
  fillLevelMm: 10,
  deepPour: { resinSystemId: resinId },
  shopTempC: 21,
});
const auditOf = async (moldId: string) =>
  (await h.http().get('/api/audit').query({ objectType: 'mold', objectId: moldId }).set(bearer(shop.lead)).expect(200)).body.items as {
    action: string;
    detail: Record<string, unknown>;
  }[];

describe('a mould that plans use', () => {
  it('is not deleted: 409 names the plans, and it goes once they are gone', async () => {
    const pieceId = await newPiece('Tray');
    const moldId = await upload(binaryStl(pocket), { pieceId });
    analyseQueuedMoulds();
    const first = (
      await h
        .http()
        .post('/api/pour-plans')
        .set(bearer(maker))
        .send(planOn(pieceId, moldId, 'First pour'))
        .expect(201)
    ).body;
    const second = (
      await h
        .http()
        .post('/api/pour-plans')
        .set(bearer(maker))
        .send(planOn(pieceId, moldId, 'Flood coat'))
        .expect(201)
    ).body;

    const refused = await h.http().delete(`/api/molds/${moldId}`).set(bearer(maker)).expect(409);
    expect(refused.body.error.code).toBe('mold_in_use');
    expect(refused.body.error.message).toContain('“First pour”');
    expect(refused.body.error.message).toContain('“Flood coat”');
    // The plans still have their mould.
    expect((await h.http().get(`/api/pour-plans/${first.id}`).set(bearer(maker)).expect(200)).body.moldId).toBe(moldId);
    await h.http().get(`/api/molds/${moldId}`).set(bearer(maker)).expect(200);
    // The database refuses too, whoever asks.
    await expect(h.ds.query('DELETE FROM molds WHERE id = $1', [moldId])).rejects.toThrow(/pour_plans_mold_fk/);

    await h.http().delete(`/api/pour-plans/${first.id}`).set(bearer(maker)).expect(204);
    const one = await h.http().delete(`/api/molds/${moldId}`).set(bearer(maker)).expect(409);
    expect(one.body.error.message).toMatch(/the pour plan “Flood coat”, so it stays: delete that plan/);
    await h.http().delete(`/api/pour-plans/${second.id}`).set(bearer(maker)).expect(204);
    await h.http().delete(`/api/molds/${moldId}`).set(bearer(maker)).expect(204);
    expect((await auditOf(moldId)).map((e) => e.action)).toContain('mold.delete');
  });
});

describe('PATCH /api/molds/:id', () => {
  it('renames, attaches to a piece and detaches, with an audit event each time', async () => {
    const moldId = await upload(binaryStl(pocket));
    const pieceId = await newPiece('Side table');
    const renamed = (await h.http().patch(`/api/molds/${moldId}`).set(bearer(maker)).send({ name: 'Table top, left pocket', pieceId }).expect(200)).body;
    expect(renamed).toMatchObject({ name: 'Table top, left pocket', pieceId });
    const listed = (await h.http().get('/api/molds').query({ pieceId }).set(bearer(maker)).expect(200)).body;
    expect(listed.items.map((m: { id: string }) => m.id)).toEqual([moldId]);
    const detached = (await h.http().patch(`/api/molds/${moldId}`).set(bearer(maker)).send({ pieceId: null }).expect(200)).body;
    expect(detached.pieceId).toBeNull();
    expect(detached.status).toBe('queued');
    const events = await auditOf(moldId);
    expect(events.filter((e) => e.action === 'mold.update').map((e) => e.detail.change)).toEqual([
      { pieceId: null },
      { name: 'Table top, left pocket', pieceId },
    ]);
  });

  it('reads the stored file again when the units are corrected, without an upload', async () => {
    // Drawn in centimetres but uploaded as millimetres: a tenth of the size, a thousandth of the volume.
    const moldId = await upload(binaryStl(pocket, 0.1), { units: 'mm' });
    analyseQueuedMoulds();
    const wrong = (await h.http().get(`/api/molds/${moldId}`).set(bearer(maker)).expect(200)).body;
    expect(wrong.report.fillToTop.volumeMm3).toBeCloseTo(64_000 / 1000, 3);
    const analysedBefore = wrong.analysedAt;

    const patched = (await h.http().patch(`/api/molds/${moldId}`).set(bearer(maker)).send({ units: 'cm' }).expect(200)).body;
    expect(patched).toMatchObject({ units: 'cm', status: 'queued', report: null, analysedAt: null });
    await h.http().get(`/api/molds/${moldId}/fill`).query({ level: 5 }).set(bearer(maker)).expect(409);
    analyseQueuedMoulds();
    const right = (await h.http().get(`/api/molds/${moldId}`).set(bearer(maker)).expect(200)).body;
    // 1 cm = 10 mm (NIST SP 811): read as centimetres the file is the 100 × 60 × 30 mm block, 64 mL to the rim.
    expect(right.status).toBe('ready');
    expect(right.report.bboxMm.max).toEqual([100, 60, 30]);
    expect(right.report.fillToTop.volumeMm3).toBeCloseTo(64_000, -1);
    expect(right.analysedAt).not.toBe(analysedBefore);
    const files = await h.ds.query('SELECT count(*)::int AS n FROM mold_files WHERE mold_id = $1', [moldId]);
    expect(files[0].n).toBe(1);
    const update = (await auditOf(moldId)).find((e) => e.action === 'mold.update')!;
    expect(update.detail).toMatchObject({ change: { units: 'cm' }, reanalysed: true });
  });

  it('turns the mould when its up axis is corrected', async () => {
    // The same block drawn with y up: file (x, y, z) = (x, z, −y), so as uploaded with z up it lies on its side.
    const yUp = pocket.map((tri) => tri.map(([x, y, z]) => [x, z, -y] as [number, number, number]));
    const moldId = await upload(binaryStl(yUp), { up: 'z' });
    analyseQueuedMoulds();
    await h.http().patch(`/api/molds/${moldId}`).set(bearer(maker)).send({ upAxis: 'y' }).expect(200);
    analyseQueuedMoulds();
    const mold = (await h.http().get(`/api/molds/${moldId}`).set(bearer(maker)).expect(200)).body;
    expect(mold.upAxis).toBe('y');
    expect(mold.report.fillToTop.volumeMm3).toBeCloseTo(64_000, -1);
    expect(mold.report.floorMm.outline).toBeCloseTo(10, 6);
  });

  it('refuses an empty change, a name of nothing and another shop’s piece', async () => {
    const moldId = await upload(binaryStl(pocket));
    expect((await h.http().patch(`/api/molds/${moldId}`).set(bearer(maker)).send({}).expect(400)).body.error.message).toMatch(
      /at least one of name, pieceId, units, upAxis/,
    );
    await h.http().patch(`/api/molds/${moldId}`).set(bearer(maker)).send({ name: '  ' }).expect(400);
    await h.http().patch(`/api/molds/${moldId}`).set(bearer(maker)).send({ units: 'furlongs' }).expect(400);
    const other = await createShop(h, 'Other links shop');
    const foreignPiece = (await h.http().post('/api/pieces').set(bearer(other.lead)).send({ name: 'Not yours' }).expect(201)).body.id;
    await h.http().patch(`/api/molds/${moldId}`).set(bearer(maker)).send({ pieceId: foreignPiece }).expect(404);
    expect((await h.http().get(`/api/molds/${moldId}`).set(bearer(maker)).expect(200)).body.pieceId).toBeNull();
  });
});
