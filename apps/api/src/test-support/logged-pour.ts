import type { SessionResponse } from '@gelpoint/contracts';
import { resinInput } from './fixtures';
import { bearer, createShop, type Harness, type ShopFixture } from './harness';

export interface PlannedCup {
  index: number;
  partA: { grams: number };
  partB: { grams: number };
  pigment: { grams: number };
  pour: { kind: 'layer'; layer: number };
}

export interface LoggedPour {
  shop: ShopFixture;
  apprentice: SessionResponse;
  maker: SessionResponse;
  resinId: string;
  pigmentId: string;
  lots: { a: string; b: string; pigment: string; spareA: string };
  piece: { id: string; name: string };
  plan: { id: string; name: string };
  pourId: string;
  cups: PlannedCup[];
  /** What was logged for each cup, in the order it was logged. */
  logged: { planBatchIndex: number; weighedAG: number; weighedBG: number; weighedPigmentG: number; mixedAt: string; mixedBy: SessionResponse }[];
  readings: { at: string; tempC: number }[];
}

/**
 * A shop with a pigmented two-layer plan under way: lots of A, B and pigment received, every cup logged from
 * them (slightly off the targets, by two people, at known times), hourly readings and one cure check.
 */
export async function loggedPour(h: Harness, label: string): Promise<LoggedPour> {
  const shop = await createShop(h, `Shop ${label}`);
  const lead = bearer(shop.lead);
  const maker = await shop.member('maker');
  const apprentice = await shop.member('apprentice');
  const post = async (path: string, body: object, who = lead) =>
    (await h.http().post(path).set(who).send(body).expect(201)).body as { id: string } & Record<string, unknown>;
  const resin = await post('/api/shelf/resin-systems', resinInput({ name: `Deep ${label}`, mixRatio: { a: 2, b: 1, basis: 'weight' }, maxLayerMm: 25 }));
  const pigment = await post('/api/shelf/pigments', {
    name: `Teal ${label}`,
    kind: 'paste',
    densityGPerMl: 1.3,
    recommendedPct: 2,
    maxPct: 5,
    pricePerPack: 12,
    packSizeG: 50,
  });
  const lot = (part: 'A' | 'B' | 'pigment', lotNumber: string) =>
    post(
      '/api/shelf/lots',
      part === 'pigment'
        ? { part, pigmentId: pigment.id, lotNumber, quantityG: 500, receivedOn: '2026-10-01' }
        : { part, resinSystemId: resin.id, lotNumber, quantityG: 20_000, receivedOn: '2026-10-01' },
    );
  const lots = {
    a: (await lot('A', `${label}-A-1`)).id,
    b: (await lot('B', `${label}-B-1`)).id,
    pigment: (await lot('pigment', `${label}-P-1`)).id,
    spareA: (await lot('A', `${label}-A-2`)).id,
  };
  const piece = await post('/api/pieces', { name: `Tray ${label}` }, bearer(maker));
  const plan = await post(
    '/api/pour-plans',
    {
      pieceId: piece.id,
      name: `Plan ${label}`,
      cavity: { source: 'shape', shape: { kind: 'rectangle', lengthMm: 200, widthMm: 100, depthMm: 40 } },
      fillLevelMm: 40,
      deepPour: { resinSystemId: resin.id, pigmentId: pigment.id, pigmentPct: 2 },
      overPourPct: 0,
      cupWaste: { massG: 0 },
      shopTempC: 20,
    },
    bearer(maker),
  );
  const result = plan.result as { layers: { batches: PlannedCup[] }[] };
  const cups = result.layers.flatMap((l) => l.batches);
  const pour = await post('/api/pours', { pourPlanId: plan.id }, bearer(apprentice));
  // Three days ago on the hour: everything logged lies in the past, as a real log does.
  const start = Math.floor(Date.now() / 3_600_000) * 3_600_000 - 72 * 3_600_000;
  const logged: LoggedPour['logged'] = [];
  for (const [i, cup] of cups.entries()) {
    const mixedBy = i % 2 === 0 ? apprentice : maker;
    const row = {
      planBatchIndex: cup.index,
      // A little off the targets, as a real scale reads, with decimals a CSV must carry exactly.
      weighedAG: Math.round((cup.partA.grams + 0.3 + i) * 10) / 10,
      weighedBG: Math.round((cup.partB.grams - 0.2) * 10) / 10,
      weighedPigmentG: Math.round((cup.pigment.grams + 0.1) * 10) / 10,
      mixedAt: new Date(start + cup.pour.layer * 14 * 3_600_000 + i * 600_000).toISOString(),
    };
    await h
      .http()
      .post(`/api/pours/${pour.id}/batches`)
      .set(bearer(mixedBy))
      .send({
        ...row,
        lotAId: lots.a,
        lotBId: lots.b,
        lotPigmentId: lots.pigment,
        ambientTempC: 20.5,
        surfaceTempC: 19.5,
        rhPct: 45,
        notes: i === 0 ? '=SUM(A1:A9) stirred 3 min' : '',
      })
      .expect(201);
    logged.push({ ...row, mixedBy });
  }
  const readings = Array.from({ length: 6 }, (_, k) => ({
    at: new Date(start + k * 3_600_000).toISOString(),
    tempC: Math.round((19.5 + 0.7 * k - (k === 3 ? 1.9 : 0)) * 10) / 10,
  }));
  await h.http().post(`/api/pours/${pour.id}/readings`).set(bearer(apprentice)).send({ readings }).expect(200);
  await h
    .http()
    .post(`/api/pours/${pour.id}/checks`)
    .set(bearer(apprentice))
    .field('stage', 'tack_free')
    .field('hardnessShoreD', '62')
    .field('note', 'firm at the rim')
    .expect(201);
  return {
    shop,
    apprentice,
    maker,
    resinId: resin.id,
    pigmentId: pigment.id,
    lots,
    piece: { id: piece.id, name: String(piece.name) },
    plan: { id: plan.id, name: String(plan.name) },
    pourId: pour.id,
    cups,
    logged,
    readings,
  };
}
