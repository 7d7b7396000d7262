import { describe, expect, it } from 'vitest';
import { resinInput } from '../../test-support/fixtures';
import { bearer, createShop, useHarness } from '../../test-support/harness';

const h = useHarness();
const hour = 3_600_000;
const iso = (msAgo: number) => new Date(Date.now() - msAgo).toISOString();

// Q = 5000 K, the ASTM C1074 worked example's value: Ea = Q·R = 5000 × 8.314462618 J/mol.
const EA_FOR_Q5000 = (5000 * 8.314462618) / 1000;


async function world() {
  const shop = await createShop(h);
  const maker = await shop.member('maker');
  const apprentice = await shop.member('apprentice');
  const product = (await h.http().post('/api/shelf/resin-systems').set(bearer(shop.lead)).send(resinInput({ mixRatio: { a: 2, b: 1, basis: 'weight' }, referenceTempC: 20, minWorkTempC: 5, maxLayerMm: 25, activationEnergyKJPerMol: EA_FOR_Q5000 })).expect(201)).body;
  const piece = (await h.http().post('/api/pieces').set(bearer(maker)).send({ name: 'Walnut tray' }).expect(201)).body;
  const plan = (
    await h
      .http()
      .post('/api/pour-plans')
      .set(bearer(maker))
      .send({ pieceId: piece.id, name: 'Two layers', cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 40 } }, fillLevelMm: 40, deepPour: { resinSystemId: product.id }, overPourPct: 0, cupWaste: { massG: 0 }, shopTempC: 20 })
      .expect(201)
  ).body;
  const batches = [...plan.result.layers.flatMap((l: { batches: unknown[] }) => l.batches)] as { index: number; partA: { grams: number }; partB: { grams: number }; pour: { layer: number } }[];
  const pour = (await h.http().post('/api/pours').set(bearer(apprentice)).send({ pourPlanId: plan.id }).expect(201)).body;
  return { shop, maker, apprentice, product, piece, plan, batches, pour };
}

const onRatio = (b: { partA: { grams: number }; partB: { grams: number } }) => ({ weighedAG: b.partA.grams, weighedBG: b.partB.grams });

