import type { CureState, ReleaseEvidence } from '@gelpoint/core';
import type { PourBatch, Reminder } from '@gelpoint/db';
import type { BatchView, CureView, ReminderView } from '@gelpoint/contracts';
import type { z } from 'zod';

export function cureView(state: CureState, release: ReleaseEvidence): z.infer<typeof CureView> {
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
    spans: s?.age.spans.map((x) => ({ from: x.from, to: x.to, source: x.source, tempC: x.tempC, startTempC: x.startTempC, endTempC: x.endTempC, belowMinimum: x.belowMinimum })) ?? [],
    readyToMachine: Boolean(state.isLastStep && s?.stages.find((x) => x.key === 'ready_to_machine')?.reached),
    release,
    stages: s?.stages.map((x) => ({ key: x.key, equivalentHoursAtRef: x.equivalentHoursAtRef, reached: x.reached, reachedAt: x.reachedAt, predictedAt: x.predictedAt })) ?? [],
    cautions: s?.cautions.map((c) => ({ code: c.code, severity: c.severity, message: c.message })) ?? [],
  };
}

export const reminderView = (r: Reminder): ReminderView => ({
  id: r.id,
  kind: r.kind,
  step: r.step,
  dueAt: r.dueAt.toISOString(),
  eventAt: r.eventAt.toISOString(),
  leadMin: r.leadMin,
  status: r.status,
  assumed: r.assumed,
  title: r.title,
  sentAt: r.sentAt?.toISOString() ?? null,
});

export const batchView = (b: PourBatch): BatchView => ({
  id: b.id,
  planBatchIndex: b.planBatchIndex,
  step: b.step,
  mixedBy: b.mixedBy ? { id: b.mixedBy.id, name: b.mixedBy.name } : null,
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
});
