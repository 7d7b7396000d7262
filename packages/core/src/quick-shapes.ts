import { fail, ok, type Result } from './result';
import { mm3ToMl } from './units';
import type { VolumeCurve } from './volume-curve';

/** What a quick shape tells the pour plan, in the same terms as a cavity report from a mesh. */
export interface QuickShapeCavity {
  fillVolumeMm3: number;
  fillVolumeMl: number;
  /** Floor plus the walls that are wood (and so take a seal coat). */
  wettedAreaMm2: number;
  maxDepthMm: number;
  curve: VolumeCurve;
}

function checkDimensions(dimensions: Record<string, number>): Result<true> {
  for (const [name, value] of Object.entries(dimensions)) {
    if (!Number.isFinite(value) || value <= 0) {
      return fail('shape_dimension_not_positive', `${name} must be above zero (in mm), got ${String(value)}; measure the cavity and enter it.`);
    }
  }
  return ok(true);
}

// Straight walls make volume linear in level, so two samples describe the curve exactly.
function prismCurve(floorAreaMm2: number, depthMm: number): VolumeCurve {
  return [
    { levelMm: 0, volumeMm3: 0 },
    { levelMm: depthMm, volumeMm3: floorAreaMm2 * depthMm },
  ];
}

function cavity(fillVolumeMm3: number, wettedAreaMm2: number, maxDepthMm: number, curve: VolumeCurve): QuickShapeCavity {
  return { fillVolumeMm3, fillVolumeMl: mm3ToMl(fillVolumeMm3), wettedAreaMm2, maxDepthMm, curve };
}

/** A pocket with four wooden walls. */
export function rectangleCavity(input: { lengthMm: number; widthMm: number; depthMm: number }): Result<QuickShapeCavity> {
  const checked = checkDimensions(input);
  if (!checked.ok) return checked;
  const { lengthMm, widthMm, depthMm } = input;
  const floor = lengthMm * widthMm;
  return ok(cavity(floor * depthMm, floor + 2 * (lengthMm + widthMm) * depthMm, depthMm, prismCurve(floor, depthMm)));
}

/** A river channel: wood along both long sides, the two ends closed by dams that need no seal coat. */
export function channelCavity(input: { lengthMm: number; widthMm: number; depthMm: number }): Result<QuickShapeCavity> {
  const checked = checkDimensions(input);
  if (!checked.ok) return checked;
  const { lengthMm, widthMm, depthMm } = input;
  const floor = lengthMm * widthMm;
  return ok(cavity(floor * depthMm, floor + 2 * lengthMm * depthMm, depthMm, prismCurve(floor, depthMm)));
}

export function cylinderCavity(input: { diameterMm: number; depthMm: number }): Result<QuickShapeCavity> {
  const checked = checkDimensions(input);
  if (!checked.ok) return checked;
  const { diameterMm, depthMm } = input;
  const floor = (Math.PI * diameterMm ** 2) / 4;
  return ok(cavity(floor * depthMm, floor + Math.PI * diameterMm * depthMm, depthMm, prismCurve(floor, depthMm)));
}

const areaDepthCurveSteps = 40;

/**
 * A cavity known only by its outline area and average depth (an irregular landscape). When the
 * deepest point is deeper than the average, the floor is taken to fall smoothly toward it: the
 * area wetted at height h above the deepest point is A·(h/H)^k with k = H/d − 1, which holds
 * exactly A·d below the rim. The walls come from the outline's perimeter when known; otherwise
 * from a circle of the same area, the shortest outline that area can have, so the seal coat is
 * then a lower bound (flagged by wettedAreaEstimated).
 */
export function areaDepthCavity(input: {
  areaMm2: number;
  averageDepthMm: number;
  maxDepthMm?: number;
  perimeterMm?: number;
}): Result<QuickShapeCavity & { wettedAreaEstimated: boolean }> {
  const { areaMm2, averageDepthMm } = input;
  const maxDepthMm = input.maxDepthMm ?? averageDepthMm;
  const checked = checkDimensions({ areaMm2, averageDepthMm, maxDepthMm, ...(input.perimeterMm === undefined ? {} : { perimeterMm: input.perimeterMm }) });
  if (!checked.ok) return checked;
  if (maxDepthMm < averageDepthMm) {
    return fail(
      'shape_depth_inconsistent',
      `The deepest point (${maxDepthMm} mm) cannot be shallower than the average depth (${averageDepthMm} mm); check both measurements.`,
    );
  }
  const fillVolumeMm3 = areaMm2 * averageDepthMm;
  const exponent = maxDepthMm / averageDepthMm;
  const curve: VolumeCurve =
    exponent === 1
      ? prismCurve(areaMm2, maxDepthMm)
      : Array.from({ length: areaDepthCurveSteps + 1 }, (_, i) => {
          const levelMm = (maxDepthMm * i) / areaDepthCurveSteps;
          return { levelMm, volumeMm3: fillVolumeMm3 * (levelMm / maxDepthMm) ** exponent };
        });
  const perimeterMm = input.perimeterMm ?? 2 * Math.sqrt(Math.PI * areaMm2);
  // An estimate for the seal coat: walls as perimeter × average depth, the floor as the outline area.
  const wettedAreaMm2 = areaMm2 + perimeterMm * averageDepthMm;
  return ok({ ...cavity(fillVolumeMm3, wettedAreaMm2, maxDepthMm, curve), wettedAreaEstimated: input.perimeterMm === undefined });
}
