import { randomInt } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { bearer, createShop, PASSWORD, useHarness, type Harness } from '../test-support/harness';
import { binaryStl, pocketMouldTriangles } from '../test-support/pocket-mould';

// Two API instances over one database, as a second instance behind a load balancer would run: every
// count below is made on both and must add up (OWASP ASVS 6.3.1 brute force, 2.4.1 costly functions).
const limits = { GELPOINT_AUTH_RATE_PER_15MIN: '3', GELPOINT_UPLOADS_PER_HOUR: '3' };
const first = useHarness(limits);
const second = useHarness(limits);
// Shops and members are made through an instance with the everyday limits: the suite's other files also
// sign in from 127.0.0.1, and their failures count against that address in the shared store.
const setup = useHarness();

const stl = binaryStl(pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 10 }));
// Room for two of these files and a half, so the third one does not fit.
const quota = useHarness({ GELPOINT_UPLOAD_QUOTA_MB: String((stl.length * 2.5) / 1024 / 1024) });

/**
 * The loopback proxy is trusted, so each test gives itself an address of its own (RFC 5737 documentation range). The
 * API counts the last one, the proxy's client: those are handed out in turn, never twice, since two tests drawing the
 * same one at random would share a count.
 */
let addressesMade = randomInt(0, 254);
const anAddress = () => `203.0.113.${randomInt(1, 255)}, 198.51.100.${(addressesMade++ % 254) + 1}`;
const instance = (i: number): Harness => (i % 2 === 0 ? first : second);

const upload = (h: Harness, session: { token: string }) =>
  h.http().post('/api/molds').set(bearer(session)).attach('file', stl, 'tray.stl').field('units', 'mm').field('up', 'z');
const moldsOf = async (h: Harness, shopId: string) =>
  ((await h.ds.query('SELECT count(*)::int AS n FROM molds WHERE shop_id = $1', [shopId])) as { n: number }[])[0]!.n;

describe('sign-in guard shared by every instance', () => {
  it('refuses the fourth wrong password for one account, whichever instance gets it, and says when to come back', async () => {
    const shop = await createShop(setup);
    const email = shop.lead.user.email;
    const address = anAddress();
    for (let i = 0; i < 3; i++) {
      await instance(i).http().post('/api/auth/login').set('X-Forwarded-For', address).send({ email, password: 'not the password' }).expect(401);
    }
    const blocked = await instance(3)
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', anAddress())
      .send({ email: email.toUpperCase(), password: PASSWORD })
      .expect(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
    expect(blocked.body.error.message).toMatch(/wait \d+ minute/);
    const retryAfterS = Number(blocked.headers['retry-after']);
    expect(retryAfterS).toBeGreaterThan(0);
    expect(retryAfterS).toBeLessThanOrEqual(15 * 60);
    expect(blocked.headers['ratelimit-policy']).toMatch(/^3;w=900/);
  });

  it('does not count members who sign in correctly', async () => {
    const shop = await createShop(setup);
    for (let i = 0; i < 5; i++) {
      await instance(i)
        .http()
        .post('/api/auth/login')
        .set('X-Forwarded-For', anAddress())
        .send({ email: shop.lead.user.email, password: PASSWORD })
        .expect(200);
    }
  });

  it('limits one address guessing at many accounts', async () => {
    const address = anAddress();
    for (let i = 0; i < 9; i++) {
      await instance(i)
        .http()
        .post('/api/auth/login')
        .set('X-Forwarded-For', address)
        .send({ email: `nobody-${i}-${randomInt(1e9)}@example.test`, password: 'guess' })
        .expect(401);
    }
    const blocked = await second
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', address)
      .send({ email: `fresh-${randomInt(1e9)}@example.test`, password: 'guess' })
      .expect(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
    await first
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', anAddress())
      .send({ email: `fresh-${randomInt(1e9)}@example.test`, password: 'guess' })
      .expect(401);
  });

  it('counts every reset request, so one person cannot be flooded with mail', async () => {
    const email = `reset-${randomInt(1e9)}@example.test`;
    for (let i = 0; i < 3; i++) await instance(i).http().post('/api/auth/password-reset').set('X-Forwarded-For', anAddress()).send({ email }).expect(202);
    const blocked = await second.http().post('/api/auth/password-reset').set('X-Forwarded-For', anAddress()).send({ email }).expect(429);
    expect(blocked.headers['retry-after']).toBeDefined();
  });
});

describe('uploads per member', () => {
  it('takes three uploads an hour from a member across both instances, refuses the fourth without storing it, and leaves others alone', async () => {
    const shop = await createShop(setup);
    const maker = await shop.member('maker');
    for (let i = 0; i < 3; i++) await upload(instance(i), maker).expect(202);
    const refused = await upload(second, maker).expect(429);
    expect(refused.body.error.code).toBe('too_many_uploads');
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    expect(await moldsOf(first, shop.shopId)).toBe(3);
    // The count is the member's, not the shop's or the address's.
    await upload(first, shop.lead).expect(202);
  });

  it('counts cure-check photos and log imports in the same allowance', async () => {
    const shop = await createShop(setup);
    const maker = await shop.member('maker');
    const pourId = '00000000-0000-4000-8000-000000000000';
    for (let i = 0; i < 3; i++) {
      await instance(i)
        .http()
        .post(`/api/pours/${pourId}/readings/csv`)
        .set(bearer(maker))
        .set('Content-Type', 'text/csv')
        .send('2026-11-01T10:00:00Z,21\n')
        .expect(404);
    }
    await upload(first, maker).expect(429);
  });
});

describe('storage allowance per member', () => {
  it('refuses the file that would pass the allowance with a 413 that says what to do, and stores nothing of it', async () => {
    const shop = await createShop(quota);
    const maker = await shop.member('maker');
    await upload(quota, maker).expect(202);
    await upload(quota, maker).expect(202);
    const refused = await upload(quota, maker).expect(413);
    expect(refused.body.error.code).toBe('upload_quota_exceeded');
    expect(refused.body.error.message).toMatch(/delete moulds you no longer need/);
    expect(await moldsOf(quota, shop.shopId)).toBe(2);
  });

  it('lets only as many of several uploads at once through as fit', async () => {
    const shop = await createShop(quota);
    const maker = await shop.member('maker');
    const statuses = (await Promise.all([0, 1, 2, 3].map(() => upload(quota, maker)))).map((r) => r.status).sort();
    expect(statuses).toEqual([202, 202, 413, 413]);
    expect(await moldsOf(quota, shop.shopId)).toBe(2);
  });
});
