import type { EntityManager } from 'typeorm';
import type { PlanCavity } from '@gelpoint/core';
import type { PourPlanInput } from '@gelpoint/contracts';
import type { z } from 'zod';
import { AppError } from '../../http/errors';

type PlanInput = z.output<typeof PourPlanInput>;
type DamName = 'outline' | 'box';

/** What a pour plan needs from a mould's stored analysis; provided by the molds module. */
export interface MoldCavityLookup {
  /** The cavity with the resin surface at a height above the cavity floor, levels from the floor. */
  cavity(m: EntityManager, shopId: string, moldId: string, dam: DamName, levelAboveFloorMm: number): Promise<{ cavity: PlanCavity; fillLevelMm: number }>;
  /** The cavity floor with a dam, in the mould's own frame (mm). */
  floorMm(m: EntityManager, shopId: string, moldId: string, dam: DamName): Promise<number>;
}

// A nanometre: the float noise of a subtraction, never a difference a mould is cut to.
const aboveFloor = (levelMm: number, floorMm: number) => Math.round((levelMm - floorMm) * 1e6) / 1e6;

/** The input with its fill level as the height above the cavity floor, the only way a plan is stored. */
export async function measuredFromFloor(m: EntityManager, shopId: string, input: PlanInput, molds: MoldCavityLookup): Promise<PlanInput> {
  if (input.levelFrom === 'floor') return input;
  if (input.cavity.source !== 'mold') {
    const message = "levelFrom 'mould' applies to a mould's cavity only: a quick shape's fill level is its depth above its floor";
    throw new AppError('bad_request', 'level_from_invalid', message, { levelFrom: message });
  }
  const floor = await molds.floorMm(m, shopId, input.cavity.moldId, input.cavity.dam);
  return { ...input, fillLevelMm: aboveFloor(input.fillLevelMm, floor), levelFrom: 'floor' };
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Stored inputs in today's terms. Plans saved before the marker measured a mould's fill level in the mould's own
 * frame: those are converted with the mould's floor as its analysis gives it now. When the analysis cannot say (the
 * mould is being analysed again), they keep their number and say levelFrom: 'mould', never taken for a floor height.
 */
export async function storedInputs(
  m: EntityManager,
  shopId: string,
  inputs: Record<string, unknown>,
  molds: MoldCavityLookup,
): Promise<Record<string, unknown>> {
  if (inputs.levelFrom !== undefined) return inputs;
  const cavity = inputs.cavity;
  // A quick shape's level was always its depth above its floor.
  if (!isRecord(cavity) || cavity.source !== 'mold') return { ...inputs, levelFrom: 'floor' };
  const level = inputs.fillLevelMm;
  if (typeof cavity.moldId !== 'string' || typeof level !== 'number') return { ...inputs, levelFrom: 'mould' };
  try {
    const floor = await molds.floorMm(m, shopId, cavity.moldId, cavity.dam === 'box' ? 'box' : 'outline');
    return { ...inputs, fillLevelMm: aboveFloor(level, floor), levelFrom: 'floor' };
  } catch (err) {
    if (err instanceof AppError && (err.kind === 'conflict' || err.kind === 'not_found')) return { ...inputs, levelFrom: 'mould' };
    throw err;
  }
}
