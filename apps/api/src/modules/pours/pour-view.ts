import type { EntityManager } from 'typeorm';
import { forecastTrack, type CureState, type ReleaseEvidence } from '@gelpoint/core';
import type { PourBatch, Reminder, TemperatureReading } from '@gelpoint/db';
import type { BatchView, CureView, PourSummary, ReadingView, ReminderView } from '@gelpoint/contracts';
import type { z } from 'zod';

/** Names of the members a view mentions, looked up once per view. */
export type Names = ReadonlyMap<string, string>;

export async function namesOf(m: EntityManager, ids: (string | null | undefined)[]): Promise<Names> {
  const wanted = [...new Set(ids.filter((id): id is string => Boolean(id)))];
  if (wanted.length === 0) return new Map();
  const rows: { id: string; name: string }[] = await m.query('SELECT id, name FROM users WHERE id = ANY($1)', [wanted]);
  return new Map(rows.map((r) => [r.id, r.name]));
}

const ref = (names: Names, id: string | null) => (id && names.has(id) ? { id, name: names.get(id)! } : null);

export function cureView(state: CureState, release: ReleaseEvidence, asOf: Date): z.infer<typeof CureView> {
  const s = state.status;
  return {
    step: state.step?.key ?? null,
    productName: state.step?.product.name ?? null,
    pouredAt: state.pouredAt?.toISOString() ?? null,
    equivalentHoursAtRef: s?.age.equivalentHoursAtRef ?? 0,
    progress: s?.progress ?? 0,
    stageReached: s?.stageReached ?? null,
    nextLayerWindow: s?.nextLayerWindow ?? null,
    assumedHours: s?.age.assumedHours ?? 0,
    belowMinimumHours: s?.age.belowMinimumHours ?? 0,
    loggedEquivalentHours: s?.age.loggedEquivalentHours ?? 0,
    assumedEquivalentHours: s?.age.assumedEquivalentHours ?? 0,
    readingCarryH: s?.age.readingCarryH ?? 0,
    gaps: s?.age.gaps ?? [],
    spans:
      s?.age.spans.map((x) => ({
        from: x.from,
        to: x.to,
        source: x.source,
        tempC: x.tempC,
        startTempC: x.startTempC,
        endTempC: x.endTempC,
        belowMinimum: x.belowMinimum,
      })) ?? [],
    ahead: s
      ? forecastTrack(s.ahead, s.stages, asOf.getTime()).map((p) => ({
          from: new Date(p.fromMs).toISOString(),
          to: new Date(p.toMs).toISOString(),
          tempC: p.tempC,
        }))
      : [],
    readyToMachine: Boolean(state.isLastStep && s?.stages.find((x) => x.key === 'ready_to_machine')?.reached),
    release,
    stages:
      s?.stages.map((x) => ({
        key: x.key,
        equivalentHoursAtRef: x.equivalentHoursAtRef,
        reached: x.reached,
        reachedAt: x.reachedAt,
        predictedAt: x.predictedAt,
      })) ?? [],
    cautions: s?.cautions.map((c) => ({ code: c.code, severity: c.severity, message: c.message })) ?? [],
  };
}

type ReminderRow = Pick<
  Reminder,
  'id' | 'kind' | 'step' | 'dueAt' | 'eventAt' | 'leadMin' | 'viaDigest' | 'status' | 'assumed' | 'title' | 'sentAt' | 'doneAt' | 'doneById' | 'doneHow'
>;

export const reminderView = (r: ReminderRow, names: Names = new Map()): ReminderView => ({
  id: r.id,
  kind: r.kind,
  done: r.doneAt && r.doneHow ? { at: r.doneAt.toISOString(), by: ref(names, r.doneById), how: r.doneHow } : null,
  step: r.step,
  dueAt: r.dueAt.toISOString(),
  eventAt: r.eventAt.toISOString(),
  leadMin: r.leadMin,
  viaDigest: r.viaDigest,
  status: r.status,
  assumed: r.assumed,
  title: r.title,
  sentAt: r.sentAt?.toISOString() ?? null,
});

export const batchView = (b: PourBatch, names: Names = new Map()): BatchView => ({
  id: b.id,
  planBatchIndex: b.planBatchIndex,
  step: b.step,
  mixedBy: ref(names, b.mixedById),
  mixedAt: b.mixedAt.toISOString(),
  lotA: b.lotANumber,
  lotB: b.lotBNumber,
  lotPigment: b.lotPigmentNumber,
  targetAG: b.targetAG,
  targetBG: b.targetBG,
  targetPigmentG: b.targetPigmentG,
  weighedAG: b.weighedAG,
  weighedBG: b.weighedBG,
  weighedPigmentG: b.weighedPigmentG,
  offRatioPct: b.offRatioPct,
  ambientTempC: b.ambientTempC,
  surfaceTempC: b.surfaceTempC,
  rhPct: b.rhPct,
  dewPointC: b.dewPointC,
  warnings: b.warnings,
  notes: b.notes,
  voided: b.voidedAt ? { at: b.voidedAt.toISOString(), by: ref(names, b.voidedById), reason: b.voidReason ?? '' } : null,
});

export const readingView = (r: TemperatureReading, names: Names = new Map()): ReadingView => ({
  id: r.id,
  at: r.takenAt.toISOString(),
  tempC: r.tempC,
  source: r.source,
  loggedBy: ref(names, r.loggedById),
  loggedAt: r.createdAt.toISOString(),
  voided: r.voidedAt ? { at: r.voidedAt.toISOString(), by: ref(names, r.voidedById), reason: r.voidReason ?? '' } : null,
});

type Flag = PourSummary['flags'][number];

/** What about a pour's log needs a look, counted from its live cups' warnings and its voided entries. */
export function flagsOf(warningCodes: string[][], voidedEntries: number): Flag[] {
  const count = (code: string) => warningCodes.filter((codes) => codes.includes(code)).length;
  const cups = (n: number) => `${n} cup${n === 1 ? '' : 's'}`;
  const flags: Flag[] = [];
  const offRatio = count('off_ratio');
  if (offRatio > 0) flags.push({ code: 'off_ratio', count: offRatio, message: `${cups(offRatio)} off ratio` });
  const expired = count('expired_lot');
  if (expired > 0) flags.push({ code: 'expired_lot', count: expired, message: `${cups(expired)} from an expired lot` });
  const dew = count('dew_point');
  if (dew > 0) flags.push({ code: 'dew_point', count: dew, message: `${cups(dew)} poured near the dew point` });
  if (voidedEntries > 0)
    flags.push({ code: 'voided', count: voidedEntries, message: `${voidedEntries} voided entr${voidedEntries === 1 ? 'y' : 'ies'} in the log` });
  return flags;
}
