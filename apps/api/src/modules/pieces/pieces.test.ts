import { describe, expect, it } from 'vitest';
import { bearer, createShop, useHarness } from '../../test-support/harness';

const h = useHarness();

describe('pieces', () => {
  it('creates, lists, searches, updates and deletes, with an audit trail', async () => {
    const shop = await createShop(h);
    const a = await h.http().post('/api/pieces').set(bearer(shop.lead)).send({ name: 'Walnut tray', wood: 'walnut' }).expect(201);
    expect(a.body).toMatchObject({ name: 'Walnut tray', wood: 'walnut', notes: '', stage: 'planning', createdBy: { name: 'Lead Person' } });
    await h.http().post('/api/pieces').set(bearer(shop.lead)).send({ name: 'Oak 100% clock_face', stage: 'curing' }).expect(201);
    const all = await h.http().get('/api/pieces').set(bearer(shop.lead)).expect(200);
    expect(all.body.total).toBe(2);
    const curing = await h.http().get('/api/pieces').query({ stage: 'curing' }).set(bearer(shop.lead)).expect(200);
    expect(curing.body.items.map((p: { name: string }) => p.name)).toEqual(['Oak 100% clock_face']);
    // LIKE wildcards in the search are literal characters.
    expect((await h.http().get('/api/pieces').query({ q: '100%' }).set(bearer(shop.lead)).expect(200)).body.total).toBe(1);
    expect((await h.http().get('/api/pieces').query({ q: '_' }).set(bearer(shop.lead)).expect(200)).body.total).toBe(1);
    const page = await h.http().get('/api/pieces').query({ limit: 1, offset: 1 }).set(bearer(shop.lead)).expect(200);
    expect(page.body).toMatchObject({ total: 2, items: [expect.any(Object)] });

    const updated = await h
      .http()
      .patch(`/api/pieces/${a.body.id}`)
      .set(bearer(shop.lead))
      .send({ stage: 'pouring', notes: 'first layer tonight' })
      .expect(200);
    expect(updated.body).toMatchObject({ stage: 'pouring', notes: 'first layer tonight', name: 'Walnut tray' });
    await h.http().delete(`/api/pieces/${a.body.id}`).set(bearer(shop.lead)).expect(204);
    await h.http().get(`/api/pieces/${a.body.id}`).set(bearer(shop.lead)).expect(404);
    const audit = await h.http().get('/api/audit').query({ objectId: a.body.id }).set(bearer(shop.lead)).expect(200);
    expect(audit.body.items.map((e: { action: string }) => e.action)).toEqual(['piece.delete', 'piece.update', 'piece.create']);
  });

  it('refuses bad input with a 400 that names the field, and writes nothing', async () => {
    const shop = await createShop(h);
    const cases: [unknown, string][] = [
      [{ name: '' }, 'name'],
      [{ name: 'x'.repeat(121) }, 'name'],
      [{ name: 'ok', stage: 'cooked' }, 'stage'],
      [{ name: 'ok', notes: 'n'.repeat(4001) }, 'notes'],
      [{ name: 42 }, 'name'],
      [{ name: 'ok', colour: 'red' }, 'body'],
      [[1, 2], 'body'],
    ];
    for (const [body, field] of cases) {
      const res = await h
        .http()
        .post('/api/pieces')
        .set(bearer(shop.lead))
        .send(body as object)
        .expect(400);
      expect(Object.keys(res.body.error.fields)).toContain(field);
    }
    await h.http().get('/api/pieces').query({ limit: 100000 }).set(bearer(shop.lead)).expect(400);
    await h.http().get('/api/pieces/not-a-uuid').set(bearer(shop.lead)).expect(400);
    const n = await h.ds.query('SELECT count(*)::int AS n FROM pieces WHERE shop_id = $1', [shop.shopId]);
    expect(n[0].n).toBe(0);
  });

  it('stores text as given, SQL-looking or not', async () => {
    const shop = await createShop(h);
    const name = `Robert'); DROP TABLE pieces;-- 🌊 ñ`;
    const res = await h.http().post('/api/pieces').set(bearer(shop.lead)).send({ name }).expect(201);
    expect((await h.http().get(`/api/pieces/${res.body.id}`).set(bearer(shop.lead)).expect(200)).body.name).toBe(name);
  });
});
