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
  const product = (
    await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(
        resinInput({ mixRatio: { a: 2, b: 1, basis: 'weight' }, referenceTempC: 20, minWorkTempC: 5, maxLayerMm: 25, activationEnergyKJPerMol: EA_FOR_Q5000 }),
      )
      .expect(201)
  ).body;
  const piece = (await h.http().post('/api/pieces').set(bearer(maker)).send({ name: 'Walnut tray' }).expect(201)).body;
  const plan = (
    await h
      .http()
      .post('/api/pour-plans')
      .set(bearer(maker))
      .send({
        pieceId: piece.id,
        name: 'Two layers',
        cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 40 } },
        fillLevelMm: 40,
        deepPour: { resinSystemId: product.id },
        overPourPct: 0,
        cupWaste: { massG: 0 },
        shopTempC: 20,
      })
      .expect(201)
  ).body;
  const batches = [...plan.result.layers.flatMap((l: { batches: unknown[] }) => l.batches)] as {
    index: number;
    partA: { grams: number };
    partB: { grams: number };
    pour: { layer: number };
  }[];
  const pour = (await h.http().post('/api/pours').set(bearer(apprentice)).send({ pourPlanId: plan.id }).expect(201)).body;
  return { shop, maker, apprentice, product, piece, plan, batches, pour };
}

const onRatio = (b: { partA: { grams: number }; partB: { grams: number } }) => ({ weighedAG: b.partA.grams, weighedBG: b.partB.grams });

