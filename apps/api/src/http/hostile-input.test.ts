import { zipSync } from 'fflate';
import { beforeAll, describe, expect, it } from 'vitest';
import { ZodObject, type ZodType } from 'zod';
import { bearer, useHarness } from '../test-support/harness';
import { judge, sendAll, type Answer, type Attempt } from '../test-support/hostile-requests';
import {
  PNG_BYTES,
  fillPath,
  newMarker,
  pathParams,
  routeKey,
  stockShop,
  stockedMould,
  validParts,
  type StockedShop,
  type ValidParts,
} from '../test-support/stocked-shop';
import { tenantRowCounts } from '../test-support/tenant-rows';
import type { RegisteredRoute } from './route-registry';

// Every registered route under hostile input (OWASP ASVS 5.0 chapter 2 and 8 style input handling):
// the cases are derived from the registry and from one valid request per route, so a new route
// cannot ship without being sent malformed JSON, mistyped fields, huge strings, NUL characters,
// SQL-looking text and absurd numbers. Refusals must be a 4xx with a code and a sentence, and the
// refused batch must leave every table of the shop as it was.

// Uploads are rate-limited per member; this file sends hundreds on purpose.
const h = useHarness({ GELPOINT_UPLOADS_PER_HOUR: '100000' });
let shop: StockedShop;
let parts: Record<string, ValidParts>;

beforeAll(async () => {
  shop = await stockShop(h, newMarker('hostile'));
  parts = validParts(shop);
}, 60_000);

const ONE_MB = 1024 * 1024;
const TEN_KB = 'x'.repeat(10 * 1024);
const SQL_TEXT = "'; drop table shops; --";
const ODD_TEXT = ['🪵 walnut 🙂 \u202Eטקסט מימין לשמאל\u202C e\u0301\u0301 <script>alert(1)</script>', SQL_TEXT];
const ODD_NUMBERS = ['-1', '-0', '1e308'];
const BAD_PARAMS = ['not-a-uuid', encodeURIComponent("' OR '1'='1"), '%00', '99999999999999999999', 'x'.repeat(6000)];
const ODD_QUERY = [SQL_TEXT, '\u0000', '-1', '1e308', 'NaN', ''];

const isPassword = (path: string) => /password/i.test(path);

/** Every leaf of a JSON value with its dotted path (arrays by their first element). */
function leaves(value: unknown, path = ''): { path: string; value: unknown }[] {
  if (Array.isArray(value)) return value.length ? leaves(value[0], path ? `${path}.0` : '0') : [];
  if (value && typeof value === 'object') return Object.entries(value).flatMap(([k, v]) => leaves(v, path ? `${path}.${k}` : k));
  return [{ path, value }];
}

const PLACEHOLDER = '"__hostile_raw__"';
/** The body as JSON text with one leaf replaced by raw JSON text (so 1e999 and -0 reach the server as written). */
function withLeaf(body: unknown, path: string, rawJson: string): string {
  const copy = structuredClone(body) as Record<string, unknown>;
  const keys = path.split('.');
  let at: Record<string, unknown> = copy;
  for (const k of keys.slice(0, -1)) at = at[k] as Record<string, unknown>;
  at[keys.at(-1)!] = '__hostile_raw__';
  return JSON.stringify(copy).replace(PLACEHOLDER, rawJson);
}

function wrongTypesFor(value: unknown): string[] {
  if (typeof value === 'string') return ['12345', '["a"]', 'true'];
  if (typeof value === 'number') return ['"NaN"', '{}', '1e999'];
  if (typeof value === 'boolean') return ['"true"', '1', '{}', '[]'];
  return ['12345', '"not-a-value"', 'true'];
}

function urlOf(route: RegisteredRoute, p: ValidParts, params = pathParams(route.fullPath, shop), query = p.query): string {
  const qs = query ? new URLSearchParams(query).toString() : '';
  return fillPath(route.fullPath, params) + (qs ? `?${qs}` : '');
}

const headersOf = (p: ValidParts) => ({ ...bearer(shop.lead), ...(p.headers ?? {}) });
const shapeKeys = (schema: ZodType) => (schema instanceof ZodObject ? Object.keys(schema.shape) : []);
const routes = () => h.app.registry.routes;

