import { cureStatus, type CureStatus } from './cure-model';
import type { CureReading } from './cure-readings';
import type { PlannedBatch, PourPlan } from './pour-plan';
import type { ResinSystem } from './shelf';
import { finishCoatSchedule } from './finish-coats';
import type { StageTiming } from './cure-model';
import type { AssumedTemperature } from './shop-temperature';

/** What a saved plan's snapshot holds (see pour-plans.service): the products the plan was computed with. */
export interface PlanSnapshot {
  deepPour: ResinSystem & { id: string };
  sealCoat: (ResinSystem & { id: string }) | null;
}

export interface PlanStep {
  /** 'seal_coat:1' or 'layer:2' (1-based, as the shop counts them). */
  key: string;
  kind: 'seal_coat' | 'layer';
  number: number;
  batches: PlannedBatch[];
  product: ResinSystem;
}

export const stepKeyOf = (b: PlannedBatch) => (b.pour.kind === 'seal_coat' ? `seal_coat:${b.pour.coat + 1}` : `layer:${b.pour.layer + 1}`);

/** The plan's steps in the order they are poured: seal coats first, then layers from the floor up. */
export function planSteps(plan: PourPlan, snapshot: PlanSnapshot): PlanStep[] {
  const steps: PlanStep[] = [];
  for (const coat of plan.sealCoat?.coats ?? []) {
    if (!snapshot.sealCoat) break;
    steps.push({ key: `seal_coat:${coat.index + 1}`, kind: 'seal_coat', number: coat.index + 1, batches: coat.batches, product: snapshot.sealCoat });
  }
  plan.layers.forEach((layer, i) => steps.push({ key: `layer:${i + 1}`, kind: 'layer', number: i + 1, batches: layer.batches, product: snapshot.deepPour }));
  return steps;
}

export function plannedBatches(plan: PourPlan): PlannedBatch[] {
  return [...(plan.sealCoat?.coats.flatMap((c) => c.batches) ?? []), ...plan.layers.flatMap((l) => l.batches)].sort((a, b) => a.index - b.index);
}

export interface CureState {
  step: PlanStep | null;
  isLastStep: boolean;
  pouredAt: Date | null;
  status: CureStatus | null;
}

/**
 * The cure clock runs from the latest step poured (its first cup): the next layer's window, demold
 * and readiness all follow the newest resin in the mould.
 */
export function cureState(
  steps: PlanStep[],
  logged: { step: string; mixedAt: Date }[],
  readings: CureReading[],
  assumedTempC: AssumedTemperature,
  now: Date,
  options: { readingCarryH?: number } = {},
): CureState {
  const firstMixed = new Map<string, Date>();
  for (const b of logged) {
    const seen = firstMixed.get(b.step);
    if (!seen || b.mixedAt < seen) firstMixed.set(b.step, b.mixedAt);
  }
  let latest = -1;
  steps.forEach((s, i) => {
    if (firstMixed.has(s.key)) latest = i;
  });
  if (latest < 0) return { step: null, isLastStep: false, pouredAt: null, status: null };
  const step = steps[latest]!;
  const pouredAt = firstMixed.get(step.key)!;
  const asOf = now > pouredAt ? now : pouredAt;
  const status = cureStatus({ product: step.product, readings, pouredAt: pouredAt.toISOString(), asOf: asOf.toISOString(), assumedTempC, ...options });
  return { step, isLastStep: latest === steps.length - 1, pouredAt, status: status.ok ? status.value : null };
}

/** What the cure model schedules; recomputed as the log changes. */
export const cureReminderKinds = [
  'seal_coat_window_opens',
  'seal_coat_window_closes',
  'next_layer_window_opens',
  'next_layer_window_closes',
  'demold_check',
  'ready_to_machine',
  'finish_coat_due',
] as const;
export type CureReminderKind = (typeof cureReminderKinds)[number];
/** Notices of something done (a release, machining): sent once to the maker and the leads. */
export type NoticeKind = 'piece_released' | 'piece_machined';
export type ReminderKind = CureReminderKind | NoticeKind;

