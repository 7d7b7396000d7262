/** The signed error of a weighed cup against the product's ratio by mass, in percent (+: too much A). */
export function offRatioPct(weighedAG: number, weighedBG: number, massRatioAToB: number): number {
  return (weighedAG / weighedBG / massRatioAToB - 1) * 100;
}

/** The shop's off-ratio tolerance when none is given: the shop setting's own default, in percent. */
export const defaultOffRatioTolerancePct = 3;

export interface OffRatio {
  /** The signed error in percent (+: too much A). */
  signedPct: number;
  /** Its size in percent (0 = on ratio). */
  pct: number;
  /** True when pct is beyond the shop's tolerance; a cup right at the tolerance is still within it. */
  beyondTolerance: boolean;
}

/**
 * A weighed cup against the product's own A:B by mass and the shop's tolerance: what the mixing form shows while
 * typing and what the server warns about when the cup is logged. Null until both parts are weighed above zero.
 */
export function offRatioCheck(weighed: { partAG: number; partBG: number }, massRatioAToB: number, tolerancePct: number): OffRatio | null {
  const { partAG, partBG } = weighed;
  if (!(partAG > 0) || !(partBG > 0) || !Number.isFinite(partAG) || !Number.isFinite(partBG) || !(massRatioAToB > 0) || !Number.isFinite(massRatioAToB))
    return null;
  const signedPct = offRatioPct(partAG, partBG, massRatioAToB);
  const pct = Math.abs(signedPct);
  // The quotient carries binary rounding (206 g : 100 g at 2:1 comes out 3.0000000000000027 %), so a cup exactly at
  // the tolerance is compared with a margin far below anything a scale can show.
  return { signedPct, pct, beyondTolerance: pct > tolerancePct + 1e-9 };
}

/** The part B that puts a cup back on the product's ratio once part A is in. */
export function partBForRatio(weighedAG: number, massRatioAToB: number): number | null {
  if (!(weighedAG > 0) || !(massRatioAToB > 0)) return null;
  return weighedAG / massRatioAToB;
}
