import type { CurvePoint, DepthMap } from './cavity-analysis';
import type { Dam } from './dam';
import { curve, fillAt, type CavitySource } from './fill-queries';
import { ok, type Result } from './result';

/** Levels sampled on a plan's volume curve, from the cavity floor up to the fill level. */
export const PLAN_CURVE_POINTS = 241;

/** What a pour plan needs of a mould at one fill level, in the mould's own frame (absolute levels, mm). */
export interface PlanCavityFacts {
  /** Volume below each level, sampled evenly from the floor (where the curve bends) to the fill level; levels strictly rising. */
  curve: CurvePoint[];
  wettedAreaMm2: number;
  maxDepthMm: number;
  /** Resin depth per column at the fill level, for the exotherm forecast. */
  depthMap: DepthMap;
}

/**
 * The one way a mould becomes a plan's cavity, for the API's plans and the demo seed alike: the fill at the level,
 * and the volume curve sampled from the floor, so the first layer starts where the resin does.
 */
export function planCavityFacts(source: CavitySource, dam: Dam, floorMm: number, levelMm: number): Result<PlanCavityFacts> {
  const f = fillAt(source, levelMm, dam);
  if (!f.ok) return f;
  const levels = Array.from({ length: PLAN_CURVE_POINTS }, (_, i) => floorMm + ((levelMm - floorMm) * i) / (PLAN_CURVE_POINTS - 1));
  const c = curve(source, levels, dam);
  if (!c.ok) return c;
  // A floor at the level itself samples one level many times; the plan's curve needs rising levels.
  const points = c.value.filter((p, i, all) => i === 0 || p.levelMm > all[i - 1]!.levelMm);
  const { depthMap } = f.value;
  return ok({
    curve: points,
    wettedAreaMm2: f.value.wettedAreaMm2,
    maxDepthMm: f.value.maxDepthMm,
    depthMap: { originMm: depthMap.originMm, cellMm: depthMap.cellMm, nx: depthMap.nx, ny: depthMap.ny, depthsMm: depthMap.depthsMm },
  });
}
