import type { Test } from 'supertest';
import { describe, expect, it, beforeAll } from 'vitest';
import { rolesFor, type Action, type Role, type SessionResponse } from '@gelpoint/contracts';
import { PASSWORD, bearer, createShop, uniqueEmail, useHarness, type ShopFixture } from '../test-support/harness';
import { resinInput } from '../test-support/fixtures';
import { binaryStl, pocketMouldTriangles } from '../test-support/pocket-mould';

// Every route × every caller: anonymous → 401, a role without the right → 403, a role with it → neither,
// and another shop's object → 404. Which permission each route needs is written out here, apart from the
// route table, and must name every registered route, so a new route cannot ship without its access rule being
// checked; which roles hold a permission comes from the one permission table the web's screens also follow,
// so the API's answers are checked against what the screens show.
// Fixtures in the own shop use fresh lead sessions too: the matrix signs the lead out everywhere.

const h = useHarness();
const ROLES: Role[] = ['lead', 'maker', 'apprentice'];

interface World {
  own: ShopFixture;
  other: ShopFixture;
  people: Record<Role, SessionResponse>;
  otherIds: { piece: string; membership: string; invitation: string; resin: string; pigment: string; lot: string; plan: string; mold: string; pour: string };
  ownPlan: string;
  ownPour: string;
  ownPiece: string;
  ownResin: string;
  ownPigment: string;
  ownMold: string;
}

type Params = (w: World, shop: 'own' | 'other') => Promise<Record<string, string>>;
interface Rule {
  allowed: 'public' | 'member' | Action;
  body?: (w: World) => object;
  params?: Params;
  query?: string;
  /** For routes that take CSV or multipart rather than JSON. */
  raw?: (req: Test) => Test;
}

async function freshPiece(w: World, shop: 'own' | 'other'): Promise<string> {
  const lead = shop === 'own' ? await sessionFor('lead') : w.other.lead;
  return (await h.http().post('/api/pieces').set(bearer(lead)).send({ name: 'matrix piece' }).expect(201)).body.id;
}

async function freshInvitation(w: World, shop: 'own' | 'other'): Promise<string> {
  const lead = shop === 'own' ? await sessionFor('lead') : w.other.lead;
  return (
    await h
      .http()
      .post('/api/shop/invitations')
      .set(bearer(lead))
      .send({ email: uniqueEmail('mx'), role: 'maker' })
      .expect(201)
  ).body.id;
}

const leadOf = async (w: World, shop: 'own' | 'other') => (shop === 'own' ? sessionFor('lead') : w.other.lead);
const created = async (w: World, shop: 'own' | 'other', path: string, body: object) =>
  (
    await h
      .http()
      .post(path)
      .set(bearer(await leadOf(w, shop)))
      .send(body)
      .expect(201)
  ).body.id as string;

const freshResin = (w: World, shop: 'own' | 'other') => created(w, shop, '/api/shelf/resin-systems', resinInput());
const freshPigment = (w: World, shop: 'own' | 'other') =>
  created(w, shop, '/api/shelf/pigments', {
    name: 'Matrix teal',
    kind: 'powder',
    densityGPerMl: 2.8,
    recommendedPct: 1,
    maxPct: 3,
    pricePerPack: 9,
    packSizeG: 25,
  });
const freshLot = async (w: World, shop: 'own' | 'other') =>
  created(w, shop, '/api/shelf/lots', { part: 'A', resinSystemId: await freshResin(w, shop), lotNumber: 'MX-1', quantityG: 3000, receivedOn: '2026-11-01' });
const planBody = (pieceId: string, resinSystemId: string) => ({
  pieceId,
  name: 'Matrix plan',
  cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 20 } },
  fillLevelMm: 20,
  deepPour: { resinSystemId },
  shopTempC: 21,
});
const freshPlan = async (w: World, shop: 'own' | 'other') =>
  created(w, shop, '/api/pour-plans', planBody(await freshPiece(w, shop), await freshResin(w, shop)));
const freshPour = async (w: World, shop: 'own' | 'other') => created(w, shop, '/api/pours', { pourPlanId: await freshPlan(w, shop) });
const ownOrOther =
  (fresh: (w: World, shop: 'own') => Promise<string>, key: keyof World['otherIds']): Params =>
  async (w, shop) => ({ id: shop === 'own' ? await fresh(w, 'own') : w.otherIds[key] });

