import { absorptionPresets, type UnitSystem } from '@gelpoint/core';
import { z } from 'zod';
import type { AbsorptionChoice, PlannerValues } from './planner-values';

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

// A number box as the form holds it: a number, or NaN when emptied; one never touched is left out of the JSON and
// comes back empty, which the form shows the same way.
const box = z.union([z.number(), z.nan()]).default(Number.NaN);
const optionalBox = z.union([z.number(), z.nan()]).nullable().default(null);
const absorption = z.custom<AbsorptionChoice | ''>((v) => v === '' || v === 'custom' || (typeof v === 'string' && Object.hasOwn(absorptionPresets, v)));

const DraftValues = z.object({
  name: z.string(),
  cavity: z.object({
    source: z.enum(['shape', 'mold']),
    shape: z.object({
      kind: z.enum(['rectangle', 'channel', 'cylinder', 'area_depth']),
      lengthMm: box,
      widthMm: box,
      depthMm: box,
      diameterMm: box,
      areaMm2: box,
      averageDepthMm: box,
      maxDepthMm: optionalBox,
      perimeterMm: optionalBox,
    }),
    moldId: z.string(),
    dam: z.enum(['outline', 'box']),
  }),
  fillLevelMm: box,
  deepPour: z.object({ resinSystemId: z.string(), pigmentId: z.string(), pigmentPct: box }),
  sealCoat: z.object({ enabled: z.boolean(), resinSystemId: z.string(), filmThicknessMm: box, coats: box, absorption, absorptionFactor: box }),
  overPourPct: box,
  cupWaste: z.object({ unit: z.enum(['g', 'mL']), amount: box }),
  shopTempC: box,
  shopAir: z.object({ enabled: z.boolean(), rhPct: box, surfaceTempC: box }),
  wood: z.object({ enabled: z.boolean(), lengthMm: box, widthMm: box, thicknessMm: box, pricePerBoardFoot: box }),
});

const Draft = z.object({
  version: z.literal(1),
  unitSystem: z.enum(['metric', 'us']),
  basedOn: z.string().nullable(),
  savedAt: z.string(),
  values: DraftValues,
});

export function parseDraft(text: string): PlannerDraft | null {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text, (_key, value: unknown) => (value === emptyNumber ? Number.NaN : value));
  } catch {
    return null;
  }
  // Only the form's own shape comes back: anything else is an old or foreign entry, dropped.
  const draft = Draft.safeParse(parsed);
  return draft.success ? draft.data : null;
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
