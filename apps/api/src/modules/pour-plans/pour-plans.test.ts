import { describe, expect, it } from 'vitest';
import { analyseQueuedMoulds, resinInput as resin } from '../../test-support/fixtures';
import { bearer, createShop, useHarness } from '../../test-support/harness';
import { binaryStl, pocketMouldTriangles } from '../../test-support/pocket-mould';

const h = useHarness();

async function setUp() {
  const shop = await createShop(h);
  const maker = await shop.member('maker');
  const product = (await h.http().post('/api/shelf/resin-systems').set(bearer(shop.lead)).send(resin()).expect(201)).body;
  const piece = (await h.http().post('/api/pieces').set(bearer(maker)).send({ name: 'Tray' }).expect(201)).body;
  return { shop, maker, product, piece };
}

describe('pour plans', () => {
  it('splits a quick-shape cavity into layers no thicker than the product allows and keeps the shelf values it used', async () => {
    const { shop, maker, product, piece } = await setUp();
    const body = {
      pieceId: piece.id,
      name: 'First pour',
      cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 300, widthMm: 200, depthMm: 30 } },
      fillLevelMm: 30,
      deepPour: { resinSystemId: product.id },
      overPourPct: 5,
      cupWaste: { massG: 0 },
      shopTempC: 22,
    };
    const res = await h.http().post('/api/pour-plans').set(bearer(maker)).send(body).expect(201);
    const plan = res.body.result;
    // 300 × 200 × 30 mm = 1,800,000 mm³ = 1800 mL (prism volume; 1 mL = 1000 mm³, NIST SP 811).
    expect(plan.fill.fillVolumeMl).toBeCloseTo(1800, 1);
    // 30 mm with at most 20 mm per layer: two layers of 15 mm.
    expect(plan.layers).toHaveLength(2);
    expect(plan.fill.layerThicknessMm).toBeCloseTo(15, 6);
    expect(plan.fill.pourVolumeMl).toBeCloseTo(1800 * 1.05, 0);
    expect(res.body.productSnapshot.deepPour).toMatchObject({ id: product.id, name: 'Stillwater Deep 50', maxLayerMm: 20 });
    // The forecast of each layer, calibrated to the data sheet's 20 mm at 22 °C; at 22 °C it never makes a layer thicker.
    const forecast = plan.forecast;
    expect(forecast).toMatchObject({ version: 2, available: true, shopTempC: 22, calibration: { maxLayerMm: 20, tempC: 22 } });
    expect(forecast.calibratedTo).toMatch(/20 mm layer poured at 22 °C/);
    expect(forecast.layers).toHaveLength(2);
    for (const layer of forecast.layers) {
      expect(layer.peakC).toBeGreaterThan(22);
      expect(layer.peakC).toBeLessThanOrEqual(forecast.limitC);
      expect(layer.overLimit).toBe(false);
      expect(layer.curve.length).toBeGreaterThan(2);
    }

    await h
      .http()
      .put(`/api/shelf/resin-systems/${product.id}`)
      .set(bearer(shop.lead))
      .send(resin({ name: 'Renamed on the shelf', maxLayerMm: 50 }))
      .expect(200);
    const again = (await h.http().get(`/api/pour-plans/${res.body.id}`).set(bearer(maker)).expect(200)).body;
    expect(again.productSnapshot.deepPour.name).toBe('Stillwater Deep 50');
    expect(again.result.layers).toHaveLength(2);
    const replaced = (await h.http().put(`/api/pour-plans/${res.body.id}`).set(bearer(maker)).send(body).expect(200)).body;
    expect(replaced.result.layers).toHaveLength(1);
    const list = (await h.http().get('/api/pour-plans').query({ pieceId: piece.id }).set(bearer(maker)).expect(200)).body;
    expect(list.items).toHaveLength(1);
    expect(list.items[0].totalGrams).toBeGreaterThan(0);
  });

  it('plans from an analysed mould the same way', async () => {
    const { maker, product, piece } = await setUp();
    const stl = binaryStl(pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 10 }));
    const mold = (await h.http().post('/api/molds').set(bearer(maker)).attach('file', stl, 'pocket.stl').field('pieceId', piece.id).expect(202)).body;
    analyseQueuedMoulds();
    // The fill level is the resin's height above the pocket floor, as for a quick shape: 20 mm fills it to the rim.
    const body = {
      pieceId: piece.id,
      name: 'From the mould',
      cavity: { source: 'mold', moldId: mold.id },
      fillLevelMm: 20,
      deepPour: { resinSystemId: product.id },
      overPourPct: 0,
      shopTempC: 22,
    };
    const plan = (await h.http().post('/api/pour-plans').set(bearer(maker)).send(body).expect(201)).body;
    // The pocket is a prism 80 × 40 × 20 mm = 64 mL (CRC, prism volume); 20 mm is one layer.
    expect(plan.result.fill.fillVolumeMl).toBeCloseTo(64, 1);
    expect(plan.result.layers).toHaveLength(1);
    expect(plan.moldId).toBe(mold.id);
    // The forecast runs on the mould's depth map: its hottest spot lies inside the pocket, x 10..90, y 10..50 mm in the mould's frame.
    const [layer] = plan.result.forecast.layers;
    expect(layer.hottest.xMm).toBeGreaterThan(10);
    expect(layer.hottest.xMm).toBeLessThan(90);
    expect(layer.hottest.yMm).toBeGreaterThan(10);
    expect(layer.hottest.yMm).toBeLessThan(50);
    // At or below the floor there is nothing to pour.
    const tooLow = await h
      .http()
      .post('/api/pour-plans')
      .set(bearer(maker))
      .send({ ...body, fillLevelMm: -5 })
      .expect(422);
    expect(tooLow.body.error.code).toBe('fill_below_floor');
    // The analysis runs in a worker process of its own, started cold: on a busy machine that alone can take most of
    // the default 30 s.
  }, 90_000);

  it('refuses archived products and another shop’s piece', async () => {
    const { shop, maker, product, piece } = await setUp();
    const other = await createShop(h);
    const foreignPiece = (await h.http().post('/api/pieces').set(bearer(other.lead)).send({ name: 'Not yours' }).expect(201)).body;
    const body = {
      pieceId: piece.id,
      name: 'P',
      cavity: { source: 'shape', shape: { kind: 'cylinder', diameterMm: 100, depthMm: 10 } },
      fillLevelMm: 10,
      deepPour: { resinSystemId: product.id },
      shopTempC: 22,
    };
    await h
      .http()
      .post('/api/pour-plans')
      .set(bearer(maker))
      .send({ ...body, pieceId: foreignPiece.id })
      .expect(404);
    await h.http().delete(`/api/shelf/resin-systems/${product.id}`).set(bearer(shop.lead)).expect(204);
    expect((await h.http().post('/api/pour-plans').set(bearer(maker)).send(body).expect(422)).body.error.code).toBe('product_archived');
    expect((await h.ds.query('SELECT count(*)::int AS n FROM pour_plans WHERE shop_id = $1', [shop.shopId]))[0].n).toBe(0);
  });
});
