import { dgebaAmineDefaults, type DataSheetLimit, type ResinThermal } from '@gelpoint/thermal';
import { mixedDensity } from './mix';
import { activationEnergyOf, type ResinSystem } from './shelf';

/**
 * The peak a shop accepts when its lead has entered none. The forecast is calibrated so the data
 * sheet's maximum layer at its own temperature peaks exactly here, so this number mostly sets the
 * point the extrapolation starts from; 60 °C is from memory of what deep-pour products are said to
 * stay under at their maximum layer, not a published value: the shelf shows it as a default to replace.
 */
export const defaultAcceptedPeakC = 60;

/** The numbers an empty shelf setting takes (the thin-film gel time and activation energy follow the data sheet instead). */
export const exothermDefaults = {
  reactionHeatJPerG: dgebaAmineDefaults.reactionHeatJPerG,
  heatCapacityJPerGK: dgebaAmineDefaults.heatCapacityJPerGK,
  conductivityWPerMK: dgebaAmineDefaults.conductivityWPerMK,
  acceptedPeakC: defaultAcceptedPeakC,
} as const;

export type ExothermSettingField =
  'reactionHeatJPerG' | 'thinFilmGelMin' | 'heatCapacityJPerGK' | 'conductivityWPerMK' | 'acceptedPeakC' | 'activationEnergyKJPerMol';

export interface ExothermSetting {
  value: number;
  /** True when the shelf entry leaves it empty and the value below is the default. */
  isDefault: boolean;
  /** Where the value comes from, in words. */
  source: string;
}

export interface ExothermSettings {
  /** The resin as the forecast takes it (not yet calibrated). */
  resin: ResinThermal & { acceptedPeakC: number };
  /** The data sheet's own exotherm point the forecast is calibrated to. */
  sheet: DataSheetLimit;
  settings: Record<ExothermSettingField, ExothermSetting>;
}

type ExothermProduct = Pick<
  ResinSystem,
  | 'mixRatio'
  | 'densityAGPerMl'
  | 'densityBGPerMl'
  | 'gelTimeH'
  | 'referenceTempC'
  | 'maxLayerMm'
  | 'activationEnergyKJPerMol'
  | 'reactionHeatJPerG'
  | 'thinFilmGelMin'
  | 'heatCapacityJPerGK'
  | 'conductivityWPerMK'
  | 'acceptedPeakC'
>;

function setting(given: number | undefined, fallback: number, source: string, defaultSource: string): ExothermSetting {
  return given === undefined ? { value: fallback, isDefault: true, source: defaultSource } : { value: given, isDefault: false, source };
}

/**
 * A shelf entry in the forecast's terms, every empty setting filled with its named default. An empty
 * thin-film gel time takes the data sheet's gel time: a data sheet usually times a cup, which gels
 * sooner than a film, so that errs towards a faster, hotter cure.
 */
export function exothermSettingsOf(product: ExothermProduct): ExothermSettings {
  const settings: Record<ExothermSettingField, ExothermSetting> = {
    reactionHeatJPerG: setting(product.reactionHeatJPerG, dgebaAmineDefaults.reactionHeatJPerG, 'the shelf', 'DGEBA/amine by DSC (Polímeros, SciELO)'),
    thinFilmGelMin: setting(product.thinFilmGelMin, product.gelTimeH * 60, 'the shelf', "the data sheet's gel time"),
    heatCapacityJPerGK: setting(
      product.heatCapacityJPerGK,
      dgebaAmineDefaults.heatCapacityJPerGK,
      'the shelf',
      'typical of published cure models (from memory)',
    ),
    conductivityWPerMK: setting(
      product.conductivityWPerMK,
      dgebaAmineDefaults.conductivityWPerMK,
      'the shelf',
      'typical of unfilled polymers (Windberger et al. 2021)',
    ),
    acceptedPeakC: setting(product.acceptedPeakC, defaultAcceptedPeakC, 'the shelf', 'a default (from memory): enter the shop’s own'),
    activationEnergyKJPerMol: setting(
      product.activationEnergyKJPerMol,
      activationEnergyOf(product),
      'the data sheet',
      'the rate doubling per 10 °C (common practice)',
    ),
  };
  return {
    resin: {
      reactionHeatJPerG: settings.reactionHeatJPerG.value,
      activationEnergyKJPerMol: settings.activationEnergyKJPerMol.value,
      gelTimeMin: settings.thinFilmGelMin.value,
      refTempC: product.referenceTempC,
      densityGPerMl: mixedDensity(product.mixRatio, product.densityAGPerMl, product.densityBGPerMl),
      heatCapacityJPerGK: settings.heatCapacityJPerGK.value,
      conductivityWPerMK: settings.conductivityWPerMK.value,
      acceptedPeakC: settings.acceptedPeakC.value,
    },
    sheet: { maxLayerMm: product.maxLayerMm, tempC: product.referenceTempC },
    settings,
  };
}
