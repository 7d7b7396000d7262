import { randomUUID } from 'node:crypto';
import type { SessionResponse } from '@gelpoint/contracts';
import type { RegisteredRoute } from '../http/route-registry';
import { resinInput } from './fixtures';
import { PASSWORD, bearer, createShop, linkTokenFor, type Harness } from './harness';
import { binaryStl, pocketMouldTriangles } from './pocket-mould';

/** A shop with one of everything the API has an id for, made through the real routes. */
export interface StockedShop {
  marker: string;
  shopId: string;
  lead: SessionResponse;
  /** A second sign-in of the lead, for routes that end the session they are called with. */
  spareLead: SessionResponse;
  maker: SessionResponse;
  apprentice: SessionResponse;
  ids: {
    membership: string;
    invitation: string;
    piece: string;
    resin: string;
    sealResin: string;
    pigment: string;
    lot: string;
    plan: string;
    pour: string;
    mold: string;
    check: string;
    batch: string;
    reading: string;
    reminder: string;
  };
  invitationToken: string;
  /** A password-reset token of the maker (never of the lead, whose session the tests keep using). */
  resetToken: string;
  ingestToken: string;
  /** The last segment of the lead's calendar feed URL (token.ics). */
  calendarFeed: string;
}

/** The smallest valid PNG header: enough for the photo check, which reads the magic number. */
export const PNG_BYTES = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64, 1)]);

export const newMarker = (label: string) => `${label}${randomUUID().replace(/-/g, '').slice(0, 10)}`;

export function planBody(pieceId: string, resinSystemId: string, extra: { pigmentId?: string; sealResinId?: string } = {}) {
  return {
    pieceId,
    name: 'Hostile plan',
    cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 20 } },
    fillLevelMm: 20,
    deepPour: { resinSystemId, pigmentId: extra.pigmentId ?? null, pigmentPct: extra.pigmentId ? 1 : 0 },
    sealCoat: extra.sealResinId ? { resinSystemId: extra.sealResinId, filmThicknessMm: 0.2, coats: 1, absorptionFactor: 1.2 } : null,
    overPourPct: 5,
    cupWaste: { massG: 5 },
    shopTempC: 21,
    shopAir: { rhPct: 50, surfaceTempC: 20 },
    wood: { lengthMm: 300, widthMm: 150, thicknessMm: 30, pricePerBoardFoot: 12 },
  };
}

export const pigmentBody = () => ({ name: 'Hostile teal', kind: 'powder', densityGPerMl: 2.8, recommendedPct: 1, maxPct: 3, pricePerPack: 9, packSizeG: 25 });

export function stockedMould(): Buffer {
  return binaryStl(pocketMouldTriangles({ outer: [40, 30, 10], pocket: [5, 5, 35, 25], floorZ: 4 }));
}

