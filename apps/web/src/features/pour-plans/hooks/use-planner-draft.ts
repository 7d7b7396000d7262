import type { UnitSystem } from '@gelpoint/core';
import { useEffect, useRef, useState } from 'react';
import { clearDraft, comparableValues, readDraft, writeDraft, type DraftPlace, type PlannerDraft } from '../utils/planner-draft';
import type { PlannerValues } from '../utils/planner-values';

// Long enough not to write on every key stroke, short enough that a reload right after typing keeps it.
const writeDelayMs = 300;

function browserStorage(): Storage | null {
  try {
    return typeof window === 'undefined' ? null : window.localStorage;
  } catch {
    return null;
  }
}

export interface PlannerDraftInput {
  place: DraftPlace;
  unitSystem: UnitSystem;
  /** The saved plan's updatedAt; null for a new plan. */
  basedOn: string | null;
  /** The form as it opened without a draft, in the shown units. */
  original: PlannerValues;
}

export interface PlannerDraftState {
  /** The draft the form opened with, if one was kept. */
  restored: PlannerDraft | null;
  /** Keeps the values as the draft (or forgets it when they are the original again). */
  keep: (values: PlannerValues) => void;
  /** Whether these values differ from the original. */
  differs: (values: PlannerValues) => boolean;
  /** Forgets the draft; `final` after a save, so nothing is written again while the page goes. */
  forget: (final: boolean) => void;
}

/** The planner's draft in this browser's storage: read once when the form opens, written as the maker types. */
export function usePlannerDraft({ place, unitSystem, basedOn, original }: PlannerDraftInput): PlannerDraftState {
  const [restored] = useState(() => {
    const storage = browserStorage();
    return storage ? readDraft(storage, place, { unitSystem, basedOn }) : null;
  });
  const [originalKey] = useState(() => comparableValues(original));
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const forgotten = useRef(false);

  useEffect(() => () => clearTimeout(timer.current), []);

  const differs = (values: PlannerValues) => comparableValues(values) !== originalKey;
  return {
    restored,
    differs,
    keep: (values) => {
      clearTimeout(timer.current);
      if (forgotten.current) return;
      timer.current = setTimeout(() => {
        const storage = browserStorage();
        if (!storage || forgotten.current) return;
        if (!differs(values)) clearDraft(storage, place);
        else writeDraft(storage, place, { version: 1, unitSystem, basedOn, savedAt: new Date().toISOString(), values });
      }, writeDelayMs);
    },
    forget: (final) => {
      forgotten.current = final;
      clearTimeout(timer.current);
      const storage = browserStorage();
      if (storage) clearDraft(storage, place);
    },
  };
}
