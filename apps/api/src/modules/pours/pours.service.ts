import { In, type DataSource, type EntityManager } from 'typeorm';
import { dewPointC, massRatioAToB, offRatioPct as offRatioPctOf, parseIsoInstant, releaseEvidence, surfaceDewPointCheck, type CureReading, type PourPlan as CorePourPlan, type ReleaseCheck } from '@gelpoint/core';
import { CureCheck, Lot, Piece, Pour, PourBatch, PourPlan, Reminder, Shop, TemperatureReading, User, type CureCheckStage, type PieceStage } from '@gelpoint/db';
import type { PourSummary, PourView } from '@gelpoint/contracts';
import type { AuthContext } from '../../http/auth-context';
import { AppError, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { UploadQuota } from '../uploads/upload-quota';
import { syncReminders } from './pour-reminders';
import { cureState, plannedBatches, planSteps, stepKeyOf, wantedReminders, type PlanSnapshot } from '@gelpoint/core';
import { batchView, cureView, reminderView } from './pour-view';

export interface LogBatchInput {
  planBatchIndex: number;
  mixedAt?: string;
  lotAId: string | null;
  lotBId: string | null;
  lotPigmentId: string | null;
  lotANumber: string;
  lotBNumber: string;
  lotPigmentNumber: string;
  weighedAG: number;
  weighedBG: number;
  weighedPigmentG: number;
  ambientTempC: number | null;
  surfaceTempC: number | null;
  rhPct: number | null;
  notes: string;
  acknowledgeExpiredLot: boolean;
}

interface LoggedBatch {
  step: string;
  mixed_at: Date;
}

function groupByPour<T extends { pour_id: string }>(rows: T[]): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const r of rows) {
    const list = out.get(r.pour_id);
    if (list) list.push(r);
    else out.set(r.pour_id, [r]);
  }
  return out;
}

interface Loaded {
  pour: Pour;
  piece: Piece;
  plan: PourPlan;
  result: CorePourPlan;
  snapshot: PlanSnapshot;
}

/** The shop settings the cure model and the reminders follow. */
type CureSettings = Pick<Shop, 'readingCarryH' | 'windowCloseLeadMin'>;

const today = () => new Date().toISOString().slice(0, 10);

export class Pours {
  constructor(
    private readonly ds: DataSource,
    private readonly now: () => Date = () => new Date(),
    private readonly quota = new UploadQuota(),
  ) {}

