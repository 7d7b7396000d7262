import { beforeAll, describe, expect, it } from 'vitest';
import { analyseQueuedMoulds, resinInput } from '../../test-support/fixtures';
import { bowlBlankStl, sphericalCapMm3 } from '../../test-support/bowl-blank';
import { bearer, createShop, useHarness, type ShopFixture } from '../../test-support/harness';
import { binaryStl, pocketMouldTriangles } from '../../test-support/pocket-mould';

const h = useHarness();

// A bowl blank 120 × 120 × 48 mm with a hemispherical bowl of radius 38 mm turned into its top: the bowl's bottom,
// the cavity floor, stands 10 mm above the blank's underside, the lowest point of the mould.
const bowl = { halfSide: 60, topMm: 48, radiusMm: 38 };
const floorAboveUndersideMm = bowl.topMm - bowl.radiusMm;
const depthMm = 20;
// The bowl is 256-gon frusta inscribed in the sphere, ringed exactly at the resin surface: within 0.1 % of the cap.
const capTolerance = 1e-3;
const relative = (a: number, b: number) => Math.abs(a - b) / b;

// A 100 × 60 × 30 mm block with an 80 × 40 mm pocket floored at z = 10: a box pocket holds L·W·h.
const pocketStl = () => binaryStl(pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 10 }));
const boxPocketMm3 = (h: number) => 80 * 40 * h;

let shop: ShopFixture;
let maker: Awaited<ReturnType<ShopFixture['member']>>;
let resinId: string;
let pieceId: string;
let bowlId: string;
let pocketId: string;

beforeAll(async () => {
  shop = await createShop(h, 'Datum shop');
  maker = await shop.member('maker');
  resinId = (
    await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(resinInput({ maxLayerMm: 25 }))
      .expect(201)
  ).body.id;
  pieceId = (await h.http().post('/api/pieces').set(bearer(maker)).send({ name: 'Bowl with a resin well' }).expect(201)).body.id;
  const upload = async (bytes: Buffer, name: string) =>
    (await h.http().post('/api/molds').set(bearer(maker)).attach('file', bytes, name).field('pieceId', pieceId).expect(202)).body.id as string;
  bowlId = await upload(bowlBlankStl(bowl, [depthMm / 2, depthMm]), 'bowl blank.stl');
  pocketId = await upload(pocketStl(), 'pocket blank.stl');
  analyseQueuedMoulds();
}, 120_000);

const plan = (cavity: object, fillLevelMm: number, extra: object = {}) => ({
  pieceId,
  name: 'Datum walk',
  cavity,
  fillLevelMm,
  deepPour: { resinSystemId: resinId },
  overPourPct: 0,
  cupWaste: { massG: 0 },
  shopTempC: 21,
  ...extra,
});

