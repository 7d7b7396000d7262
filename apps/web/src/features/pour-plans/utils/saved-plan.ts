import { PlanProductSnapshot, PourPlanInput, PourPlanResult } from '@gelpoint/contracts';
import { fail, ok, type PourPlan, type Result } from '@gelpoint/core';
import { z } from 'zod';
import type { SavedPlanInput } from './planner-values';

// The stored result is read through contracts' PourPlanResult, which brings older plans up to its current version;
// the annotation makes the compiler hold that schema to core's PourPlan.
export const SavedPourPlan: z.ZodType<PourPlan, unknown> = PourPlanResult;

/** The shelf values a saved plan was made with, read through the same schema the server reads them with. */
export const PlanSnapshot = PlanProductSnapshot;
export type PlanSnapshot = PlanProductSnapshot;
export type SnapshotProduct = PlanProductSnapshot['deepPour'];

export interface SavedPlan {
  plan: PourPlan;
  snapshot: PlanSnapshot;
  /** Null when the stored inputs no longer pass today's checks: the plan still shows and prints, but cannot be edited. */
  input: SavedPlanInput | null;
  /**
   * The plan was saved with its fill level in the mould's own frame and the server could not yet say where that
   * mould's cavity floor is: the number is not a height above the floor, so the planner does not take it as one.
   */
  levelInMouldFrame: boolean;
}

export const unreadableInputsMessage =
  'The inputs stored with this plan no longer pass the current checks, so it cannot be opened in the planner. Plan the pour again from its piece.';

export const mouldFrameInputsMessage =
  'This plan was saved with its fill level in the mould file’s own frame, and its mould cannot say where its cavity floor is right now (it is being measured again, or it is gone). Open the plan again once the mould’s report is ready, or plan the pour again from its piece.';

/** Reads a saved plan's stored result and snapshot (and its inputs when they still pass), or says what it cannot read. */
export function readSavedPlan(view: { result: unknown; productSnapshot: unknown; inputs: unknown }): Result<SavedPlan> {
  const plan = SavedPourPlan.safeParse(view.result);
  if (!plan.success)
    return fail('saved_result_unreadable', 'The stored result of this plan is not in a form this page can show. Save the plan again to recompute it.');
  const snapshot = PlanSnapshot.safeParse(view.productSnapshot);
  if (!snapshot.success)
    return fail(
      'saved_snapshot_unreadable',
      'The shelf values stored with this plan are not in a form this page can show. Save the plan again to take a new snapshot.',
    );
  const levelInMouldFrame = typeof view.inputs === 'object' && view.inputs !== null && (view.inputs as { levelFrom?: unknown }).levelFrom === 'mould';
  const input = PourPlanInput.safeParse(view.inputs);
  return ok({ plan: plan.data, snapshot: snapshot.data, input: input.success && !levelInMouldFrame ? input.data : null, levelInMouldFrame });
}