function formAttempt(route: RegisteredRoute, p: ValidParts, label: string, fields: [string, string][], expect: Attempt['expect'], field?: string): Attempt {
  const files = route.fullPath === '/api/molds' ? [{ part: 'file', bytes: stockedMould(), name: 'hostile.stl' }] : [];
  return { label, method: route.method, url: urlOf(route, p), headers: headersOf(p), form: { fields, files }, expect, field };
}

function refusedBatch(): Attempt[] {
  const out: Attempt[] = [];
  for (const route of routes()) {
    const p = parts[routeKey(route)] ?? {};
    const url = urlOf(route, p);
    const base = { method: route.method, url, headers: headersOf(p), expect: 'reject' as const };
    out.push({ ...base, label: 'malformed JSON', raw: '{"name": "unterminated', status: 400, code: 'malformed_json' });
    if (route.method !== 'get')
      out.push({ ...base, label: '1 MB string', raw: JSON.stringify({ name: 'x'.repeat(ONE_MB) }), status: 413, code: 'body_too_large' });

    if (route.body && p.body) {
      for (const raw of ['[]', '"text"', 'null', '42']) out.push({ ...base, label: `body is ${raw}`, raw });
      for (const leaf of leaves(p.body)) {
        for (const raw of wrongTypesFor(leaf.value))
          out.push({ ...base, label: `${leaf.path} = ${raw}`, raw: withLeaf(p.body, leaf.path, raw), field: leaf.path });
        if (typeof leaf.value === 'string') {
          out.push({ ...base, label: `${leaf.path} = 10 kB`, raw: withLeaf(p.body, leaf.path, JSON.stringify(TEN_KB)), field: leaf.path });
          if (!isPassword(leaf.path))
            out.push({ ...base, label: `${leaf.path} has NUL`, raw: withLeaf(p.body, leaf.path, JSON.stringify(`a\u0000${leaf.value}`)) });
        }
      }
    }
    if (route.body && p.form) {
      const fields = Object.entries(p.form);
      out.push({ ...base, label: 'JSON instead of multipart', raw: JSON.stringify(p.form) });
      out.push(formAttempt(route, p, 'unknown form field', [...fields, ['hostileExtra', '1']], 'reject'));
      fields.forEach(([name, value], i) => {
        const others = fields.filter((_, j) => j !== i);
        out.push(formAttempt(route, p, `${name} = 10 kB`, [...others, [name, TEN_KB]], 'reject'));
        out.push(formAttempt(route, p, `${name} has NUL`, [...others, [name, `a\u0000${value}`]], 'reject'));
        out.push(formAttempt(route, p, `${name} twice`, [...fields, [name, value]], 'reject'));
      });
    }
    const own = pathParams(route.fullPath, shop);
    for (const name of Object.keys(own)) {
      for (const bad of BAD_PARAMS) {
        // Sent as written: the router decodes what the client sent, so %00 arrives as a NUL.
        const path = route.fullPath.replace(/:([A-Za-z]+)/g, (_m, k: string) => (k === name ? bad : encodeURIComponent(own[k]!)));
        out.push({
          ...base,
          url: path + url.slice(fillPath(route.fullPath, own).length),
          label: `:${name} = ${bad.slice(0, 30)}`,
          raw: p.body ? JSON.stringify(p.body) : undefined,
        });
      }
    }
    if (route.query) {
      const query = p.query ?? {};
      const keys = shapeKeys(route.query);
      out.push({ ...base, url: urlOf(route, p, undefined, { ...query, hostileExtra: '1' }), label: 'unknown query key' });
      for (const k of keys) {
        const others = new URLSearchParams(Object.entries(query).filter(([q]) => q !== k));
        others.append(k, query[k] ?? '1');
        others.append(k, query[k] ?? '2');
        out.push({ ...base, url: `${fillPath(route.fullPath, pathParams(route.fullPath, shop))}?${others}`, label: `?${k} twice` });
        out.push({ ...base, url: urlOf(route, p, undefined, { ...query, [k]: TEN_KB }), label: `?${k} = 10 kB` });
      }
    }
  }
  return out;
}

