import { describe, expect, it } from 'vitest';
import { resinInput } from '../../test-support/fixtures';
import { bearer, createShop, useHarness } from '../../test-support/harness';

const h = useHarness();

describe('resin systems', () => {
  it('keeps the data sheet and fills in the common-practice activation energy when it has none', async () => {
    const shop = await createShop(h);
    const res = await h.http().post('/api/shelf/resin-systems').set(bearer(shop.lead)).send(resinInput()).expect(201);
    expect(res.body).toMatchObject({ name: 'Stillwater Deep 50', mixRatio: { a: 2, b: 1, basis: 'volume' }, activationEnergyKJPerMol: null, archived: false });
    // "Rate doubles per 10 °C" (common practice): Ea = R·ln 2 / (1/T1 − 1/T2), T1 = 295.15 K, T2 = 305.15 K,
    // R = 8.314462618 J/(mol·K) (CODATA 2018).
    const expected = (8.314462618 * Math.LN2) / (1 / 295.15 - 1 / 305.15) / 1000;
    expect(res.body.effectiveActivationEnergyKJPerMol).toBeCloseTo(expected, 3);
    const given = await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(resinInput({ name: 'With Ea', activationEnergyKJPerMol: 60 }))
      .expect(201);
    expect(given.body.effectiveActivationEnergyKJPerMol).toBe(60);
  });

  it('says which data-sheet value is inconsistent', async () => {
    const shop = await createShop(h);
    const cases: [Record<string, unknown>, string][] = [
      [{ recoatWindow: { earliestH: 40, latestH: 30 } }, 'recoatWindow'],
      [{ minWorkTempC: 30, maxWorkTempC: 20 }, 'minWorkTempC'],
      [{ demoldH: 200 }, 'demoldH'],
      [{ densityAGPerMl: 0 }, 'densityAGPerMl'],
      [{ mixRatio: { a: 2, b: 1, basis: 'mass' } }, 'mixRatio.basis'],
      [{ maxBatchG: -5 }, 'maxBatchG'],
    ];
    for (const [over, field] of cases) {
      const res = await h.http().post('/api/shelf/resin-systems').set(bearer(shop.lead)).send(resinInput(over)).expect(400);
      expect(Object.keys(res.body.error.fields), JSON.stringify(over)).toContain(field);
    }
    expect((await h.http().get('/api/shelf/resin-systems').set(bearer(shop.lead)).expect(200)).body.total).toBe(0);
  });

  it('keeps the exotherm settings, names the default of each empty one and refuses impossible ones in a sentence', async () => {
    const shop = await createShop(h);
    const empty = await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(resinInput({ name: 'Defaults only' }))
      .expect(201);
    expect(empty.body).toMatchObject({
      reactionHeatJPerG: null,
      thinFilmGelMin: null,
      heatCapacityJPerGK: null,
      conductivityWPerMK: null,
      acceptedPeakC: null,
    });
    const used = empty.body.exothermSettings;
    // 486 J/g: DGEBA/TETA by DSC (Polímeros, SciELO); 1.5 J/(g·K) and 0.2 W/(m·K): inside the published ranges (from memory).
    expect(used.reactionHeatJPerG).toMatchObject({ value: 486, isDefault: true });
    expect(used.heatCapacityJPerGK).toMatchObject({ value: 1.5, isDefault: true });
    expect(used.conductivityWPerMK).toMatchObject({ value: 0.2, isDefault: true });
    // The empty film gel time falls back on the data sheet's 8 h gel time.
    expect(used.thinFilmGelMin).toMatchObject({ value: 480, isDefault: true });
    expect(used.acceptedPeakC.isDefault).toBe(true);

    const settings = { reactionHeatJPerG: 410, thinFilmGelMin: 720, heatCapacityJPerGK: 1.7, conductivityWPerMK: 0.18, acceptedPeakC: 58 };
    const given = await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(resinInput({ name: 'Measured', ...settings }))
      .expect(201);
    expect(given.body).toMatchObject(settings);
    expect(given.body.exothermSettings.acceptedPeakC).toMatchObject({ value: 58, isDefault: false });
    const read = await h.http().get(`/api/shelf/resin-systems/${given.body.id}`).set(bearer(shop.lead)).expect(200);
    expect(read.body).toMatchObject(settings);
    const cleared = await h
      .http()
      .put(`/api/shelf/resin-systems/${given.body.id}`)
      .set(bearer(shop.lead))
      .send(resinInput({ name: 'Measured', ...settings, acceptedPeakC: null }))
      .expect(200);
    expect(cleared.body.acceptedPeakC).toBeNull();

    const cases: [Record<string, unknown>, string, RegExp][] = [
      [{ reactionHeatJPerG: -5 }, 'reactionHeatJPerG', /heat of reaction must be above zero/],
      [{ thinFilmGelMin: 'slow' }, 'thinFilmGelMin', /thin-film gel time must be a number/],
      [{ heatCapacityJPerGK: 12 }, 'heatCapacityJPerGK', /heat capacity must be at most 4/],
      [{ conductivityWPerMK: 0 }, 'conductivityWPerMK', /thermal conductivity must be at least 0.05/],
      [{ acceptedPeakC: 20 }, 'acceptedPeakC', /accepted peak temperature must be above the reference temperature/],
    ];
    for (const [over, field, sentence] of cases) {
      const res = await h
        .http()
        .post('/api/shelf/resin-systems')
        .set(bearer(shop.lead))
        .send(resinInput({ name: 'Refused', ...over }))
        .expect(400);
      expect(res.body.error.fields[field], JSON.stringify(over)).toMatch(sentence);
    }
  });

  it('replaces, searches and archives', async () => {
    const shop = await createShop(h);
    const a = await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(resinInput({ name: 'Tabletop Clear' }))
      .expect(201);
    await h
      .http()
      .post('/api/shelf/resin-systems')
      .set(bearer(shop.lead))
      .send(resinInput({ name: 'River 100% Deep' }))
      .expect(201);
    const put = await h
      .http()
      .put(`/api/shelf/resin-systems/${a.body.id}`)
      .set(bearer(shop.lead))
      .send(resinInput({ name: 'Tabletop Clear v2', potLifeMin: 30 }))
      .expect(200);
    expect(put.body).toMatchObject({ name: 'Tabletop Clear v2', potLifeMin: 30 });
    expect(
      (await h.http().get('/api/shelf/resin-systems').query({ q: '100%' }).set(bearer(shop.lead)).expect(200)).body.items.map((r: { name: string }) => r.name),
    ).toEqual(['River 100% Deep']);
    await h.http().delete(`/api/shelf/resin-systems/${a.body.id}`).set(bearer(shop.lead)).expect(204);
    expect((await h.http().get('/api/shelf/resin-systems').set(bearer(shop.lead)).expect(200)).body.total).toBe(1);
    const all = await h.http().get('/api/shelf/resin-systems').query({ includeArchived: 'true' }).set(bearer(shop.lead)).expect(200);
    expect(all.body.items.find((r: { id: string }) => r.id === a.body.id).archived).toBe(true);
  });
});

