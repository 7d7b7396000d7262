import { fail, ok, type Result } from './result';
import { mm3ToMl } from './units';

/**
 * How much more than a film on glass a wood surface takes up in its seal coat. Common practice
 * rules of thumb, Gelpoint's starting points, to be tuned by the shop from its own scraps.
 */
export const absorptionPresets = {
  /** Already sealed or non-porous: the film alone. */
  sealed: 1.0,
  /** Closed-grain hardwoods (maple, cherry, birch). */
  closed_grain: 1.15,
  /** Open-pored hardwoods (oak, ash, walnut). */
  open_grain: 1.3,
  /** Softwoods, spalted or punky wood. */
  soft_or_spalted: 1.5,
  /** End grain drinks along its fibres. */
  end_grain: 2.0,
} as const;

export type AbsorptionPreset = keyof typeof absorptionPresets;

export interface SealCoatInput {
  wettedAreaMm2: number;
  filmThicknessMm: number;
  coats: number;
  /** ≥ 1; a preset's value or the shop's own. */
  absorptionFactor: number;
}

export interface SealCoatVolume {
  perCoatMl: number;
  totalMl: number;
}

export function checkSealCoatInput(input: SealCoatInput): Result<SealCoatInput> {
  if (!Number.isFinite(input.wettedAreaMm2) || input.wettedAreaMm2 <= 0) {
    return fail(
      'wetted_area_not_positive',
      `The wetted area must be above zero (in mm²), got ${String(input.wettedAreaMm2)}; take it from the cavity report or a quick shape.`,
    );
  }
  if (!Number.isFinite(input.filmThicknessMm) || input.filmThicknessMm <= 0) {
    return fail(
      'film_not_positive',
      `The seal coat film thickness must be above zero (in mm), got ${String(input.filmThicknessMm)}; a thin seal coat is a few tenths of a millimetre.`,
    );
  }
  if (!Number.isInteger(input.coats) || input.coats < 1) {
    return fail('coats_not_whole', `The number of seal coats must be a whole number of at least 1, got ${String(input.coats)}.`);
  }
  if (!Number.isFinite(input.absorptionFactor) || input.absorptionFactor < 1) {
    return fail(
      'absorption_below_one',
      `The absorption factor must be 1 or more (1 means the wood takes up nothing), got ${String(input.absorptionFactor)}; pick a preset if unsure.`,
    );
  }
  return ok(input);
}

/** Wetted area × film thickness × absorption per coat; each coat is mixed on its own, once the one before is tacky. */
export function sealCoatVolume(input: SealCoatInput): Result<SealCoatVolume> {
  const checked = checkSealCoatInput(input);
  if (!checked.ok) return checked;
  const perCoatMl = mm3ToMl(input.wettedAreaMm2 * input.filmThicknessMm * input.absorptionFactor);
  return ok({ perCoatMl, totalMl: perCoatMl * input.coats });
}
