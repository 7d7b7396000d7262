import { describe, expect, it } from 'vitest';
import { resinInput } from '../../test-support/fixtures';
import { bearer, createShop, useHarness } from '../../test-support/harness';

const h = useHarness();
const hour = 3_600_000;
const iso = (msAgo: number) => new Date(Date.now() - msAgo).toISOString();

type Cup = { index: number; partA: { grams: number }; partB: { grams: number }; pigment: { grams: number }; pour: { layer: number } };

/** A shop with a 18–29 °C product, a pigment, and a two-layer plan whose first cup was mixed 6 h ago. */
async function world() {
  const shop = await createShop(h);
  const maker = await shop.member('maker');
  const apprentice = await shop.member('apprentice');
  const other = await shop.member('apprentice');
  const product = (
    await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(resinInput({ minWorkTempC: 18, maxWorkTempC: 29, maxLayerMm: 25 }))
      .expect(201)
  ).body;
  const pigment = (
    await h
      .http()
      .post('/api/shelf/pigments')
      .set(bearer(shop.lead))
      .send({ name: 'Deep teal', kind: 'liquid', densityGPerMl: 1.0, recommendedPct: 2, maxPct: 6, pricePerPack: 10, packSizeG: 50 })
      .expect(201)
  ).body;
  const lot = (
    await h
      .http()
      .post('/api/shelf/lots')
      .set(bearer(shop.lead))
      .send({ part: 'A', resinSystemId: product.id, lotNumber: 'A-100', quantityG: 5000, receivedOn: '2026-11-01' })
      .expect(201)
  ).body;
  const piece = (await h.http().post('/api/pieces').set(bearer(maker)).send({ name: 'Oak tray' }).expect(201)).body;
  const plan = (
    await h
      .http()
      .post('/api/pour-plans')
      .set(bearer(maker))
      .send({
        pieceId: piece.id,
        name: 'Teal tray',
        cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 40 } },
        fillLevelMm: 40,
        deepPour: { resinSystemId: product.id, pigmentId: pigment.id, pigmentPct: 2 },
        overPourPct: 0,
        cupWaste: { massG: 0 },
        shopTempC: 22,
      })
      .expect(201)
  ).body;
  const cups = plan.result.layers.flatMap((l: { batches: Cup[] }) => l.batches) as Cup[];
  const pour = (await h.http().post('/api/pours').set(bearer(apprentice)).send({ pourPlanId: plan.id }).expect(201)).body;
  const first = cups[0]!;
  const logged = (
    await h
      .http()
      .post(`/api/pours/${pour.id}/batches`)
      .set(bearer(apprentice))
      .send({
        planBatchIndex: first.index,
        mixedAt: iso(6 * hour),
        lotAId: lot.id,
        weighedAG: first.partA.grams,
        weighedBG: first.partB.grams,
        weighedPigmentG: first.pigment.grams,
      })
      .expect(201)
  ).body.batch;
  return { shop, maker, apprentice, other, product, pigment, lot, plan, cups, pour, first, logged };
}

const pourOf = async (w: { pour: { id: string }; maker: { token: string } }) =>
  (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.maker)).expect(200)).body;

