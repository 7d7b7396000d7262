import { type Result } from './result';
/** One sample of a cavity's fill: the volume held below a level measured up from the cavity floor. */
export interface VolumeCurvePoint {
    levelMm: number;
    volumeMm3: number;
}
export type VolumeCurve = VolumeCurvePoint[];
/** Levels strictly rising, volumes never falling, at least two points: what interpolation needs. */
export declare function checkVolumeCurve(curve: VolumeCurve): Result<VolumeCurve>;
/**
 * Volume below a level, linear between samples. Below the first sample the curve's first volume
 * applies (whatever lies under the curve's start is poured with the first layer); above the last
 * sample there is no answer, so callers check the level first.
 */
export declare function volumeAtLevel(curve: VolumeCurve, levelMm: number): number;
export declare function curveStartLevelMm(curve: VolumeCurve): number;
export declare function curveTopLevelMm(curve: VolumeCurve): number;