describe('lots', () => {
  it('tracks stock, low and expired lots, and only against this shop’s products', async () => {
    const shop = await createShop(h);
    const other = await createShop(h);
    const resin = await h.http().post('/api/shelf/resin-systems').set(bearer(shop.lead)).send(resinInput()).expect(201);
    const foreign = await h.http().post('/api/shelf/resin-systems').set(bearer(other.lead)).send(resinInput()).expect(201);
    const fresh = await h
      .http()
      .post('/api/shelf/lots')
      .set(bearer(shop.lead))
      .send({ part: 'A', resinSystemId: resin.body.id, lotNumber: 'A-2611', quantityG: 3000, receivedOn: '2026-11-01', expiresOn: '2099-11-01' })
      .expect(201);
    expect(fresh.body).toMatchObject({ productName: 'Stillwater Deep 50', remainingG: 3000, expired: false, low: false });
    const old = await h
      .http()
      .post('/api/shelf/lots')
      .set(bearer(shop.lead))
      .send({ part: 'B', resinSystemId: resin.body.id, lotNumber: 'B-1901', quantityG: 1500, receivedOn: '2019-01-01', expiresOn: '2020-01-01' })
      .expect(201);
    expect(old.body.expired).toBe(true);
    const low = await h.http().patch(`/api/shelf/lots/${fresh.body.id}`).set(bearer(shop.lead)).send({ remainingG: 200 }).expect(200);
    expect(low.body.low).toBe(true);
    await h.http().patch(`/api/shelf/lots/${fresh.body.id}`).set(bearer(shop.lead)).send({ remainingG: 5000 }).expect(400);
    expect(
      (await h.http().get('/api/shelf/lots').query({ status: 'expired' }).set(bearer(shop.lead)).expect(200)).body.items.map(
        (l: { lotNumber: string }) => l.lotNumber,
      ),
    ).toEqual(['B-1901']);
    expect(
      (await h.http().get('/api/shelf/lots').query({ status: 'low' }).set(bearer(shop.lead)).expect(200)).body.items.map(
        (l: { lotNumber: string }) => l.lotNumber,
      ),
    ).toEqual(['A-2611']);
    await h
      .http()
      .post('/api/shelf/lots')
      .set(bearer(shop.lead))
      .send({ part: 'A', resinSystemId: foreign.body.id, lotNumber: 'X', quantityG: 1, receivedOn: '2026-11-01' })
      .expect(404);
    await h
      .http()
      .post('/api/shelf/lots')
      .set(bearer(shop.lead))
      .send({ part: 'pigment', resinSystemId: resin.body.id, lotNumber: 'X', quantityG: 1, receivedOn: '2026-11-01' })
      .expect(400);
    await h
      .http()
      .post('/api/shelf/lots')
      .set(bearer(shop.lead))
      .send({ part: 'A', resinSystemId: resin.body.id, lotNumber: 'X', quantityG: 1, receivedOn: '2026-11-01', expiresOn: '2026-10-01' })
      .expect(400);
  });
});