describe('plausibility guards', () => {
  it('questions 70 typed as °C (did you mean °F?) and logs it only when confirmed', async () => {
    const w = await world();
    const asked = await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings`)
      .set(bearer(w.apprentice))
      .send({ readings: [{ at: iso(hour), tempC: 70 }] })
      .expect(422);
    expect(asked.body.error.code).toBe('confirmation_needed');
    // NIST SP 811: 70 °F = (70 − 32)/1.8 = 21.1 °C; the range is 18–29 °C widened by 10 K.
    expect(asked.body.error.message).toContain('8 to 39 °C');
    expect(asked.body.error.message).toContain('70 °F is 21.1 °C: did you mean °F?');
    expect(asked.body.error.fields).toHaveProperty(['readings.0.tempC']);
    expect((await pourOf(w)).readings).toEqual([]);
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings`)
      .set(bearer(w.apprentice))
      .send({ readings: [{ at: iso(hour), tempC: 70 }], confirmUnusual: true })
      .expect(200);
    expect((await pourOf(w)).readings.map((r: { tempC: number }) => r.tempC)).toEqual([70]);
  });

  it('converts a CSV headed tempF and refuses readings from the future or from before the pour', async () => {
    const w = await world();
    const csv = await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings/csv`)
      .set(bearer(w.apprentice))
      .set('Content-Type', 'text/csv')
      .send(`time,tempF\n${iso(2 * hour)},70\n${iso(hour)},68\n`)
      .expect(200);
    expect(csv.body).toEqual({ added: 2, duplicates: 0, unit: 'F' });
    // NIST SP 811: 70 °F = 21.111 °C, 68 °F = 20 °C.
    expect((await pourOf(w)).readings.map((r: { tempC: number }) => r.tempC)).toEqual([21.111, 20]);
    const future = await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings`)
      .set(bearer(w.apprentice))
      .send({ readings: [{ at: '2030-01-01T00:00:00Z', tempC: 21 }] })
      .expect(422);
    expect(future.body.error.code).toBe('reading_time_impossible');
    expect(future.body.error.message).toMatch(/is in the future/);
    const before = await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings`)
      .set(bearer(w.apprentice))
      .send({ readings: [{ at: iso(30 * 24 * hour), tempC: 21 }], confirmUnusual: true })
      .expect(422);
    expect(before.body.error.message).toMatch(/is before this pour started/);
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings`)
      .set(bearer(w.apprentice))
      .send({ readings: [{ at: new Date(Date.now() + 5 * 60_000).toISOString(), tempC: 21 }] })
      .expect(200);
  });

  it('questions a cup weighed far from its target, and needs the pigment weighed when the cup takes pigment', async () => {
    const w = await world();
    const cup = w.cups[1]!;
    const huge = await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ planBatchIndex: cup.index, weighedAG: 99_999, weighedBG: cup.partB.grams, weighedPigmentG: cup.pigment.grams })
      .expect(422);
    expect(huge.body.error.code).toBe('confirmation_needed');
    expect(huge.body.error.fields).toHaveProperty('weighedAG');
    const blank = await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ planBatchIndex: cup.index, weighedAG: cup.partA.grams, weighedBG: cup.partB.grams })
      .expect(400);
    expect(blank.body.error.fields).toHaveProperty('weighedPigmentG');
    const confirmed = await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({
        planBatchIndex: cup.index,
        weighedAG: cup.partA.grams * 1.6,
        weighedBG: cup.partB.grams * 1.6,
        weighedPigmentG: cup.pigment.grams,
        confirmUnusual: true,
      })
      .expect(201);
    expect(confirmed.body.warnings.map((x: { code: string }) => x.code)).toContain('weight_far_from_target');
  });
});

