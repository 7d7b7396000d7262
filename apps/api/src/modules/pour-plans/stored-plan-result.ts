import { PourPlanResult } from '@gelpoint/contracts';
import type { PourPlan as CorePourPlan } from '@gelpoint/core';
import { AppError } from '../../http/errors';

// Assigning the schema's output to core's PourPlan lets the compiler hold the stored shape and core's to each other.
const asCorePlan = (plan: PourPlanResult): CorePourPlan => plan;

/** A pour_plans row's result of any stored version, read as the current one; a row no version explains is a 409. */
export function storedPlanResult(stored: unknown): CorePourPlan {
  const parsed = PourPlanResult.safeParse(stored);
  if (!parsed.success) {
    throw new AppError(
      'conflict',
      'plan_unreadable',
      'The stored result of this pour plan is not in a form Gelpoint can read; open the plan and save it again to recompute it.',
    );
  }
  return asCorePlan(parsed.data);
}
