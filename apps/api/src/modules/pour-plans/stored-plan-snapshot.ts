import { PlanProductSnapshot } from '@gelpoint/contracts';
import type { PlanSnapshot } from '@gelpoint/core';
import { AppError } from '../../http/errors';

// Assigning the schema's output to core's PlanSnapshot lets the compiler hold the stored shape and core's to each other.
const asCoreSnapshot = (snapshot: PlanProductSnapshot): PlanSnapshot => snapshot;

/** A pour_plans row's product snapshot, read through its schema; a row the schema does not explain is a 409. */
export function storedPlanSnapshot(stored: unknown): PlanSnapshot {
  const parsed = PlanProductSnapshot.safeParse(stored);
  if (!parsed.success) {
    throw new AppError(
      'conflict',
      'plan_unreadable',
      'The products this pour plan was saved with are not in a form Gelpoint can read; open the plan and save it again to take them from the shelf.',
    );
  }
  return asCoreSnapshot(parsed.data);
}
