import { randomUUID } from 'node:crypto';
import type { Test } from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { ZodObject } from 'zod';
import type { Role, SessionResponse } from '@gelpoint/contracts';
import { bearer, useHarness } from '../test-support/harness';
import { fillPath, newMarker, pathParams, planBody, routeKey, stockShop, stockedMould, validParts, type StockedShop } from '../test-support/stocked-shop';
import { tenantRowCounts } from '../test-support/tenant-rows';
import type { RegisteredRoute } from './route-registry';

// Tenants are isolated per object (OWASP ASVS 5.0 8.2.2, 8.4.1): shop B's members, in every role,
// are sent at shop A's objects through every route the registry has, by path, by query filter and
// inside request bodies. Another shop's id must look exactly like an id that does not exist (404
// where the role may call the route, the same 403 where it may not), no answer may carry A's data,
// and nothing of A's may change.

const h = useHarness({ GELPOINT_UPLOADS_PER_HOUR: '100000' });
const ROLES: Role[] = ['lead', 'maker', 'apprentice'];
let a: StockedShop;
let b: StockedShop;
let aCountsBefore: Record<string, number>;
let aObjectsBefore: Record<string, unknown>;

/** Routes whose request is not JSON and not a multipart form: the body they take. */
const RAW_BODIES: Record<string, { type: string; text: string }> = {
  'POST /api/pours/:id/readings/csv': { type: 'text/csv', text: '2026-11-01T10:00:00Z,20\n' },
};

const sessionOf = (shop: StockedShop, role: Role): SessionResponse => (role === 'lead' ? shop.lead : shop[role]);
const allows = (route: RegisteredRoute, role: Role) => route.access === 'member' || (Array.isArray(route.access) && route.access.includes(role));

/** A request B could validly make, pointed at the given path parameters. */
function request(route: RegisteredRoute, params: Record<string, string>, session: SessionResponse): Test {
  const key = routeKey(route);
  const parts = validParts(b)[key] ?? {};
  const qs = parts.query ? `?${new URLSearchParams(parts.query)}` : '';
  let req = h
    .http()
    [route.method](fillPath(route.fullPath, params) + qs)
    .set(bearer(session));
  const raw = RAW_BODIES[key];
  if (raw) return req.set('Content-Type', raw.type).send(raw.text);
  if (parts.form) {
    for (const [k, v] of Object.entries(parts.form)) req = req.field(k, v);
    if (route.fullPath === '/api/molds') req = req.attach('file', stockedMould(), 'm.stl');
    return req;
  }
  return parts.body ? req.send(parts.body) : req;
}

/** Everything of shop A's that an answer must never show. */
const secretsOf = (shop: StockedShop) => [
  shop.marker,
  shop.shopId,
  shop.invitationToken,
  ...Object.values(shop.ids),
  shop.lead.user.id,
  shop.maker.user.id,
  shop.apprentice.user.id,
];
const leaks = (text: string) => secretsOf(a).filter((s) => text.includes(s));

/**
 * Parts of a view that change with the clock or with background work (a worker run by another test
 * file analyses every queued mould and sends due reminders), not with anything a request does.
 */
const MOVING_PARTS = ['cure', 'nextReminder', 'reminders', 'progress', 'report', 'analysedAt', 'error'];
function settled(path: string, body: unknown): unknown {
  if (!body || typeof body !== 'object') return body;
  const copy = { ...(body as Record<string, unknown>) };
  for (const k of MOVING_PARTS) delete copy[k];
  if (path.startsWith('/api/molds')) delete copy.status;
  return copy;
}

/** What shop A's lead sees of each of A's objects, through every GET route that reads one object as JSON. */
async function aObjects(): Promise<Record<string, unknown>> {
  const seen: Record<string, unknown> = {};
  for (const route of h.app.registry.routes) {
    // Routes with a query compute from an object (a fill at a level) rather than show it; an event stream is not JSON
    // (and stays open while the mould waits for its analysis).
    if (route.method !== 'get' || !route.fullPath.includes('/:') || !route.response || route.query || route.contentType || route.access === 'public') continue;
    const parts = validParts(a)[routeKey(route)] ?? {};
    const qs = parts.query ? `?${new URLSearchParams(parts.query)}` : '';
    const res = await h
      .http()
      .get(fillPath(route.fullPath, pathParams(route.fullPath, a)) + qs)
      .set(bearer(a.lead));
    seen[routeKey(route)] = { status: res.status, body: settled(route.fullPath, res.body) };
  }
  // The shop and its people have no one-object route; their lists are the view.
  for (const path of ['/api/shop', '/api/shop/members', '/api/shop/invitations'])
    seen[`GET ${path}`] = (await h.http().get(path).set(bearer(a.lead)).expect(200)).body;
  return seen;
}

