import { randomUUID } from 'node:crypto';
import { pino } from 'pino';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../app';
import { resinInput } from '../test-support/fixtures';
import { bearer, createShop, useHarness } from '../test-support/harness';
import { binaryStl, pocketMouldTriangles } from '../test-support/pocket-mould';
import { canonicalJson, requestFingerprint } from './idempotency';

const h = useHarness();

// A 1 × 1 PNG (PNG specification, ISO/IEC 15948: signature, IHDR, IDAT, IEND), and the same file with one more byte
// after its end, so two uploads differ only in the file part.
const png = Buffer.from(
  '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082',
  'hex',
);
const otherPng = Buffer.concat([png, Buffer.from([0])]);

async function pourUnderWay() {
  const shop = await createShop(h);
  const maker = await shop.member('maker');
  const apprentice = await shop.member('apprentice');
  const product = (
    await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(resinInput({ mixRatio: { a: 2, b: 1, basis: 'weight' }, maxLayerMm: 25 }))
      .expect(201)
  ).body;
  const piece = (await h.http().post('/api/pieces').set(bearer(maker)).send({ name: 'Cherry board' }).expect(201)).body;
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
  const cups = plan.result.layers.flatMap((l: { batches: unknown[] }) => l.batches) as { index: number; partA: { grams: number }; partB: { grams: number } }[];
  const pour = (await h.http().post('/api/pours').set(bearer(apprentice)).send({ pourPlanId: plan.id }).expect(201)).body;
  return { shop, maker, apprentice, piece, pour, cups };
}

const count = async (sql: string, params: unknown[]) => Number(((await h.ds.query(sql, params)) as { n: string }[])[0]!.n);