export interface WantedReminder {
  kind: CureReminderKind;
  step: string;
  /** When the reminder goes out: the moment of the step, or a lead time before a window closes. */
  dueAt: Date;
  /** The moment of the step itself (a window opening or closing, demold, ready). */
  eventAt: Date;
  /** Minutes between dueAt and eventAt (0 except for closing windows). */
  leadMin: number;
  assumed: boolean;
  title: string;
}

const stepWords = (key: string) => {
  const [kind, n] = key.split(':');
  return kind === 'seal_coat' ? `seal coat ${n}` : kind === 'layer' ? `layer ${n}` : `finish coat ${n}`;
};

function at(stage: StageTiming | undefined, now: Date): { eventAt: Date; assumed: boolean } | undefined {
  if (!stage) return undefined;
  if (stage.reached) return { eventAt: stage.reachedAt ? new Date(stage.reachedAt) : now, assumed: false };
  return stage.predictedAt ? { eventAt: new Date(stage.predictedAt), assumed: true } : undefined;
}

/** Closing windows are announced this long before they close unless the shop says otherwise. */
export const defaultWindowCloseLeadMin = 30;

export const closingReminderKinds: ReadonlySet<string> = new Set(['seal_coat_window_closes', 'next_layer_window_closes']);

/** The reminders a pour should have now, from its cure state (and its finish coats once machined). */
export function wantedReminders(
  state: CureState,
  pieceName: string,
  now: Date,
  finish: { machinedAt: Date; coats: number; hoursBetween: number } | null,
  options: { windowCloseLeadMin?: number } = {},
): WantedReminder[] {
  const leadMin = options.windowCloseLeadMin ?? defaultWindowCloseLeadMin;
  const out: WantedReminder[] = [];
  const { step, status } = state;
  if (step && status) {
    const find = (key: StageTiming['key']) => status.stages.find((s) => s.key === key);
    const assumedHistory = status.age.assumedHours > 0;
    const add = (kind: CureReminderKind, stageKey: StageTiming['key'], title: string) => {
      const when = at(find(stageKey), now);
      if (!when) return;
      const lead = closingReminderKinds.has(kind) ? leadMin : 0;
      const dueAt = new Date(when.eventAt.getTime() - lead * 60_000);
      out.push({ kind, step: step.key, dueAt, eventAt: when.eventAt, leadMin: lead, assumed: when.assumed || assumedHistory, title });
    };
    const what = `${pieceName}, ${stepWords(step.key)}`;
    if (step.kind === 'seal_coat') {
      add('seal_coat_window_opens', 'next_layer_opens', `Pour window opens: ${what} is tacky enough for the next pour`);
      add('seal_coat_window_closes', 'next_layer_closes', `Pour window closes: pour over ${what} before it is too hard`);
    } else if (!state.isLastStep) {
      add('next_layer_window_opens', 'next_layer_opens', `Next layer can go on: ${what}`);
      add('next_layer_window_closes', 'next_layer_closes', `Next layer window closes: ${what}`);
    } else {
      add('demold_check', 'demold', `Demold check: ${what}`);
      add('ready_to_machine', 'ready_to_machine', `Ready to machine (by the logged cure): ${pieceName}`);
    }
  }
  if (finish && finish.coats > 0) {
    const schedule = finishCoatSchedule({ machinedAt: finish.machinedAt.toISOString(), coats: finish.coats, hoursBetweenCoats: finish.hoursBetween });
    if (schedule.ok) {
      for (const c of schedule.value) {
        const dueAt = new Date(c.dueAt);
        out.push({
          kind: 'finish_coat_due',
          step: `finish:${c.coat}`,
          dueAt,
          eventAt: dueAt,
          leadMin: 0,
          assumed: false,
          title: `Finish coat ${c.coat} of ${finish.coats} due: ${pieceName}`,
        });
      }
    }
  }
  return out;
}
