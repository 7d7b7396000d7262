import type { DataSource, EntityManager } from 'typeorm';
import {
  dewPointC,
  massRatioAToB,
  lotExpired,
  offRatioCheck,
  parseIsoInstant,
  plannedBatches,
  planSteps,
  shopTimeWords,
  stepKeyOf,
  surfaceDewPointCheck,
  weightConcerns,
  type CureReading,
  type LogConcern,
  type PlannedBatch,
  type ResinSystem,
} from '@gelpoint/core';
import { Lot, PourBatch, Shop, TemperatureReading } from '@gelpoint/db';
import { mayVoidEntry, type BatchView, type ReadingView } from '@gelpoint/contracts';
import type { AuthContext } from '../../http/auth-context';
import { AppError, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { pourStateOf, refreshReminders } from './pour-cure-state';
import { readingConcerns, refuseImpossibleTimes, requireConfirmation } from './pour-guards';
import { checksOf, cureSettingsOf, liveReadingsOf, loadPour, loggedStepsOf, type LoadedPour } from './pour-queries';
import { batchView, namesOf, readingView } from './pour-view';
import { assumedTemperatureOf } from './shop-temperature-of';

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
  weighedPigmentG?: number | undefined;
  ambientTempC: number | null;
  surfaceTempC: number | null;
  rhPct: number | null;
  notes: string;
  acknowledgeExpiredLot: boolean;
  confirmUnusual: boolean;
}

type Warning = { code: string; message: string };

/** How long before a pour was set up in Gelpoint its first cups may be logged (mixed first, logged later). */
const retroLogWindowMs = 30 * 24 * 3_600_000;

function productOfBatch(l: LoadedPour, planned: PlannedBatch): ResinSystem {
  return planned.pour.kind === 'seal_coat' && l.snapshot.sealCoat ? l.snapshot.sealCoat : l.snapshot.deepPour;
}

function stepWords(key: string): string {
  const [kind, n] = key.split(':');
  return kind === 'seal_coat' ? `seal coat ${n}` : `layer ${n}`;
}

/** Logging and correcting a pour's cups and temperatures: every change checked, every void kept. */
export class PourLog {
  constructor(
    private readonly ds: DataSource,
    private readonly now: () => Date = () => new Date(),
  ) {}

  /** A cup poured onto a step whose window is not open yet is questioned, naming the window. */
  private async layerWindowConcern(m: EntityManager, l: LoadedPour, planned: PlannedBatch, mixedAt: Date): Promise<LogConcern[]> {
    const steps = planSteps(l.result, l.snapshot);
    const newStep = steps.findIndex((s) => s.key === stepKeyOf(planned));
    const settings = await cureSettingsOf(m, l.pour.shopId);
    const assumed = await assumedTemperatureOf(m, l.pour.shopId, l.pour.assumedTempC, mixedAt);
    const { state } = pourStateOf(
      l,
      settings,
      await loggedStepsOf(m, l.pour.id),
      await liveReadingsOf(m, l.pour.id),
      await checksOf(m, l.pour.id),
      mixedAt,
      assumed,
    );
    if (!state.step || !state.status || steps.findIndex((s) => s.key === state.step!.key) >= newStep) return [];
    if (state.status.nextLayerWindow !== 'not_open') return [];
    const opens = state.status.stages.find((s) => s.key === 'next_layer_opens');
    // In the shop's own clock, as every time the shop reads.
    const when = opens?.predictedAt ? ` around ${shopTimeWords(new Date(opens.predictedAt).getTime(), settings.timeZone)}` : '';
    return [
      {
        code: 'layer_window_not_open',
        field: 'planBatchIndex',
        message: `${stepWords(stepKeyOf(planned))} goes on ${stepWords(state.step.key)}, whose window for the next pour opens${when} (${state.status.age.equivalentHoursAtRef.toFixed(1)} of the ${state.step.product.recoatWindow.earliestH} h at ${state.step.product.referenceTempC} °C the data sheet asks, by the logged temperatures). Pouring sooner can trap heat and soften the layer below.`,
      },
    ];
  }