beforeAll(async () => {
  a = await stockShop(h, newMarker('tenanta'));
  b = await stockShop(h, newMarker('tenantb'));
  aCountsBefore = await tenantRowCounts(h.ds, { shopIds: [a.shopId], marker: a.marker });
  aObjectsBefore = await aObjects();
}, 60_000);

describe('tenant isolation', () => {
  it("answers shop B's members about shop A's objects exactly as about ids that do not exist", async () => {
    const failures: string[] = [];
    let checked = 0;
    for (const route of h.app.registry.routes) {
      if (!route.fullPath.includes('/:')) continue;
      const key = routeKey(route);
      // Invitation links and calendar feeds are bearer capabilities, not shop objects: whoever holds the token may use it.
      if (route.access === 'public') {
        expect(route.fullPath, key).toMatch(/\/:token(\/|$)/);
        continue;
      }
      const foreign = pathParams(route.fullPath, a);
      const unknown = Object.fromEntries(Object.keys(foreign).map((k) => [k, randomUUID()]));
      for (const role of ROLES) {
        const session = sessionOf(b, role);
        const [theirs, nobodys] = [await request(route, foreign, session), await request(route, unknown, session)];
        const want = allows(route, role) ? 404 : 403;
        if (theirs.status !== want) failures.push(`${key} as B's ${role} with A's ids → ${theirs.status}, want ${want}`);
        if (theirs.status !== nobodys.status || theirs.body?.error?.code !== nobodys.body?.error?.code)
          failures.push(
            `${key} as B's ${role}: A's ids → ${theirs.status} ${theirs.body?.error?.code}, unknown ids → ${nobodys.status} ${nobodys.body?.error?.code}`,
          );
        const leaked = leaks(theirs.text ?? '');
        if (leaked.length) failures.push(`${key} as B's ${role} shows A's ${leaked.join(', ')}`);
        checked++;
      }
    }
    // A check of A's photo through B's own pour: the photo lookup must be scoped too, not only the pour.
    const mixed = await h.http().get(`/api/pours/${b.ids.pour}/checks/${a.ids.check}/photo`).set(bearer(b.lead));
    if (mixed.status !== 404) failures.push(`A's photo through B's pour → ${mixed.status}, want 404`);
    expect(failures).toEqual([]);
    expect(checked).toBeGreaterThan(60);
  }, 90_000);

  it("never lists or finds shop A's rows, with or without A's ids in the filters", async () => {
    const failures: string[] = [];
    let seenText = '';
    for (const route of h.app.registry.routes) {
      if (route.method !== 'get' || route.fullPath.includes('/:') || route.access === 'public') continue;
      const key = routeKey(route);
      const shape = route.query instanceof ZodObject ? Object.keys(route.query.shape) : [];
      const byA: Record<string, string> = {};
      if (shape.includes('pieceId')) byA.pieceId = a.ids.piece;
      if (shape.includes('productId')) byA.productId = a.ids.resin;
      if (shape.includes('objectId')) byA.objectId = a.ids.piece;
      if (shape.includes('q')) byA.q = a.marker;
      if (shape.includes('status')) byA.status = 'all';
      for (const role of ROLES) {
        if (!allows(route, role)) continue;
        for (const query of [{}, byA]) {
          const res = await h
            .http()
            .get(route.fullPath)
            .query(query)
            .set(bearer(sessionOf(b, role)));
          if (res.status !== 200) failures.push(`${key} ${JSON.stringify(query)} as B's ${role} → ${res.status}`);
          const leaked = leaks(res.text);
          if (leaked.length) failures.push(`${key} ${JSON.stringify(query)} as B's ${role} lists A's ${leaked.join(', ')}`);
          seenText += res.text;
        }
      }
    }
    expect(failures).toEqual([]);
    // The lists are not empty by accident: B's own objects are in them.
    for (const id of [b.ids.piece, b.ids.resin, b.ids.pigment, b.ids.lot, b.ids.mold, b.ids.plan, b.ids.pour, b.ids.membership, b.ids.invitation])
      expect(seenText).toContain(id);
  }, 60_000);

  it("refuses shop A's ids inside shop B's request bodies as not found", async () => {
    const lead = bearer(b.lead);
    const post = (path: string, body: object, who: Record<string, string> = lead) => h.http().post(path).set(who).send(body);
    const cases: [string, Test, number][] = [
      ["plan for A's piece", post('/api/pour-plans', planBody(a.ids.piece, b.ids.resin)), 404],
      ["plan with A's resin", post('/api/pour-plans', planBody(b.ids.piece, a.ids.resin)), 404],
      ["plan with A's pigment", post('/api/pour-plans', planBody(b.ids.piece, b.ids.resin, { pigmentId: a.ids.pigment })), 404],
      ["plan with A's seal coat", post('/api/pour-plans', planBody(b.ids.piece, b.ids.resin, { sealResinId: a.ids.sealResin })), 404],
      ["plan on A's mould", post('/api/pour-plans', { ...planBody(b.ids.piece, b.ids.resin), cavity: { source: 'mold', moldId: a.ids.mold } }), 404],
      ["B's plan moved to A's piece", h.http().put(`/api/pour-plans/${b.ids.plan}`).set(lead).send(planBody(a.ids.piece, b.ids.resin)), 404],
      ["pour of A's plan", post('/api/pours', { pourPlanId: a.ids.plan }), 404],
      ["pour notifying A's lead", post('/api/pours', { pourPlanId: b.ids.plan, notifyUserIds: [a.lead.user.id] }), 400],
      ["lot of A's resin", post('/api/shelf/lots', { part: 'A', resinSystemId: a.ids.resin, lotNumber: 'X', quantityG: 1, receivedOn: '2026-11-01' }), 404],
      [
        "lot of A's pigment",
        post('/api/shelf/lots', { part: 'pigment', pigmentId: a.ids.pigment, lotNumber: 'X', quantityG: 1, receivedOn: '2026-11-01' }),
        404,
      ],
      [
        "batch from A's lot",
        post(`/api/pours/${b.ids.pour}/batches`, {
          planBatchIndex: 1,
          lotAId: a.ids.lot,
          weighedAG: 10,
          weighedBG: 5,
          weighedPigmentG: 0.2,
          confirmUnusual: true,
        }),
        404,
      ],
      ["mould for A's piece", h.http().post('/api/molds').set(lead).field('pieceId', a.ids.piece).attach('file', stockedMould(), 'm.stl'), 404],
      [
        "readings into A's pour with B's thermometer",
        post(
          '/api/ingest/readings',
          { pourId: a.ids.pour, readings: [{ at: '2026-11-01T10:00:00Z', tempC: 20 }] },
          { 'X-Gelpoint-Ingest-Token': b.ingestToken },
        ),
        404,
      ],
      ['switch into A', post('/api/auth/switch-shop', { shopId: a.shopId }, bearer(b.spareLead)), 403],
      ["sign in to A with B's password", post('/api/auth/login', { email: b.lead.user.email, password: 'correct horse battery', shopId: a.shopId }), 403],
    ];
    const failures: string[] = [];
    for (const [label, req, want] of cases) {
      const res = await req;
      if (res.status !== want) failures.push(`${label} → ${res.status} ${JSON.stringify(res.body)}, want ${want}`);
      const leaked = leaks(res.text);
      if (leaked.length) failures.push(`${label} shows A's ${leaked.join(', ')}`);
    }
    expect(failures).toEqual([]);
    // The same requests with ids nobody has answer the same: A's ids are not recognisable.
    const unknownShop = await post('/api/auth/switch-shop', { shopId: randomUUID() }, bearer(b.spareLead));
    expect(unknownShop.status).toBe(403);
    const unknownPiece = await post('/api/pour-plans', planBody(randomUUID(), b.ids.resin));
    expect(unknownPiece.body.error).toEqual((await post('/api/pour-plans', planBody(a.ids.piece, b.ids.resin))).body.error);
  });

  it('leaves every row and object of shop A as it was', async () => {
    expect(await tenantRowCounts(h.ds, { shopIds: [a.shopId], marker: a.marker })).toEqual(aCountsBefore);
    expect(await aObjects()).toEqual(aObjectsBefore);
    expect(Object.keys(aObjectsBefore).length).toBeGreaterThanOrEqual(10);
  });
});
