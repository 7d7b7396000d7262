import { caution, formatLength, formatVolume, handlingCautions, mm3ToMl, type Caution, type UnitSystem } from '@gelpoint/core';

/**
 * Resin deeper than about 25 mm (1 in) in one pour is where most products start to need a
 * deep-pour formula and layers, because the heat of curing builds up in the mass (common practice;
 * the product's TDS gives its own limit).
 */
export const deepPourFromMm = 25;

export interface MoldCautionInput {
  maxDepthMm: number;
  trappedAirMm3: number;
  /** The thickest layer the chosen product allows, when the maker typed one. */
  maxLayerMm: number | null;
  /** How many layers the pour needs at that thickness, when known. */
  layersNeeded: number | null;
  unitSystem: UnitSystem;
}

/** What the mould itself warns about at a fill level, plus the SDS/TDS line every pour carries. */
export function moldCautions(input: MoldCautionInput): Caution[] {
  const cautions: Caution[] = [];
  const depth = formatLength(input.maxDepthMm, input.unitSystem).text;
  if (input.trappedAirMm3 > 0) {
    cautions.push(
      caution(
        'trapped_air',
        'warning',
        `About ${formatVolume(mm3ToMl(input.trappedAirMm3), input.unitSystem).text} of air would stay trapped under overhangs at this level. Drill a small vent at the top of each overhang, or turn the mould so nothing hangs over the resin, before pouring.`,
        'plan',
      ),
    );
  }
  if (input.maxLayerMm !== null && input.maxDepthMm > input.maxLayerMm && input.layersNeeded !== null) {
    cautions.push(
      caution(
        'deeper_than_layer',
        'danger',
        `The resin stands ${depth} deep at its deepest spot, more than the ${formatLength(input.maxLayerMm, input.unitSystem).text} one layer may be. Pour it in ${input.layersNeeded} layers (the lines in the view), each cured to the product's recoat window before the next.`,
        'layer',
      ),
    );
  } else if (input.maxDepthMm > deepPourFromMm) {
    cautions.push(
      caution(
        'deep_pour_exotherm',
        'warning',
        `The resin stands ${depth} deep at its deepest spot. Thick resin heats itself as it cures (exotherm) and can crack, yellow or smoke: check the maximum layer thickness in the product's TDS and pour in layers if it is less.`,
        'layer',
      ),
    );
  }
  const sdsLine = handlingCautions().find((c) => c.code === 'follow_sds_tds');
  if (sdsLine) cautions.push(sdsLine);
  return cautions;
}
