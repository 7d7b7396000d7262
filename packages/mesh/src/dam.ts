import { fail, ok, type Result } from './result';

/**
 * How the pour is contained. `outline`: dams follow the mould's own outline, so resin stands only
 * where there is mould beneath it. `box`: a box dam around the bounding box, whose floor outside
 * the mould is the table at the mould's lowest z.
 */
export type Dam = 'outline' | 'box';

export function checkDam(dam: unknown): Result<Dam> {
  if (dam === 'outline' || dam === 'box') return ok(dam);
  return fail('dam_invalid', `The dam must be "outline" (along the mould's outline) or "box" (around its bounding box), got "${String(dam)}".`);
}
