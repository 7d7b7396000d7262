import type { EntityManager } from 'typeorm';
import {
  cureState,
  plannedBatches,
  planSteps,
  releaseEvidence,
  wantedReminders,
  type AssumedTemperature,
  type CureReading,
  type CureState,
  type ReleaseEvidence,
} from '@gelpoint/core';
import { checksOf, cureSettingsOf, liveReadingsOf, loggedStepsOf, shopHoursOf, type CureSettings, type LoadedPour, type LoggedStep } from './pour-queries';
import { syncReminders } from './pour-reminders';
import { assumedTemperatureOf } from './shop-temperature-of';

export interface PourState {
  state: CureState;
  release: ReleaseEvidence;
  batchesLogged: number;
  batchesPlanned: number;
}

type Check = { checkedAt: Date; hardnessShoreD: number | null; stage: string };

/** Where a pour's cure stands, from its logged cups, readings and checks, as of `now`. */
export function pourStateOf(
  l: LoadedPour,
  settings: CureSettings,
  logged: LoggedStep[],
  readings: CureReading[],
  checks: Check[],
  now: Date,
  assumed: AssumedTemperature = l.pour.assumedTempC,
): PourState {
  const steps = planSteps(l.result, l.snapshot);
  const state = cureState(
    steps,
    logged.map((b) => ({ step: b.step, mixedAt: b.mixed_at })),
    readings,
    assumed,
    now,
    { readingCarryH: settings.readingCarryH },
  );
  return { state, release: releaseEvidence(state, checks), batchesLogged: logged.length, batchesPlanned: plannedBatches(l.result).length };
}

export async function loadPourState(m: EntityManager, l: LoadedPour, now: Date, settings?: CureSettings): Promise<PourState> {
  const s = settings ?? (await cureSettingsOf(m, l.pour.shopId));
  const assumed = await assumedTemperatureOf(m, l.pour.shopId, l.pour.assumedTempC, now);
  return pourStateOf(l, s, await loggedStepsOf(m, l.pour.id), await liveReadingsOf(m, l.pour.id), await checksOf(m, l.pour.id), now, assumed);
}

// A demold check is done once someone found the piece demoldable (or further along) after the last pour.
const demoldedStages = new Set(['demoldable', 'machinable']);

/** Recomputes the pour's reminders from everything logged so far; called after every change to its log. */
export async function refreshReminders(m: EntityManager, l: LoadedPour, now: Date): Promise<void> {
  const settings = await cureSettingsOf(m, l.pour.shopId);
  const checks = await checksOf(m, l.pour.id);
  const assumed = await assumedTemperatureOf(m, l.pour.shopId, l.pour.assumedTempC, now);
  const { state } = pourStateOf(l, settings, await loggedStepsOf(m, l.pour.id), await liveReadingsOf(m, l.pour.id), checks, now, assumed);
  const finish =
    l.pour.machinedAt && l.pour.finishCoats
      ? { machinedAt: l.pour.machinedAt, coats: l.pour.finishCoats, hoursBetween: l.pour.finishCoatIntervalH ?? 24 }
      : null;
  const active = l.pour.status === 'open';
  const wanted = wantedReminders(active ? state : { ...state, step: null, status: null }, l.piece.name, now, finish, {
    windowCloseLeadMin: settings.windowCloseLeadMin,
  });
  const pouredMs = state.pouredAt?.getTime() ?? Infinity;
  const demolded = checks.some((c) => demoldedStages.has(c.stage) && c.checkedAt.getTime() >= pouredMs);
  await syncReminders(
    m,
    l.pour.shopId,
    l.pour.id,
    shopHoursOf(settings),
    now,
    wanted.map((w) => ({ ...w, done: w.kind === 'demold_check' && demolded })),
  );
}