async function membershipOf(lead: SessionResponse, userId: string): Promise<string> {
  const members = (await h.http().get('/api/shop/members').set(bearer(lead)).expect(200)).body as { id: string; userId: string }[];
  return members.find((m) => m.userId === userId)!.id;
}

const table: Record<string, Rule> = {
  'GET /api/health': { allowed: 'public' },
  'POST /api/auth/register': { allowed: 'public' },
  'POST /api/auth/login': { allowed: 'public' },
  'POST /api/auth/logout': { allowed: 'member' },
  'POST /api/auth/logout-everywhere': { allowed: 'member' },
  'GET /api/me': { allowed: 'member' },
  'POST /api/me/calendar/rotate': { allowed: 'member' },
  'GET /api/calendar/:token': { allowed: 'public' },
  'POST /api/auth/switch-shop': { allowed: 'member', body: (w) => ({ shopId: w.own.shopId }) },
  'POST /api/auth/password-reset': { allowed: 'public' },
  'POST /api/auth/password-reset/confirm': { allowed: 'public' },
  'GET /api/shop': { allowed: 'member' },
  'PATCH /api/shop': { allowed: 'shop:manage', body: () => ({ unitSystem: 'metric' }) },
  'GET /api/shop/members': { allowed: 'member' },
  'PATCH /api/shop/members/:id': {
    allowed: 'team:manage',
    body: () => ({ role: 'apprentice' }),
    params: async (w, shop) => ({ id: shop === 'own' ? await membershipOf(await sessionFor('lead'), w.people.apprentice.user.id) : w.otherIds.membership }),
  },
  'GET /api/shop/invitations': { allowed: 'team:manage' },
  'POST /api/shop/invitations': { allowed: 'team:manage', body: () => ({ email: uniqueEmail('mx'), role: 'maker' }) },
  'DELETE /api/shop/invitations/:id': {
    allowed: 'team:manage',
    params: async (w, shop) => ({ id: shop === 'own' ? await freshInvitation(w, 'own') : w.otherIds.invitation }),
  },
  'GET /api/invitations/:token': { allowed: 'public' },
  'POST /api/invitations/:token/accept': { allowed: 'public' },
  'GET /api/pieces': { allowed: 'member' },
  'POST /api/pieces': { allowed: 'piece:create', body: () => ({ name: 'matrix piece' }) },
  'GET /api/pieces/:id': { allowed: 'member', params: async (w, shop) => ({ id: shop === 'own' ? await freshPiece(w, 'own') : w.otherIds.piece }) },
  'PATCH /api/pieces/:id': {
    allowed: 'piece:edit',
    body: () => ({ notes: 'checked' }),
    params: async (w, shop) => ({ id: shop === 'own' ? await freshPiece(w, 'own') : w.otherIds.piece }),
  },
  'DELETE /api/pieces/:id': { allowed: 'piece:delete', params: async (w, shop) => ({ id: shop === 'own' ? await freshPiece(w, 'own') : w.otherIds.piece }) },
  'GET /api/audit': { allowed: 'audit:read' },
  'GET /api/audit/export': { allowed: 'audit:read' },
  'GET /api/shelf/resin-systems': { allowed: 'member' },
  'POST /api/shelf/resin-systems': { allowed: 'shelf:keep', body: () => resinInput() },
  'GET /api/shelf/resin-systems/:id': { allowed: 'member', params: ownOrOther(freshResin, 'resin') },
  'PUT /api/shelf/resin-systems/:id': { allowed: 'shelf:keep', body: () => resinInput({ name: 'Renamed' }), params: ownOrOther(freshResin, 'resin') },
  'DELETE /api/shelf/resin-systems/:id': { allowed: 'shelf:keep', params: ownOrOther(freshResin, 'resin') },
  'GET /api/shelf/pigments': { allowed: 'member' },
  'POST /api/shelf/pigments': {
    allowed: 'shelf:keep',
    body: () => ({ name: 'Matrix ochre', kind: 'paste', densityGPerMl: 1.3, recommendedPct: 2, maxPct: 5, pricePerPack: 12, packSizeG: 50 }),
  },
  'GET /api/shelf/pigments/:id': { allowed: 'member', params: ownOrOther(freshPigment, 'pigment') },
  'PUT /api/shelf/pigments/:id': {
    allowed: 'shelf:keep',
    body: () => ({ name: 'Matrix ochre', kind: 'paste', densityGPerMl: 1.3, recommendedPct: 2, maxPct: 5, pricePerPack: 12, packSizeG: 50 }),
    params: ownOrOther(freshPigment, 'pigment'),
  },
  'DELETE /api/shelf/pigments/:id': { allowed: 'shelf:keep', params: ownOrOther(freshPigment, 'pigment') },
  'GET /api/shelf/lots': { allowed: 'member' },
  'POST /api/shelf/lots': {
    allowed: 'shelf:keep',
    body: (w) => ({ part: 'pigment', pigmentId: w.ownPigment, lotNumber: 'MX-2', quantityG: 25, receivedOn: '2026-11-02' }),
  },
  'GET /api/shelf/lots/:id': { allowed: 'member', params: ownOrOther(freshLot, 'lot') },
  'PATCH /api/shelf/lots/:id': { allowed: 'shelf:keep', body: () => ({ notes: 'checked' }), params: ownOrOther(freshLot, 'lot') },
  'DELETE /api/shelf/lots/:id': { allowed: 'shelf:keep', params: ownOrOther(freshLot, 'lot') },
  'GET /api/shelf/lots/:id/uses': { allowed: 'member', params: ownOrOther(freshLot, 'lot') },
  'POST /api/molds': { allowed: 'mold:change' },
  'GET /api/molds': { allowed: 'member' },
  'GET /api/molds/:id': { allowed: 'member', params: async (w, shop) => ({ id: shop === 'own' ? w.ownMold : w.otherIds.mold }) },
  'PATCH /api/molds/:id': {
    allowed: 'mold:change',
    body: () => ({ name: 'matrix mould' }),
    params: async (w, shop) => ({ id: shop === 'own' ? w.ownMold : w.otherIds.mold }),
  },
  'GET /api/molds/:id/fill': { allowed: 'member', query: 'level=5', params: async (w, shop) => ({ id: shop === 'own' ? w.ownMold : w.otherIds.mold }) },
  'GET /api/molds/:id/layers': { allowed: 'member', query: 'levels=4,6', params: async (w, shop) => ({ id: shop === 'own' ? w.ownMold : w.otherIds.mold }) },
  'GET /api/molds/:id/stl': { allowed: 'member', params: async (w, shop) => ({ id: shop === 'own' ? w.ownMold : w.otherIds.mold }) },
  // A finished mould's stream says so and closes, so each call here gets a whole answer.
  'GET /api/molds/:id/events': { allowed: 'member', params: async (w, shop) => ({ id: shop === 'own' ? await settledMold(w) : w.otherIds.mold }) },
  'GET /api/molds/:id/depth-map': { allowed: 'member', params: async (w, shop) => ({ id: shop === 'own' ? w.ownMold : w.otherIds.mold }) },
  'DELETE /api/molds/:id': { allowed: 'mold:change', params: async (w, shop) => ({ id: shop === 'own' ? await uploadMold(w, 'own') : w.otherIds.mold }) },
  'GET /api/pour-plans': { allowed: 'member' },
  'POST /api/pour-plans': { allowed: 'plan:change', body: (w) => planBody(w.ownPiece, w.ownResin) },
  'GET /api/pour-plans/:id': { allowed: 'member', params: ownOrOther(freshPlan, 'plan') },
  'PUT /api/pour-plans/:id': { allowed: 'plan:change', body: (w) => planBody(w.ownPiece, w.ownResin), params: ownOrOther(freshPlan, 'plan') },
  'DELETE /api/pour-plans/:id': { allowed: 'plan:change', params: ownOrOther(freshPlan, 'plan') },
  'POST /api/exotherm': { allowed: 'member', body: () => ({ depthMm: 10, ambientC: 21, reactionHeatJG: 300, activationKJMol: 53, refTempC: 22, gelMin: 480 }) },
  'GET /api/pours': { allowed: 'member' },
  'POST /api/pours': { allowed: 'member', body: (w) => ({ pourPlanId: w.ownPlan }) },
  'GET /api/pours/:id': { allowed: 'member', params: ownOrOther(freshPour, 'pour') },
  'POST /api/pours/:id/batches': { allowed: 'member', body: () => ({ planBatchIndex: 0, weighedAG: 10, weighedBG: 5 }), params: ownOrOther(freshPour, 'pour') },
  'POST /api/pours/:id/readings': {
    allowed: 'member',
    body: () => ({ readings: [{ at: '2026-11-01T10:00:00Z', tempC: 20 }] }),
    params: ownOrOther(freshPour, 'pour'),
  },
  'POST /api/pours/:id/readings/csv': {
    allowed: 'member',
    raw: (r) => r.set('Content-Type', 'text/csv').send('2026-11-01T10:00:00Z,20\n'),
    params: ownOrOther(freshPour, 'pour'),
  },
  'POST /api/pours/:id/checks': { allowed: 'member', raw: (r) => r.field('stage', 'gelled'), params: ownOrOther(freshPour, 'pour') },
  'GET /api/pours/:id/batches.csv': { allowed: 'member', params: ownOrOther(freshPour, 'pour') },
  'GET /api/pours/:id/readings.csv': { allowed: 'member', params: ownOrOther(freshPour, 'pour') },
  'GET /api/pours/:id/checks/:checkId/photo': {
    allowed: 'member',
    params: async (w, shop) => ({ id: shop === 'own' ? w.ownPour : w.otherIds.pour, checkId: '00000000-0000-4000-8000-000000000000' }),
  },
  'GET /api/pours/:id/readings': { allowed: 'member', params: ownOrOther(freshPour, 'pour') },
  // Voids are also the logger's or a lead's own right per entry; an id nobody logged tests the role rule alone.
  'DELETE /api/pours/:id/readings/:readingId': {
    allowed: 'member',
    body: () => ({ reason: 'matrix' }),
    params: async (w, shop) => ({ id: shop === 'own' ? w.ownPour : w.otherIds.pour, readingId: '00000000-0000-4000-8000-000000000000' }),
  },
  'POST /api/pours/:id/batches/:batchId/void': {
    allowed: 'member',
    body: () => ({ reason: 'matrix' }),
    params: async (w, shop) => ({ id: shop === 'own' ? w.ownPour : w.otherIds.pour, batchId: '00000000-0000-4000-8000-000000000000' }),
  },
  'POST /api/reminders/:id/done': { allowed: 'member', params: async () => ({ id: '00000000-0000-4000-8000-000000000000' }) },
  'POST /api/pours/:id/release': { allowed: 'pour:release', params: ownOrOther(freshPour, 'pour') },
  'POST /api/pours/:id/machined': { allowed: 'pour:machined', body: () => ({ finishCoats: 1, hoursBetweenCoats: 12 }), params: ownOrOther(freshPour, 'pour') },
  'GET /api/today': { allowed: 'member' },
  'POST /api/shop/ingest-token': { allowed: 'shop:manage' },
  'POST /api/ingest/readings': { allowed: 'public' },
};

