import type { UnitSystem } from '@gelpoint/core';
import type { PlannerValues } from './planner-values';

/**
 * A plan being typed is kept in this browser's storage until it is saved, so a reload or a closed tab loses
 * nothing. One draft per piece and plan ("new" for a plan not saved yet). A draft holds the form as typed, in the
 * shop's units at the time: it comes back only in the same units and over the same saved version of the plan.
 */
export interface PlannerDraft {
  version: 1;
  unitSystem: UnitSystem;
  /** The saved plan's updatedAt the draft started from; null for a new plan. */
  basedOn: string | null;
  savedAt: string;
  values: PlannerValues;
}

export interface DraftPlace {
  pieceId: string;
  planId: string | null;
}

/** What a draft must match to come back. */
export interface DraftContext {
  unitSystem: UnitSystem;
  basedOn: string | null;
}

export type DraftStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

export function draftStorageKey({ pieceId, planId }: DraftPlace): string {
  return `gelpoint:planner-draft:${pieceId}:${planId ?? 'new'}`;
}

// An empty number box is NaN in the form; JSON has no NaN, so it travels as a marker no one can type.
const emptyNumber = '\u0000NaN';

export function serializeDraft(draft: PlannerDraft): string {
  return JSON.stringify(draft, (_key, value: unknown) => (typeof value === 'number' && Number.isNaN(value) ? emptyNumber : value));
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function parseDraft(text: string): PlannerDraft | null {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text, (_key, value: unknown) => (value === emptyNumber ? Number.NaN : value));
  } catch {
    return null;
  }
  if (!isRecord(parsed) || parsed.version !== 1 || !isRecord(parsed.values)) return null;
  if ((parsed.unitSystem !== 'metric' && parsed.unitSystem !== 'us') || typeof parsed.savedAt !== 'string') return null;
  if (parsed.basedOn !== null && typeof parsed.basedOn !== 'string') return null;
  const values = parsed.values;
  // Only the form's own shape comes back: anything else is an old or foreign entry, dropped.
  if (typeof values.name !== 'string' || !isRecord(values.cavity) || !isRecord(values.deepPour) || !isRecord(values.sealCoat)) return null;
  return parsed as unknown as PlannerDraft;
}

export function readDraft(storage: DraftStorage, place: DraftPlace, context: DraftContext): PlannerDraft | null {
  let text: string | null;
  try {
    text = storage.getItem(draftStorageKey(place));
  } catch {
    return null;
  }
  const draft = text === null ? null : parseDraft(text);
  if (!draft || draft.unitSystem !== context.unitSystem || draft.basedOn !== context.basedOn) return null;
  return draft;
}

export function writeDraft(storage: DraftStorage, place: DraftPlace, draft: PlannerDraft): void {
  try {
    storage.setItem(draftStorageKey(place), serializeDraft(draft));
  } catch {
    // A full or refused storage only costs the draft; the form itself goes on.
  }
}

export function clearDraft(storage: DraftStorage, place: DraftPlace): void {
  try {
    storage.removeItem(draftStorageKey(place));
  } catch {
    // Nothing kept, nothing to clear.
  }
}

/**
 * A text that is equal for two forms showing the same thing: an empty number box is the same whether it was never
 * touched (undefined), emptied (NaN) or optional (null).
 */
export function comparableValues(values: unknown): string {
  return JSON.stringify(values, (_key, v: unknown) => (v === undefined || v === null || (typeof v === 'number' && Number.isNaN(v)) ? null : v));
}