describe('pours and the cure log', () => {
  it('lists the pours of one plan, newest first, for the printed run sheet to link to', async () => {
    const w = await world();
    const other = await world();
    const again = (await h.http().post('/api/pours').set(bearer(w.apprentice)).send({ pourPlanId: w.plan.id }).expect(201)).body;
    const list = (await h.http().get(`/api/pours?status=all&pourPlanId=${w.plan.id}`).set(bearer(w.apprentice)).expect(200)).body as {
      items: { id: string }[];
      total: number;
    };
    expect(list.items.map((p) => p.id)).toEqual([again.id, w.pour.id]);
    // Another shop's plan is nobody's here: an empty list, not its pours.
    const foreign = (await h.http().get(`/api/pours?status=all&pourPlanId=${other.plan.id}`).set(bearer(w.apprentice)).expect(200)).body as { total: number };
    expect(foreign.total).toBe(0);
  });

  it('logs batches with their lots and warns about off-ratio cups, the dew point and expired lots', async () => {
    const w = await world();
    expect(w.batches.length).toBeGreaterThanOrEqual(2);
    const expired = (
      await h
        .http()
        .post('/api/shelf/lots')
        .set(bearer(w.shop.lead))
        .send({ part: 'A', resinSystemId: w.product.id, lotNumber: 'OLD-A', quantityG: 5000, receivedOn: '2020-01-01', expiresOn: '2021-01-01' })
        .expect(201)
    ).body;
    const b0 = w.batches[0]!;
    const base = { planBatchIndex: b0.index, lotAId: expired.id, lotBNumber: 'B-typed', ambientTempC: 20, surfaceTempC: 19, rhPct: 85 };
    const refused = await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ ...base, ...onRatio(b0) })
      .expect(409);
    expect(refused.body.error.code).toBe('expired_lot_unacknowledged');
    const offA = b0.partA.grams * 1.1;
    const res = await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ ...base, weighedAG: offA, weighedBG: b0.partB.grams, acknowledgeExpiredLot: true })
      .expect(201);
    expect(res.body.warnings.map((x: { code: string }) => x.code).sort()).toEqual(['dew_point', 'expired_lot', 'off_ratio']);
    expect(res.body.batch.offRatioPct).toBeCloseTo(10, 6);
    // Dew point at 20 °C / 85 %: 17.40 °C (Lawrence 2005, Magnus form with Alduchov–Eskridge constants).
    expect(res.body.batch.dewPointC).toBeCloseTo(17.4, 2);
    expect(res.body.batch).toMatchObject({ lotA: 'OLD-A', lotB: 'B-typed', mixedBy: { id: w.apprentice.user.id } });
    const lot = (await h.http().get(`/api/shelf/lots/${expired.id}`).set(bearer(w.shop.lead)).expect(200)).body;
    expect(lot.remainingG).toBeCloseTo(5000 - offA, 6);
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ ...base, ...onRatio(b0), acknowledgeExpiredLot: true })
      .expect(409);
    await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).send({ planBatchIndex: 999, weighedAG: 1, weighedBG: 1 }).expect(400);
  });

  it('runs the cure clock from the newest layer, on logged temperatures (ASTM C1074 equivalent age)', async () => {
    const w = await world();
    const layer1 = w.batches.filter((b) => b.pour.layer === 0);
    const layer2 = w.batches.filter((b) => b.pour.layer === 1);
    const poured1 = iso(30 * hour);
    for (const b of layer1)
      await h
        .http()
        .post(`/api/pours/${w.pour.id}/batches`)
        .set(bearer(w.apprentice))
        .send({ planBatchIndex: b.index, mixedAt: poured1, ...onRatio(b) })
        .expect(201);
    let pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body;
    const opens = pour.reminders.find((r: { kind: string }) => r.kind === 'next_layer_window_opens');
    // At the reference temperature the Arrhenius factor is 1: the window opens 12 h after the pour.
    expect(new Date(opens.dueAt).getTime()).toBeCloseTo(new Date(poured1).getTime() + 12 * hour, -3);
    expect(pour.cure.nextLayerWindow).toBe('open');

    const poured2 = iso(24 * hour);
    // Layer 2 six hours after layer 1, whose window opens after 12 h: the log asks, naming the window, and logs it once confirmed.
    const early = await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ planBatchIndex: layer2[0]!.index, mixedAt: poured2, ...onRatio(layer2[0]!) })
      .expect(422);
    expect(early.body.error.code).toBe('confirmation_needed');
    expect(early.body.error.message).toMatch(/^layer 2 goes on layer 1, whose window for the next pour opens around /);
    expect(early.body.error.fields).toHaveProperty('planBatchIndex');
    for (const b of layer2)
      await h
        .http()
        .post(`/api/pours/${w.pour.id}/batches`)
        .set(bearer(w.apprentice))
        .send({ planBatchIndex: b.index, mixedAt: poured2, ...onRatio(b), confirmUnusual: true })
        .expect(201);
    const hourly = Array.from({ length: 25 }, (_, i) => ({ at: iso((24 - i) * hour), tempC: 10 }));
    await h.http().post(`/api/pours/${w.pour.id}/readings`).set(bearer(w.apprentice)).send({ readings: hourly }).expect(200);
    pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body;
    // ASTM C1074 maturity method: 24 h at 10 °C with Q = 5000 K is 13.14 h at 20 °C.
    expect(pour.cure.step).toBe('layer:2');
    expect(pour.cure.equivalentHoursAtRef).toBeCloseTo(13.14, 1);
    expect(pour.cure.assumedHours).toBeLessThan(0.01);
    expect(pour.cure.loggedEquivalentHours).toBeCloseTo(13.14, 1);
    const kinds = pour.reminders
      .filter((r: { status: string }) => r.status === 'pending')
      .map((r: { kind: string }) => r.kind)
      .sort();
    expect(kinds).toEqual(['demold_check', 'ready_to_machine']);
    expect(pour.reminders.filter((r: { kind: string; status: string }) => r.kind.startsWith('next_layer') && r.status === 'pending')).toEqual([]);
    expect(pour.piece.stage).toBe('curing');

    const notYet = await h.http().post(`/api/pours/${w.pour.id}/release`).set(bearer(w.shop.lead)).expect(409);
    expect(notYet.body.error.code).toBe('not_ready');
    await h.http().post(`/api/pours/${w.pour.id}/release`).set(bearer(w.apprentice)).expect(403);
  });

  it('releases a piece only when the logged history says it is ready, then schedules finish coats', async () => {
    const w = await world();
    // Both layers at once: the guard asks about the second layer poured before the first is ready, and it is confirmed.
    for (const b of w.batches)
      await h
        .http()
        .post(`/api/pours/${w.pour.id}/batches`)
        .set(bearer(w.apprentice))
        .send({ planBatchIndex: b.index, mixedAt: iso(200 * hour), ...onRatio(b), confirmUnusual: true })
        .expect(201);
    const readings = Array.from({ length: 101 }, (_, i) => ({ at: iso((200 - 2 * i) * hour - 1000), tempC: 20 }));
    await h.http().post(`/api/pours/${w.pour.id}/readings`).set(bearer(w.apprentice)).send({ readings }).expect(200);
    const board = (await h.http().get('/api/pours').query({ readyToday: 'true' }).set(bearer(w.shop.lead)).expect(200)).body;
    expect(board.items.map((p: { id: string }) => p.id)).toContain(w.pour.id);
    const released = (await h.http().post(`/api/pours/${w.pour.id}/release`).set(bearer(w.shop.lead)).expect(200)).body;
    expect(released).toMatchObject({ status: 'released', releasedBy: { id: w.shop.lead.user.id }, piece: { stage: 'released' } });
    const machined = (await h.http().post(`/api/pours/${w.pour.id}/machined`).set(bearer(w.maker)).send({ finishCoats: 3, hoursBetweenCoats: 12 }).expect(200))
      .body;
    const coats = machined.reminders.filter((r: { kind: string }) => r.kind === 'finish_coat_due');
    expect(coats).toHaveLength(3);
    expect(new Date(coats[2].dueAt).getTime() - new Date(coats[0].dueAt).getTime()).toBe(24 * hour);
  });

  it('imports a CSV log all or nothing, and takes readings from the shop thermometer with its token', async () => {
    const w = await world();
    const b0 = w.batches[0]!;
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ planBatchIndex: b0.index, mixedAt: iso(6 * hour), ...onRatio(b0) })
      .expect(201);
    const [t5, t4, t3] = [iso(5 * hour), iso(4 * hour), iso(3 * hour)];
    const bad = await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings/csv`)
      .set(bearer(w.apprentice))
      .set('Content-Type', 'text/csv')
      .send(`time,tempC\n${t5},21\nyesterday,20\n${t3},warm\n`)
      .expect(422);
    expect(bad.body.error.code).toBe('csv_invalid');
    expect(Object.keys(bad.body.error.fields)).toEqual(['row 3', 'row 4']);
    expect((await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body.readings).toEqual([]);
    const good = await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings/csv`)
      .set(bearer(w.apprentice))
      .set('Content-Type', 'text/csv')
      .send(`time,tempC\r\n${t5},21\r\n${t4},20.5\r\n`)
      .expect(200);
    expect(good.body).toEqual({ added: 2, duplicates: 0, unit: 'C' });
    const again = await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings/csv`)
      .set(bearer(w.apprentice))
      .set('Content-Type', 'text/csv')
      .send(`${t4},20.5\n${t3},20\n`)
      .expect(200);
    expect(again.body).toEqual({ added: 1, duplicates: 1, unit: 'C' });

    await h
      .http()
      .post('/api/ingest/readings')
      .set('X-Gelpoint-Ingest-Token', 'nope')
      .send({ pourId: w.pour.id, readings: [{ at: iso(2 * hour), tempC: 19 }] })
      .expect(401);
    const { token } = (await h.http().post('/api/shop/ingest-token').set(bearer(w.shop.lead)).expect(201)).body;
    await h
      .http()
      .post('/api/ingest/readings')
      .set('X-Gelpoint-Ingest-Token', token)
      .send({ pourId: w.pour.id, readings: [{ at: iso(2 * hour), tempC: 19 }] })
      .expect(202);
    const other = await createShop(h);
    const { token: otherToken } = (await h.http().post('/api/shop/ingest-token').set(bearer(other.lead)).expect(201)).body;
    await h
      .http()
      .post('/api/ingest/readings')
      .set('X-Gelpoint-Ingest-Token', otherToken)
      .send({ pourId: w.pour.id, readings: [{ at: iso(hour), tempC: 19 }] })
      .expect(404);
    const readings = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body.readings;
    expect(readings.map((r: { source: string }) => r.source)).toEqual(['csv', 'csv', 'csv', 'sensor']);
  });

  it('records cure checks with a photo checked by its content', async () => {
    const w = await world();
    // The smallest valid PNG: signature, IHDR (1×1), IDAT, IEND (PNG specification, ISO/IEC 15948).
    const png = Buffer.from(
      '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082',
      'hex',
    );
    const res = await h
      .http()
      .post(`/api/pours/${w.pour.id}/checks`)
      .set(bearer(w.apprentice))
      .field('stage', 'gelled')
      .field('hardnessShoreD', '40')
      .field('note', 'thumbnail test')
      .attach('photo', png, 'check.png')
      .expect(201);
    expect(res.body).toMatchObject({ stage: 'gelled', hardnessShoreD: 40, hasPhoto: true });
    const photo = await h.http().get(`/api/pours/${w.pour.id}/checks/${res.body.id}/photo`).set(bearer(w.maker)).buffer(true).expect(200);
    expect(photo.headers['content-type']).toBe('image/png');
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/checks`)
      .set(bearer(w.apprentice))
      .field('stage', 'gelled')
      .attach('photo', Buffer.from('<html><script>alert(1)</script></html>'), 'x.png')
      .expect(422);
    await h.http().post(`/api/pours/${w.pour.id}/checks`).set(bearer(w.apprentice)).field('stage', 'rock hard').expect(400);
  });
});