  async logBatch(auth: AuthContext, pourId: string, input: LogBatchInput): Promise<{ batch: BatchView; warnings: Warning[] }> {
    const id = await this.ds.transaction(async (m) => {
      const now = this.now();
      const l = await loadPour(m, auth.shopId, pourId, true);
      if (l.pour.status !== 'open') throw new AppError('conflict', 'pour_closed', 'this pour is released; batches can no longer be added');
      const planned = plannedBatches(l.result).find((b) => b.index === input.planBatchIndex);
      if (!planned)
        throw new AppError('bad_request', 'invalid_input', `the run sheet has no batch ${input.planBatchIndex + 1}`, {
          planBatchIndex: 'not on the run sheet',
        });
      const live: unknown[] = await m.query('SELECT 1 FROM pour_batches WHERE pour_id = $1 AND plan_batch_index = $2 AND voided_at IS NULL', [
        pourId,
        input.planBatchIndex,
      ]);
      if (live.length > 0)
        throw new AppError(
          'conflict',
          'batch_already_logged',
          `batch ${input.planBatchIndex + 1} of the run sheet is already logged; void it (with the reason) to log it again`,
        );
      if (planned.pigment.grams > 0 && input.weighedPigmentG === undefined) {
        throw new AppError(
          'bad_request',
          'invalid_input',
          `this cup takes ${planned.pigment.grams} g of pigment: weigh it and enter the grams (0 if you left it out)`,
          { weighedPigmentG: 'weigh the pigment and enter its grams' },
        );
      }
      const weighedPigmentG = input.weighedPigmentG ?? 0;
      const mixedAt = input.mixedAt ? new Date(input.mixedAt) : now;
      // A cup may be logged after the fact, but not from the future, nor from long before the pour was set up.
      refuseImpossibleTimes([{ field: 'mixedAt', atMs: mixedAt.getTime() }], l.pour.createdAt.getTime() - retroLogWindowMs, now.getTime());

      const concerns = [
        ...weightConcerns([
          { field: 'weighedAG', label: 'Part A', weighedG: input.weighedAG, targetG: planned.partA.grams },
          { field: 'weighedBG', label: 'Part B', weighedG: input.weighedBG, targetG: planned.partB.grams },
          { field: 'weighedPigmentG', label: 'Pigment', weighedG: weighedPigmentG, targetG: planned.pigment.grams },
        ]),
        ...(await this.layerWindowConcern(m, l, planned, mixedAt)),
      ];
      requireConfirmation(concerns, input.confirmUnusual);
      // A confirmed question stays on the cup, so the log shows it was asked and answered.
      const warnings: Warning[] = concerns.map((c) => ({ code: c.code, message: `Confirmed when logged: ${c.message}` }));

      const shop = await m.findOneByOrFail(Shop, { id: auth.shopId });
      const lots = { A: input.lotAId, B: input.lotBId, pigment: input.lotPigmentId } as const;
      const lotNumbers = { A: input.lotANumber, B: input.lotBNumber, pigment: input.lotPigmentNumber };
      const grams = { A: input.weighedAG, B: input.weighedBG, pigment: weighedPigmentG };
      for (const part of ['A', 'B', 'pigment'] as const) {
        const lotId = lots[part];
        if (!lotId) continue;
        const lot = await m.findOne(Lot, { where: { id: lotId, shopId: auth.shopId }, lock: { mode: 'pessimistic_write' } });
        if (!lot) throw new AppError('not_found', 'not_found', `no such lot (part ${part}) on this shop's shelf`);
        if (lot.part !== part)
          throw new AppError('bad_request', 'invalid_input', `lot ${lot.lotNumber} is a part ${lot.part} lot, not part ${part}`, {
            [`lot${part === 'pigment' ? 'Pigment' : part}Id`]: 'wrong part',
          });
        if (lotExpired(lot.expiresOn, mixedAt.getTime(), shop.timeZone)) {
          if (!input.acknowledgeExpiredLot) {
            throw new AppError(
              'conflict',
              'expired_lot_unacknowledged',
              `lot ${lot.lotNumber} expired on ${lot.expiresOn}; confirm that you want to use it (test a small cup first), or pick another lot`,
            );
          }
          warnings.push({ code: 'expired_lot', message: `Lot ${lot.lotNumber} (part ${part}) was past its date (${lot.expiresOn}) when mixed.` });
        }
        lotNumbers[part] = lot.lotNumber;
        // Stock is drawn down by what was weighed; it never goes below zero.
        await m.query('UPDATE lots SET remaining_g = GREATEST(0, remaining_g - $2), updated_at = now() WHERE id = $1', [lot.id, grams[part]]);
      }
      // The product's own ratio by mass, not the cup's rounded targets: a weighed cup is checked against the chemistry.
      const product = productOfBatch(l, planned);
      const targetRatio = massRatioAToB(product.mixRatio, product.densityAGPerMl, product.densityBGPerMl);
      const offRatio = offRatioCheck({ partAG: input.weighedAG, partBG: input.weighedBG }, targetRatio, shop.offRatioTolerancePct);
      const offRatioPct = offRatio?.signedPct ?? 0;
      if (offRatio?.beyondTolerance) {
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
          weighedPigmentG,
          offRatioPct: Math.round(offRatioPct * 100) / 100,
          ambientTempC: input.ambientTempC,
          surfaceTempC: input.surfaceTempC,
          rhPct: input.rhPct,
          dewPointC: dew,
          warnings,
          notes: input.notes,
          voidedAt: null,
          voidedById: null,
          voidReason: null,
        }),
      );
      await this.settlePieceStage(m, l);
      await refreshReminders(m, l, now);
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'batch.log',
        objectType: 'pour',
        objectId: pourId,
        detail: { planBatchIndex: input.planBatchIndex, warnings: warnings.map((w) => w.code) },
      });
      return batch.id;
    });
    const batch = await this.ds.getRepository(PourBatch).findOneByOrFail({ id });
    return { batch: batchView(batch, await namesOf(this.ds.manager, [batch.mixedById])), warnings: batch.warnings };
  }

  /** When the pour started: its first cup mixed, or when it was set up if that came first. */
  private async startedMs(m: EntityManager, l: LoadedPour): Promise<number> {
    const rows: { first: Date | null }[] = await m.query('SELECT min(mixed_at) AS first FROM pour_batches WHERE pour_id = $1 AND voided_at IS NULL', [
      l.pour.id,
    ]);
    const first = rows[0]?.first?.getTime() ?? Infinity;
    return Math.min(first, l.pour.createdAt.getTime());
  }

  /** Every cup logged: curing; fewer (after a void): still pouring. */
  private async settlePieceStage(m: EntityManager, l: LoadedPour): Promise<void> {
    const rows: { n: number }[] = await m.query('SELECT count(*)::int AS n FROM pour_batches WHERE pour_id = $1 AND voided_at IS NULL', [l.pour.id]);
    const all = rows[0]!.n >= plannedBatches(l.result).length;
    if (all) await m.query(`UPDATE pieces SET stage = 'curing', updated_at = now() WHERE id = $1 AND stage = 'pouring'`, [l.piece.id]);
    else await m.query(`UPDATE pieces SET stage = 'pouring', updated_at = now() WHERE id = $1 AND stage = 'curing'`, [l.piece.id]);
  }

  /**
   * All readings or none. The same time and temperature again is a re-sent log and is skipped; the same time with
   * another temperature is refused (void the first to correct it). Times out of the pour's life are refused;
   * temperatures far outside the product's range need the person's confirmation.
   */
  async addReadings(
    shopId: string,
    pourId: string,
    readings: CureReading[],
    source: 'manual' | 'csv' | 'sensor',
    actor: AuthContext | null,
    confirmUnusual: boolean,
  ) {
    return this.ds.transaction(async (m) => {
      const now = this.now();
      const l = await loadPour(m, shopId, pourId, true);
      const instants = readings.map((r, i) => {
        const ms = parseIsoInstant(r.at);
        if (!ms.ok) throw new AppError('bad_request', 'invalid_input', ms.error.message, { [`readings.${i}.at`]: 'not an ISO time with an offset' });
        return { ms: ms.value, tempC: r.tempC };
      });
      refuseImpossibleTimes(
        instants.map((r, i) => ({ field: `readings.${i}.at`, atMs: r.ms })),
        await this.startedMs(m, l),
        now.getTime(),
      );
      const steps = planSteps(l.result, l.snapshot);
      const latest: { step: string }[] = await m.query('SELECT step FROM pour_batches WHERE pour_id = $1 AND voided_at IS NULL', [pourId]);
      const product =
        [...steps].reverse().find((s) => latest.some((b) => b.step === s.key))?.product ??
        steps.find((s) => s.kind === 'layer')?.product ??
        l.snapshot.deepPour;
      requireConfirmation(readingConcerns(readings, product), confirmUnusual);

      let added = 0;
      let duplicates = 0;
      for (const r of instants) {
        const at = new Date(r.ms);
        const inserted: unknown[] = await m.query(
          `INSERT INTO temperature_readings (shop_id, pour_id, taken_at, temp_c, source, logged_by_id) VALUES ($1, $2, $3, $4, $5, $6)
           ON CONFLICT (pour_id, taken_at) WHERE voided_at IS NULL DO NOTHING RETURNING id`,
          [shopId, pourId, at, r.tempC, source, actor?.userId ?? null],
        );
        if (inserted.length > 0) {
          added++;
          continue;
        }
        const existing: { temp_c: number }[] = await m.query(
          'SELECT temp_c FROM temperature_readings WHERE pour_id = $1 AND taken_at = $2 AND voided_at IS NULL',
          [pourId, at],
        );
        // A re-sent log repeats its values to the tenth of a degree a thermometer shows.
        if (existing[0] && Math.abs(existing[0].temp_c - r.tempC) < 0.05) {
          duplicates++;
          continue;
        }
        throw new AppError(
          'conflict',
          'reading_time_taken',
          `a reading at ${at.toISOString()} is already logged (${existing[0]?.temp_c} °C); to correct it, void that reading with the reason, then log ${r.tempC} °C again`,
        );
      }
      await refreshReminders(m, l, now);
      await recordAudit(m, {
        shopId,
        actor,
        action: 'readings.add',
        objectType: 'pour',
        objectId: pourId,
        detail: { added, source, confirmedUnusual: confirmUnusual },
      });
      return { added, duplicates };
    });
  }

  async listReadings(shopId: string, pourId: string): Promise<ReadingView[]> {
    const m = this.ds.manager;
    await loadPour(m, shopId, pourId);
    const rows = await m.find(TemperatureReading, { where: { pourId }, order: { takenAt: 'ASC', createdAt: 'ASC' } });
    const names = await namesOf(
      m,
      rows.flatMap((r) => [r.loggedById, r.voidedById]),
    );
    return rows.map((r) => readingView(r, names));
  }

  private mayVoid(auth: AuthContext, loggedById: string | null): void {
    if (mayVoidEntry(auth, loggedById)) return;
    throw new AppError('forbidden', 'not_yours_to_void', 'only the person who logged it or a lead may void it');
  }

  async voidReading(auth: AuthContext, pourId: string, readingId: string, reason: string): Promise<ReadingView> {
    await this.ds.transaction(async (m) => {
      const l = await loadPour(m, auth.shopId, pourId, true);
      const reading = await m.findOne(TemperatureReading, { where: { id: readingId, pourId, shopId: auth.shopId }, lock: { mode: 'pessimistic_write' } });
      if (!reading) throw notFound('reading');
      if (reading.voidedAt) throw new AppError('conflict', 'already_voided', 'this reading is already voided');
      this.mayVoid(auth, reading.loggedById);
      await m.update(TemperatureReading, { id: readingId }, { voidedAt: this.now(), voidedById: auth.userId, voidReason: reason });
      await refreshReminders(m, l, this.now());
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'reading.void',
        objectType: 'pour',
        objectId: pourId,
        detail: { readingId, at: reading.takenAt.toISOString(), tempC: reading.tempC, reason },
      });
    });
    const row = await this.ds.getRepository(TemperatureReading).findOneByOrFail({ id: readingId });
    return readingView(row, await namesOf(this.ds.manager, [row.loggedById, row.voidedById]));
  }

  async voidBatch(auth: AuthContext, pourId: string, batchId: string, reason: string): Promise<BatchView> {
    await this.ds.transaction(async (m) => {
      const l = await loadPour(m, auth.shopId, pourId, true);
      const batch = await m.findOne(PourBatch, { where: { id: batchId, pourId, shopId: auth.shopId }, lock: { mode: 'pessimistic_write' } });
      if (!batch) throw notFound('batch');
      if (batch.voidedAt) throw new AppError('conflict', 'already_voided', 'this batch is already voided');
      this.mayVoid(auth, batch.mixedById);
      if (l.pour.status !== 'open')
        throw new AppError('conflict', 'pour_closed', 'this pour is released; its cups can no longer be voided (the release rests on them)');
      await m.update(PourBatch, { id: batchId }, { voidedAt: this.now(), voidedById: auth.userId, voidReason: reason });
      // The grams go back to the lots they were drawn from, never above what the lot held.
      const giveBack = [
        [batch.lotAId, batch.weighedAG],
        [batch.lotBId, batch.weighedBG],
        [batch.lotPigmentId, batch.weighedPigmentG],
      ] as const;
      for (const [lotId, grams] of giveBack) {
        if (lotId) await m.query('UPDATE lots SET remaining_g = LEAST(quantity_g, remaining_g + $2), updated_at = now() WHERE id = $1', [lotId, grams]);
      }
      await this.settlePieceStage(m, l);
      await refreshReminders(m, l, this.now());
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'batch.void',
        objectType: 'pour',
        objectId: pourId,
        detail: { batchId, planBatchIndex: batch.planBatchIndex, reason },
      });
    });
    const row = await this.ds.getRepository(PourBatch).findOneByOrFail({ id: batchId });
    return batchView(row, await namesOf(this.ds.manager, [row.mixedById, row.voidedById]));
  }
}