async function uploadMold(w: World, shop: 'own' | 'other'): Promise<string> {
  const res = await h
    .http()
    .post('/api/molds')
    .set(bearer(await leadOf(w, shop)))
    .attach('file', binaryStl(pocketMouldTriangles({ outer: [40, 30, 10], pocket: [5, 5, 35, 25], floorZ: 4 })), 'm.stl')
    .expect(202);
  return res.body.id;
}

/** A mould of the own shop whose analysis is over (here: refused), as a worker leaves it. */
async function settledMold(w: World): Promise<string> {
  const id = await uploadMold(w, 'own');
  await h.ds.query(`UPDATE molds SET status = 'failed', progress = 1, error_code = 'matrix', error_message = 'settled for the matrix' WHERE id = $1`, [id]);
  return id;
}

const world = {} as World;
beforeAll(async () => {
  world.own = await createShop(h, 'Matrix shop');
  world.other = await createShop(h, 'Other shop');
  world.people = { lead: world.own.lead, maker: await world.own.member('maker'), apprentice: await world.own.member('apprentice') };
  const otherMaker = await world.other.member('maker');
  world.otherIds = {
    piece: await freshPiece(world, 'other'),
    membership: await membershipOf(world.other.lead, otherMaker.user.id),
    invitation: await freshInvitation(world, 'other'),
    resin: await freshResin(world, 'other'),
    pigment: await freshPigment(world, 'other'),
    lot: await freshLot(world, 'other'),
    plan: await freshPlan(world, 'other'),
    mold: await uploadMold(world, 'other'),
    pour: await freshPour(world, 'other'),
  };
  world.ownPlan = await freshPlan(world, 'own');
  world.ownPour = await freshPour(world, 'own');
  world.ownPiece = await freshPiece(world, 'own');
  world.ownResin = await freshResin(world, 'own');
  world.ownPigment = await freshPigment(world, 'own');
  world.ownMold = await uploadMold(world, 'own');
});

