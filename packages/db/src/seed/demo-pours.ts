import type { EntityManager } from 'typeorm';
import {
  buildPourPlan,
  channelCavity,
  cureState,
  plannedBatches,
  planSteps,
  rectangleCavity,
  stepKeyOf,
  wantedReminders,
  type PlanSnapshot,
} from '@gelpoint/core';
import { Lot, Pigment, Piece, Pour, PourBatch, PourPlan, Reminder, ResinSystem, TemperatureReading, User } from '../entities';
import { toCorePigment, toCoreResinSystem } from '../shelf-values';

const hour = 3_600_000;

interface DemoPour {
  pieceName: string;
  planName: string;
  shape: { kind: 'channel' | 'rectangle'; lengthMm: number; widthMm: number; depthMm: number };
  fillLevelMm: number;
  sealCoat: boolean;
  pigmentPct: number;
  /** Hours ago the seal coat and the deep pour were mixed. */
  sealHoursAgo: number;
  pourHoursAgo: number;
  tempC: number;
  /** Reminders already due when the demo starts: kept pending (sent at the first tick) or marked sent. */
  pastReminders: 'pending' | 'sent';
}

// Invented scenario: the river table's demold check came due a few hours ago (the first worker tick
// mails it), and the coaster set has cured long enough to be released for machining.
const demoPours: DemoPour[] = [
  {
    pieceName: 'River table, 1.8 m',
    planName: 'Channel pour, smoky teal',
    shape: { kind: 'channel', lengthMm: 1800, widthMm: 180, depthMm: 45 },
    fillLevelMm: 45,
    sealCoat: true,
    pigmentPct: 1,
    sealHoursAgo: 96,
    pourHoursAgo: 84,
    tempC: 21.5,
    pastReminders: 'pending',
  },
  {
    pieceName: 'Coaster set of six',
    planName: 'Six clear coasters',
    shape: { kind: 'rectangle', lengthMm: 6 * 95, widthMm: 95, depthMm: 8 },
    fillLevelMm: 8,
    sealCoat: false,
    pigmentPct: 0,
    sealHoursAgo: 0,
    pourHoursAgo: 240,
    tempC: 22,
    pastReminders: 'sent',
  },
];

