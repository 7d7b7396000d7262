import type { DefaultValues } from 'react-hook-form';
import type { PlannerValues } from './planner-values';

type Loose = { [key: string]: unknown };

function withoutNaN(value: unknown): unknown {
  if (typeof value === 'number') return Number.isNaN(value) ? undefined : value;
  if (value && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value as Loose).map(([k, v]) => [k, withoutNaN(v)]));
  }
  return value;
}

/** An empty number is NaN in the planner but must start as an empty box, not the text "NaN", in the form. */
export function formDefaultsOf(values: PlannerValues): DefaultValues<PlannerValues> {
  return withoutNaN(values) as DefaultValues<PlannerValues>;
}

/** A stable text for "did anything change", which also tells an empty number from zero. */
export function valuesKey(values: unknown): string {
  return JSON.stringify(values, (_key, v: unknown) => (typeof v === 'number' && Number.isNaN(v) ? 'NaN' : v === undefined ? 'empty' : v));
}