function toleratedBatch(): Attempt[] {
  const out: Attempt[] = [];
  for (const route of routes()) {
    const p = parts[routeKey(route)] ?? {};
    const base = { method: route.method, url: urlOf(route, p), headers: headersOf(p), expect: 'tolerate' as const };
    if (route.body && p.body) {
      out.push({ ...base, label: 'unknown top-level key', raw: JSON.stringify({ ...p.body, hostileExtra: 1 }) });
      for (const leaf of leaves(p.body)) {
        if (typeof leaf.value === 'string')
          for (const s of ODD_TEXT) out.push({ ...base, label: `${leaf.path} = ${s}`, raw: withLeaf(p.body, leaf.path, JSON.stringify(s)), field: leaf.path });
        if (typeof leaf.value === 'number')
          for (const n of ODD_NUMBERS) out.push({ ...base, label: `${leaf.path} = ${n}`, raw: withLeaf(p.body, leaf.path, n), field: leaf.path });
        if (isPassword(leaf.path))
          out.push({ ...base, label: `${leaf.path} has NUL`, raw: withLeaf(p.body, leaf.path, JSON.stringify('a\u0000 long secret')) });
      }
    }
    if (route.body && p.form) {
      const fields = Object.entries(p.form);
      fields.forEach(([name], i) => {
        const others = fields.filter((_, j) => j !== i);
        for (const s of [SQL_TEXT, '🪵 🙂', '-1', '1e308']) out.push(formAttempt(route, p, `${name} = ${s}`, [...others, [name, s]], 'tolerate'));
      });
    }
    if (route.query) {
      const query = p.query ?? {};
      for (const k of shapeKeys(route.query))
        for (const v of ODD_QUERY) out.push({ ...base, url: urlOf(route, p, undefined, { ...query, [k]: v }), label: `?${k} = ${JSON.stringify(v)}` });
    }
  }
  return out;
}

const failuresOf = (answers: Answer[]) => answers.map(judge).filter((f): f is string => f !== undefined);
const scope = () => ({ shopIds: [shop.shopId], marker: shop.marker });

describe('hostile input on every route', () => {
  it('has a valid request for every route that validates a body or a query, and each passes its schema', () => {
    const missing: string[] = [];
    for (const route of routes()) {
      const key = routeKey(route);
      const p = parts[key];
      pathParams(route.fullPath, shop);
      if (route.params) expect(route.params.safeParse(pathParams(route.fullPath, shop)).success, `${key} params`).toBe(true);
      if (route.body) {
        const body = p?.body ?? p?.form;
        if (!body) missing.push(`${key} body`);
        else expect(route.body.safeParse(body).error?.issues ?? [], `${key} body`).toEqual([]);
      }
      if (route.query && !p?.query && shapeKeys(route.query).length) missing.push(`${key} query`);
      if (route.query && p?.query) expect(route.query.safeParse(p.query).error?.issues ?? [], `${key} query`).toEqual([]);
    }
    expect(missing).toEqual([]);
  });

  it('refuses malformed, mistyped, oversized and NUL-carrying requests with a 4xx that says what to fix, and writes nothing', async () => {
    const attempts = refusedBatch();
    expect(attempts.length).toBeGreaterThan(500);
    const before = await tenantRowCounts(h.ds, scope());
    const answers = await sendAll(h, attempts);
    const after = await tenantRowCounts(h.ds, scope());
    expect(failuresOf(answers)).toEqual([]);
    expect(after).toEqual(before);
    expect(await h.ds.query('SELECT count(*)::int AS n FROM shops WHERE id = $1', [shop.shopId])).toEqual([{ n: 1 }]);
  }, 120_000);

  it('never answers 5xx to valid-but-absurd values: unicode, RTL, SQL-looking text, extreme numbers', async () => {
    const answers = await sendAll(h, toleratedBatch());
    expect(answers.length).toBeGreaterThan(300);
    expect(failuresOf(answers)).toEqual([]);
  }, 120_000);

  it('stores SQL-looking and unicode text literally and finds it again by search', async () => {
    const names = [SQL_TEXT, '🪵 walnut 🙂', '\u202Eטקסט\u202C', "Robert'); DELETE FROM pieces WHERE ('1'='1"];
    for (const name of names) {
      const created = await h
        .http()
        .post('/api/pieces')
        .set(bearer(shop.lead))
        .send({ name, notes: `${shop.marker} ${name}` })
        .expect(201);
      const read = await h.http().get(`/api/pieces/${created.body.id}`).set(bearer(shop.lead)).expect(200);
      expect(read.body.name).toBe(name.trim());
      const found = await h
        .http()
        .get('/api/pieces')
        .query({ q: name.trim().slice(0, 100) })
        .set(bearer(shop.lead))
        .expect(200);
      expect(found.body.items.map((i: { id: string }) => i.id)).toContain(created.body.id);
    }
    const pieces: { n: number }[] = await h.ds.query('SELECT count(*)::int AS n FROM pieces WHERE shop_id = $1', [shop.shopId]);
    expect(pieces[0]!.n).toBeGreaterThanOrEqual(names.length + 1);
  });
});

