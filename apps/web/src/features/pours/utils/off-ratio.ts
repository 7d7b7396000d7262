export interface PartMasses {
  partAG: number;
  partBG: number;
}

export interface OffRatio {
  /** How far the weighed A:B is from the target A:B, in percent (0 = on ratio). */
  pct: number;
  /** True when pct is beyond the shop's tolerance. */
  beyondTolerance: boolean;
}

/**
 * |(weighed A ÷ weighed B) ÷ (target A ÷ target B) − 1| × 100 — common practice for judging a weighed cup against
 * its run sheet. Only a guide while typing: the server's answer when the batch is logged is the one that counts.
 * Null until both weighed parts are above zero.
 */
export function offRatio(weighed: PartMasses, target: PartMasses, tolerancePct: number): OffRatio | null {
  const { partAG, partBG } = weighed;
  if (!(partAG > 0) || !(partBG > 0) || !(target.partAG > 0) || !(target.partBG > 0)) return null;
  if (!Number.isFinite(partAG) || !Number.isFinite(partBG)) return null;
  const pct = Math.abs(partAG / partBG / (target.partAG / target.partBG) - 1) * 100;
  return { pct, beyondTolerance: pct > tolerancePct };
}

/** The weighed part B that would put a cup back on ratio once part A is in, for the warning's advice. */
export function partBForRatio(weighedAG: number, target: PartMasses): number | null {
  if (!(weighedAG > 0) || !(target.partAG > 0) || !(target.partBG > 0)) return null;
  return (weighedAG * target.partBG) / target.partAG;
}