describe('corrections with history', () => {
  it('lists readings with who logged them, voids one with its reason, and lets a correct one be logged at the same time', async () => {
    const w = await world();
    const at = iso(2 * hour);
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings`)
      .set(bearer(w.apprentice))
      .send({ readings: [{ at, tempC: 30 }], confirmUnusual: true })
      .expect(200);
    const clash = await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings`)
      .set(bearer(w.maker))
      .send({ readings: [{ at, tempC: 21 }] })
      .expect(409);
    expect(clash.body.error.code).toBe('reading_time_taken');
    const [reading] = (await h.http().get(`/api/pours/${w.pour.id}/readings`).set(bearer(w.maker)).expect(200)).body.items;
    expect(reading).toMatchObject({ tempC: 30, source: 'manual', loggedBy: { id: w.apprentice.user.id }, voided: null });

    await h.http().delete(`/api/pours/${w.pour.id}/readings/${reading.id}`).set(bearer(w.other)).send({ reason: 'not mine' }).expect(403);
    await h.http().delete(`/api/pours/${w.pour.id}/readings/${reading.id}`).set(bearer(w.apprentice)).send({}).expect(400);
    const voided = (
      await h
        .http()
        .delete(`/api/pours/${w.pour.id}/readings/${reading.id}`)
        .set(bearer(w.apprentice))
        .send({ reason: 'thermometer on the heat lamp' })
        .expect(200)
    ).body;
    expect(voided.voided).toMatchObject({ by: { id: w.apprentice.user.id }, reason: 'thermometer on the heat lamp' });
    await h.http().delete(`/api/pours/${w.pour.id}/readings/${reading.id}`).set(bearer(w.shop.lead)).send({ reason: 'again' }).expect(409);

    await h
      .http()
      .post(`/api/pours/${w.pour.id}/readings`)
      .set(bearer(w.maker))
      .send({ readings: [{ at, tempC: 21 }] })
      .expect(200);
    const pour = await pourOf(w);
    expect(pour.readings.map((r: { tempC: number }) => r.tempC)).toEqual([21]);
    expect(pour.voidedReadings.map((r: { tempC: number }) => r.tempC)).toEqual([30]);
    expect(pour.flags.map((f: { code: string }) => f.code)).toContain('voided');
    const all = (await h.http().get(`/api/pours/${w.pour.id}/readings`).set(bearer(w.maker)).expect(200)).body.items;
    expect(all).toHaveLength(2);
    const audit = (await h.http().get('/api/audit').set(bearer(w.shop.lead)).expect(200)).body;
    const events = (audit.items ?? audit.events ?? audit) as { action: string }[];
    expect(events.map((e) => e.action)).toContain('reading.void');
  });

  it('voids a cup with its reason: the stock comes back, the cure follows, and the cup can be logged again', async () => {
    const w = await world();
    const lotBefore = (await h.http().get(`/api/shelf/lots/${w.lot.id}`).set(bearer(w.shop.lead)).expect(200)).body.remainingG;
    expect(lotBefore).toBeCloseTo(5000 - w.first.partA.grams, 6);
    expect((await pourOf(w)).cure.pouredAt).not.toBeNull();
    await h.http().post(`/api/pours/${w.pour.id}/batches/${w.logged.id}/void`).set(bearer(w.other)).send({ reason: 'not mine' }).expect(403);
    const voided = (
      await h
        .http()
        .post(`/api/pours/${w.pour.id}/batches/${w.logged.id}/void`)
        .set(bearer(w.shop.lead))
        .send({ reason: 'logged against the wrong cup' })
        .expect(200)
    ).body;
    expect(voided.voided).toMatchObject({ by: { id: w.shop.lead.user.id }, reason: 'logged against the wrong cup' });
    expect((await h.http().get(`/api/shelf/lots/${w.lot.id}`).set(bearer(w.shop.lead)).expect(200)).body.remainingG).toBeCloseTo(5000, 6);
    let pour = await pourOf(w);
    expect(pour.batches).toEqual([]);
    expect(pour.voidedBatches.map((b: { id: string }) => b.id)).toEqual([w.logged.id]);
    expect(pour.cure.pouredAt).toBeNull();
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({
        planBatchIndex: w.first.index,
        mixedAt: iso(5 * hour),
        weighedAG: w.first.partA.grams,
        weighedBG: w.first.partB.grams,
        weighedPigmentG: w.first.pigment.grams,
      })
      .expect(201);
    pour = await pourOf(w);
    expect(pour.batches).toHaveLength(1);
    expect(Date.parse(pour.cure.pouredAt)).toBeCloseTo(Date.now() - 5 * hour, -4);
  });
});

