import { createHash, randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { CureCheckStage, Reminder } from '@gelpoint/db';
import type { PourSummary, PourView, ReminderView, TodayView } from '@gelpoint/contracts';
import type { z } from 'zod';
import type { AuthContext } from '../../http/auth-context';
import { AppError, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { UploadQuota } from '../uploads/upload-quota';
import { loadPourState, pourStateOf, refreshReminders, type PourState } from './pour-cure-state';
import { cureSettingsOf, loadedOf, loadPour, makerAndLeadsOf, shopHoursOf, type LoadedPour } from './pour-queries';
import { markReminderDone, queueNotice } from './pour-reminders';
import { shopTemperatureFor } from './shop-temperature-of';
import { batchView, cureView, flagsOf, namesOf, readingView, reminderView, type Names } from './pour-view';
import {
  activeMembersAmong,
  cureCheckPhoto,
  dueReminders,
  insertCureCheck,
  insertPour,
  openPourCount,
  pourLogOf,
  pourPage,
  pourPageDetails,
  pourPlanOf,
  reminderById,
  setIngestTokenHash,
  setPieceStage,
  shopOfIngestTokenHash,
  updatePour,
  type PourListFilter,
} from './pours.queries';

const tokenHash = (t: string) => createHash('sha256').update(t).digest('hex');

/** Pours: started from plans, watched on the cure board, checked, released and machined. */
export class Pours {
  constructor(
    private readonly ds: DataSource,
    private readonly now: () => Date = () => new Date(),
    private readonly quota = new UploadQuota(),
  ) {}

  private summaryOf(
    l: LoadedPour,
    { state, release, batchesLogged, batchesPlanned }: PourState,
    next: Reminder | null,
    flags: PourSummary['flags'],
    names: Names,
  ): PourSummary {
    return {
      id: l.pour.id,
      piece: { id: l.piece.id, name: l.piece.name, stage: l.piece.stage },
      planName: l.plan.name,
      status: l.pour.status,
      startedAt: l.pour.createdAt.toISOString(),
      batchesLogged,
      batchesPlanned,
      cure: cureView(state, release, this.now()),
      nextReminder: next ? reminderView(next, names) : null,
      flags,
    };
  }

  async get(shopId: string, id: string): Promise<PourView> {
    const m = this.ds.manager;
    const l = await loadPour(m, shopId, id);
    const state = await loadPourState(m, l, this.now());
    const { batches, readings, checks, reminders } = await pourLogOf(m, id);
    const next = reminders.find((r) => r.status === 'pending' && r.doneAt === null) ?? null;
    const names = await namesOf(m, [
      ...l.pour.notifyUserIds,
      l.pour.releasedById,
      ...batches.flatMap((b) => [b.mixedById, b.voidedById]),
      ...readings.flatMap((r) => [r.loggedById, r.voidedById]),
      ...checks.map((c) => c.checkedById),
      ...reminders.map((r) => r.doneById),
    ]);
    const live = batches.filter((b) => !b.voidedAt);
    const voided = batches.length - live.length + readings.filter((r) => r.voidedAt).length;
    const flags = flagsOf(
      live.map((b) => b.warnings.map((w) => w.code)),
      voided,
    );
    const ref = (userId: string | null) => (userId && names.has(userId) ? { id: userId, name: names.get(userId)! } : null);
    return {
      ...this.summaryOf(l, state, next, flags, names),
      pourPlanId: l.plan.id,
      assumedTempC: l.pour.assumedTempC,
      notify: l.pour.notifyUserIds.flatMap((userId) => (names.has(userId) ? [{ id: userId, name: names.get(userId)! }] : [])),
      batches: live.map((b) => batchView(b, names)),
      voidedBatches: batches.filter((b) => b.voidedAt).map((b) => batchView(b, names)),
      readings: readings.filter((r) => !r.voidedAt).map((r) => readingView(r, names)),
      voidedReadings: readings.filter((r) => r.voidedAt).map((r) => readingView(r, names)),
      checks: checks.map((c) => ({
        id: c.id,
        checkedAt: c.checkedAt.toISOString(),
        stage: c.stage,
        hardnessShoreD: c.hardnessShoreD,
        note: c.note,
        hasPhoto: c.photoType !== null,
        checkedBy: ref(c.checkedById),
      })),
      reminders: reminders.map((r) => reminderView(r, names)),
      releasedAt: l.pour.releasedAt?.toISOString() ?? null,
      releasedBy: ref(l.pour.releasedById),
      machinedAt: l.pour.machinedAt?.toISOString() ?? null,
    };
  }

  async list(shopId: string, q: PourListFilter) {
    const [pours, total] = await pourPage(this.ds, shopId, q);
    const m = this.ds.manager;
    const { plans, pieces, batches, readings, checks, nextOf } = await pourPageDetails(m, pours);
    const settings = await cureSettingsOf(m, shopId);
    const now = this.now();
    const assumedFor = await shopTemperatureFor(m, shopId, now);
    const items = pours.map((pour) => {
      const l = loadedOf(pour, plans.get(pour.pourPlanId)!, pieces.get(pour.pieceId)!);
      const pourBatches = batches.get(pour.id) ?? [];
      const live = pourBatches.filter((b) => !b.voided);
      const pourReadings = readings.get(pour.id) ?? [];
      const log = pourReadings.filter((r) => !r.voided).map((r) => ({ at: r.taken_at.toISOString(), tempC: r.temp_c }));
      const pourChecks = (checks.get(pour.id) ?? []).map((c) => ({ checkedAt: c.checked_at, hardnessShoreD: c.hardness_shore_d, stage: c.stage }));
      const state = pourStateOf(l, settings, live, log, pourChecks, now, assumedFor(pour.assumedTempC));
      const voided = pourBatches.length - live.length + pourReadings.filter((r) => r.voided).length;
      const flags = flagsOf(
        live.map((b) => b.warnings.map((w) => w.code)),
        voided,
      );
      return this.summaryOf(l, state, nextOf.get(pour.id) ?? null, flags, new Map());
    });
    return { items, total };
  }

  async start(auth: AuthContext, pourPlanId: string, notifyUserIds?: string[]): Promise<PourView> {
    const id = await this.ds.transaction(async (m) => {
      const plan = await pourPlanOf(m, auth.shopId, pourPlanId);
      if (!plan) throw notFound('pour plan');
      const wanted = notifyUserIds ?? [...new Set([auth.userId, plan.createdById].filter((x): x is string => Boolean(x)))];
      const members = await activeMembersAmong(m, auth.shopId, wanted);
      if (members.length !== wanted.length)
        throw new AppError('bad_request', 'invalid_input', 'everyone to notify must be an active member of this shop', {
          notifyUserIds: 'not all are members',
        });
      const inputs = plan.inputs as { shopTempC?: number };
      const pour = await insertPour(m, {
        shopId: auth.shopId,
        pieceId: plan.pieceId,
        pourPlanId: plan.id,
        status: 'open',
        assumedTempC: inputs.shopTempC ?? 20,
        notifyUserIds: wanted,
        startedById: auth.userId,
      });
      await setPieceStage(m, plan.pieceId, 'pouring');
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'pour.start', objectType: 'pour', objectId: pour.id, detail: { pourPlanId } });
      return pour.id;
    });
    return this.get(auth.shopId, id);
  }

  async addCheck(
    auth: AuthContext,
    pourId: string,
    input: { stage: CureCheckStage; checkedAt?: string; hardnessShoreD?: number; note: string },
    photo: { bytes: Buffer; type: string } | null,
  ) {
    return this.ds.transaction(async (m) => {
      const l = await loadPour(m, auth.shopId, pourId, true);
      if (photo) await this.quota.reserve(m, auth.userId, photo.bytes.length);
      const check = await insertCureCheck(m, {
        shopId: auth.shopId,
        pourId,
        checkedAt: input.checkedAt ? new Date(input.checkedAt) : this.now(),
        stage: input.stage,
        hardnessShoreD: input.hardnessShoreD ?? null,
        note: input.note,
        photoType: photo?.type ?? null,
        photo: photo?.bytes ?? null,
        checkedById: auth.userId,
      });
      // A check at a stage is the logged step of that stage's reminder (a demold check).
      await refreshReminders(m, l, this.now());
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'cure_check.add',
        objectType: 'pour',
        objectId: pourId,
        detail: { stage: input.stage },
      });
      return {
        id: check.id,
        checkedAt: check.checkedAt.toISOString(),
        stage: check.stage,
        hardnessShoreD: check.hardnessShoreD,
        note: check.note,
        hasPhoto: photo !== null,
        checkedBy: { id: auth.userId, name: auth.userName },
      };
    });
  }

  async photo(shopId: string, pourId: string, checkId: string): Promise<{ bytes: Buffer; type: string }> {
    const photo = await cureCheckPhoto(this.ds, shopId, pourId, checkId);
    if (!photo) throw notFound('photo');
    return photo;
  }

  async release(auth: AuthContext, pourId: string): Promise<PourView> {
    await this.ds.transaction(async (m) => {
      const l = await loadPour(m, auth.shopId, pourId, true);
      if (l.pour.status !== 'open') throw new AppError('conflict', 'already_released', 'this pour was already released');
      const now = this.now();
      const { state, release } = await loadPourState(m, l, now);
      if (!release.allowed) {
        throw new AppError('conflict', 'not_ready', `The log does not show this piece ready to machine yet. ${release.reasons.join(' ')}`);
      }
      await updatePour(m, pourId, { status: 'released', releasedAt: now, releasedById: auth.userId });
      await setPieceStage(m, l.piece.id, 'released');
      l.pour.status = 'released';
      await refreshReminders(m, l, now);
      const recipients = await makerAndLeadsOf(m, auth.shopId, l.plan.createdById);
      await queueNotice(
        m,
        auth.shopId,
        pourId,
        shopHoursOf(await cureSettingsOf(m, auth.shopId)),
        'piece_released',
        `Released for machining: ${l.piece.name} (by ${auth.userName})`,
        recipients,
        now,
      );
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'pour.release',
        objectType: 'pour',
        objectId: pourId,
        detail: {
          equivalentHoursAtRef: state.status?.age.equivalentHoursAtRef,
          loggedEquivalentHours: state.status?.age.loggedEquivalentHours,
          assumedEquivalentHours: state.status?.age.assumedEquivalentHours,
        },
      });
    });
    return this.get(auth.shopId, pourId);
  }

  async machined(auth: AuthContext, pourId: string, input: { machinedAt?: string; finishCoats: number; hoursBetweenCoats: number }): Promise<PourView> {
    await this.ds.transaction(async (m) => {
      const l = await loadPour(m, auth.shopId, pourId, true);
      if (l.pour.status === 'open') throw new AppError('conflict', 'not_released', 'release the piece for machining first');
      const now = this.now();
      const machinedAt = input.machinedAt ? new Date(input.machinedAt) : now;
      await updatePour(m, pourId, { status: 'machined', machinedAt, finishCoats: input.finishCoats, finishCoatIntervalH: input.hoursBetweenCoats });
      Object.assign(l.pour, { status: 'machined', machinedAt, finishCoats: input.finishCoats, finishCoatIntervalH: input.hoursBetweenCoats });
      await setPieceStage(m, l.piece.id, input.finishCoats > 0 ? 'finishing' : 'done');
      await refreshReminders(m, l, now);
      const recipients = await makerAndLeadsOf(m, auth.shopId, l.plan.createdById);
      const coats = input.finishCoats > 0 ? `; ${input.finishCoats} finish coat${input.finishCoats === 1 ? '' : 's'} to go` : '';
      await queueNotice(
        m,
        auth.shopId,
        pourId,
        shopHoursOf(await cureSettingsOf(m, auth.shopId)),
        'piece_machined',
        `Machined: ${l.piece.name} (by ${auth.userName})${coats}`,
        recipients,
        now,
      );
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'pour.machined', objectType: 'pour', objectId: pourId, detail: { ...input } });
    });
    return this.get(auth.shopId, pourId);
  }

  /** What is due in the next 24 hours or overdue and not done, with what was sent in the last 24 hours. */
  async today(shopId: string): Promise<z.infer<typeof TodayView>> {
    const due = await dueReminders(this.ds, shopId);
    return {
      due: due.map(({ reminder, pieceName }) => ({ ...reminderView(reminder), pourId: reminder.pourId, pieceName })),
      openPours: await openPourCount(this.ds, shopId),
    };
  }

  /** Any member may mark a reminder done; who and when are kept. */
  async markDone(auth: AuthContext, reminderId: string): Promise<ReminderView> {
    await this.ds.transaction(async (m) => {
      if (!(await markReminderDone(m, auth.shopId, reminderId, auth.userId))) throw notFound('reminder');
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'reminder.done', objectType: 'reminder', objectId: reminderId });
    });
    const row = await reminderById(this.ds.manager, reminderId);
    return reminderView(row, await namesOf(this.ds.manager, [row.doneById]));
  }

  async issueIngestToken(auth: AuthContext): Promise<string> {
    const token = randomBytes(24).toString('base64url');
    await this.ds.transaction(async (m) => {
      await setIngestTokenHash(m, auth.shopId, tokenHash(token));
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'ingest_token.issue', objectType: 'shop', objectId: auth.shopId });
    });
    return token;
  }

  /** The shop a thermometer token belongs to, or null. */
  async shopOfIngestToken(token: string): Promise<string | null> {
    return shopOfIngestTokenHash(this.ds, tokenHash(token));
  }
}
