import { get, type IncomingHttpHeaders } from 'node:http';
import type { AddressInfo } from 'node:net';
import { gunzipSync } from 'node:zlib';
import express from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { compressAnswers } from './compress-answers';

// The middleware on a bare app with three kinds of answer: a large JSON list, a small one, and a
// Server-Sent Events stream whose first event must reach the client before the stream ends
// (WHATWG HTML, server-sent events: the stream is read as it arrives).
const app = express();
app.use(compressAnswers());
const rows = Array.from({ length: 400 }, (_, i) => ({ id: i, name: `pour ${i}`, tempC: 20 + (i % 7) }));
app.get('/large', (_req, res) => void res.json(rows));
app.get('/small', (_req, res) => void res.json({ ok: true }));
app.get('/events', (req, res) => {
  res.setHeader('Content-Type', 'text/event-stream');
  res.setHeader('Cache-Control', 'no-cache');
  res.flushHeaders();
  res.write(`data: ${'x'.repeat(2000)}\n\n`);
  // Held open until the client has seen the first event, then ended.
  req.on('close', () => res.end());
});

let base = '';
let server: ReturnType<typeof app.listen>;
beforeAll(async () => {
  server = app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

function fetchRaw(path: string, headers: Record<string, string>): Promise<{ headers: IncomingHttpHeaders; body: Buffer }> {
  return new Promise((resolve, reject) => {
    get(`${base}${path}`, { headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
    }).on('error', reject);
  });
}

describe('compressAnswers', () => {
  it('gzips a large JSON answer for a client that accepts it, and the bytes decode to the same JSON', async () => {
    const r = await fetchRaw('/large', { 'Accept-Encoding': 'gzip' });
    expect(r.headers['content-encoding']).toBe('gzip');
    expect(JSON.parse(gunzipSync(r.body).toString('utf8'))).toEqual(rows);
    const plain = await fetchRaw('/large', {});
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(r.body.length).toBeLessThan(plain.body.length / 3);
  });

  it('leaves an answer under 1 kB as it is', async () => {
    const r = await fetchRaw('/small', { 'Accept-Encoding': 'gzip' });
    expect(r.headers['content-encoding']).toBeUndefined();
  });

  it('streams Server-Sent Events uncompressed, the first event arriving while the stream is still open', async () => {
    const first = await new Promise<{ encoding: string | undefined; text: string }>((resolve, reject) => {
      const req = get(`${base}/events`, { headers: { 'Accept-Encoding': 'gzip, br', Accept: 'text/event-stream' } }, (res) => {
        res.setEncoding('utf8');
        res.once('data', (text: string) => {
          resolve({ encoding: res.headers['content-encoding'], text });
          req.destroy();
        });
      });
      req.on('error', (err) => (err.message === 'socket hang up' ? undefined : reject(err)));
      setTimeout(() => reject(new Error('no event within 3 s: the stream was held back')), 3_000).unref();
    });
    expect(first.encoding).toBeUndefined();
    expect(first.text.startsWith('data: xxx')).toBe(true);
  });
});