describe('reminders that clear, and notices', () => {
  it('clears a demold check when the piece is checked demoldable, lets any member mark a reminder done, and keeps Today to what is left', async () => {
    const w = await world();
    for (const cup of w.cups.slice(1)) {
      await h
        .http()
        .post(`/api/pours/${w.pour.id}/batches`)
        .set(bearer(w.apprentice))
        .send({
          planBatchIndex: cup.index,
          mixedAt: iso(6 * hour),
          weighedAG: cup.partA.grams,
          weighedBG: cup.partB.grams,
          weighedPigmentG: cup.pigment.grams,
          confirmUnusual: true,
        })
        .expect(201);
    }
    let pour = await pourOf(w);
    const demold = pour.reminders.find((r: { kind: string }) => r.kind === 'demold_check');
    expect(demold.done).toBeNull();
    await h.http().post(`/api/pours/${w.pour.id}/checks`).set(bearer(w.apprentice)).field('stage', 'demoldable').expect(201);
    pour = await pourOf(w);
    expect(pour.reminders.find((r: { kind: string }) => r.kind === 'demold_check').done).toMatchObject({ how: 'logged' });

    const ready = pour.reminders.find((r: { kind: string }) => r.kind === 'ready_to_machine');
    const marked = (await h.http().post(`/api/reminders/${ready.id}/done`).set(bearer(w.apprentice)).expect(200)).body;
    expect(marked.done).toMatchObject({ how: 'marked', by: { id: w.apprentice.user.id } });
    const other = await createShop(h);
    await h.http().post(`/api/reminders/${ready.id}/done`).set(bearer(other.lead)).expect(404);
    const today = (await h.http().get('/api/today').set(bearer(w.maker)).expect(200)).body;
    expect(today.due.map((r: { id: string }) => r.id)).not.toContain(ready.id);
  });

  it('tells the maker and the lead when a piece is released', async () => {
    const shop = await createShop(h);
    const maker = await shop.member('maker');
    const apprentice = await shop.member('apprentice');
    const product = (
      await h
        .http()
        .post('/api/shelf/resin-systems')
        .set(bearer(shop.lead))
        .send(resinInput({ referenceTempC: 20, minWorkTempC: 5 }))
        .expect(201)
    ).body;
    const piece = (await h.http().post('/api/pieces').set(bearer(maker)).send({ name: 'Walnut bowl' }).expect(201)).body;
    const plan = (
      await h
        .http()
        .post('/api/pour-plans')
        .set(bearer(maker))
        .send({
          pieceId: piece.id,
          name: 'One layer',
          cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 100, widthMm: 100, depthMm: 10 } },
          fillLevelMm: 10,
          deepPour: { resinSystemId: product.id },
          overPourPct: 0,
          cupWaste: { massG: 0 },
          shopTempC: 20,
        })
        .expect(201)
    ).body;
    const pour = (await h.http().post('/api/pours').set(bearer(apprentice)).send({ pourPlanId: plan.id }).expect(201)).body;
    for (const cup of plan.result.layers.flatMap((l: { batches: Cup[] }) => l.batches) as Cup[]) {
      await h
        .http()
        .post(`/api/pours/${pour.id}/batches`)
        .set(bearer(apprentice))
        .send({ planBatchIndex: cup.index, mixedAt: iso(200 * hour), weighedAG: cup.partA.grams, weighedBG: cup.partB.grams })
        .expect(201);
    }
    const readings = Array.from({ length: 101 }, (_, i) => ({ at: iso((200 - 2 * i) * hour - 1000), tempC: 20 }));
    await h.http().post(`/api/pours/${pour.id}/readings`).set(bearer(apprentice)).send({ readings }).expect(200);
    const released = (await h.http().post(`/api/pours/${pour.id}/release`).set(bearer(shop.lead)).expect(200)).body;
    const notice = released.reminders.find((r: { kind: string }) => r.kind === 'piece_released');
    expect(notice.title).toMatch(/^Released for machining: Walnut bowl/);
    const today = (await h.http().get('/api/today').set(bearer(maker)).expect(200)).body;
    expect(today.due.map((r: { kind: string }) => r.kind)).toContain('piece_released');
  });
});
