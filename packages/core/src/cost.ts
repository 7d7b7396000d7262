import { fail, ok, type Result } from './result';
import { convertLength } from './units';

/** NHLA: one board foot is 144 cubic inches (12 in × 12 in × 1 in). */
export const cubicInchesPerBoardFoot = 144;

export interface WoodBlank {
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  pricePerBoardFoot: number;
}

export function boardFeet(lengthMm: number, widthMm: number, thicknessMm: number): number {
  const cubicInches = convertLength(lengthMm, 'mm', 'in') * convertLength(widthMm, 'mm', 'in') * convertLength(thicknessMm, 'mm', 'in');
  return cubicInches / cubicInchesPerBoardFoot;
}

export interface WoodCost {
  boardFeet: number;
  pricePerBoardFoot: number;
  cost: number;
}

export function woodCost(blank: WoodBlank): Result<WoodCost> {
  for (const field of ['lengthMm', 'widthMm', 'thicknessMm'] as const) {
    if (!Number.isFinite(blank[field]) || blank[field] <= 0) {
      return fail('wood_dimension_not_positive', `The blank's ${field} must be above zero, got ${String(blank[field])}; measure the rough blank.`);
    }
  }
  if (!Number.isFinite(blank.pricePerBoardFoot) || blank.pricePerBoardFoot < 0) {
    return fail('wood_price_negative', `The price per board foot must be zero or more, got ${String(blank.pricePerBoardFoot)}.`);
  }
  const feet = boardFeet(blank.lengthMm, blank.widthMm, blank.thicknessMm);
  return ok({ boardFeet: feet, pricePerBoardFoot: blank.pricePerBoardFoot, cost: feet * blank.pricePerBoardFoot });
}
