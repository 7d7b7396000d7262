import { cavityFloorMm, type CavityModel, type Dam } from '@gelpoint/mesh';

/**
 * Where the demo plan's resin surface stands, said two ways: the mould file's own frame, where the engine's fills and
 * curve are measured, and what the plan's stored inputs say, with the datum they are measured from.
 */
export interface DemoPlanLevel {
  floorMm: number;
  frameLevelMm: number;
  stored: { levelFrom: 'floor'; fillLevelMm: number };
}

/**
 * The demo plan fills the pocket flush with the blank's top face. Stored as plans are stored: the height of the
 * resin surface above the cavity floor (the lowest point where resin stands with the plan's dam), found the way the
 * API finds it. The one place the datum is decided.
 */
export function demoPlanLevel(model: CavityModel, dam: Dam): DemoPlanLevel {
  const floor = cavityFloorMm(model, dam);
  if (!floor.ok) throw new Error(`demo mould: ${floor.error.message}`);
  const rimMm = model.analysis.bboxMm.max[2];
  return { floorMm: floor.value, frameLevelMm: rimMm, stored: { levelFrom: 'floor', fillLevelMm: Math.round((rimMm - floor.value) * 1e6) / 1e6 } };
}