describe('one datum for the fill level', () => {
  it('reports the cavity floor in the mould’s own frame, 10 mm above the blank’s underside', async () => {
    const mold = (await h.http().get(`/api/molds/${bowlId}`).set(bearer(maker)).expect(200)).body;
    expect(mold.report.bboxMm.min[2]).toBe(0);
    expect(mold.report.floorMm).toEqual({ outline: floorAboveUndersideMm, box: floorAboveUndersideMm });
  });

  it('gives the spherical cap for a resin depth typed from the floor, whichever way it is asked', async () => {
    const cap = sphericalCapMm3(bowl.radiusMm, depthMm);
    const fromFloor = (await h.http().get(`/api/molds/${bowlId}/fill`).query({ level: depthMm }).set(bearer(maker)).expect(200)).body;
    expect(fromFloor).toMatchObject({ levelFrom: 'floor', levelMm: depthMm, floorMm: 10, levelAboveFloorMm: depthMm, levelInMouldMm: 30 });
    expect(relative(fromFloor.volumeMm3, cap)).toBeLessThan(capTolerance);
    // The deepest resin is the depth typed: the bowl's bottom is where the deepest resin stands.
    expect(fromFloor.maxDepthMm).toBeCloseTo(depthMm, 6);
    const inMouldFrame = (await h.http().get(`/api/molds/${bowlId}/fill`).query({ level: 30, from: 'mould' }).set(bearer(maker)).expect(200)).body;
    expect(inMouldFrame).toMatchObject({ levelFrom: 'mould', levelMm: 30, levelAboveFloorMm: depthMm });
    expect(inMouldFrame.volumeMm3).toBe(fromFloor.volumeMm3);
    // The mistake one datum removes: 20 mm read from the underside fills only a 10 mm cap, about a third.
    const fromUnderside = (await h.http().get(`/api/molds/${bowlId}/fill`).query({ level: depthMm, from: 'mould' }).set(bearer(maker)).expect(200)).body;
    expect(relative(fromUnderside.volumeMm3, sphericalCapMm3(bowl.radiusMm, 10))).toBeLessThan(capTolerance);

    // Layers between heights above the floor: the lower half is the 10 mm cap, both together the 20 mm one.
    const layers = (
      await h
        .http()
        .get(`/api/molds/${bowlId}/layers`)
        .query({ levels: `0,${depthMm / 2},${depthMm}` })
        .set(bearer(maker))
        .expect(200)
    ).body;
    expect(layers).toMatchObject({ levelFrom: 'floor', floorMm: 10 });
    expect(relative(layers.layers[0].volumeMm3, sphericalCapMm3(bowl.radiusMm, depthMm / 2))).toBeLessThan(capTolerance);
    expect(relative(layers.layers[0].volumeMm3 + layers.layers[1].volumeMm3, cap)).toBeLessThan(capTolerance);

    // The planner's saved plan takes the same depth to the same resin: mL = mm³ / 1000 (NIST SP 811).
    const saved = (
      await h
        .http()
        .post('/api/pour-plans')
        .set(bearer(maker))
        .send(plan({ source: 'mold', moldId: bowlId }, depthMm))
        .expect(201)
    ).body;
    expect(saved.inputs).toMatchObject({ fillLevelMm: depthMm, levelFrom: 'floor' });
    expect(relative(saved.result.fill.fillVolumeMl * 1000, cap)).toBeLessThan(capTolerance);
    expect(saved.result.fill.fillLevelMm).toBeCloseTo(depthMm, 9);
    expect(saved.result.layers).toHaveLength(1);
    expect(saved.result.fill.deepestResinMm).toBeCloseTo(depthMm, 6);
    // Given in the mould's frame instead, the plan is stored measured from the floor all the same.
    const framed = (
      await h
        .http()
        .post('/api/pour-plans')
        .set(bearer(maker))
        .send(plan({ source: 'mold', moldId: bowlId }, 30, { levelFrom: 'mould' }))
        .expect(201)
    ).body;
    expect(framed.inputs).toMatchObject({ fillLevelMm: depthMm, levelFrom: 'floor' });
    expect(framed.result.fill.fillVolumeMl).toBeCloseTo(saved.result.fill.fillVolumeMl, 9);
  });

  it('plans a box pocket from its mould exactly as the quick shape of the same pocket', async () => {
    // CRC Concise Encyclopedia of Mathematics, right prism: 80 × 40 × 15 mm³ = 48 mL.
    const fromMould = (
      await h
        .http()
        .post('/api/pour-plans')
        .set(bearer(maker))
        .send(plan({ source: 'mold', moldId: pocketId }, 15))
        .expect(201)
    ).body;
    const fromShape = (
      await h
        .http()
        .post('/api/pour-plans')
        .set(bearer(maker))
        .send(plan({ source: 'shape', shape: { kind: 'rectangle', lengthMm: 80, widthMm: 40, depthMm: 20 } }, 15))
        .expect(201)
    ).body;
    expect(fromMould.result.fill.fillVolumeMl).toBeCloseTo(boxPocketMm3(15) / 1000, 6);
    expect(fromShape.result.fill.fillVolumeMl).toBeCloseTo(boxPocketMm3(15) / 1000, 6);
    const fill = (await h.http().get(`/api/molds/${pocketId}/fill`).query({ level: 15 }).set(bearer(maker)).expect(200)).body;
    expect(fill.volumeMm3).toBeCloseTo(boxPocketMm3(15), 3);
  });

  it('refuses levels at the floor or above the rim, in floor heights, and a mould frame for a quick shape', async () => {
    const low = await h
      .http()
      .post('/api/pour-plans')
      .set(bearer(maker))
      .send(plan({ source: 'mold', moldId: pocketId }, 0))
      .expect(422);
    expect(low.body.error.code).toBe('fill_below_floor');
    const high = await h
      .http()
      .post('/api/pour-plans')
      .set(bearer(maker))
      .send(plan({ source: 'mold', moldId: pocketId }, 25))
      .expect(422);
    expect(high.body.error).toMatchObject({ code: 'fill_above_report' });
    expect(high.body.error.message).toContain('20 mm above its cavity floor');
    const shape = await h
      .http()
      .post('/api/pour-plans')
      .set(bearer(maker))
      .send(plan({ source: 'shape', shape: { kind: 'cylinder', diameterMm: 50, depthMm: 10 } }, 10, { levelFrom: 'mould' }))
      .expect(400);
    expect(shape.body.error.code).toBe('level_from_invalid');
  });

  it('reads a plan saved before the datum was one in the mould’s frame, and saving it again keeps its resin', async () => {
    const body = plan({ source: 'mold', moldId: pocketId }, 12);
    const saved = (await h.http().post('/api/pour-plans').set(bearer(maker)).send(body).expect(201)).body;
    // As such a plan was stored: no marker, the level as a height in the mould's frame (the pocket floor is at z = 10).
    await h.ds.query(`UPDATE pour_plans SET inputs = (inputs - 'levelFrom') || '{"fillLevelMm": 22}'::jsonb WHERE id = $1`, [saved.id]);
    const read = (await h.http().get(`/api/pour-plans/${saved.id}`).set(bearer(maker)).expect(200)).body;
    expect(read.inputs).toMatchObject({ fillLevelMm: 12, levelFrom: 'floor' });
    const again = (await h.http().put(`/api/pour-plans/${saved.id}`).set(bearer(maker)).send(read.inputs).expect(200)).body;
    // 80 × 40 × 12 mm³ = 38.4 mL before and after (prism, CRC).
    expect(again.result.fill.fillVolumeMl).toBeCloseTo(boxPocketMm3(12) / 1000, 6);
    expect(saved.result.fill.fillVolumeMl).toBeCloseTo(boxPocketMm3(12) / 1000, 6);
    const stored = await h.ds.query('SELECT inputs FROM pour_plans WHERE id = $1', [saved.id]);
    expect(stored[0].inputs).toMatchObject({ fillLevelMm: 12, levelFrom: 'floor' });

    // While its mould is being read again, the old number is handed back as what it is, never as a floor height.
    await h.ds.query(`UPDATE pour_plans SET inputs = (inputs - 'levelFrom') || '{"fillLevelMm": 22}'::jsonb WHERE id = $1`, [saved.id]);
    await h.ds.query(`UPDATE molds SET status = 'queued' WHERE id = $1`, [pocketId]);
    try {
      const pending = (await h.http().get(`/api/pour-plans/${saved.id}`).set(bearer(maker)).expect(200)).body;
      expect(pending.inputs).toMatchObject({ fillLevelMm: 22, levelFrom: 'mould' });
    } finally {
      await h.ds.query(`UPDATE molds SET status = 'ready' WHERE id = $1`, [pocketId]);
    }
  });

  it('names the floor for a report stored before reports carried it', async () => {
    await h.ds.query(`UPDATE molds SET report = report - 'floorMm', analysed_at = analysed_at + interval '1 second' WHERE id = $1`, [bowlId]);
    const mold = (await h.http().get(`/api/molds/${bowlId}`).set(bearer(maker)).expect(200)).body;
    expect(mold.report.floorMm).toEqual({ outline: floorAboveUndersideMm, box: floorAboveUndersideMm });
  });
});