/** A new session for each request, so routes that sign out cannot spoil the next check. */
async function sessionFor(role: Role): Promise<SessionResponse> {
  const email = world.people[role].user.email;
  const res = await h.http().post('/api/auth/login').send({ email, password: PASSWORD, shopId: world.own.shopId });
  if (res.status !== 200) throw new Error(`sign-in of the ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
}

function call(method: string, path: string, params: Record<string, string>, rule: Rule, session?: SessionResponse) {
  const body = rule.body?.(world);
  const query = rule.query;
  const url = path.replace(/:([A-Za-z]+)/g, (_m, k: string) => params[k] ?? `missing-${k}`) + (query ? `?${query}` : '');
  const req = h.http()[method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete'](url);
  if (session) req.set(bearer(session));
  if (rule.raw) return rule.raw(req);
  return body ? req.send(body) : req;
}

describe('access matrix', () => {
  it('has a rule for exactly the registered routes', () => {
    const registered = h.app.registry.routes.map((r) => `${r.method.toUpperCase()} ${r.fullPath}`).sort();
    expect(registered).toEqual(Object.keys(table).sort());
  });

  it('serves each route under the permission the table names', () => {
    const served = Object.fromEntries(h.app.registry.routes.map((r) => [`${r.method.toUpperCase()} ${r.fullPath}`, r.action ?? r.access]));
    const wanted = Object.fromEntries(Object.entries(table).map(([key, rule]) => [key, rule.allowed]));
    expect(served).toEqual(wanted);
  });

  it('answers each caller as the table says', async () => {
    const failures: string[] = [];
    for (const route of h.app.registry.routes) {
      const key = `${route.method.toUpperCase()} ${route.fullPath}`;
      const rule = table[key]!;
      if (rule.allowed === 'public') continue;
      const params = rule.params ? await rule.params(world, 'own') : {};
      const anon = await call(route.method, route.fullPath, params, rule);
      if (anon.status !== 401) failures.push(`${key} anonymous → ${anon.status}, want 401`);
      for (const role of ROLES) {
        const allowed = rule.allowed === 'member' || rolesFor(rule.allowed).includes(role);
        const p = rule.params ? await rule.params(world, 'own') : {};
        const res = await call(route.method, route.fullPath, p, rule, await sessionFor(role));
        if (allowed && (res.status === 401 || res.status === 403 || res.status >= 500)) failures.push(`${key} ${role} → ${res.status}, want allowed`);
        if (!allowed && res.status !== 403) failures.push(`${key} ${role} → ${res.status}, want 403`);
        if (allowed && rule.params) {
          const foreign = await call(route.method, route.fullPath, await rule.params(world, 'other'), rule, await sessionFor(role));
          if (foreign.status !== 404) failures.push(`${key} ${role} with another shop's id → ${foreign.status}, want 404`);
        }
      }
    }
    expect(failures).toEqual([]);
  }, 180_000);

  it("never changes another shop's objects", async () => {
    const piece = await h.http().get(`/api/pieces/${world.otherIds.piece}`).set(bearer(world.other.lead)).expect(200);
    expect(piece.body.notes).toBe('');
    const members = (await h.http().get('/api/shop/members').set(bearer(world.other.lead)).expect(200)).body as { id: string; role: string }[];
    expect(members.find((m) => m.id === world.otherIds.membership)!.role).toBe('maker');
    const invs = (await h.http().get('/api/shop/invitations').set(bearer(world.other.lead)).expect(200)).body as { id: string; status: string }[];
    expect(invs.find((i) => i.id === world.otherIds.invitation)!.status).toBe('pending');
  });
});