export async function stockShop(h: Harness, marker: string): Promise<StockedShop> {
  const shop = await createShop(h, `Shop ${marker}`);
  const lead = shop.lead;
  const maker = await shop.member('maker');
  const apprentice = await shop.member('apprentice');
  const http = () => h.http();
  const post = async (path: string, body: object, who: SessionResponse = lead) =>
    (await http().post(path).set(bearer(who)).send(body).expect(201)).body.id as string;

  const members = (await http().get('/api/shop/members').set(bearer(lead)).expect(200)).body as { id: string; userId: string }[];
  const invitationEmail = `${marker}-invited@example.test`;
  const invitation = await post('/api/shop/invitations', { email: invitationEmail, role: 'maker' });
  const resin = await post('/api/shelf/resin-systems', resinInput({ name: `Deep ${marker}` }));
  const sealResin = await post('/api/shelf/resin-systems', resinInput({ name: `Seal ${marker}`, use: 'seal' }));
  const pigment = await post('/api/shelf/pigments', { ...pigmentBody(), name: `Teal ${marker}` });
  const lot = await post('/api/shelf/lots', { part: 'A', resinSystemId: resin, lotNumber: `LOT-${marker}`, quantityG: 3000, receivedOn: '2026-11-01' });
  const piece = await post('/api/pieces', { name: `Piece ${marker}` });
  const plan = await post('/api/pour-plans', planBody(piece, resin, { pigmentId: pigment, sealResinId: sealResin }));
  const pour = await post('/api/pours', { pourPlanId: plan });
  const mold = (await http().post('/api/molds').set(bearer(lead)).field('name', `Mould ${marker}`).attach('file', stockedMould(), 'hostile.stl').expect(202))
    .body.id as string;
  const recent = (hoursAgo: number) => new Date(Date.now() - hoursAgo * 3_600_000).toISOString();
  const batch = (
    await http()
      .post(`/api/pours/${pour}/batches`)
      .set(bearer(lead))
      .send({ planBatchIndex: 0, mixedAt: recent(2), weighedAG: 10, weighedBG: 5, weighedPigmentG: 0.2, confirmUnusual: true })
      .expect(201)
  ).body.batch.id as string;
  await http()
    .post(`/api/pours/${pour}/readings`)
    .set(bearer(lead))
    .send({ readings: [{ at: recent(1), tempC: 21 }] })
    .expect(200);
  const reading = (await http().get(`/api/pours/${pour}/readings`).set(bearer(lead)).expect(200)).body.items[0].id as string;
  const reminder = (await http().get(`/api/pours/${pour}`).set(bearer(lead)).expect(200)).body.reminders[0].id as string;
  const check = (
    await http()
      .post(`/api/pours/${pour}/checks`)
      .set(bearer(lead))
      .field('stage', 'gelled')
      .field('note', `Check ${marker}`)
      .attach('photo', PNG_BYTES, 'check.png')
      .expect(201)
  ).body.id as string;
  await http().post('/api/auth/password-reset').send({ email: maker.user.email }).expect(202);
  const spareLead = (await http().post('/api/auth/login').send({ email: lead.user.email, password: PASSWORD, shopId: shop.shopId }).expect(200))
    .body as SessionResponse;
  const ingestToken = (await http().post('/api/shop/ingest-token').set(bearer(lead)).expect(201)).body.token as string;
  const calendarFeed = ((await http().get('/api/me').set(bearer(lead)).expect(200)).body.calendarUrl as string).split('/').pop()!;

  return {
    marker,
    shopId: shop.shopId,
    lead,
    spareLead,
    maker,
    apprentice,
    ids: {
      membership: members.find((m) => m.userId === apprentice.user.id)!.id,
      invitation,
      piece,
      resin,
      sealResin,
      pigment,
      lot,
      plan,
      pour,
      mold,
      check,
      batch,
      reading,
      reminder,
    },
    invitationToken: await linkTokenFor(h.ds, invitationEmail, 'invitations'),
    resetToken: await linkTokenFor(h.ds, maker.user.email, 'reset-password'),
    ingestToken,
    calendarFeed,
  };
}

export const routeKey = (r: Pick<RegisteredRoute, 'method' | 'fullPath'>) => `${r.method.toUpperCase()} ${r.fullPath}`;

/** Which object a path parameter names, read from the path segment before it. */
const ID_BY_SEGMENT: Record<string, keyof StockedShop['ids']> = {
  members: 'membership',
  invitations: 'invitation',
  pieces: 'piece',
  'resin-systems': 'resin',
  pigments: 'pigment',
  lots: 'lot',
  'pour-plans': 'plan',
  pours: 'pour',
  molds: 'mold',
  checks: 'check',
  batches: 'batch',
  readings: 'reading',
  reminders: 'reminder',
};

/** The shop's own value for every parameter of a route's path; throws for a parameter nobody has classified. */
export function pathParams(path: string, shop: StockedShop): Record<string, string> {
  const segments = path.split('/');
  const params: Record<string, string> = {};
  segments.forEach((seg, i) => {
    if (!seg.startsWith(':')) return;
    const name = seg.slice(1);
    if (name === 'token') {
      params[name] = path.startsWith('/api/calendar/') ? shop.calendarFeed : shop.invitationToken;
      return;
    }
    const kind = ID_BY_SEGMENT[segments[i - 1] ?? ''];
    if (!kind) throw new Error(`stocked-shop.ts does not know which object ${name} in ${path} names; add it to ID_BY_SEGMENT`);
    params[name] = shop.ids[kind];
  });
  return params;
}

