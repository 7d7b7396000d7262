import { fail, ok, type Result } from './result';

/** One sample of a cavity's fill: the volume held below a level measured up from the cavity floor. */
export interface VolumeCurvePoint {
  levelMm: number;
  volumeMm3: number;
}

export type VolumeCurve = VolumeCurvePoint[];

/** Levels strictly rising, volumes never falling, at least two points: what interpolation needs. */
export function checkVolumeCurve(curve: VolumeCurve): Result<VolumeCurve> {
  if (curve.length < 2) {
    return fail(
      'curve_too_short',
      `The volume-vs-level curve needs at least two points, got ${curve.length}; sample the cavity at its floor and at its rim at least.`,
    );
  }
  for (let i = 0; i < curve.length; i++) {
    const point = curve[i]!;
    if (!Number.isFinite(point.levelMm) || !Number.isFinite(point.volumeMm3) || point.volumeMm3 < 0) {
      return fail('curve_point_invalid', `Point ${i + 1} of the volume-vs-level curve is not a finite level with a volume of zero or more; fix that sample.`);
    }
    if (i > 0) {
      const before = curve[i - 1]!;
      if (point.levelMm <= before.levelMm) {
        return fail(
          'curve_not_rising',
          `Point ${i + 1} of the volume-vs-level curve is at ${point.levelMm} mm, not above the point before it (${before.levelMm} mm); list levels from the floor up.`,
        );
      }
      if (point.volumeMm3 < before.volumeMm3) {
        return fail(
          'curve_volume_falls',
          `Point ${i + 1} of the volume-vs-level curve holds less volume than the point below it; a cavity's volume can only grow with the level.`,
        );
      }
    }
  }
  return ok(curve);
}

/**
 * Volume below a level, linear between samples. Below the first sample the curve's first volume
 * applies (whatever lies under the curve's start is poured with the first layer); above the last
 * sample there is no answer, so callers check the level first.
 */
export function volumeAtLevel(curve: VolumeCurve, levelMm: number): number {
  const first = curve[0]!;
  if (levelMm <= first.levelMm) return first.volumeMm3;
  for (let i = 1; i < curve.length; i++) {
    const upper = curve[i]!;
    if (levelMm <= upper.levelMm) {
      const lower = curve[i - 1]!;
      const share = (levelMm - lower.levelMm) / (upper.levelMm - lower.levelMm);
      return lower.volumeMm3 + share * (upper.volumeMm3 - lower.volumeMm3);
    }
  }
  return curve[curve.length - 1]!.volumeMm3;
}

export function curveStartLevelMm(curve: VolumeCurve): number {
  return curve[0]!.levelMm;
}

export function curveTopLevelMm(curve: VolumeCurve): number {
  return curve[curve.length - 1]!.levelMm;
}
