import { describe, expect, it } from 'vitest';
import { bearer, createShop, useHarness } from '../../test-support/harness';

const h = useHarness();

describe('the shop currency', () => {
  it('starts as USD, takes any ISO 4217 code the runtime knows, in either case, and keeps it', async () => {
    const shop = await createShop(h, 'Currency shop');
    const lead = bearer(shop.lead);
    expect((await h.http().get('/api/shop').set(lead).expect(200)).body.currency).toBe('USD');
    // ISO 4217: MXN is the Mexican peso, CAD the Canadian dollar.
    const mxn = await h.http().patch('/api/shop').set(lead).send({ currency: 'MXN' }).expect(200);
    expect(mxn.body.currency).toBe('MXN');
    const cad = await h.http().patch('/api/shop').set(lead).send({ currency: ' cad ' }).expect(200);
    expect(cad.body.currency).toBe('CAD');
    const read = await h.http().get('/api/shop').set(lead).expect(200);
    expect(read.body).toMatchObject({ currency: 'CAD', unitSystem: 'metric', name: 'Currency shop' });
    // Changing the currency leaves the other settings as they were.
    expect(read.body.offRatioTolerancePct).toBe(3);
    const audit = await h.http().get('/api/audit').query({ objectType: 'shop' }).set(lead).expect(200);
    expect(audit.body.items[0]).toMatchObject({ action: 'shop.update', detail: { currency: 'CAD' } });
  });

  it('refuses a code that is not a currency with a 400 and a sentence, and keeps the old one', async () => {
    const shop = await createShop(h, 'Currency shop');
    const lead = bearer(shop.lead);
    await h.http().patch('/api/shop').set(lead).send({ currency: 'MXN' }).expect(200);
    for (const bad of ['ABC', 'dollars', '$', '', 'US', 'USDX', 12]) {
      const res = await h.http().patch('/api/shop').set(lead).send({ currency: bad }).expect(400);
      expect(res.body.error.fields.currency).toMatch(/ISO 4217/);
      expect(res.body.error.message).toMatch(/currency/);
    }
    expect((await h.http().get('/api/shop').set(lead).expect(200)).body.currency).toBe('MXN');
    // Only the lead changes it.
    const maker = await shop.member('maker');
    await h.http().patch('/api/shop').set(bearer(maker)).send({ currency: 'USD' }).expect(403);
  });

  it('holds only three capital letters in the database, whatever reaches it', async () => {
    const shop = await createShop(h, 'Currency shop');
    await expect(h.ds.query(`UPDATE shops SET currency = 'usd' WHERE id = $1`, [shop.shopId])).rejects.toThrow(/shops_currency_check/);
  });
});
