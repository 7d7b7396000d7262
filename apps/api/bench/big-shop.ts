import { randomUUID } from 'node:crypto';
import type { PlanProductSnapshot, PourPlanInput } from '@gelpoint/contracts';
import type { DataSource, EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import {
  buildPourPlan,
  channelCavity,
  cureState,
  plannedBatches,
  planSteps,
  rectangleCavity,
  stepKeyOf,
  wantedReminders,
  type PourPlan as CorePourPlan,
} from '@gelpoint/core';
import {
  Lot,
  Pigment,
  Piece,
  Pour,
  PourBatch,
  PourPlan,
  Reminder,
  ResinSystem,
  Shop,
  TemperatureReading,
  User,
  toCorePigment,
  toCoreResinSystem,
} from '@gelpoint/db';

const hour = 3_600_000;
const day = 24 * hour;

export interface BigShopSize {
  /** Open pours on the cure board, each with its own piece and plan, logged batches and readings. */
  pours: number;
  /** Lots on the shelf, across every part A, part B and pigment of the demo shelf. */
  lots: number;
}

export interface BigShopSummary {
  shopName: string;
  pieces: number;
  pourPlans: number;
  pours: number;
  batches: number;
  readings: number;
  reminders: number;
  lots: number;
}

interface PlanTemplate {
  label: string;
  shape: { kind: 'channel' | 'rectangle'; lengthMm: number; widthMm: number; depthMm: number };
  sealCoat: boolean;
  pigmentPct: number;
  tempC: number;
}

// Invented bench data: the kinds of pieces a busy shop keeps curing at once.
const planTemplates: PlanTemplate[] = [
  { label: 'River table', shape: { kind: 'channel', lengthMm: 1600, widthMm: 160, depthMm: 40 }, sealCoat: true, pigmentPct: 1, tempC: 21 },
  { label: 'Serving tray', shape: { kind: 'rectangle', lengthMm: 420, widthMm: 260, depthMm: 8 }, sealCoat: false, pigmentPct: 2, tempC: 22 },
  { label: 'Coaster set', shape: { kind: 'rectangle', lengthMm: 570, widthMm: 95, depthMm: 6 }, sealCoat: false, pigmentPct: 0, tempC: 23 },
  { label: 'Charcuterie board', shape: { kind: 'channel', lengthMm: 600, widthMm: 90, depthMm: 18 }, sealCoat: true, pigmentPct: 1, tempC: 20 },
  { label: 'Coffee table', shape: { kind: 'channel', lengthMm: 1100, widthMm: 220, depthMm: 55 }, sealCoat: true, pigmentPct: 1, tempC: 19 },
  { label: 'Wall panel', shape: { kind: 'rectangle', lengthMm: 900, widthMm: 300, depthMm: 12 }, sealCoat: false, pigmentPct: 2, tempC: 22 },
];
const woods = ['black walnut', 'white oak', 'hard maple', 'cherry', 'ash', 'elm burl', 'sapele'];

async function insertChunked<T extends ObjectLiteral>(m: EntityManager, entity: EntityTarget<T>, rows: T[], chunk = 500): Promise<void> {
  for (let i = 0; i < rows.length; i += chunk) {
    await m
      .createQueryBuilder()
      .insert()
      .into(entity)
      .values(rows.slice(i, i + chunk))
      .execute();
  }
}

interface BuiltTemplate extends PlanTemplate {
  inputs: Omit<PourPlanInput, 'pieceId'>;
  snapshot: PlanProductSnapshot;
  result: CorePourPlan;
}

async function buildTemplates(m: EntityManager, shopId: string): Promise<BuiltTemplate[]> {
  const deep = await m.findOneByOrFail(ResinSystem, { shopId, use: 'deep_pour' });
  const seal = await m.findOneByOrFail(ResinSystem, { shopId, use: 'coating' });
  const teal = await m.findOneByOrFail(Pigment, { shopId, name: 'Smoky Teal mica' });
  return planTemplates.map((t) => {
    const { kind, ...size } = t.shape;
    const cavity = kind === 'channel' ? channelCavity(size) : rectangleCavity(size);
    if (!cavity.ok) throw new Error(cavity.error.message);
    const snapshot = {
      deepPour: { id: deep.id, ...toCoreResinSystem(deep) },
      pigment: t.pigmentPct > 0 ? { id: teal.id, ...toCorePigment(teal) } : null,
      sealCoat: t.sealCoat ? { id: seal.id, ...toCoreResinSystem(seal) } : null,
      scaleResolutionG: 0.1,
    };
    const planned = buildPourPlan({
      cavity: { curve: cavity.value.curve, wettedAreaMm2: cavity.value.wettedAreaMm2 },
      fillLevelMm: t.shape.depthMm,
      deepPour: { product: snapshot.deepPour, ...(snapshot.pigment ? { pigment: { pigment: snapshot.pigment, pct: t.pigmentPct } } : {}) },
      ...(snapshot.sealCoat ? { sealCoat: { product: snapshot.sealCoat, filmThicknessMm: 0.15, coats: 1, absorptionFactor: 1.3 } } : {}),
      overPourPct: 5,
      cupWaste: { massG: 10 },
      scaleResolutionG: 0.1,
      shopTempC: t.tempC,
    });
    if (!planned.ok) throw new Error(planned.error.message);
    const inputs = {
      name: t.label,
      cavity: { source: 'shape' as const, shape: t.shape },
      fillLevelMm: t.shape.depthMm,
      deepPour: { resinSystemId: deep.id, pigmentId: snapshot.pigment?.id ?? null, pigmentPct: t.pigmentPct },
      sealCoat: t.sealCoat ? { resinSystemId: seal.id, filmThicknessMm: 0.15, coats: 1, absorptionFactor: 1.3 } : null,
      overPourPct: 5,
      cupWaste: { massG: 10 },
      shopTempC: t.tempC,
    };
    return { ...t, inputs, snapshot, result: planned.value };
  });
}

/**
 * Adds a big shop's worth of curing pours and lots to the demo shop, in bulk inserts: every pour has
 * its own piece and saved plan, its batches logged from the demo lots, temperature readings every
 * three hours since the first cup and the reminders the cure model wants (those already due are
 * marked sent, so a worker does not mail hundreds of them while the bench runs).
 */
export async function seedBigShop(ds: DataSource, size: BigShopSize, now = new Date()): Promise<BigShopSummary> {
  return ds.transaction(async (m) => {
    const shop = await m.findOneByOrFail(Shop, { name: 'Kettle Creek Woodworks' });
    const shopId = shop.id;
    const maker = await m.findOneByOrFail(User, { email: 'maker@gelpoint.test' });
    const lead = await m.findOneByOrFail(User, { email: 'lead@gelpoint.test' });
    const apprentice = await m.findOneByOrFail(User, { email: 'apprentice@gelpoint.test' });
    const templates = await buildTemplates(m, shopId);
    const demoLots = await m.findBy(Lot, { shopId });
    const lotFor = (part: 'A' | 'B', resinSystemId: string) => demoLots.find((l) => l.part === part && l.resinSystemId === resinSystemId) ?? null;

    const pieces: Partial<Piece>[] = [];
    const plans: Partial<PourPlan>[] = [];
    const pours: Partial<Pour>[] = [];
    const batches: Partial<PourBatch>[] = [];
    const readings: Partial<TemperatureReading>[] = [];
    const reminders: Partial<Reminder>[] = [];

    for (let i = 0; i < size.pours; i++) {
      const t = templates[i % templates.length]!;
      const pieceId = randomUUID();
      const planId = randomUUID();
      const pourId = randomUUID();
      const pieceName = `${t.label} no. ${i + 1}`;
      // Spread over the last twelve days, so the board holds every stage from fresh pours to ready ones.
      const pourHoursAgo = 2 + ((i * 37) % 288);
      const sealHoursAgo = t.sealCoat ? pourHoursAgo + 8 : 0;
      const startedAt = new Date(now.getTime() - Math.max(pourHoursAgo, sealHoursAgo) * hour - 30 * 60_000);
      pieces.push({
        id: pieceId,
        shopId,
        name: pieceName,
        wood: woods[i % woods.length]!,
        notes: '',
        stage: 'curing',
        createdById: maker.id,
        createdAt: startedAt,
        updatedAt: startedAt,
      });
      plans.push({
        id: planId,
        shopId,
        pieceId,
        moldId: null,
        name: `${t.label} pour`,
        inputs: { ...t.inputs, pieceId },
        productSnapshot: t.snapshot,
        result: t.result,
        createdById: maker.id,
        createdAt: startedAt,
        updatedAt: startedAt,
      });
      pours.push({
        id: pourId,
        shopId,
        pieceId,
        pourPlanId: planId,
        status: 'open',
        assumedTempC: t.tempC,
        notifyUserIds: [maker.id, lead.id],
        startedById: apprentice.id,
        createdAt: startedAt,
        updatedAt: startedAt,
      });

      const logged: { step: string; mixedAt: Date }[] = [];
      for (const b of plannedBatches(t.result)) {
        const isSeal = b.pour.kind === 'seal_coat';
        const product = isSeal ? t.snapshot.sealCoat! : t.snapshot.deepPour;
        const productId = (product as { id: string }).id;
        const mixedAt = new Date(now.getTime() - (isSeal ? sealHoursAgo : pourHoursAgo) * hour + b.index * 6 * 60_000);
        const [lotA, lotB] = [lotFor('A', productId), lotFor('B', productId)];
        batches.push({
          id: randomUUID(),
          shopId,
          pourId,
          planBatchIndex: b.index,
          step: stepKeyOf(b),
          mixedById: apprentice.id,
          mixedAt,
          lotAId: lotA?.id ?? null,
          lotBId: lotB?.id ?? null,
          lotPigmentId: null,
          lotANumber: lotA?.lotNumber ?? '',
          lotBNumber: lotB?.lotNumber ?? '',
          lotPigmentNumber: '',
          targetAG: b.partA.grams,
          targetBG: b.partB.grams,
          targetPigmentG: b.pigment.grams,
          weighedAG: b.partA.grams,
          weighedBG: b.partB.grams,
          weighedPigmentG: b.pigment.grams,
          offRatioPct: 0,
          ambientTempC: t.tempC,
          surfaceTempC: t.tempC - 0.5,
          rhPct: 45,
          dewPointC: null,
          warnings: [],
          notes: '',
        });
        logged.push({ step: stepKeyOf(b), mixedAt });
      }
      const pourReadings: { at: string; tempC: number }[] = [];
      for (let h = Math.max(pourHoursAgo, sealHoursAgo); h >= 0; h -= 3) {
        // A shop that cools a little at night: ±1.5 °C around the plan's temperature.
        const tempC = Math.round((t.tempC + 1.5 * Math.sin((h / 24) * 2 * Math.PI)) * 10) / 10;
        const takenAt = new Date(now.getTime() - h * hour);
        pourReadings.push({ at: takenAt.toISOString(), tempC });
        readings.push({ id: randomUUID(), shopId, pourId, takenAt, tempC, source: 'sensor' });
      }
      const state = cureState(planSteps(t.result, t.snapshot), logged, pourReadings, t.tempC, now);
      for (const w of wantedReminders(state, pieceName, now, null)) {
        const past = w.dueAt.getTime() <= now.getTime();
        reminders.push({
          id: randomUUID(),
          shopId,
          pourId,
          kind: w.kind,
          step: w.step,
          dueAt: w.dueAt,
          eventAt: w.eventAt,
          leadMin: w.leadMin,
          assumed: w.assumed,
          title: w.title,
          status: past ? 'sent' : 'pending',
          sentAt: past ? w.dueAt : null,
        });
      }
    }

    const lots: Partial<Lot>[] = [];
    const products = [
      ...(await m.findBy(ResinSystem, { shopId })).flatMap((r) =>
        (['A', 'B'] as const).map((part) => ({
          part,
          resinSystemId: r.id,
          pigmentId: null,
          code: r.name.slice(0, 3).toUpperCase(),
          kitG: part === 'A' ? r.kitSizeG * 0.66 : r.kitSizeG * 0.34,
        })),
      ),
      ...(await m.findBy(Pigment, { shopId })).map((p) => ({
        part: 'pigment' as const,
        resinSystemId: null,
        pigmentId: p.id,
        code: p.name.slice(0, 3).toUpperCase(),
        kitG: p.packSizeG,
      })),
    ];
    for (let i = 0; i < size.lots; i++) {
      const p = products[i % products.length]!;
      const receivedDaysAgo = (i * 13) % 700;
      const quantityG = Math.round(p.kitG);
      // Every tenth lot is nearly used up and every seventh is empty: the "low" and "in stock" filters have something to find.
      const remainingG = i % 7 === 0 ? 0 : i % 10 === 0 ? Math.round(quantityG * 0.05) : Math.round(quantityG * (0.2 + ((i * 17) % 80) / 100));
      const receivedOn = new Date(now.getTime() - receivedDaysAgo * day).toISOString().slice(0, 10);
      const expiresOn = p.part === 'pigment' && i % 3 === 0 ? null : new Date(now.getTime() + (365 - receivedDaysAgo) * day).toISOString().slice(0, 10);
      lots.push({
        id: randomUUID(),
        shopId,
        part: p.part,
        resinSystemId: p.resinSystemId,
        pigmentId: p.pigmentId,
        lotNumber: `${p.code}-${p.part === 'pigment' ? 'P' : p.part}-${String(i + 1).padStart(4, '0')}`,
        quantityG,
        remainingG,
        receivedOn,
        expiresOn,
        notes: '',
      });
    }

    await insertChunked(m, Piece, pieces as Piece[]);
    await insertChunked(m, PourPlan, plans as PourPlan[], 200);
    await insertChunked(m, Pour, pours as Pour[]);
    await insertChunked(m, PourBatch, batches as PourBatch[]);
    await insertChunked(m, TemperatureReading, readings as TemperatureReading[], 2000);
    await insertChunked(m, Reminder, reminders as Reminder[]);
    await insertChunked(m, Lot, lots as Lot[]);
    await m.query('ANALYZE');
    return {
      shopName: shop.name,
      pieces: pieces.length,
      pourPlans: plans.length,
      pours: pours.length,
      batches: batches.length,
      readings: readings.length,
      reminders: reminders.length,
      lots: lots.length,
    };
  });
}
