import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { createServer, get, type IncomingHttpHeaders, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, useHarness } from '../test-support/harness';
import { PNG_BYTES, newMarker, stockShop, stockedMould, type StockedShop } from '../test-support/stocked-shop';

// The built web app (npm test builds it first) served by the real app on a real socket, read byte for
// byte: compressed bodies are decoded with Node's own zlib and must equal the file on disk. Header
// semantics: RFC 9110 §8.4 (Content-Encoding), §12.5.3 (Accept-Encoding), §12.5.5 (Vary);
// RFC 9111 §5.2.2.5 (no-cache); RFC 8246 (immutable).
const h = useHarness();
let server: Server;
let base = '';
let shop: StockedShop;

interface RawAnswer {
  status: number;
  headers: IncomingHttpHeaders;
  body: Buffer;
}

function rawGet(path: string, headers: Record<string, string> = {}): Promise<RawAnswer> {
  return new Promise((resolve, reject) => {
    get(`${base}${path}`, { headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
      res.on('error', reject);
    }).on('error', reject);
  });
}

function builtDist(): string {
  const dir = h.config.webDist;
  if (!existsSync(join(dir, 'index.html'))) throw new Error(`the web app is not built in ${dir}: run npm run build (npm test does)`);
  return dir;
}

/** The entry script named in the built index.html: hashed, and big enough to have been precompressed. */
function entryScript(dir: string): string {
  const html = readFileSync(join(dir, 'index.html'), 'utf8');
  const src = /<script[^>]+src="\/assets\/([^"]+\.js)"/.exec(html)?.[1];
  if (!src) throw new Error('index.html names no script under /assets/');
  return src;
}

beforeAll(async () => {
  server = createServer(h.app.app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  shop = await stockShop(h, newMarker('gz'));
});

afterAll(async () => {
  await new Promise<void>((resolve) => server?.close(() => resolve()));
});

describe('the built web app', () => {
  it('has a .br and a .gz twin beside every hashed script and stylesheet above 1 kB', () => {
    const assets = join(builtDist(), 'assets');
    const files = readdirSync(assets);
    const big = files.filter((f) => /\.(js|css)$/.test(f) && readFileSync(join(assets, f)).length > 1024);
    expect(big.length).toBeGreaterThan(0);
    for (const f of big) {
      expect(files, f).toContain(`${f}.br`);
      expect(files, f).toContain(`${f}.gz`);
    }
  });

  it('answers a hashed asset in brotli, gzip or as it is, by Accept-Encoding, cached for a year as immutable', async () => {
    const dir = builtDist();
    const name = entryScript(dir);
    const original = readFileSync(join(dir, 'assets', name));

    const br = await rawGet(`/assets/${name}`, { 'Accept-Encoding': 'gzip, deflate, br' });
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.body.length).toBeLessThan(original.length / 2);
    expect(brotliDecompressSync(br.body).equals(original)).toBe(true);

    const gz = await rawGet(`/assets/${name}`, { 'Accept-Encoding': 'gzip' });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).equals(original)).toBe(true);

    const plain = await rawGet(`/assets/${name}`, { 'Accept-Encoding': 'identity' });
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.equals(original)).toBe(true);
    const none = await rawGet(`/assets/${name}`);
    expect(none.headers['content-encoding']).toBeUndefined();
    expect(none.body.equals(original)).toBe(true);

    for (const a of [br, gz, plain, none]) {
      expect(a.headers['content-type']).toMatch(/^(text|application)\/javascript/);
      expect(a.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect(a.headers.vary).toMatch(/Accept-Encoding/i);
    }
  });

  it('revalidates the HTML on every visit, for index.html and a deep link alike, and keeps the CSP', async () => {
    for (const path of ['/', '/pieces', '/pour-plans/new']) {
      const r = await rawGet(path, { 'Accept-Encoding': 'br, gzip' });
      expect(r.status, path).toBe(200);
      expect(r.headers['content-type']).toMatch(/^text\/html/);
      expect(r.headers['cache-control'], path).toBe('no-cache');
      expect(r.headers['content-security-policy']).toContain("script-src 'self'");
    }
  });

  it('answers a hashed asset that does not exist with a 404, not the app', async () => {
    const r = await rawGet('/assets/nothing-here-0000.js', { 'Accept-Encoding': 'br' });
    expect(r.status).toBe(404);
    expect(r.body.toString()).not.toContain('<html');
  });
});

describe('API answers', () => {
  it('compresses a large JSON answer when the client accepts it, and only then', async () => {
    const gz = await rawGet('/api/openapi.json', { 'Accept-Encoding': 'gzip' });
    expect(gz.status).toBe(200);
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.headers.vary).toMatch(/Accept-Encoding/i);
    const document = JSON.parse(gunzipSync(gz.body).toString('utf8')) as { paths: Record<string, unknown> };
    expect(Object.keys(document.paths).length).toBeGreaterThan(20);

    const br = await rawGet('/api/openapi.json', { 'Accept-Encoding': 'br' });
    expect(br.headers['content-encoding']).toBe('br');
    expect(JSON.parse(brotliDecompressSync(br.body).toString('utf8'))).toEqual(document);

    const plain = await rawGet('/api/openapi.json');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(JSON.parse(plain.body.toString('utf8'))).toEqual(document);
  });

  it('leaves a small answer as it is', async () => {
    const r = await rawGet('/api/health', { 'Accept-Encoding': 'gzip, br' });
    expect(r.status).toBe(200);
    expect(r.headers['content-encoding']).toBeUndefined();
    expect(r.body.length).toBeLessThan(1024);
  });

  it('still hands over the STL download and a cure-check photo byte for byte', async () => {
    const auth = bearer(shop.lead);
    const stl = await rawGet(`/api/molds/${shop.ids.mold}/stl`, { ...auth, 'Accept-Encoding': 'gzip' });
    expect(stl.status).toBe(200);
    expect(stl.headers['content-disposition']).toMatch(/^attachment/);
    const stlBytes = stl.headers['content-encoding'] === 'gzip' ? gunzipSync(stl.body) : stl.body;
    expect(stlBytes.equals(stockedMould())).toBe(true);

    const photo = await rawGet(`/api/pours/${shop.ids.pour}/checks/${shop.ids.check}/photo`, { ...auth, 'Accept-Encoding': 'gzip, br' });
    expect(photo.status).toBe(200);
    expect(photo.headers['content-encoding']).toBeUndefined();
    expect(photo.body.equals(PNG_BYTES)).toBe(true);
  });
});