export async function seedDemoPours(m: EntityManager, shopId: string, people: Map<string, User>): Promise<void> {
  const now = Date.now();
  const maker = people.get('maker@gelpoint.test')!;
  const lead = people.get('lead@gelpoint.test')!;
  const apprentice = people.get('apprentice@gelpoint.test')!;
  const deep = await m.findOneByOrFail(ResinSystem, { shopId, use: 'deep_pour' });
  const seal = await m.findOneByOrFail(ResinSystem, { shopId, use: 'coating' });
  const teal = await m.findOneByOrFail(Pigment, { shopId, name: 'Smoky Teal mica' });
  const lotOf = async (part: 'A' | 'B', resinSystemId: string) => m.findOneByOrFail(Lot, { shopId, part, resinSystemId });

  for (const d of demoPours) {
    const { kind, ...size } = d.shape;
    const cavity = kind === 'channel' ? channelCavity(size) : rectangleCavity(size);
    if (!cavity.ok) throw new Error(cavity.error.message);
    const piece = await m.findOneByOrFail(Piece, { shopId, name: d.pieceName });
    const snapshot = {
      deepPour: { id: deep.id, ...toCoreResinSystem(deep) },
      pigment: d.pigmentPct > 0 ? { id: teal.id, ...toCorePigment(teal) } : null,
      sealCoat: d.sealCoat ? { id: seal.id, ...toCoreResinSystem(seal) } : null,
      scaleResolutionG: 0.1,
    };
    const inputs = {
      pieceId: piece.id,
      name: d.planName,
      cavity: { source: 'shape' as const, shape: d.shape },
      fillLevelMm: d.fillLevelMm,
      deepPour: { resinSystemId: deep.id, pigmentId: snapshot.pigment?.id ?? null, pigmentPct: d.pigmentPct },
      sealCoat: d.sealCoat ? { resinSystemId: seal.id, filmThicknessMm: 0.15, coats: 1, absorptionFactor: 1.3 } : null,
      overPourPct: 5,
      cupWaste: { massG: 10 },
      shopTempC: d.tempC,
    };
    const planned = buildPourPlan({
      cavity: { curve: cavity.value.curve, wettedAreaMm2: cavity.value.wettedAreaMm2 },
      fillLevelMm: d.fillLevelMm,
      deepPour: { product: snapshot.deepPour, ...(snapshot.pigment ? { pigment: { pigment: snapshot.pigment, pct: d.pigmentPct } } : {}) },
      ...(snapshot.sealCoat ? { sealCoat: { product: snapshot.sealCoat, filmThicknessMm: 0.15, coats: 1, absorptionFactor: 1.3 } } : {}),
      overPourPct: 5,
      cupWaste: { massG: 10 },
      scaleResolutionG: 0.1,
      shopTempC: d.tempC,
    });
    if (!planned.ok) throw new Error(planned.error.message);
    const plan = await m.save(
      m.create(PourPlan, {
        shopId,
        pieceId: piece.id,
        moldId: null,
        name: d.planName,
        inputs,
        productSnapshot: snapshot,
        result: planned.value,
        createdById: maker.id,
      }),
    );
    const pour = await m.save(
      m.create(Pour, {
        shopId,
        pieceId: piece.id,
        pourPlanId: plan.id,
        status: 'open',
        assumedTempC: d.tempC,
        notifyUserIds: [maker.id, lead.id],
        startedById: apprentice.id,
      }),
    );

    const logged: { step: string; mixedAt: Date }[] = [];
    for (const b of plannedBatches(planned.value)) {
      const isSeal = b.pour.kind === 'seal_coat';
      const product = isSeal ? seal : deep;
      const mixedAt = new Date(now - (isSeal ? d.sealHoursAgo : d.pourHoursAgo) * hour + b.index * 6 * 60_000);
      const [lotA, lotB] = [await lotOf('A', product.id), await lotOf('B', product.id)];
      await m.save(
        m.create(PourBatch, {
          shopId,
          pourId: pour.id,
          planBatchIndex: b.index,
          step: stepKeyOf(b),
          mixedById: apprentice.id,
          mixedAt,
          lotAId: lotA.id,
          lotBId: lotB.id,
          lotPigmentId: null,
          lotANumber: lotA.lotNumber,
          lotBNumber: lotB.lotNumber,
          lotPigmentNumber: b.pigment.grams > 0 ? 'STM-0917' : '',
          targetAG: b.partA.grams,
          targetBG: b.partB.grams,
          targetPigmentG: b.pigment.grams,
          weighedAG: b.partA.grams,
          weighedBG: b.partB.grams,
          weighedPigmentG: b.pigment.grams,
          offRatioPct: 0,
          ambientTempC: d.tempC,
          surfaceTempC: d.tempC - 0.5,
          rhPct: 45,
          dewPointC: null,
          warnings: [],
          notes: '',
        }),
      );
      logged.push({ step: stepKeyOf(b), mixedAt });
    }
    const firstHoursAgo = Math.max(d.sealHoursAgo, d.pourHoursAgo);
    const readings = [];
    for (let h = firstHoursAgo; h >= 0; h -= 4) {
      // A shop that cools a little at night: ±1 °C around the plan's temperature.
      const tempC = Math.round((d.tempC + Math.sin((h / 24) * 2 * Math.PI)) * 10) / 10;
      readings.push({ at: new Date(now - h * hour).toISOString(), tempC });
      await m.save(m.create(TemperatureReading, { shopId, pourId: pour.id, takenAt: new Date(now - h * hour), tempC, source: 'sensor' }));
    }
    const state = cureState(planSteps(planned.value, snapshot as PlanSnapshot), logged, readings, d.tempC, new Date(now));
    for (const w of wantedReminders(state, piece.name, new Date(now), null)) {
      const past = w.dueAt.getTime() <= now;
      const status = past ? d.pastReminders : 'pending';
      await m.save(
        m.create(Reminder, {
          shopId,
          pourId: pour.id,
          kind: w.kind,
          step: w.step,
          dueAt: w.dueAt,
          eventAt: w.eventAt,
          leadMin: w.leadMin,
          assumed: w.assumed,
          title: w.title,
          status,
          sentAt: status === 'sent' ? w.dueAt : null,
        }),
      );
    }
  }
}
