import type { PlanDepthMap } from './plan-exotherm';
import { fail, ok, type Result } from './result';
import { checkVolumeCurve, volumeAtLevel, type VolumeCurve } from './volume-curve';

/** What a cavity report says about a mould at one fill level, in its own frame (absolute levels, mm). */
export interface MoldFillFacts {
  /** Volume below each level, levels as in the report (not from the floor). */
  curve: VolumeCurve;
  wettedAreaMm2: number;
  /** Deepest resin at the fill level. */
  maxDepthMm: number;
  /** Resin depth per column at the fill level, for the exotherm forecast's hottest spot. */
  depthMap?: PlanDepthMap;
}

export interface PlanCavity {
  curve: VolumeCurve;
  wettedAreaMm2: number;
  maxDepthMm?: number;
  depthMap?: PlanDepthMap;
}

/**
 * Turns a report's absolute curve into the pour plan's terms: levels from the cavity floor (the last
 * sampled level that still holds no resin), cut at the fill level. The browser's live numbers and
 * the server's saved plan both go through here, so they agree.
 */
export function planCavityFromMold(facts: MoldFillFacts, fillLevelMm: number): Result<{ cavity: PlanCavity; fillLevelMm: number }> {
  const checked = checkVolumeCurve(facts.curve);
  if (!checked.ok) return checked;
  const curve = checked.value;
  const top = curve[curve.length - 1]!.levelMm;
  if (!(fillLevelMm <= top)) {
    return fail(
      'fill_above_report',
      `The fill level ${fillLevelMm} mm is above the top of the mould's report (${top} mm); choose a level inside the mould, or dam it higher and report again.`,
    );
  }
  let floorIndex = 0;
  while (floorIndex + 1 < curve.length && curve[floorIndex + 1]!.volumeMm3 === 0) floorIndex++;
  const floorMm = curve[floorIndex]!.levelMm;
  if (!(fillLevelMm > floorMm)) {
    return fail(
      'fill_below_floor',
      `The fill level ${fillLevelMm} mm is at or below the cavity floor (${floorMm} mm): no resin would be poured; raise the level.`,
    );
  }
  const relative: VolumeCurve = [];
  for (const p of curve.slice(floorIndex)) {
    if (p.levelMm >= fillLevelMm) break;
    relative.push({ levelMm: p.levelMm - floorMm, volumeMm3: p.volumeMm3 });
  }
  relative.push({ levelMm: fillLevelMm - floorMm, volumeMm3: volumeAtLevel(curve, fillLevelMm) });
  return ok({
    cavity: { curve: relative, wettedAreaMm2: facts.wettedAreaMm2, maxDepthMm: facts.maxDepthMm, ...(facts.depthMap ? { depthMap: facts.depthMap } : {}) },
    fillLevelMm: fillLevelMm - floorMm,
  });
}