describe('pours and the cure log', () => {
  it('logs batches with their lots and warns about off-ratio cups, the dew point and expired lots', async () => {
    const w = await world();
    expect(w.batches.length).toBeGreaterThanOrEqual(2);
    const expired = (await h.http().post('/api/shelf/lots').set(bearer(w.shop.lead)).send({ part: 'A', resinSystemId: w.product.id, lotNumber: 'OLD-A', quantityG: 5000, receivedOn: '2020-01-01', expiresOn: '2021-01-01' }).expect(201)).body;
    const b0 = w.batches[0]!;
    const base = { planBatchIndex: b0.index, lotAId: expired.id, lotBNumber: 'B-typed', ambientTempC: 20, surfaceTempC: 19, rhPct: 85 };
    const refused = await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).send({ ...base, ...onRatio(b0) }).expect(409);
    expect(refused.body.error.code).toBe('expired_lot_unacknowledged');
    const offA = b0.partA.grams * 1.1;
    const res = await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).send({ ...base, weighedAG: offA, weighedBG: b0.partB.grams, acknowledgeExpiredLot: true }).expect(201);
    expect(res.body.warnings.map((x: { code: string }) => x.code).sort()).toEqual(['dew_point', 'expired_lot', 'off_ratio']);
    expect(res.body.batch.offRatioPct).toBeCloseTo(10, 6);
    // Dew point at 20 °C / 85 %: 17.40 °C (Lawrence 2005, Magnus form with Alduchov–Eskridge constants).
    expect(res.body.batch.dewPointC).toBeCloseTo(17.4, 2);
    expect(res.body.batch).toMatchObject({ lotA: 'OLD-A', lotB: 'B-typed', mixedBy: { id: w.apprentice.user.id } });
    const lot = (await h.http().get(`/api/shelf/lots/${expired.id}`).set(bearer(w.shop.lead)).expect(200)).body;
    expect(lot.remainingG).toBeCloseTo(5000 - offA, 6);
    await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).send({ ...base, ...onRatio(b0), acknowledgeExpiredLot: true }).expect(409);
    await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).send({ planBatchIndex: 999, weighedAG: 1, weighedBG: 1 }).expect(400);
  });

  it('runs the cure clock from the newest layer, on logged temperatures (ASTM C1074 equivalent age)', async () => {
    const w = await world();
    const layer1 = w.batches.filter((b) => b.pour.layer === 0);
    const layer2 = w.batches.filter((b) => b.pour.layer === 1);
    const poured1 = iso(30 * hour);
    for (const b of layer1) await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).send({ planBatchIndex: b.index, mixedAt: poured1, ...onRatio(b) }).expect(201);
    let pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body;
    const opens = pour.reminders.find((r: { kind: string }) => r.kind === 'next_layer_window_opens');
    // At the reference temperature the Arrhenius factor is 1: the window opens 12 h after the pour.
    expect(new Date(opens.dueAt).getTime()).toBeCloseTo(new Date(poured1).getTime() + 12 * hour, -3);
    expect(pour.cure.nextLayerWindow).toBe('open');

    const poured2 = iso(24 * hour);
    for (const b of layer2) await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).send({ planBatchIndex: b.index, mixedAt: poured2, ...onRatio(b) }).expect(201);
    await h.http().post(`/api/pours/${w.pour.id}/readings`).set(bearer(w.apprentice)).send({ readings: [{ at: poured2, tempC: 10 }, { at: new Date().toISOString(), tempC: 10 }] }).expect(200);
    pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body;
    // ASTM C1074 maturity method: 24 h at 10 °C with Q = 5000 K is 13.14 h at 20 °C.
    expect(pour.cure.step).toBe('layer:2');
    expect(pour.cure.equivalentHoursAtRef).toBeCloseTo(13.14, 1);
    expect(pour.cure.assumedHours).toBeLessThan(0.01);
    const kinds = pour.reminders.filter((r: { status: string }) => r.status === 'pending').map((r: { kind: string }) => r.kind).sort();
    expect(kinds).toEqual(['demold_check', 'ready_to_machine']);
    expect(pour.reminders.filter((r: { kind: string; status: string }) => r.kind.startsWith('next_layer') && r.status === 'pending')).toEqual([]);
    expect(pour.piece.stage).toBe('curing');

    const early = await h.http().post(`/api/pours/${w.pour.id}/release`).set(bearer(w.shop.lead)).expect(409);
    expect(early.body.error.code).toBe('not_ready');
    await h.http().post(`/api/pours/${w.pour.id}/release`).set(bearer(w.apprentice)).expect(403);
  });

  it('releases a piece only when the logged history says it is ready, then schedules finish coats', async () => {
    const w = await world();
    for (const b of w.batches) await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).send({ planBatchIndex: b.index, mixedAt: iso(200 * hour), ...onRatio(b) }).expect(201);
    await h.http().post(`/api/pours/${w.pour.id}/readings`).set(bearer(w.apprentice)).send({ readings: [{ at: iso(200 * hour), tempC: 20 }, { at: iso(1000), tempC: 20 }] }).expect(200);
    const board = (await h.http().get('/api/pours').query({ readyToday: 'true' }).set(bearer(w.shop.lead)).expect(200)).body;
    expect(board.items.map((p: { id: string }) => p.id)).toContain(w.pour.id);
    const released = (await h.http().post(`/api/pours/${w.pour.id}/release`).set(bearer(w.shop.lead)).expect(200)).body;
    expect(released).toMatchObject({ status: 'released', releasedBy: { id: w.shop.lead.user.id }, piece: { stage: 'released' } });
    const machined = (await h.http().post(`/api/pours/${w.pour.id}/machined`).set(bearer(w.maker)).send({ finishCoats: 3, hoursBetweenCoats: 12 }).expect(200)).body;
    const coats = machined.reminders.filter((r: { kind: string }) => r.kind === 'finish_coat_due');
    expect(coats).toHaveLength(3);
    expect(new Date(coats[2].dueAt).getTime() - new Date(coats[0].dueAt).getTime()).toBe(24 * hour);
  });

  it('imports a CSV log all or nothing, and takes readings from the shop thermometer with its token', async () => {
    const w = await world();
    const bad = await h.http().post(`/api/pours/${w.pour.id}/readings/csv`).set(bearer(w.apprentice)).set('Content-Type', 'text/csv').send('time,tempC\n2026-11-01T10:00:00Z,21\nyesterday,20\n2026-11-01T12:00:00Z,warm\n').expect(422);
    expect(bad.body.error.code).toBe('csv_invalid');
    expect(Object.keys(bad.body.error.fields)).toEqual(['row 3', 'row 4']);
    expect((await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body.readings).toEqual([]);
    const good = await h.http().post(`/api/pours/${w.pour.id}/readings/csv`).set(bearer(w.apprentice)).set('Content-Type', 'text/csv').send('time,tempC\r\n2026-11-01T10:00:00Z,21\r\n2026-11-01T11:00:00Z,20.5\r\n').expect(200);
    expect(good.body).toEqual({ added: 2, duplicates: 0 });
    const again = await h.http().post(`/api/pours/${w.pour.id}/readings/csv`).set(bearer(w.apprentice)).set('Content-Type', 'text/csv').send('2026-11-01T11:00:00Z,20.5\n2026-11-01T12:00:00Z,20\n').expect(200);
    expect(again.body).toEqual({ added: 1, duplicates: 1 });

    await h.http().post('/api/ingest/readings').set('X-Gelpoint-Ingest-Token', 'nope').send({ pourId: w.pour.id, readings: [{ at: '2026-11-01T13:00:00Z', tempC: 19 }] }).expect(401);
    const { token } = (await h.http().post('/api/shop/ingest-token').set(bearer(w.shop.lead)).expect(201)).body;
    await h.http().post('/api/ingest/readings').set('X-Gelpoint-Ingest-Token', token).send({ pourId: w.pour.id, readings: [{ at: '2026-11-01T13:00:00Z', tempC: 19 }] }).expect(202);
    const other = await createShop(h);
    const { token: otherToken } = (await h.http().post('/api/shop/ingest-token').set(bearer(other.lead)).expect(201)).body;
    await h.http().post('/api/ingest/readings').set('X-Gelpoint-Ingest-Token', otherToken).send({ pourId: w.pour.id, readings: [{ at: '2026-11-01T14:00:00Z', tempC: 19 }] }).expect(404);
    const readings = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body.readings;
    expect(readings.map((r: { source: string }) => r.source)).toEqual(['csv', 'csv', 'csv', 'sensor']);
  });

  it('records cure checks with a photo checked by its content', async () => {
    const w = await world();
    // The smallest valid PNG: signature, IHDR (1×1), IDAT, IEND (PNG specification, ISO/IEC 15948).
    const png = Buffer.from('89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082', 'hex');
    const res = await h.http().post(`/api/pours/${w.pour.id}/checks`).set(bearer(w.apprentice)).field('stage', 'gelled').field('hardnessShoreD', '40').field('note', 'thumbnail test').attach('photo', png, 'check.png').expect(201);
    expect(res.body).toMatchObject({ stage: 'gelled', hardnessShoreD: 40, hasPhoto: true });
    const photo = await h.http().get(`/api/pours/${w.pour.id}/checks/${res.body.id}/photo`).set(bearer(w.maker)).buffer(true).expect(200);
    expect(photo.headers['content-type']).toBe('image/png');
    await h.http().post(`/api/pours/${w.pour.id}/checks`).set(bearer(w.apprentice)).field('stage', 'gelled').attach('photo', Buffer.from('<html><script>alert(1)</script></html>'), 'x.png').expect(422);
    await h.http().post(`/api/pours/${w.pour.id}/checks`).set(bearer(w.apprentice)).field('stage', 'rock hard').expect(400);
  });
});
