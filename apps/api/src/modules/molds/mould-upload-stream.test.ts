import { createHash } from 'node:crypto';
import { request as httpRequest, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { EventSource } from 'eventsource';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { encodeStlBinary } from '@gelpoint/mesh';
import { heightFieldBlock } from '../../../../../packages/mesh/test/moulds';
import { analyseQueuedMouldsMeanwhile } from '../../test-support/fixtures';
import { bearer, createShop, PASSWORD, useHarness, type ShopFixture } from '../../test-support/harness';
import { binaryStl, pocketMouldTriangles } from '../../test-support/pocket-mould';

// A 1 MB limit, so a file past it is quick to send; heartbeats five times a second, so a test can hear them.
// Uploads are left to the worker here (GELPOINT_ANALYSE_ON_UPLOAD=false), whose progress the stream follows.
const h = useHarness({ GELPOINT_MAX_STL_MB: '1', GELPOINT_EVENTS_HEARTBEAT_S: '0.2', GELPOINT_ANALYSE_ON_UPLOAD: 'false' });

// Block 100 × 60 × 30 mm with an 80 × 40 mm pocket whose floor is at z = 10: resin filled to the top stands 20 mm deep
// over the whole pocket floor (a prism: CRC Concise Encyclopedia of Mathematics, volume = base × height).
const pocket = binaryStl(pocketMouldTriangles({ outer: [100, 60, 30], pocket: [10, 10, 90, 50], floorZ: 10 }));

let shop: ShopFixture;
let maker: Awaited<ReturnType<ShopFixture['member']>>;
let server: Server;
let base: string;

beforeAll(async () => {
  shop = await createShop(h, 'Streaming shop');
  maker = await shop.member('maker');
  server = h.app.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(async () => {
  server?.closeAllConnections();
  await new Promise((resolve) => server?.close(resolve));
});

const upload = (bytes: Buffer, name = 'tray pocket.stl') => h.http().post('/api/molds').set(bearer(maker)).field('units', 'mm').attach('file', bytes, name);
const count = async (sql: string, params: unknown[]) => ((await h.ds.query(`SELECT count(*)::int AS n FROM ${sql}`, params)) as [{ n: number }])[0].n;

describe('a streamed mould upload', () => {
  it('stores the file once, under the SHA-256 of the very bytes sent, as PostgreSQL itself hashes what it stored', async () => {
    // A terrain block of 19 208 triangles (about 0.9 MB): the upload arrives in many chunks.
    const bytes = Buffer.from(
      encodeStlBinary(
        heightFieldBlock({ width: 120, depth: 80, bottomZ: 0, nx: 96, ny: 96, top: (x, y) => 30 - 5 * Math.sin(x / 17) * Math.cos(y / 13) }),
        'solid terrain',
      ),
    );
    expect(bytes.length).toBeGreaterThan(800_000);
    const res = await upload(bytes, 'terrain.stl').expect(202);
    // Node's own SHA-256 of what was sent, and PostgreSQL's sha256() of what was stored: two implementations apart from ours.
    const sent = createHash('sha256').update(bytes).digest('hex');
    expect(res.body).toMatchObject({ sha256: sent, sizeBytes: bytes.length, format: 'stl', status: 'queued' });
    const [stored] = (await h.ds.query(
      `SELECT encode(sha256(f.bytes), 'hex') AS hash, octet_length(f.bytes) AS size, m.sha256, m.triangle_count FROM mold_files f JOIN molds m ON m.id = f.mold_id WHERE m.id = $1`,
      [res.body.id],
    )) as [{ hash: string; size: number; sha256: string; triangle_count: number }];
    expect(stored).toEqual({ hash: sent, size: bytes.length, sha256: sent, triangle_count: 2 * 96 * 96 + 4 * 96 * 3 });
  });

  it('refuses a file past the limit with 413 while it is still being sent, and keeps nothing of it', async () => {
    const moulds = await count('molds WHERE shop_id = $1', [shop.shopId]);
    const files = await count('mold_files f JOIN molds m ON m.id = f.mold_id WHERE m.shop_id = $1', [shop.shopId]);
    // Sent in chunks without a declared length, so only the bytes themselves can tell the size; the request is never
    // finished: the answer must come while the client is still sending.
    const boundary = 'gelpoint-test-boundary';
    const answer = await new Promise<{ status: number; body: string }>((resolve, reject) => {
      const req = httpRequest(`${base}/api/molds`, {
        method: 'POST',
        headers: { ...bearer(maker), 'Content-Type': `multipart/form-data; boundary=${boundary}`, 'Transfer-Encoding': 'chunked' },
      });
      req.on('response', (res) => {
        let body = '';
        res.on('data', (b: Buffer) => (body += b.toString()));
        res.on('end', () => {
          resolve({ status: res.statusCode ?? 0, body });
          req.destroy();
        });
      });
      req.on('error', reject);
      req.write(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="huge.stl"\r\nContent-Type: application/octet-stream\r\n\r\n`);
      const chunk = Buffer.alloc(64 * 1024, 7);
      for (let sent = 0; sent < 1.5 * 1024 * 1024; sent += chunk.length) req.write(chunk);
    });
    expect(answer.status).toBe(413);
    expect(JSON.parse(answer.body).error).toMatchObject({ code: 'file_too_large', message: expect.stringMatching(/larger than 1 MB/) });
    // A request that says up front it is too large is refused before its body is read.
    const declared = await upload(Buffer.alloc(2 * 1024 * 1024, 1), 'declared.stl');
    expect(declared.status).toBe(413);
    expect(declared.body.error.code).toBe('file_too_large');
    expect(await count('molds WHERE shop_id = $1', [shop.shopId])).toBe(moulds);
    expect(await count('mold_files f JOIN molds m ON m.id = f.mold_id WHERE m.shop_id = $1', [shop.shopId])).toBe(files);
  });

  it('refuses a file the reader cannot read with its sentence, writing nothing', async () => {
    const moulds = await count('molds WHERE shop_id = $1', [shop.shopId]);
    const bad = await upload(Buffer.from('solid broken\n  facet normal 0 0 1\n    outer loop\n      vertex 0 0\n'), 'broken.stl').expect(422);
    expect(bad.body.error.message.length).toBeGreaterThan(10);
    expect(await count('molds WHERE shop_id = $1', [shop.shopId])).toBe(moulds);
  });
});

interface Received {
  type: string;
  data: { status: string; progress: number; error: unknown };
}

/** The browser's own way in: the session cookie from signing in, which an EventSource sends as any GET does. */
async function sessionCookie(): Promise<string> {
  const login = await h.http().post('/api/auth/login').send({ email: maker.user.email, password: PASSWORD }).expect(200);
  const cookie = /gp_session=[^;]+/.exec(String(login.headers['set-cookie']));
  expect(cookie).not.toBeNull();
  return cookie![0];
}

/** Reads a stream's raw text for a while (or to its end), as it arrives. */
async function readStream(url: string, headers: Record<string, string>, forMs: number): Promise<{ status: number; text: string; ended: boolean }> {
  const stop = new AbortController();
  const res = await fetch(url, { headers, signal: stop.signal });
  let text = '';
  let ended = false;
  const timer = setTimeout(() => stop.abort(), forMs);
  try {
    for await (const chunk of res.body ?? []) text += Buffer.from(chunk).toString();
    ended = true;
  } catch (err) {
    if (!stop.signal.aborted) throw err;
  } finally {
    clearTimeout(timer);
  }
  return { status: res.status, text, ended };
}

describe("a mould's analysis as it runs, and its depth map", () => {
  let analysed: string;

  it('streams the analysis in order, to a browser signed in with its cookie, ending with ready', async () => {
    const res = await upload(pocket).expect(202);
    analysed = res.body.id;
    const cookie = await sessionCookie();
    const received: Received[] = [];
    const source = new EventSource(`${base}/api/molds/${analysed}/events`, {
      fetch: (input, init) => fetch(input, { ...init, headers: { ...init?.headers, Cookie: cookie } }),
    });
    const done = new Promise<void>((resolve, reject) => {
      const keep = (type: string) => (e: MessageEvent) => {
        received.push({ type, data: JSON.parse(e.data as string) });
        if (type !== 'progress') {
          source.close();
          resolve();
        }
      };
      source.addEventListener('progress', keep('progress'));
      source.addEventListener('ready', keep('ready'));
      source.addEventListener('failed', keep('failed'));
      source.addEventListener('error', () => {
        if (source.readyState === EventSource.CLOSED) reject(new Error('the event stream was refused'));
      });
    });
    // The first event is the state now; the worker starts once the stream is open.
    while (received.length === 0) await new Promise((r) => setTimeout(r, 20));
    expect(received[0]).toEqual({ type: 'progress', data: { status: 'queued', progress: 0, error: null } });
    await analyseQueuedMouldsMeanwhile();
    await done;

    const last = received.at(-1)!;
    expect(last).toEqual({ type: 'ready', data: { status: 'ready', progress: 1, error: null } });
    const running = received.slice(1, -1);
    expect(running.length).toBeGreaterThanOrEqual(2);
    expect(running.every((e) => e.type === 'progress' && e.data.status === 'analysing')).toBe(true);
    const progress = received.map((e) => e.data.progress);
    expect(progress).toEqual([...progress].sort((a, b) => a - b));

    // A stream opened on a finished mould says so at once and closes.
    const after = await readStream(`${base}/api/molds/${analysed}/events`, { Cookie: cookie }, 5_000);
    expect(after.ended).toBe(true);
    expect(after.text).toMatch(/event: ready\ndata: \{"status":"ready","progress":1,"error":null\}\n\n$/);
    // The worker starts from source (tsx) in the tests, which takes a while on a busy machine.
  }, 90_000);

  it('keeps a quiet stream open with comments, and streams nothing to strangers', async () => {
    const queued = (await upload(pocket, 'waiting.stl').expect(202)).body.id as string;
    const quiet = await readStream(`${base}/api/molds/${queued}/events`, bearer(maker), 900);
    expect(quiet.status).toBe(200);
    expect(quiet.ended).toBe(false);
    expect(quiet.text.startsWith('retry: 3000\n\nevent: progress\ndata: {"status":"queued","progress":0,"error":null}\n\n')).toBe(true);
    expect(quiet.text.match(/^: still here$/gm)?.length ?? 0).toBeGreaterThanOrEqual(2);

    expect((await fetch(`${base}/api/molds/${queued}/events`)).status).toBe(401);
    const stranger = await createShop(h, 'Other streaming shop');
    const theirs = await fetch(`${base}/api/molds/${queued}/events`, { headers: bearer(stranger.lead) });
    expect(theirs.status).toBe(404);
    expect(theirs.headers.get('content-type')).toMatch(/application\/json/);
  });

  it('serves the depth map on its own, with a strong ETag that answers 304 while it holds', async () => {
    const first = await h.http().get(`/api/molds/${analysed}/depth-map`).set(bearer(maker)).expect(200);
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^"[A-Za-z0-9_-]{43}"$/);
    expect(first.headers['cache-control']).toBe('private, no-cache');
    const map = first.body as { nx: number; ny: number; depthsMm: number[]; levelMm: number; dam: string; cellMm: [number, number] };
    expect(map).toMatchObject({ levelMm: 30, dam: 'outline' });
    expect(map.depthsMm.length).toBe(map.nx * map.ny);
    // 20 mm of resin over the pocket floor (30 − 10); the wet cells cover the 80 × 40 mm floor.
    expect(Math.max(...map.depthsMm)).toBeCloseTo(20, 3);
    const wetAreaMm2 = map.depthsMm.filter((d) => d > 0).length * map.cellMm[0] * map.cellMm[1];
    expect(Math.abs(wetAreaMm2 - 80 * 40) / (80 * 40)).toBeLessThan(0.1);

    const again = await h.http().get(`/api/molds/${analysed}/depth-map`).set(bearer(maker)).set('If-None-Match', etag).expect(304);
    expect(again.text ?? '').toBe('');
    expect(again.headers.etag).toBe(etag);
    // If-None-Match compares weakly (RFC 9110 §13.1.2), and names may come in a list.
    await h.http().get(`/api/molds/${analysed}/depth-map`).set(bearer(maker)).set('If-None-Match', `"other", W/${etag}`).expect(304);
    await h.http().get(`/api/molds/${analysed}/depth-map`).set(bearer(maker)).set('If-None-Match', '"other"').expect(200);

    const waiting = (await upload(pocket, 'not yet.stl').expect(202)).body.id as string;
    const early = await h.http().get(`/api/molds/${waiting}/depth-map`).set(bearer(maker)).expect(409);
    expect(early.body.error.code).toBe('mold_not_ready');
  });

  it('answers the mould itself without the depth map', async () => {
    const mould = (await h.http().get(`/api/molds/${analysed}`).set(bearer(maker)).expect(200)).body;
    expect(mould.status).toBe('ready');
    expect(mould.report.fillToTop.volumeMm3).toBeCloseTo(80 * 40 * 20, -1);
    expect(mould.report.fillToTop).not.toHaveProperty('depthMap');
    expect(JSON.stringify(mould)).not.toMatch(/depthsMm/);
  });
});
