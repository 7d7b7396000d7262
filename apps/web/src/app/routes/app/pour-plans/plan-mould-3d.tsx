import type { PourPlan, UnitSystem } from '@gelpoint/core';
import type { ForecastHeat } from '../../../../components/heat/heat-colours';
import { MoldView3D } from '../../../../features/molds/components/MoldView3D';
import type { MoldFill, MoldView } from '../../../../features/molds/types';

export interface PlanMould3DProps {
  mold: MoldView;
  /** The plan's fill of the mould, with its depth map: the level in both frames. */
  fill: MoldFill;
  plan: PourPlan;
  heat: ForecastHeat;
  unitSystem: UnitSystem;
}

/** A mould plan's forecast on the mould itself: the 3D view at the plan's level, its layers outlined. */
export function PlanMould3D({ mold, fill, plan, heat, unitSystem }: PlanMould3DProps) {
  if (!mold.report) return null;
  // The plan's layers run from the cavity floor; the 3D view draws in the mould's own frame.
  const first = plan.layers[0];
  const layerLevelsMm = first ? [fill.floorMm + first.fromLevelMm, ...plan.layers.map((l) => fill.floorMm + l.toLevelMm)] : [];
  return (
    <MoldView3D
      mold={mold}
      report={mold.report}
      fill={fill}
      floorMm={fill.floorMm}
      levelMm={fill.levelInMouldMm}
      layerLevelsMm={layerLevelsMm}
      footprint={fill.depthMap}
      footprintLevelMm={fill.levelInMouldMm}
      unitSystem={unitSystem}
      heat={heat}
    />
  );
}
