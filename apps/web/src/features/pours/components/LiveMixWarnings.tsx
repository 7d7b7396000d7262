import { formatWeighedMass, offRatioCheck, partBForRatio, type UnitSystem } from '@gelpoint/core';
import { Alert } from '../../../components/ui/Alert';
import { dewPointReadout } from '../utils/dew-point-warning';
import { scaleStepOf } from '../utils/shop-units';

export interface LiveMixWarningsProps {
  weighedAG: number | null;
  weighedBG: number | null;
  /** The product's part A over part B by mass: what a scale checks. */
  massRatioAToB: number;
  ambientTempC: number | null;
  surfaceTempC: number | null;
  rhPct: number | null;
  tolerancePct: number;
  unitSystem: UnitSystem;
  scaleResolutionG: number;
}

/** Off-ratio and dew-point warnings while the numbers are typed; the server checks again when the batch is logged. */
export function LiveMixWarnings(props: LiveMixWarningsProps) {
  const { weighedAG, weighedBG, massRatioAToB, tolerancePct, unitSystem, scaleResolutionG } = props;
  const ratio = weighedAG !== null && weighedBG !== null ? offRatioCheck({ partAG: weighedAG, partBG: weighedBG }, massRatioAToB, tolerancePct) : null;
  const dew = dewPointReadout(props.ambientTempC, props.surfaceTempC, props.rhPct, unitSystem);
  const matchingB = weighedAG !== null ? partBForRatio(weighedAG, massRatioAToB) : null;
  const shown = (grams: number) => formatWeighedMass(grams, unitSystem, scaleStepOf(scaleResolutionG)).text;
  return (
    <div className="flex flex-col gap-3" aria-live="polite">
      {ratio?.beyondTolerance ? (
        <Alert tone="warning" title="Off ratio" live="none">
          Part A to part B is {ratio.pct.toFixed(1)} % away from the product’s ratio; the shop allows {tolerancePct} %. Off-ratio resin may stay soft or tacky.
          {matchingB !== null ? ` With this part A, part B should be about ${shown(matchingB)}.` : ''} Correct the weight before you mix, or start a fresh cup.
        </Alert>
      ) : ratio ? (
        <Alert tone="success" live="none">
          On ratio: {ratio.pct.toFixed(1)} % from the product’s ratio, within the shop’s {tolerancePct} %.
        </Alert>
      ) : null}
      {dew?.warning ? (
        <Alert tone="warning" title="Near the dew point" live="none">
          {dew.warning}
        </Alert>
      ) : null}
    </div>
  );
}
