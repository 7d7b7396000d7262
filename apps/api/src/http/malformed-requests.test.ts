import { gzipSync } from 'node:zlib';
import { beforeAll, describe, expect, it } from 'vitest';
import { bearer, createShop, useHarness, type ShopFixture } from '../test-support/harness';

// What a broken client or a curious visitor sends below the level of the route schemas: the HTTP layer's
// own refusals must be 4xx with a sentence, like everything else (RFC 3986 §2.1 percent-encoding,
// RFC 9110 §8.4 Content-Encoding).
const h = useHarness();
let shop: ShopFixture;
beforeAll(async () => {
  shop = await createShop(h);
});

describe('requests the HTTP layer refuses', () => {
  it('answers a path with a broken %-escape with a 400, not a 500', async () => {
    const res = await h.http().get('/api/pieces/%E0%A4%A').set(bearer(shop.lead)).expect(400);
    expect(res.body.error.code).toBe('bad_path');
    expect(res.body.error.message).toMatch(/%-escape/);
  });

  it('answers a body that does not match its Content-Encoding with a 400, and reads one that does', async () => {
    const bad = await h
      .http()
      .post('/api/pieces')
      .set(bearer(shop.lead))
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'gzip')
      .send('not gzip at all')
      .expect(400);
    expect(bad.body.error.code).toBe('bad_encoding');
    const compressed = h.http().post('/api/pieces').set(bearer(shop.lead)).set('Content-Type', 'application/json').set('Content-Encoding', 'gzip');
    // Written to the request as bytes: send() would serialize a Buffer as JSON under this Content-Type.
    compressed.write(gzipSync(JSON.stringify({ name: 'Sent compressed' })));
    const good = await compressed;
    expect(good.status, JSON.stringify(good.body)).toBe(201);
    expect(good.body.name).toBe('Sent compressed');
  });

  it('serves nothing outside the built app for an encoded climb out of /assets', async () => {
    for (const path of ['/assets/..%2f..%2fpackage.json', '/assets/%2e%2e/%2e%2e/package.json']) {
      const res = await h.http().get(path);
      expect(res.status, path).toBe(404);
      expect(res.text).not.toContain('"workspaces"');
    }
  });
});
