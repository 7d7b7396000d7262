import { offRatioPct } from '@gelpoint/core';

export interface OffRatio {
  /** How far the weighed A:B is from the product's A:B by mass, in percent (0 = on ratio). */
  pct: number;
  /** True when pct is beyond the shop's tolerance. */
  beyondTolerance: boolean;
}

/**
 * A weighed cup against the product's own ratio by mass (core's offRatioPct), while typing: the
 * server's answer when the batch is logged is the one that counts. Null until both parts are above zero.
 */
export function offRatio(weighed: { partAG: number; partBG: number }, massRatioAToB: number, tolerancePct: number): OffRatio | null {
  const { partAG, partBG } = weighed;
  if (!(partAG > 0) || !(partBG > 0) || !Number.isFinite(partAG) || !Number.isFinite(partBG) || !(massRatioAToB > 0)) return null;
  const pct = Math.abs(offRatioPct(partAG, partBG, massRatioAToB));
  return { pct, beyondTolerance: pct > tolerancePct };
}

/** The part B that would put a cup back on the product's ratio once part A is in, for the warning's advice. */
export function partBForRatio(weighedAG: number, massRatioAToB: number): number | null {
  if (!(weighedAG > 0) || !(massRatioAToB > 0)) return null;
  return weighedAG / massRatioAToB;
}
