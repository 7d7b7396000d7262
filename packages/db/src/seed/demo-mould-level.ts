import type { CavityAnalysis } from '@gelpoint/mesh';

/**
 * Where the demo plan's resin surface stands, said two ways: the mould file's own frame, where the engine's fills and
 * curve are measured, and what the plan's stored inputs say, with the datum they are measured from.
 */
export interface DemoPlanLevel {
  frameLevelMm: number;
  stored: { levelFrom: 'floor'; fillLevelMm: number };
}

/**
 * The demo plan fills the pocket flush with the blank's top face. Stored as plans are stored: the height of the
 * resin surface above the cavity floor, the lowest point where resin stands. The one place the datum is decided.
 */
export function demoPlanLevel(analysis: CavityAnalysis): DemoPlanLevel {
  const floorMm = analysis.exact?.lowestFloorMm;
  if (floorMm === undefined) throw new Error('the demo mould has no exact cavity floor: its analysis did not take the exact method');
  const rimMm = analysis.bboxMm.max[2];
  return { frameLevelMm: rimMm, stored: { levelFrom: 'floor', fillLevelMm: rimMm - floorMm } };
}