export const fillPath = (path: string, params: Record<string, string>) => path.replace(/:([A-Za-z]+)/g, (_m, k: string) => encodeURIComponent(params[k] ?? ''));

/** A request to a route that passes validation, with the shop's own objects. */
export interface ValidParts {
  body?: Record<string, unknown>;
  /** Multipart text fields, for routes that read an upload. */
  form?: Record<string, string>;
  query?: Record<string, string>;
  headers?: Record<string, string>;
}

export function validParts(shop: StockedShop): Record<string, ValidParts> {
  const m = shop.marker;
  const { ids } = shop;
  return {
    'POST /api/auth/register': { body: { shopName: `Shop ${m}`, name: `Person ${m}`, email: `${m}-reg@example.test`, password: PASSWORD } },
    'POST /api/auth/login': { body: { email: shop.lead.user.email, password: PASSWORD, shopId: shop.shopId } },
    'POST /api/auth/switch-shop': { body: { shopId: shop.shopId }, headers: bearer(shop.spareLead) },
    'POST /api/auth/password-reset': { body: { email: shop.maker.user.email } },
    'POST /api/auth/password-reset/confirm': { body: { token: shop.resetToken, password: 'a new long password' } },
    'PATCH /api/shop': {
      body: {
        name: `Shop ${m}`,
        unitSystem: 'metric',
        scaleResolutionG: 1,
        offRatioTolerancePct: 5,
        readingCarryH: 2,
        windowCloseLeadMin: 30,
        currency: 'CAD',
        timeZone: 'America/Vancouver',
        temperatureProfile: { mode: 'day_night', dayTempC: 21, nightTempC: 15, dayStartHour: 8, nightStartHour: 20 },
        dayStartHour: 7,
        quietFromHour: 21,
      },
    },
    'PATCH /api/shop/members/:id': { body: { role: 'apprentice', status: 'active' } },
    'POST /api/shop/invitations': { body: { email: `${m}-again@example.test`, role: 'maker' } },
    'POST /api/invitations/:token/accept': { body: { name: `Joiner ${m}`, password: PASSWORD } },
    'GET /api/pieces': { query: { stage: 'planning', q: 'walnut', limit: '10', offset: '0' } },
    'POST /api/pieces': { body: { name: `Piece ${m}`, wood: 'walnut', notes: 'live edge', stage: 'planning' } },
    'PATCH /api/pieces/:id': { body: { name: `Piece ${m}`, wood: 'oak', notes: 'checked', stage: 'planning' } },
    'GET /api/audit': {
      query: {
        objectType: 'piece',
        objectId: ids.piece,
        actorId: shop.lead.user.id,
        action: 'piece',
        from: '2026-01-01',
        to: '2099-01-01T00:00:00Z',
        limit: '10',
        before: '2099-01-01T00:00:00.000001Z',
        beforeId: ids.piece,
      },
    },
    'GET /api/audit/export': {
      query: {
        objectType: 'piece',
        objectId: ids.piece,
        actorId: shop.lead.user.id,
        action: 'piece.create',
        from: '2026-01-01T00:00:00-05:00',
        to: '2099-01-01',
      },
    },
    'GET /api/shelf/resin-systems': { query: { q: 'deep', includeArchived: 'false', limit: '10', offset: '0' } },
    'POST /api/shelf/resin-systems': { body: resinInput({ maker: 'Hostile works', readyToMachineH: 72, activationEnergyKJPerMol: 50 }) },
    'PUT /api/shelf/resin-systems/:id': { body: resinInput({ name: `Deep ${m}`, maker: 'Hostile works', readyToMachineH: 72, activationEnergyKJPerMol: 50 }) },
    'GET /api/shelf/pigments': { query: { q: 'teal', includeArchived: 'true', limit: '10', offset: '0' } },
    'POST /api/shelf/pigments': { body: pigmentBody() },
    'PUT /api/shelf/pigments/:id': { body: { ...pigmentBody(), name: `Teal ${m}` } },
    'GET /api/shelf/lots': { query: { q: 'lot', part: 'A', productId: ids.resin, status: 'all', limit: '10', offset: '0' } },
    'POST /api/shelf/lots': {
      body: {
        part: 'A',
        resinSystemId: ids.resin,
        pigmentId: null,
        lotNumber: 'LOT-2',
        quantityG: 2000,
        receivedOn: '2026-11-02',
        expiresOn: '2027-11-02',
        notes: 'new',
      },
    },
    'GET /api/shelf/lots/:id/uses': { query: { limit: '10', offset: '0' } },
    'PATCH /api/shelf/lots/:id': { body: { lotNumber: `LOT-${m}`, remainingG: 2500, expiresOn: '2027-12-01', notes: 'counted' } },
    'POST /api/molds': { form: { units: 'mm', up: 'z', name: `Mould ${m}`, pieceId: ids.piece } },
    'GET /api/molds': { query: { pieceId: ids.piece, limit: '10', offset: '0' } },
    // The name only changes: the stocked mould keeps the units and axis it was uploaded with, so it is not read again.
    'PATCH /api/molds/:id': { body: { name: `Mould ${m}`, pieceId: ids.piece, units: 'mm', upAxis: 'z' } },
    'GET /api/molds/:id/fill': { query: { level: '5', from: 'mould', dam: 'outline', depthMap: 'false' } },
    'GET /api/molds/:id/layers': { query: { levels: '4,6', from: 'mould', dam: 'box' } },
    'GET /api/pour-plans': { query: { pieceId: ids.piece, limit: '10', offset: '0' } },
    'POST /api/pour-plans': { body: planBody(ids.piece, ids.resin, { pigmentId: ids.pigment, sealResinId: ids.sealResin }) },
    'PUT /api/pour-plans/:id': { body: planBody(ids.piece, ids.resin, { pigmentId: ids.pigment, sealResinId: ids.sealResin }) },
    'POST /api/exotherm': {
      body: {
        depthMm: 20,
        ambientC: 21,
        reactionHeatJG: 300,
        activationKJMol: 53,
        refTempC: 22,
        gelMin: 480,
        densityGMl: 1.1,
        heatCapacityJGK: 1.5,
        conductivityWMK: 0.2,
        base: 'wood',
        limitC: 55,
      },
    },
    'GET /api/pours': { query: { status: 'all', readyToday: 'false', pieceId: ids.piece, limit: '10', offset: '0' } },
    'POST /api/pours': { body: { pourPlanId: ids.plan, notifyUserIds: [shop.lead.user.id] } },
    'POST /api/pours/:id/batches': {
      body: {
        planBatchIndex: 1,
        mixedAt: new Date(Date.now() - 3_600_000).toISOString(),
        lotAId: null,
        lotBId: null,
        lotPigmentId: null,
        lotANumber: 'A-1',
        lotBNumber: 'B-1',
        lotPigmentNumber: 'P-1',
        weighedAG: 10,
        weighedBG: 5,
        weighedPigmentG: 0.2,
        ambientTempC: 21,
        surfaceTempC: 20,
        rhPct: 50,
        notes: 'first cup',
        acknowledgeExpiredLot: false,
        confirmUnusual: true,
      },
    },
    'POST /api/pours/:id/readings': { body: { readings: [{ at: new Date(Date.now() - 1_800_000).toISOString(), tempC: 20 }], confirmUnusual: false } },
    'POST /api/pours/:id/readings/csv': { query: { confirmUnusual: 'false' } },
    'DELETE /api/pours/:id/readings/:readingId': { body: { reason: 'read off the wrong thermometer' } },
    'POST /api/pours/:id/batches/:batchId/void': { body: { reason: 'logged against the wrong cup' } },
    'POST /api/pours/:id/checks': { form: { stage: 'gelled', checkedAt: '2026-11-01T12:00:00Z', hardnessShoreD: '40', note: 'firm' } },
    'POST /api/pours/:id/machined': { body: { machinedAt: '2026-11-09T10:00:00Z', finishCoats: 1, hoursBetweenCoats: 12 } },
    'POST /api/ingest/readings': {
      body: { pourId: ids.pour, readings: [{ at: new Date(Date.now() - 900_000).toISOString(), tempC: 21 }], confirmUnusual: false },
      headers: { 'X-Gelpoint-Ingest-Token': shop.ingestToken },
    },
  };
}