describe('hostile files', () => {
  const html = Buffer.from('<!doctype html><html><body><script>alert(document.cookie)</script></body></html>');
  const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>');
  // Cut inside the fourth triangle: whole records alone would be read (writers leave wrong counts), a cut one cannot be.
  const truncated = stockedMould().subarray(0, 84 + 50 * 3 + 17);
  const zipBomb = Buffer.from(zipSync({ '3D/3dmodel.model': new Uint8Array(32 * 2 ** 20).fill(0x20) }));

  function upload(path: string, files: { part: string; bytes: Buffer; name: string; type?: string }[], fields: [string, string][] = [], label = ''): Attempt {
    return {
      label: label || files.map((f) => `${f.part}:${f.name}`).join('+'),
      method: 'post',
      url: path,
      headers: bearer(shop.lead),
      form: { fields, files },
      expect: 'reject',
    };
  }
  function csv(body: string | Buffer, label: string, contentType = 'text/csv', status?: number): Attempt {
    return {
      label,
      method: 'post',
      url: `/api/pours/${shop.ids.pour}/readings/csv`,
      headers: bearer(shop.lead),
      raw: body as string,
      contentType,
      expect: 'reject',
      status,
    };
  }

  it('refuses files that are not what they claim with a 4xx, and writes nothing', async () => {
    const checks = `/api/pours/${shop.ids.pour}/checks`;
    const attempts: Attempt[] = [
      upload('/api/molds', [], [['name', 'no file']], 'no file part'),
      upload('/api/molds', [{ part: 'file', bytes: Buffer.alloc(0), name: 'empty.stl' }]),
      upload('/api/molds', [{ part: 'file', bytes: html, name: 'mould.stl', type: 'model/stl' }]),
      upload('/api/molds', [{ part: 'file', bytes: html, name: 'mould.html', type: 'text/html' }]),
      upload('/api/molds', [{ part: 'file', bytes: stockedMould(), name: 'mould.txt', type: 'model/stl' }]),
      upload('/api/molds', [{ part: 'file', bytes: stockedMould(), name: 'mould.stl.html', type: 'text/html' }]),
      upload('/api/molds', [{ part: 'file', bytes: truncated, name: 'truncated.stl' }]),
      upload('/api/molds', [{ part: 'file', bytes: Buffer.from('solid x\nfacet normal 0 0 1\nendsolid x\n'), name: 'broken-ascii.stl' }]),
      upload('/api/molds', [{ part: 'file', bytes: zipBomb, name: 'bomb.3mf' }]),
      upload('/api/molds', [{ part: 'file', bytes: html, name: 'page.obj' }]),
      upload('/api/molds', [{ part: 'file', bytes: Buffer.from('v 0 0 0\nf 1 1 1 9\n'), name: 'broken.obj' }]),
      upload('/api/molds', [
        { part: 'file', bytes: stockedMould(), name: 'a.stl' },
        { part: 'file', bytes: stockedMould(), name: 'b.stl' },
      ]),
      upload('/api/molds', [{ part: 'photo', bytes: stockedMould(), name: 'm.stl' }]),
      upload(checks, [{ part: 'photo', bytes: html, name: 'check.png', type: 'image/png' }], [['stage', 'gelled']]),
      upload(checks, [{ part: 'photo', bytes: svg, name: 'check.svg', type: 'image/svg+xml' }], [['stage', 'gelled']]),
      upload(checks, [{ part: 'photo', bytes: Buffer.alloc(0), name: 'empty.jpg', type: 'image/jpeg' }], [['stage', 'gelled']]),
      upload(
        checks,
        [
          { part: 'photo', bytes: PNG_BYTES, name: 'a.png' },
          { part: 'photo', bytes: PNG_BYTES, name: 'b.png' },
        ],
        [['stage', 'gelled']],
      ),
      upload(checks, [{ part: 'file', bytes: PNG_BYTES, name: 'a.png' }], [['stage', 'gelled']], 'photo in the wrong part'),
      upload(checks, [{ part: 'photo', bytes: PNG_BYTES, name: 'a.png' }], [['stage', 'rock hard']], 'bad stage with a good photo'),
      csv('', 'empty CSV', 'text/csv', 400),
      csv('<html><body>readings</body></html>', 'HTML as CSV'),
      csv('2026-11-01T10:00:00Z,20\n2026-11-01T11:00:00Z,20\u0000\n', 'NUL in CSV'),
      csv("=cmd|' /C calc'!A0,20\n", 'formula as time'),
      csv(`2026-11-01T10:00:00Z,20\n2026-11-01T11:00:00Z,${SQL_TEXT}\n`, 'SQL-looking temperature after a good row'),
      csv('2026-11-01T10:00:00Z,1e308\n', 'absurd temperature'),
      csv('2026-11-01T10:00:00Z,-0\n2026-11-01T11:00:00Z,NaN\n', 'NaN temperature'),
      csv('2026-11-01T10:00:00Z,20\n', 'CSV sent as JSON', 'application/json', 400),
      csv('2026-11-01T10:00:00Z,20\n', 'CSV as octet-stream', 'application/octet-stream', 400),
      csv(`time,tempC\n${'2026-11-01T10:00:00Z,20\n'.repeat(130_000)}`, '3 MB CSV', 'text/csv', 413),
    ];
    const before = await tenantRowCounts(h.ds, scope());
    const answers = await sendAll(h, attempts, 3);
    const after = await tenantRowCounts(h.ds, scope());
    expect(failuresOf(answers)).toEqual([]);
    expect(after).toEqual(before);
  }, 60_000);

  it('never serves an upload back as a page: moulds download as attachments, photos by their sniffed type', async () => {
    const names = ['<img src=x onerror=alert(1)>.stl', '"; filename=evil.html.stl', '🪵 mould\u202Egnp.stl', 'a\r\nSet-Cookie: x=1.stl'];
    for (const name of names) {
      const res = await h.http().post('/api/molds').set(bearer(shop.lead)).attach('file', stockedMould(), { filename: name, contentType: 'text/html' });
      expect(res.status, name).toBeLessThan(500);
      if (res.status !== 202) continue;
      const stl = await h.http().get(`/api/molds/${res.body.id}/stl`).set(bearer(shop.lead)).buffer(true).expect(200);
      expect(stl.headers['content-type']).toBe('application/octet-stream');
      expect(stl.headers['content-disposition']).toMatch(/^attachment; filename="[A-Za-z0-9_.-]+"$/);
      expect(stl.headers['x-content-type-options']).toBe('nosniff');
      expect(stl.headers['set-cookie']).toBeUndefined();
    }
    const check = await h
      .http()
      .post(`/api/pours/${shop.ids.pour}/checks`)
      .set(bearer(shop.lead))
      .field('stage', 'gelled')
      .attach('photo', PNG_BYTES, { filename: 'page.html', contentType: 'text/html' })
      .expect(201);
    const photo = await h.http().get(`/api/pours/${shop.ids.pour}/checks/${check.body.id}/photo`).set(bearer(shop.lead)).buffer(true).expect(200);
    expect(photo.headers['content-type']).toBe('image/png');
    expect(photo.headers['x-content-type-options']).toBe('nosniff');
    expect(String(photo.headers['content-security-policy'])).toContain("script-src 'self'");
  });
});
