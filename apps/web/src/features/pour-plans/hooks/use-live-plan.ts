import type { MoldFill, MoldView, PigmentView, ResinSystemView } from '@gelpoint/contracts';
import type { MoldFillFacts, Result } from '@gelpoint/core';
import { useMemo } from 'react';
import { hasStatus } from '../../../lib/api-error';
import { errorNotice } from '../../../lib/error-notice';
import { useMold } from '../api/get-mold';
import { useMoldFill } from '../api/get-mold-fill';
import { useMoldLayers } from '../api/get-mold-layers';
import { valuesKey } from '../utils/form-defaults';
import { livePourPlan, type LivePlan } from '../utils/live-plan';
import { curveFromLayerVolumes, planCurveLevels } from '../utils/mold-curve';
import { goneMoldWords } from '../utils/planner-options';
import type { PlannerUnits } from '../utils/planner-units';
import type { PlannerValues } from '../utils/planner-values';
import { checkPlanner, type PlannerCheck } from '../utils/planner-validation';
import { useDebouncedValue } from './use-debounced-value';

// Long enough to let a number be typed, short enough to feel live.
const settleMs = 250;

export interface LivePlanState {
  check: PlannerCheck;
  result: Result<LivePlan> | null;
  /** The numbers shown are for what was typed a moment ago; new ones are on their way. */
  updating: boolean;
  /** Why the mould's numbers are missing, when they are. */
  moldProblem: string | null;
  /** The mould and its fill the numbers were worked out from, when they come from a mould. */
  mould: { mold: MoldView; fill: MoldFill } | null;
}

export interface UseLivePlanInput {
  /** As typed, in the shop's units. */
  values: PlannerValues;
  pieceId: string;
  units: PlannerUnits;
  resinSystems: readonly ResinSystemView[];
  pigments: readonly PigmentView[];
  scaleResolutionG: number;
  offRatioTolerancePct: number;
}

/** The plan for the form as it stands, computed in the browser with core once the typing settles. */
export function useLivePlan({ values, pieceId, units, resinSystems, pigments, scaleResolutionG, offRatioTolerancePct }: UseLivePlanInput): LivePlanState {
  const key = valuesKey(values);
  const settled = useDebouncedValue(values, key, settleMs);
  const settledKey = valuesKey(settled);
  const check = useMemo(() => checkPlanner(settled, pieceId, units), [settled, pieceId, units]);

  const cavity = check.ok ? check.input.cavity : null;
  const moldRequest = check.ok && cavity?.source === 'mold' ? { moldId: cavity.moldId, levelMm: check.input.fillLevelMm, dam: cavity.dam } : null;
  const mold = useMold(moldRequest?.moldId ?? null);
  const report = mold.data?.report ?? null;
  const rimMm = report && moldRequest ? report.bboxMm.max[2] - report.floorMm[moldRequest.dam] : undefined;
  // Nothing to ask the mould for a level outside it; the plan says why.
  const inside = moldRequest !== null && rimMm !== undefined && moldRequest.levelMm > 0 && moldRequest.levelMm <= rimMm + 1e-9;
  const fill = useMoldFill(inside ? moldRequest : null);
  const levelMm = moldRequest?.levelMm;
  // The curve is sampled with the chosen dam from the cavity floor, as the server samples it when saving.
  const levelsMm = useMemo(() => (inside && levelMm !== undefined ? planCurveLevels(0, levelMm) : []), [inside, levelMm]);
  const layers = useMoldLayers(moldRequest && levelsMm.length >= 2 ? { moldId: moldRequest.moldId, levelsMm, dam: moldRequest.dam } : null);
  const moldFacts = useMemo<MoldFillFacts | null>(() => {
    // Answers fetched for another level or dam must not be mixed with this one.
    const top = layers.data?.layers.at(-1)?.toMm;
    if (!fill.data || fill.data.levelMm !== levelMm || top !== levelsMm.at(-1) || layers.data?.dam !== moldRequest?.dam) return null;
    const depthMap = fill.data.depthMap;
    return {
      curve: curveFromLayerVolumes(layers.data?.layers ?? []),
      wettedAreaMm2: fill.data.wettedAreaMm2,
      maxDepthMm: fill.data.maxDepthMm,
      ...(depthMap
        ? { depthMap: { originMm: depthMap.originMm, cellMm: depthMap.cellMm, nx: depthMap.nx, ny: depthMap.ny, depthsMm: depthMap.depthsMm } }
        : {}),
    };
  }, [fill.data, layers.data, levelMm, levelsMm, moldRequest?.dam]);

  const result = useMemo(
    () =>
      check.ok
        ? livePourPlan(check.input, {
            resinSystems,
            pigments,
            scaleResolutionG,
            offRatioTolerancePct,
            moldFacts,
            ...(rimMm === undefined ? {} : { moldRimMm: rimMm }),
          })
        : null,
    [check, resinSystems, pigments, scaleResolutionG, offRatioTolerancePct, moldFacts, rimMm],
  );

  return {
    check,
    result,
    updating: key !== settledKey || mold.isFetching || fill.isFetching || layers.isFetching,
    moldProblem: moldProblemOf(mold.error ?? fill.error ?? layers.error, Boolean(mold.data && !report)),
    mould: moldFacts && mold.data && fill.data ? { mold: mold.data, fill: fill.data } : null,
  };
}

function moldProblemOf(error: unknown, withoutReport: boolean): string | null {
  if (hasStatus(error, 404)) return goneMoldWords;
  if (error) return errorNotice(error).message;
  if (withoutReport) return 'This mould has no finished cavity report yet. Wait for its analysis, or plan with a quick shape.';
  return null;
}