  private async load(m: EntityManager, shopId: string, id: string, lock = false): Promise<Loaded> {
    const pour = await m.findOne(Pour, { where: { id, shopId }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
    if (!pour) throw notFound('pour');
    const plan = await m.findOneByOrFail(PourPlan, { id: pour.pourPlanId });
    const piece = await m.findOneByOrFail(Piece, { id: pour.pieceId });
    return { pour, piece, plan, result: plan.result as unknown as CorePourPlan, snapshot: plan.productSnapshot as unknown as PlanSnapshot };
  }

  private async readingsOf(m: EntityManager, pourId: string): Promise<CureReading[]> {
    const rows: { taken_at: Date; temp_c: number }[] = await m.query('SELECT taken_at, temp_c FROM temperature_readings WHERE pour_id = $1 ORDER BY taken_at', [pourId]);
    return rows.map((r) => ({ at: r.taken_at.toISOString(), tempC: r.temp_c }));
  }

  private async settingsOf(m: EntityManager, shopId: string): Promise<CureSettings> {
    return m.findOneOrFail(Shop, { where: { id: shopId }, select: { id: true, readingCarryH: true, windowCloseLeadMin: true } });
  }

  private async checksOf(m: EntityManager, pourId: string): Promise<ReleaseCheck[]> {
    const rows: { checked_at: Date; hardness_shore_d: number | null }[] = await m.query('SELECT checked_at, hardness_shore_d FROM cure_checks WHERE pour_id = $1', [pourId]);
    return rows.map((r) => ({ checkedAt: r.checked_at, hardnessShoreD: r.hardness_shore_d }));
  }

  private stateOf(l: Loaded, settings: CureSettings, logged: LoggedBatch[], readings: CureReading[], checks: ReleaseCheck[]) {
    const steps = planSteps(l.result, l.snapshot);
    const state = cureState(steps, logged.map((b) => ({ step: b.step, mixedAt: b.mixed_at })), readings, l.pour.assumedTempC, this.now(), { readingCarryH: settings.readingCarryH });
    return { state, release: releaseEvidence(state, checks), batchesLogged: logged.length, batchesPlanned: plannedBatches(l.result).length };
  }

  private async state(m: EntityManager, l: Loaded, settings?: CureSettings) {
    const logged: LoggedBatch[] = await m.query('SELECT step, mixed_at FROM pour_batches WHERE pour_id = $1', [l.pour.id]);
    return this.stateOf(l, settings ?? (await this.settingsOf(m, l.pour.shopId)), logged, await this.readingsOf(m, l.pour.id), await this.checksOf(m, l.pour.id));
  }

  /** Recomputes the pour's pending reminders from everything logged so far; called after every change. */
  private async refreshReminders(m: EntityManager, l: Loaded): Promise<void> {
    const settings = await this.settingsOf(m, l.pour.shopId);
    const { state } = await this.state(m, l, settings);
    const finish = l.pour.machinedAt && l.pour.finishCoats ? { machinedAt: l.pour.machinedAt, coats: l.pour.finishCoats, hoursBetween: l.pour.finishCoatIntervalH ?? 24 } : null;
    const active = l.pour.status === 'open';
    const wanted = wantedReminders(active ? state : { ...state, step: null, status: null }, l.piece.name, this.now(), finish, { windowCloseLeadMin: settings.windowCloseLeadMin });
    await syncReminders(m, l.pour.shopId, l.pour.id, wanted);
  }

  private async setPieceStage(m: EntityManager, pieceId: string, stage: PieceStage) {
    await m.update(Piece, { id: pieceId }, { stage });
  }

  private async summary(m: EntityManager, l: Loaded): Promise<PourSummary> {
    const state = await this.state(m, l);
    const next = await m.findOne(Reminder, { where: { pourId: l.pour.id, status: 'pending' }, order: { dueAt: 'ASC' } });
    return this.summaryOf(l, state, next);
  }

  private summaryOf(l: Loaded, { state, release, batchesLogged, batchesPlanned }: ReturnType<Pours['stateOf']>, next: Reminder | null): PourSummary {
    return {
      id: l.pour.id,
      piece: { id: l.piece.id, name: l.piece.name, stage: l.piece.stage },
      planName: l.plan.name,
      status: l.pour.status,
      startedAt: l.pour.createdAt.toISOString(),
      batchesLogged,
      batchesPlanned,
      cure: cureView(state, release),
      nextReminder: next ? reminderView(next) : null,
    };
  }

  async get(shopId: string, id: string): Promise<PourView> {
    const m = this.ds.manager;
    const l = await this.load(m, shopId, id);
    const summary = await this.summary(m, l);
    const batches = await m.find(PourBatch, { where: { pourId: id }, relations: { mixedBy: true }, order: { planBatchIndex: 'ASC' } });
    const readings: { taken_at: Date; temp_c: number; source: string }[] = await m.query('SELECT taken_at, temp_c, source FROM temperature_readings WHERE pour_id = $1 ORDER BY taken_at', [id]);
    const checks = await m.find(CureCheck, { where: { pourId: id }, relations: { checkedBy: true }, order: { checkedAt: 'ASC' } });
    const reminders = await m.find(Reminder, { where: { pourId: id }, order: { dueAt: 'ASC' } });
    const people = l.pour.notifyUserIds.length ? await m.query('SELECT id, name FROM users WHERE id = ANY($1)', [l.pour.notifyUserIds]) : [];
    const ref = async (userId: string | null) => (userId ? ((await m.findOne(User, { where: { id: userId }, select: { id: true, name: true } })) ?? null) : null);
    const releasedBy = await ref(l.pour.releasedById);
    return {
      ...summary,
      pourPlanId: l.plan.id,
      assumedTempC: l.pour.assumedTempC,
      notify: people,
      batches: batches.map(batchView),
      readings: readings.map((r) => ({ at: r.taken_at.toISOString(), tempC: r.temp_c, source: r.source })),
      checks: checks.map((c) => ({ id: c.id, checkedAt: c.checkedAt.toISOString(), stage: c.stage, hardnessShoreD: c.hardnessShoreD, note: c.note, hasPhoto: c.photoType !== null, checkedBy: c.checkedBy ? { id: c.checkedBy.id, name: c.checkedBy.name } : null })),
      reminders: reminders.map(reminderView),
      releasedAt: l.pour.releasedAt?.toISOString() ?? null,
      releasedBy: releasedBy ? { id: releasedBy.id, name: releasedBy.name } : null,
      machinedAt: l.pour.machinedAt?.toISOString() ?? null,
    };
  }

  async list(shopId: string, q: { status: 'active' | 'released' | 'machined' | 'all'; readyToday: 'true' | 'false'; pieceId?: string; limit: number; offset: number }) {
    const qb = this.ds.getRepository(Pour).createQueryBuilder('p').where('p.shop_id = :shopId', { shopId });
    if (q.status === 'active') qb.andWhere(`p.status = 'open'`);
    else if (q.status !== 'all') qb.andWhere('p.status = :s', { s: q.status });
    if (q.pieceId) qb.andWhere('p.piece_id = :pieceId', { pieceId: q.pieceId });
    if (q.readyToday === 'true') {
      // Ready today: open pours whose ready-to-machine reminder falls before the end of the day.
      qb.andWhere(`p.status = 'open'`).andWhere(
        `EXISTS (SELECT 1 FROM reminders r WHERE r.pour_id = p.id AND r.kind = 'ready_to_machine' AND r.status <> 'cancelled' AND r.due_at < date_trunc('day', now()) + interval '1 day')`,
      );
    }
    const [pours, total] = await qb.orderBy('p.createdAt', 'DESC').addOrderBy('p.id').take(q.limit).skip(q.offset).getManyAndCount();
    // Everything the page shows in five queries, whatever its length: plans, pieces, and the logged
    // batches, readings and next reminder of every pour on it.
    const m = this.ds.manager;
    const ids = pours.map((p) => p.id);
    const plans = new Map((await m.findBy(PourPlan, { id: In(pours.map((p) => p.pourPlanId)) })).map((p) => [p.id, p]));
    const pieces = new Map((await m.findBy(Piece, { id: In(pours.map((p) => p.pieceId)) })).map((p) => [p.id, p]));
    const logged = groupByPour<LoggedBatch & { pour_id: string }>(ids.length ? await m.query('SELECT pour_id, step, mixed_at FROM pour_batches WHERE pour_id = ANY($1)', [ids]) : []);
    const readings = groupByPour<{ pour_id: string; taken_at: Date; temp_c: number }>(
      ids.length ? await m.query('SELECT pour_id, taken_at, temp_c FROM temperature_readings WHERE pour_id = ANY($1) ORDER BY pour_id, taken_at', [ids]) : [],
    );
    const next = ids.length
      ? await m.getRepository(Reminder).createQueryBuilder('r').distinctOn(['r.pourId']).where('r.pourId IN (:...ids)', { ids }).andWhere(`r.status = 'pending'`).orderBy('r.pourId').addOrderBy('r.dueAt', 'ASC').getMany()
      : [];
    const nextOf = new Map(next.map((r) => [r.pourId, r]));
    const checks = groupByPour<{ pour_id: string; checked_at: Date; hardness_shore_d: number | null }>(
      ids.length ? await m.query('SELECT pour_id, checked_at, hardness_shore_d FROM cure_checks WHERE pour_id = ANY($1)', [ids]) : [],
    );
    const settings = await this.settingsOf(m, shopId);
    const items = pours.map((pour) => {
      const plan = plans.get(pour.pourPlanId)!;
      const l: Loaded = { pour, plan, piece: pieces.get(pour.pieceId)!, result: plan.result as unknown as CorePourPlan, snapshot: plan.productSnapshot as unknown as PlanSnapshot };
      const log = (readings.get(pour.id) ?? []).map((r) => ({ at: r.taken_at.toISOString(), tempC: r.temp_c }));
      const pourChecks = (checks.get(pour.id) ?? []).map((c) => ({ checkedAt: c.checked_at, hardnessShoreD: c.hardness_shore_d }));
      return this.summaryOf(l, this.stateOf(l, settings, logged.get(pour.id) ?? [], log, pourChecks), nextOf.get(pour.id) ?? null);
    });
    return { items, total };
  }

  async start(auth: AuthContext, pourPlanId: string, notifyUserIds?: string[]): Promise<PourView> {
    const id = await this.ds.transaction(async (m) => {
      const plan = await m.findOneBy(PourPlan, { id: pourPlanId, shopId: auth.shopId });
      if (!plan) throw notFound('pour plan');
      const wanted = notifyUserIds ?? [...new Set([auth.userId, plan.createdById].filter((x): x is string => Boolean(x)))];
      const members: { user_id: string }[] = await m.query(`SELECT user_id FROM memberships WHERE shop_id = $1 AND status = 'active' AND user_id = ANY($2)`, [auth.shopId, wanted]);
      if (members.length !== wanted.length) throw new AppError('bad_request', 'invalid_input', 'everyone to notify must be an active member of this shop', { notifyUserIds: 'not all are members' });
      const inputs = plan.inputs as { shopTempC?: number };
      const pour = await m.save(m.create(Pour, { shopId: auth.shopId, pieceId: plan.pieceId, pourPlanId: plan.id, status: 'open', assumedTempC: inputs.shopTempC ?? 20, notifyUserIds: wanted, startedById: auth.userId }));
      await this.setPieceStage(m, plan.pieceId, 'pouring');
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'pour.start', objectType: 'pour', objectId: pour.id, detail: { pourPlanId } });
      return pour.id;
    });
    return this.get(auth.shopId, id);
  }

