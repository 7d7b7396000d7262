import type { PourPlanView } from '@gelpoint/contracts';
import { livePourPlan } from './live-plan';
import { newPlannerValues } from './planner-values';
import { checkPlanner } from './planner-validation';
import { benchDeep, benchSeal, benchTeal, testPieceId } from './test-fixtures';

/**
 * A saved plan as the API stores it, for the tests: computed by core from invented shelf entries, snapshot in the
 * server's shape (no key for a value the shelf leaves empty), and passed through JSON as the database column passes it.
 */
export function savedTrayPlan(): Pick<PourPlanView, 'inputs' | 'productSnapshot' | 'result'> {
  const values = newPlannerValues('Tray with a seal coat');
  values.cavity.shape = { ...values.cavity.shape, lengthMm: 300, widthMm: 200, depthMm: 30 };
  values.fillLevelMm = 30;
  values.deepPour = { resinSystemId: benchDeep.id, pigmentId: benchTeal.id, pigmentPct: 2 };
  values.sealCoat = { enabled: true, resinSystemId: benchSeal.id, filmThicknessMm: 0.2, coats: 2, absorption: 'open_grain', absorptionFactor: Number.NaN };
  values.shopTempC = 20;
  const checked = checkPlanner(values, testPieceId);
  if (!checked.ok) throw new Error(JSON.stringify(checked.fieldErrors));
  const live = livePourPlan(checked.input, { resinSystems: [benchDeep, benchSeal], pigments: [benchTeal], scaleResolutionG: 0.1 });
  if (!live.ok) throw new Error(live.error.message);
  const product = (view: typeof benchDeep) => {
    const {
      effectiveActivationEnergyKJPerMol: _e,
      exothermSettings: _x,
      reactionHeatJPerG: _h,
      thinFilmGelMin: _g,
      heatCapacityJPerGK: _c,
      conductivityWPerMK: _k2,
      acceptedPeakC: _p,
      archived: _a,
      updatedAt: _u,
      maker: _m,
      readyToMachineH: _r,
      activationEnergyKJPerMol: _k,
      hardnessShoreD: _hd,
      ...core
    } = view;
    return core;
  };
  const { archived: _a, updatedAt: _u, pricePerPack, packSizeG, ...pigment } = benchTeal;
  const snapshot = {
    deepPour: product(benchDeep),
    pigment: { ...pigment, price: { pricePerPack, packSizeG } },
    sealCoat: product(benchSeal),
    scaleResolutionG: 0.1,
  };
  return JSON.parse(JSON.stringify({ inputs: checked.input, productSnapshot: snapshot, result: live.value.plan })) as Pick<
    PourPlanView,
    'inputs' | 'productSnapshot' | 'result'
  >;
}