describe('Idempotency-Key on creates', () => {
  it('answers a replayed batch with the same status and body and logs the cup once, on every API instance', async () => {
    const w = await pourUnderWay();
    const cup = w.cups[0]!;
    const key = randomUUID();
    const body = { planBatchIndex: cup.index, weighedAG: cup.partA.grams, weighedBG: cup.partB.grams, lotANumber: 'A-1', lotBNumber: 'B-1', ambientTempC: 21 };
    const send = (agent = h.http()) => agent.post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).set('Idempotency-Key', key).send(body);

    const first = await send().expect(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    const again = await send().expect(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.text).toBe(first.text);

    // A second API process over the same database sees the same key (the answers live in PostgreSQL, not in memory).
    const other = createApp({ ds: h.ds, config: h.config, logger: pino({ level: 'silent' }) });
    const fromOther = await send(supertest.agent(other.app)).expect(201);
    expect(fromOther.text).toBe(first.text);

    expect(await count('SELECT count(*) AS n FROM pour_batches WHERE pour_id = $1', [w.pour.id])).toBe(1);
    // Without the key the same cup is refused as already logged: the key, not luck, kept the replays out.
    await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).send(body).expect(409);
  });

  it('lets two replays that arrive together create one record, and both get its answer', async () => {
    const w = await pourUnderWay();
    const key = randomUUID();
    const post = () => h.http().post('/api/pieces').set(bearer(w.maker)).set('Idempotency-Key', key).send({ name: 'Twin request' });
    const answers = await Promise.all([post(), post(), post()]);
    expect(answers.map((a) => a.status)).toEqual([201, 201, 201]);
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
    expect(answers[1]!.text).toBe(answers[0]!.text);
    expect(answers.filter((a) => a.headers['idempotent-replayed'] === 'true')).toHaveLength(2);
    expect(await count(`SELECT count(*) AS n FROM pieces WHERE shop_id = $1 AND name = 'Twin request'`, [w.shop.shopId])).toBe(1);

    const cup = w.cups[1]!;
    const batchKey = randomUUID();
    const logCup = () =>
      h
        .http()
        .post(`/api/pours/${w.pour.id}/batches`)
        .set(bearer(w.apprentice))
        .set('Idempotency-Key', batchKey)
        .send({ planBatchIndex: cup.index, weighedAG: cup.partA.grams, weighedBG: cup.partB.grams });
    const cups = await Promise.all([logCup(), logCup()]);
    expect(cups.map((a) => a.status)).toEqual([201, 201]);
    expect(cups[0]!.text).toBe(cups[1]!.text);
    expect(await count('SELECT count(*) AS n FROM pour_batches WHERE pour_id = $1 AND plan_batch_index = $2', [w.pour.id, cup.index])).toBe(1);
  });

  it('replays readings, cure checks with their photo and reminder ticks without a second record', async () => {
    const w = await pourUnderWay();
    const readingKey = randomUUID();
    // A reading taken after the pour started (an earlier one is refused as outside the pour).
    const at = new Date(Date.parse(w.pour.startedAt) + 1000).toISOString();
    const reading = () =>
      h
        .http()
        .post(`/api/pours/${w.pour.id}/readings`)
        .set(bearer(w.apprentice))
        .set('Idempotency-Key', readingKey)
        .send({ readings: [{ at, tempC: 21.5 }] });
    const r1 = await reading().expect(200);
    const r2 = await reading().expect(200);
    // Without the key a second send would answer "1 duplicate"; the replay answers what the first send did.
    expect(r1.body).toMatchObject({ added: 1, duplicates: 0 });
    expect(r2.text).toBe(r1.text);

    const checkKey = randomUUID();
    const check = (photo: Buffer) =>
      h
        .http()
        .post(`/api/pours/${w.pour.id}/checks`)
        .set(bearer(w.apprentice))
        .set('Idempotency-Key', checkKey)
        .field('stage', 'liquid')
        .field('note', 'pressed with a glove')
        .attach('photo', photo, 'check.png');
    const c1 = await check(png).expect(201);
    const c2 = await check(png).expect(201);
    expect(c2.body).toEqual(c1.body);
    expect(await count('SELECT count(*) AS n FROM cure_checks WHERE pour_id = $1', [w.pour.id])).toBe(1);
    // The same key with another photo is another request.
    const other = await check(otherPng);
    expect(other.status).toBe(422);
    expect(other.body.error.code).toBe('idempotency_key_reused');

    const cup = w.cups[0]!;
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches`)
      .set(bearer(w.apprentice))
      .send({ planBatchIndex: cup.index, weighedAG: cup.partA.grams, weighedBG: cup.partB.grams })
      .expect(201);
    const pour = (await h.http().get(`/api/pours/${w.pour.id}`).set(bearer(w.apprentice)).expect(200)).body as { reminders: { id: string; done: unknown }[] };
    const reminder = pour.reminders.find((r) => r.done === null)!;
    const tickKey = randomUUID();
    const tick = () => h.http().post(`/api/reminders/${reminder.id}/done`).set(bearer(w.apprentice)).set('Idempotency-Key', tickKey);
    const t1 = await tick().expect(200);
    const t2 = await tick().expect(200);
    expect(t2.text).toBe(t1.text);
    expect(await count(`SELECT count(*) AS n FROM audit_events WHERE action = 'reminder.done' AND object_id = $1`, [reminder.id])).toBe(1);
  });

  it('refuses the same key with a different body in a sentence, and keeps keys apart per member', async () => {
    const w = await pourUnderWay();
    const key = randomUUID();
    const mine = await h.http().post('/api/pieces').set(bearer(w.maker)).set('Idempotency-Key', key).send({ name: 'Maple bowl' }).expect(201);
    const changed = await h.http().post('/api/pieces').set(bearer(w.maker)).set('Idempotency-Key', key).send({ name: 'Maple bowl, larger' }).expect(422);
    expect(changed.body.error.code).toBe('idempotency_key_reused');
    expect(changed.body.error.message).toMatch(/already used for a different request/);
    // The same key on another route is a different request too, and starts nothing.
    const crossRoute = await h.http().post('/api/pours').set(bearer(w.maker)).set('Idempotency-Key', key).send({ pourPlanId: w.pour.pourPlanId });
    expect(crossRoute.status).toBe(422);
    expect(await count('SELECT count(*) AS n FROM pours WHERE pour_plan_id = $1', [w.pour.pourPlanId])).toBe(1);
    // Another member's keys are their own: the same value creates the lead's own piece.
    const theirs = await h.http().post('/api/pieces').set(bearer(w.shop.lead)).set('Idempotency-Key', key).send({ name: 'Maple bowl' }).expect(201);
    expect(theirs.headers['idempotent-replayed']).toBeUndefined();
    expect(theirs.body.id).not.toBe(mine.body.id);
    expect(await count(`SELECT count(*) AS n FROM pieces WHERE shop_id = $1 AND name LIKE 'Maple bowl%'`, [w.shop.shopId])).toBe(2);
  });

  it('replays a streamed mould upload once, and tells a different file under the same key apart', async () => {
    const w = await pourUnderWay();
    const key = randomUUID();
    const pocket = binaryStl(pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 10 }));
    const deeper = binaryStl(pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 5 }));
    const send = (bytes: Buffer) =>
      h.http().post('/api/molds').set(bearer(w.maker)).set('Idempotency-Key', key).attach('file', bytes, 'pocket.stl').field('name', 'Tray pocket');
    const first = await send(pocket).expect(202);
    const again = await send(pocket).expect(202);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body.id).toBe(first.body.id);
    // Same fields, another file: the file's hash taken as it streamed is part of the request, so it is not a replay.
    const changed = await send(deeper).expect(422);
    expect(changed.body.error.code).toBe('idempotency_key_reused');
    expect(await count(`SELECT count(*) AS n FROM molds WHERE shop_id = $1 AND name = 'Tray pocket'`, [w.shop.shopId])).toBe(1);
  });

  it('lets a key whose create was refused be sent again once the cause is gone', async () => {
    const w = await pourUnderWay();
    const cup = w.cups[0]!;
    const entry = { planBatchIndex: cup.index, weighedAG: cup.partA.grams, weighedBG: cup.partB.grams };
    // Someone else logged the cup first: the queued entry from the phone is refused with a conflict.
    const theirs = (await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.maker)).send(entry).expect(201)).body;
    const key = randomUUID();
    const refused = await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).set('Idempotency-Key', key).send(entry).expect(409);
    expect(refused.body.error.code).toBe('batch_already_logged');
    await h
      .http()
      .post(`/api/pours/${w.pour.id}/batches/${theirs.batch.id}/void`)
      .set(bearer(w.maker))
      .send({ reason: 'logged on the wrong pour' })
      .expect(200);
    const retried = await h.http().post(`/api/pours/${w.pour.id}/batches`).set(bearer(w.apprentice)).set('Idempotency-Key', key).send(entry).expect(201);
    expect(retried.body.batch.mixedBy.id).toBe(w.apprentice.user.id);
    expect(await count('SELECT count(*) AS n FROM idempotency_keys WHERE user_id = $1 AND key = $2 AND status_code = 201', [w.apprentice.user.id, key])).toBe(
      1,
    );
  });

  it('refuses a malformed key with a sentence and leaves requests without a key as they were', async () => {
    const w = await pourUnderWay();
    const bad = await h.http().post('/api/pieces').set(bearer(w.maker)).set('Idempotency-Key', 'two words').send({ name: 'Spaced' }).expect(400);
    expect(bad.body.error.code).toBe('bad_idempotency_key');
    await h.http().post('/api/pieces').set(bearer(w.maker)).set('Idempotency-Key', 'k'.repeat(256)).send({ name: 'Long' }).expect(400);
    await h.http().post('/api/pieces').set(bearer(w.maker)).send({ name: 'Plain' }).expect(201);
    await h.http().post('/api/pieces').set(bearer(w.maker)).send({ name: 'Plain' }).expect(201);
    expect(await count(`SELECT count(*) AS n FROM pieces WHERE shop_id = $1 AND name IN ('Plain', 'Spaced', 'Long')`, [w.shop.shopId])).toBe(2);
  });

  it('documents the header on every create route', async () => {
    const doc = (await h.http().get('/api/openapi.json').expect(200)).body as {
      paths: Record<string, Record<string, { parameters?: { name: string; in: string }[] }>>;
    };
    for (const path of [
      '/api/pieces',
      '/api/molds',
      '/api/pour-plans',
      '/api/pours',
      '/api/pours/{id}/batches',
      '/api/pours/{id}/readings',
      '/api/pours/{id}/checks',
      '/api/shelf/lots',
    ]) {
      expect(
        doc.paths[path]?.post?.parameters?.some((p) => p.name === 'Idempotency-Key' && p.in === 'header'),
        path,
      ).toBe(true);
    }
  });
});

describe('request fingerprints', () => {
  it('ignore the order of keys and notice a changed value', () => {
    expect(canonicalJson({ b: 1, a: { d: [2, { f: 1, e: 0 }], c: null } })).toBe('{"a":{"c":null,"d":[2,{"e":0,"f":1}]},"b":1}');
    const base = { params: { id: 'p' }, query: {}, body: { a: 1, b: 'x' } };
    expect(requestFingerprint('POST /x', base)).toBe(requestFingerprint('POST /x', { ...base, body: { b: 'x', a: 1 } }));
    expect(requestFingerprint('POST /x', base)).not.toBe(requestFingerprint('POST /x', { ...base, body: { a: 2, b: 'x' } }));
    expect(requestFingerprint('POST /x', base)).not.toBe(requestFingerprint('POST /y', base));
    expect(requestFingerprint('POST /x', { ...base, file: { buffer: Buffer.from('a') } })).not.toBe(
      requestFingerprint('POST /x', { ...base, file: { buffer: Buffer.from('b') } }),
    );
    // A file hashed as it streamed counts the same as the same bytes held whole (SHA-256 of "a", FIPS 180-4 via node:crypto).
    const shaOfA = 'ca978112ca1bbdcafac231b39a23dc4da786eff8147c4e72b9807785afee48bb';
    expect(requestFingerprint('POST /x', { ...base, fileSha256: shaOfA })).toBe(requestFingerprint('POST /x', { ...base, file: { buffer: Buffer.from('a') } }));
  });
});
