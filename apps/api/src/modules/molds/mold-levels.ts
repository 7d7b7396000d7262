import type { Dam, LevelFrom } from '@gelpoint/contracts';
import { cavityFloorMm, type CavityModel } from '@gelpoint/mesh';
import { AppError } from '../../http/errors';

/** The cavity floor with a dam, in the mould's own frame (mm). */
export function floorOf(model: CavityModel, dam: Dam): number {
  const floor = cavityFloorMm(model, dam);
  if (!floor.ok) throw new AppError('bad_request', floor.error.code, floor.error.message, { dam: floor.error.message });
  return floor.value;
}

/** A level as asked (from the floor or in the mould's frame) as a height in the mould's own frame. */
export function inMouldFrame(levelMm: number, from: LevelFrom, floorMm: number): number {
  return from === 'floor' ? floorMm + levelMm : levelMm;
}

/** A mould-frame height above the floor, without the float noise of the subtraction past a nanometre. */
export function aboveFloor(levelInMouldMm: number, floorMm: number): number {
  return Math.round((levelInMouldMm - floorMm) * 1e6) / 1e6;
}
