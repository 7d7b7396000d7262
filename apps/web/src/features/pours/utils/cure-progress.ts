import type { ReminderView } from '@gelpoint/contracts';
import type { Cure, PourStatusKey, StageTimingEntry } from '../types';
import { hourMs, minuteMs, spanWords } from './relative-time';

/** Whole percent of full cure, rounded down so a pour never reads 100 % before it is fully cured. */
export function progressPercent(progress: number): number {
  if (!Number.isFinite(progress)) return 0;
  return Math.floor(Math.min(1, Math.max(0, progress)) * 100 + 1e-9);
}

export interface StageMarker {
  key: string;
  /** 0..1 along the bar, where the bar's end is full cure. */
  at: number;
  reached: boolean;
  /** When the stage was reached, or when it is expected. */
  when: string | null;
}

/** Where each milestone sits on a bar that runs from the pour to full cure, in equivalent hours at the reference. */
export function stageMarkers(cure: Pick<Cure, 'stages'>): StageMarker[] {
  const full = cure.stages.find((s) => s.key === 'full_cure')?.equivalentHoursAtRef ?? Math.max(0, ...cure.stages.map((s) => s.equivalentHoursAtRef));
  if (!(full > 0)) return [];
  return cure.stages.map((stage) => ({
    key: stage.key,
    at: Math.min(1, Math.max(0, stage.equivalentHoursAtRef / full)),
    reached: stage.reached,
    when: stage.reached ? stage.reachedAt : stage.predictedAt,
  }));
}

export type NextEvent = { source: 'reminder'; title: string; at: string; assumed: boolean } | { source: 'stage'; key: string; at: string };

/**
 * What the board says comes next: the pour's next pending reminder when it has one (the server's own schedule),
 * otherwise the next stage the cure model predicts a time for.
 */
export function nextEvent(cure: Pick<Cure, 'stages'>, nextReminder: ReminderView | null, status: PourStatusKey): NextEvent | null {
  if (nextReminder && nextReminder.status === 'pending') {
    return { source: 'reminder', title: nextReminder.title, at: nextReminder.dueAt, assumed: nextReminder.assumed };
  }
  if (status !== 'open') return null;
  const ahead = cure.stages
    .filter((s): s is StageTimingEntry & { predictedAt: string } => !s.reached && s.predictedAt !== null)
    .sort((p, q) => Date.parse(p.predictedAt) - Date.parse(q.predictedAt))[0];
  return ahead ? { source: 'stage', key: ahead.key, at: ahead.predictedAt } : null;
}

/** The stretch of a cure that rests on the assumed temperature, in words; null when it is under a minute. */
export function assumedSpan(assumedHours: number): string | null {
  const ms = assumedHours * hourMs;
  return Number.isFinite(ms) && ms >= minuteMs ? spanWords(ms) : null;
}
