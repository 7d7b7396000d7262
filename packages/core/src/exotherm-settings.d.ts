import { type DataSheetLimit, type ResinThermal } from '@gelpoint/thermal';
import { type ResinSystem } from './shelf';
/**
 * The peak a shop accepts when its lead has entered none. The forecast is calibrated so the data
 * sheet's maximum layer at its own temperature peaks exactly here, so this number mostly sets the
 * point the extrapolation starts from; 60 °C is from memory of what deep-pour products are said to
 * stay under at their maximum layer, not a published value: the shelf shows it as a default to replace.
 */
export declare const defaultAcceptedPeakC = 60;
/** The numbers an empty shelf setting takes (the thin-film gel time and activation energy follow the data sheet instead). */
export declare const exothermDefaults: {
    readonly reactionHeatJPerG: 486;
    readonly heatCapacityJPerGK: 1.5;
    readonly conductivityWPerMK: 0.2;
    readonly acceptedPeakC: 60;
};
export type ExothermSettingField = 'reactionHeatJPerG' | 'thinFilmGelMin' | 'heatCapacityJPerGK' | 'conductivityWPerMK' | 'acceptedPeakC' | 'activationEnergyKJPerMol';
export interface ExothermSetting {
    value: number;
    /** True when the shelf entry leaves it empty and the value below is the default. */
    isDefault: boolean;
    /** Where the value comes from, in words. */
    source: string;
}
export interface ExothermSettings {
    /** The resin as the forecast takes it (not yet calibrated). */
    resin: ResinThermal & {
        acceptedPeakC: number;
    };
    /** The data sheet's own exotherm point the forecast is calibrated to. */
    sheet: DataSheetLimit;
    settings: Record<ExothermSettingField, ExothermSetting>;
}
type ExothermProduct = Pick<ResinSystem, 'mixRatio' | 'densityAGPerMl' | 'densityBGPerMl' | 'gelTimeH' | 'referenceTempC' | 'maxLayerMm' | 'activationEnergyKJPerMol' | 'reactionHeatJPerG' | 'thinFilmGelMin' | 'heatCapacityJPerGK' | 'conductivityWPerMK' | 'acceptedPeakC'>;
/**
 * A shelf entry in the forecast's terms, every empty setting filled with its named default. An empty
 * thin-film gel time takes the data sheet's gel time: a data sheet usually times a cup, which gels
 * sooner than a film, so that errs towards a faster, hotter cure.
 */
export declare function exothermSettingsOf(product: ExothermProduct): ExothermSettings;
export {};