  async logBatch(auth: AuthContext, pourId: string, input: LogBatchInput) {
    const result = await this.ds.transaction(async (m) => {
      const l = await this.load(m, auth.shopId, pourId, true);
      if (l.pour.status !== 'open') throw new AppError('conflict', 'pour_closed', 'this pour is released; batches can no longer be added');
      const planned = plannedBatches(l.result).find((b) => b.index === input.planBatchIndex);
      if (!planned) throw new AppError('bad_request', 'invalid_input', `the run sheet has no batch ${input.planBatchIndex + 1}`, { planBatchIndex: 'not on the run sheet' });
      if (await m.findOneBy(PourBatch, { pourId, planBatchIndex: input.planBatchIndex })) {
        throw new AppError('conflict', 'batch_already_logged', `batch ${input.planBatchIndex + 1} of the run sheet is already logged`);
      }
      const warnings: { code: string; message: string }[] = [];
      const lots = { A: input.lotAId, B: input.lotBId, pigment: input.lotPigmentId } as const;
      const lotNumbers = { A: input.lotANumber, B: input.lotBNumber, pigment: input.lotPigmentNumber };
      const grams = { A: input.weighedAG, B: input.weighedBG, pigment: input.weighedPigmentG };
      for (const part of ['A', 'B', 'pigment'] as const) {
        const lotId = lots[part];
        if (!lotId) continue;
        const lot = await m.findOne(Lot, { where: { id: lotId, shopId: auth.shopId }, lock: { mode: 'pessimistic_write' } });
        if (!lot) throw new AppError('not_found', 'not_found', `no such lot (part ${part}) on this shop's shelf`);
        if (lot.part !== part) throw new AppError('bad_request', 'invalid_input', `lot ${lot.lotNumber} is a part ${lot.part} lot, not part ${part}`, { [`lot${part === 'pigment' ? 'Pigment' : part}Id`]: 'wrong part' });
        if (lot.expiresOn && lot.expiresOn < today()) {
          if (!input.acknowledgeExpiredLot) {
            throw new AppError('conflict', 'expired_lot_unacknowledged', `lot ${lot.lotNumber} expired on ${lot.expiresOn}; confirm that you want to use it (test a small cup first), or pick another lot`);
          }
          warnings.push({ code: 'expired_lot', message: `Lot ${lot.lotNumber} (part ${part}) was past its date (${lot.expiresOn}) when mixed.` });
        }
        lotNumbers[part] = lot.lotNumber;
        // Stock is drawn down by what was weighed; it never goes below zero.
        await m.query('UPDATE lots SET remaining_g = GREATEST(0, remaining_g - $2), updated_at = now() WHERE id = $1', [lot.id, grams[part]]);
      }
      const shop = await m.findOneByOrFail(Shop, { id: auth.shopId });
      // The product's own ratio by mass, not the cup's rounded targets: a weighed cup is checked against the chemistry.
      const product = planned.pour.kind === 'seal_coat' && l.snapshot.sealCoat ? l.snapshot.sealCoat : l.snapshot.deepPour;
      const targetRatio = massRatioAToB(product.mixRatio, product.densityAGPerMl, product.densityBGPerMl);
      const offRatioPct = offRatioPctOf(input.weighedAG, input.weighedBG, targetRatio);
      if (Math.abs(offRatioPct) > shop.offRatioTolerancePct) {
        warnings.push({
          code: 'off_ratio',
          message: `Off ratio: A:B weighed ${(input.weighedAG / input.weighedBG).toFixed(3)} against ${targetRatio.toFixed(3)} for ${product.mixRatio.a}:${product.mixRatio.b} by ${product.mixRatio.basis} (${offRatioPct > 0 ? '+' : ''}${offRatioPct.toFixed(1)} %, tolerance ${shop.offRatioTolerancePct} %). An off-ratio cup may never cure: follow the TDS, and do not pour it if in doubt.`,
        });
      }
      let dew: number | null = null;
      if (input.ambientTempC !== null && input.rhPct !== null) {
        const d = dewPointC(input.ambientTempC, input.rhPct);
        if (d.ok) dew = Math.round(d.value * 100) / 100;
        if (input.surfaceTempC !== null) {
          const c = surfaceDewPointCheck(input.surfaceTempC, input.ambientTempC, input.rhPct);
          if (c.ok && c.value.caution) warnings.push({ code: 'dew_point', message: c.value.caution.message });
        }
      }
      const mixedAt = input.mixedAt ? new Date(input.mixedAt) : this.now();
      const batch = await m.save(
        m.create(PourBatch, {
          shopId: auth.shopId,
          pourId,
          planBatchIndex: input.planBatchIndex,
          step: stepKeyOf(planned),
          mixedById: auth.userId,
          mixedAt,
          lotAId: input.lotAId,
          lotBId: input.lotBId,
          lotPigmentId: input.lotPigmentId,
          lotANumber: lotNumbers.A,
          lotBNumber: lotNumbers.B,
          lotPigmentNumber: lotNumbers.pigment,
          targetAG: planned.partA.grams,
          targetBG: planned.partB.grams,
          targetPigmentG: planned.pigment.grams,
          weighedAG: input.weighedAG,
          weighedBG: input.weighedBG,
          weighedPigmentG: input.weighedPigmentG,
          offRatioPct: Math.round(offRatioPct * 100) / 100,
          ambientTempC: input.ambientTempC,
          surfaceTempC: input.surfaceTempC,
          rhPct: input.rhPct,
          dewPointC: dew,
          warnings,
          notes: input.notes,
        }),
      );
      const logged = await m.countBy(PourBatch, { pourId });
      if (logged === plannedBatches(l.result).length) await this.setPieceStage(m, l.piece.id, 'curing');
      await this.refreshReminders(m, l);
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'batch.log', objectType: 'pour', objectId: pourId, detail: { planBatchIndex: input.planBatchIndex, warnings: warnings.map((w) => w.code) } });
      return { id: batch.id, warnings };
    });
    const batch = await this.ds.getRepository(PourBatch).findOneOrFail({ where: { id: result.id }, relations: { mixedBy: true } });
    return { batch: batchView(batch), warnings: result.warnings };
  }

  /** All readings or none: a duplicate time is skipped (a re-sent log), anything invalid refuses the lot. */
  async addReadings(shopId: string, pourId: string, readings: CureReading[], source: 'manual' | 'csv' | 'sensor', actor: AuthContext | null) {
    return this.ds.transaction(async (m) => {
      const l = await this.load(m, shopId, pourId, true);
      let added = 0;
      for (const r of readings) {
        // One reader of times for every path (core's), and one stored form: UTC.
        const at = parseIsoInstant(r.at);
        if (!at.ok) throw new AppError('bad_request', 'invalid_input', at.error.message, { at: 'not an ISO time with an offset' });
        const res = await m.query(
          `INSERT INTO temperature_readings (shop_id, pour_id, taken_at, temp_c, source) VALUES ($1, $2, $3, $4, $5) ON CONFLICT (pour_id, taken_at) DO NOTHING RETURNING id`,
          [shopId, pourId, new Date(at.value).toISOString(), r.tempC, source],
        );
        added += (res as unknown[]).length;
      }
      await this.refreshReminders(m, l);
      await recordAudit(m, { shopId, actor, action: 'readings.add', objectType: 'pour', objectId: pourId, detail: { added, source } });
      return { added, duplicates: readings.length - added };
    });
  }

  async addCheck(auth: AuthContext, pourId: string, input: { stage: CureCheckStage; checkedAt?: string; hardnessShoreD?: number; note: string }, photo: { bytes: Buffer; type: string } | null) {
    return this.ds.transaction(async (m) => {
      await this.load(m, auth.shopId, pourId);
      if (photo) await this.quota.reserve(m, auth.userId, photo.bytes.length);
      const check = await m.save(
        m.create(CureCheck, {
          shopId: auth.shopId,
          pourId,
          checkedAt: input.checkedAt ? new Date(input.checkedAt) : this.now(),
          stage: input.stage,
          hardnessShoreD: input.hardnessShoreD ?? null,
          note: input.note,
          photoType: photo?.type ?? null,
          photo: photo?.bytes ?? null,
          checkedById: auth.userId,
        }),
      );
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'cure_check.add', objectType: 'pour', objectId: pourId, detail: { stage: input.stage } });
      return { id: check.id, checkedAt: check.checkedAt.toISOString(), stage: check.stage, hardnessShoreD: check.hardnessShoreD, note: check.note, hasPhoto: photo !== null, checkedBy: { id: auth.userId, name: auth.userName } };
    });
  }

  async photo(shopId: string, pourId: string, checkId: string): Promise<{ bytes: Buffer; type: string }> {
    const rows: { photo: Buffer | null; photo_type: string | null }[] = await this.ds.query('SELECT photo, photo_type FROM cure_checks WHERE id = $1 AND pour_id = $2 AND shop_id = $3', [checkId, pourId, shopId]);
    if (!rows[0]?.photo || !rows[0].photo_type) throw notFound('photo');
    return { bytes: rows[0].photo, type: rows[0].photo_type };
  }

  async release(auth: AuthContext, pourId: string): Promise<PourView> {
    await this.ds.transaction(async (m) => {
      const l = await this.load(m, auth.shopId, pourId, true);
      if (l.pour.status !== 'open') throw new AppError('conflict', 'already_released', 'this pour was already released');
      const { state, release } = await this.state(m, l);
      if (!release.allowed) {
        throw new AppError('conflict', 'not_ready', `The log does not show this piece ready to machine yet. ${release.reasons.join(' ')}`);
      }
      await m.update(Pour, { id: pourId }, { status: 'released', releasedAt: this.now(), releasedById: auth.userId });
      await this.setPieceStage(m, l.piece.id, 'released');
      l.pour.status = 'released';
      await this.refreshReminders(m, l);
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'pour.release',
        objectType: 'pour',
        objectId: pourId,
        detail: { equivalentHoursAtRef: state.status?.age.equivalentHoursAtRef, loggedEquivalentHours: state.status?.age.loggedEquivalentHours, assumedEquivalentHours: state.status?.age.assumedEquivalentHours },
      });
    });
    return this.get(auth.shopId, pourId);
  }

  async machined(auth: AuthContext, pourId: string, input: { machinedAt?: string; finishCoats: number; hoursBetweenCoats: number }): Promise<PourView> {
    await this.ds.transaction(async (m) => {
      const l = await this.load(m, auth.shopId, pourId, true);
      if (l.pour.status === 'open') throw new AppError('conflict', 'not_released', 'release the piece for machining first');
      const machinedAt = input.machinedAt ? new Date(input.machinedAt) : this.now();
      await m.update(Pour, { id: pourId }, { status: 'machined', machinedAt, finishCoats: input.finishCoats, finishCoatIntervalH: input.hoursBetweenCoats });
      Object.assign(l.pour, { status: 'machined', machinedAt, finishCoats: input.finishCoats, finishCoatIntervalH: input.hoursBetweenCoats });
      await this.setPieceStage(m, l.piece.id, input.finishCoats > 0 ? 'finishing' : 'done');
      await this.refreshReminders(m, l);
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'pour.machined', objectType: 'pour', objectId: pourId, detail: { ...input } });
    });
    return this.get(auth.shopId, pourId);
  }

  async today(shopId: string) {
    const rows: (Reminder & { piece_name: string })[] = await this.ds.query(
      `SELECT r.id, r.kind, r.step, r.due_at, r.event_at, r.lead_min, r.status, r.assumed, r.title, r.sent_at, r.pour_id, pc.name AS piece_name
         FROM reminders r JOIN pours p ON p.id = r.pour_id JOIN pieces pc ON pc.id = p.piece_id
        WHERE r.shop_id = $1 AND r.status <> 'cancelled' AND r.due_at < now() + interval '24 hours'
          AND (r.status = 'pending' OR r.sent_at > now() - interval '24 hours')
        ORDER BY r.due_at LIMIT 200`,
      [shopId],
    );
    const open: { n: number }[] = await this.ds.query(`SELECT count(*)::int AS n FROM pours WHERE shop_id = $1 AND status = 'open'`, [shopId]);
    return {
      due: rows.map((r) => {
        const raw = r as unknown as { id: string; kind: Reminder['kind']; step: string; due_at: Date; event_at: Date; lead_min: number; status: Reminder['status']; assumed: boolean; title: string; sent_at: Date | null; pour_id: string; piece_name: string };
        return {
          id: raw.id,
          kind: raw.kind,
          step: raw.step,
          dueAt: raw.due_at.toISOString(),
          eventAt: raw.event_at.toISOString(),
          leadMin: raw.lead_min,
          status: raw.status,
          assumed: raw.assumed,
          title: raw.title,
          sentAt: raw.sent_at?.toISOString() ?? null,
          pourId: raw.pour_id,
          pieceName: raw.piece_name,
        };
      }),
      openPours: open[0]?.n ?? 0,
    };
  }
}