describe('release needs evidence (trade correctness)', () => {
  it('refuses release on an assumed-only cure, however long ago it was poured, and allows it on a logged one', async () => {
    const w = await world();
    for (const b of w.batches)
      await h
        .http()
        .post(`/api/pours/${w.pour.id}/batches`)
        .set(bearer(w.apprentice))
        .send({ planBatchIndex: b.index, mixedAt: iso(400 * hour), ...onRatio(b), confirmUnusual: true })
        .expect(201);
    let pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.shop.lead)).expect(200)).body;
    // 400 h at the plan's 20 °C would be far past the 168 h full cure, but none of it is logged.
    expect(pour.cure.loggedEquivalentHours).toBe(0);
    expect(pour.cure.release.allowed).toBe(false);
    expect(pour.cure.release.reasons.join(' ')).toMatch(/No temperature has been logged/);
    const refused = await h.http().post(`/api/pours/${w.pour.id}/release`).set(bearer(w.shop.lead)).expect(409);
    expect(refused.body.error.message).toMatch(/No temperature has been logged/);

    // Readings every 2 h at 20 °C (the reference: one equivalent hour per hour) over the last 200 h.
    const readings = Array.from({ length: 101 }, (_, i) => ({ at: iso((200 - 2 * i) * hour - 1000), tempC: 20 }));
    await h.http().post(`/api/pours/${w.pour.id}/readings`).set(bearer(w.apprentice)).send({ readings }).expect(200);
    pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.shop.lead)).expect(200)).body;
    expect(pour.cure.loggedEquivalentHours).toBeGreaterThan(168);
    expect(pour.cure.release).toEqual({ allowed: true, reasons: [] });
    await h.http().post(`/api/pours/${w.pour.id}/release`).set(bearer(w.shop.lead)).expect(200);
  });

  it('counts the time after a logger stops at the lower of its last reading and the plan, and shows the gap', async () => {
    const w = await world();
    for (const b of w.batches)
      await h
        .http()
        .post(`/api/pours/${w.pour.id}/batches`)
        .set(bearer(w.apprentice))
        .send({ planBatchIndex: b.index, mixedAt: iso(90 * hour), ...onRatio(b), confirmUnusual: true })
        .expect(201);
    // 12 h logged at 12 °C, then nothing for 78 h; the plan assumed 20 °C.
    const readings = Array.from({ length: 13 }, (_, i) => ({ at: iso((90 - i) * hour), tempC: 12 }));
    await h.http().post(`/api/pours/${w.pour.id}/readings`).set(bearer(w.apprentice)).send({ readings }).expect(200);
    const pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.shop.lead)).expect(200)).body;
    // ASTM C1074 with Q = 5000 K and a 20 °C reference: exp(−5000 (1/285.15 − 1/293.15)) = 0.6199 per hour at 12 °C.
    const rate12 = Math.exp(-5000 * (1 / 285.15 - 1 / 293.15));
    expect(pour.cure.equivalentHoursAtRef).toBeCloseTo(90 * rate12, 2);
    expect(pour.cure.gaps).toHaveLength(1);
    expect(pour.cure.gaps[0].tempC).toBe(12);
    expect(pour.cure.gaps[0].hours).toBeCloseTo(76, 1);
    expect(pour.cure.assumedEquivalentHours).toBeCloseTo(76 * rate12, 1);
    expect(pour.cure.cautions.map((c: { code: string }) => c.code)).toContain('cure_log_gap');
  });

  it("needs a cure check at the data sheet's Shore D hardness when the product states one", async () => {
    const w = await world();
    await h
      .http()
      .put(`/api/shelf/resin-systems/${w.product.id}`)
      .set(bearer(w.shop.lead))
      .send({
        ...resinInput({
          mixRatio: { a: 2, b: 1, basis: 'weight' },
          referenceTempC: 20,
          minWorkTempC: 5,
          maxLayerMm: 25,
          activationEnergyKJPerMol: EA_FOR_Q5000,
        }),
        hardnessShoreD: 80,
      })
      .expect(200);
    // The plan keeps the products it was made with: a new plan takes the stated hardness.
    const plan = (
      await h
        .http()
        .post('/api/pour-plans')
        .set(bearer(w.maker))
        .send({
          pieceId: w.piece.id,
          name: 'Hard one',
          cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 100, widthMm: 100, depthMm: 20 } },
          fillLevelMm: 20,
          deepPour: { resinSystemId: w.product.id },
          overPourPct: 0,
          cupWaste: { massG: 0 },
          shopTempC: 20,
        })
        .expect(201)
    ).body;
    const pour = (await h.http().post('/api/pours').set(bearer(w.apprentice)).send({ pourPlanId: plan.id }).expect(201)).body;
    for (const b of plan.result.layers.flatMap((l: { batches: unknown[] }) => l.batches) as {
      index: number;
      partA: { grams: number };
      partB: { grams: number };
    }[]) {
      await h
        .http()
        .post(`/api/pours/${pour.id}/batches`)
        .set(bearer(w.apprentice))
        .send({ planBatchIndex: b.index, mixedAt: iso(200 * hour), ...onRatio(b), confirmUnusual: true })
        .expect(201);
    }
    const readings = Array.from({ length: 101 }, (_, i) => ({ at: iso((200 - 2 * i) * hour - 1000), tempC: 20 }));
    await h.http().post(`/api/pours/${pour.id}/readings`).set(bearer(w.apprentice)).send({ readings }).expect(200);
    let view = (await h.http().get(`/api/pours/${pour.id}`).set(bearer(w.shop.lead)).expect(200)).body;
    expect(view.cure.readyToMachine).toBe(true);
    expect(view.cure.release.allowed).toBe(false);
    expect(view.cure.release.reasons.join(' ')).toMatch(/Shore D 80/);
    await h.http().post(`/api/pours/${pour.id}/checks`).set(bearer(w.apprentice)).field('stage', 'machinable').field('hardnessShoreD', '76').expect(201);
    view = (await h.http().get(`/api/pours/${pour.id}`).set(bearer(w.shop.lead)).expect(200)).body;
    expect(view.cure.release.reasons.join(' ')).toMatch(/Shore D 76, under the data sheet's 80/);
    await h.http().post(`/api/pours/${pour.id}/release`).set(bearer(w.shop.lead)).expect(409);
    await h.http().post(`/api/pours/${pour.id}/checks`).set(bearer(w.apprentice)).field('stage', 'machinable').field('hardnessShoreD', '81').expect(201);
    await h.http().post(`/api/pours/${pour.id}/release`).set(bearer(w.shop.lead)).expect(200);
  });

  it("checks a weighed cup against the product's ratio, not against its rounded targets", async () => {
    const w = await world();
    const b0 = w.batches[0]!;
    // A 2:1-by-weight product: 200 g A with 100 g B is exactly on ratio, whatever the cup's rounded targets are.
    const res = await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ planBatchIndex: b0.index, weighedAG: 200, weighedBG: 100 })
      .expect(201);
    expect(res.body.batch.offRatioPct).toBe(0);
    expect(res.body.warnings).toEqual([]);
  });

  it("sends a closing-window reminder the shop's lead time before the window closes, and says so", async () => {
    const w = await world();
    await h.http().patch('/api/shop').set(bearer(w.shop.lead)).send({ windowCloseLeadMin: 45 }).expect(200);
    const layer1 = w.batches.filter((b) => b.pour.layer === 0);
    for (const b of layer1)
      await h
        .http()
        .post(`/api/pours/${w.pour.id}/batches`)
        .set(bearer(w.apprentice))
        .send({ planBatchIndex: b.index, mixedAt: iso(hour), ...onRatio(b) })
        .expect(201);
    const pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body;
    const closes = pour.reminders.find((r: { kind: string }) => r.kind === 'next_layer_window_closes');
    expect(closes.leadMin).toBe(45);
    expect(Date.parse(closes.eventAt) - Date.parse(closes.dueAt)).toBe(45 * 60_000);
    const opens = pour.reminders.find((r: { kind: string }) => r.kind === 'next_layer_window_opens');
    expect(opens.leadMin).toBe(0);
    expect(opens.dueAt).toBe(opens.eventAt);
  });

  it('reads a CSV log time with a lower-case t as the cure sum does, and stores it in one form', async () => {
    const w = await world();
    const b0 = w.batches[0]!;
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ planBatchIndex: b0.index, mixedAt: iso(6 * hour), ...onRatio(b0) })
      .expect(201);
    const at = new Date(Math.floor((Date.now() - 3 * hour) / 1000) * 1000);
    // The same instant written with an offset of +01:00 and a lower-case t (RFC 3339 §5.6).
    const local = new Date(at.getTime() + hour).toISOString().slice(0, 19).replace('T', 't');
    const res = await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings/csv`)
      .set(bearer(w.apprentice))
      .set('Content-Type', 'text/csv')
      .send(`time,tempC\n${local}+01:00,21\n`)
      .expect(200);
    expect(res.body.added).toBe(1);
    const pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body;
    expect(pour.readings.map((r: { at: string }) => r.at)).toEqual([at.toISOString()]);
  });
});
