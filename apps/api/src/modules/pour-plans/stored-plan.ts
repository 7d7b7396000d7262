import { PlanProductSnapshot, PourPlanResult } from '@gelpoint/contracts';
import type { PlanSnapshot, PourPlan as CorePourPlan } from '@gelpoint/core';
import type { z } from 'zod';
import { AppError } from '../../http/errors';

/** One jsonb column of a pour_plans row, read through its schema; a row the schema does not explain is a 409 in words. */
function readStored<S extends z.ZodType>(schema: S, stored: unknown, unreadable: string): z.output<S> {
  const parsed = schema.safeParse(stored);
  if (!parsed.success) throw new AppError('conflict', 'plan_unreadable', unreadable);
  return parsed.data;
}

// Core's types as the answers let the compiler hold the stored shapes and core's to each other.

/** The plan's result of any stored version, read as the current one. */
export function storedPlanResult(stored: unknown): CorePourPlan {
  return readStored(
    PourPlanResult,
    stored,
    'The stored result of this pour plan is not in a form Gelpoint can read; open the plan and save it again to recompute it.',
  );
}

/** The products the plan was saved with. */
export function storedPlanSnapshot(stored: unknown): PlanSnapshot {
  return readStored(
    PlanProductSnapshot,
    stored,
    'The products this pour plan was saved with are not in a form Gelpoint can read; open the plan and save it again to take them from the shelf.',
  );
}
