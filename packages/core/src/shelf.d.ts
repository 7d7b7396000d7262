import type { MixRatio } from './mix-ratio';
import { type Result } from './result';
export type ResinUse = 'seal' | 'deep_pour' | 'casting' | 'coating';
/** A resin system as entered from its data sheet (TDS); times are at referenceTempC. */
export interface ResinSystem {
    name: string;
    use: ResinUse;
    mixRatio: MixRatio;
    densityAGPerMl: number;
    densityBGPerMl: number;
    potLifeMin: number;
    gelTimeH: number;
    recoatWindow: {
        earliestH: number;
        latestH: number;
    };
    tackFreeH: number;
    demoldH: number;
    fullCureH: number;
    /** When the product says it may be machined before full cure; otherwise full cure applies. */
    readyToMachineH?: number;
    referenceTempC: number;
    minWorkTempC: number;
    maxWorkTempC: number;
    maxLayerMm: number;
    maxBatchG: number;
    /** Absent on most data sheets; see activationEnergyOf. */
    activationEnergyKJPerMol?: number;
    /**
     * The Shore D hardness the data sheet gives for the cured product, when it gives one: release for
     * machining then also needs a cure check that measured at least this.
     */
    hardnessShoreD?: number;
    /** Exotherm forecast settings; each one absent takes the default exothermSettingsOf names. Heat of reaction of the mix, J/g (DSC). */
    reactionHeatJPerG?: number;
    /** Isothermal gel time of a thin film at referenceTempC, minutes; the data sheet's gel time when absent. */
    thinFilmGelMin?: number;
    heatCapacityJPerGK?: number;
    conductivityWPerMK?: number;
    /** The hottest the shop lets a layer get, °C; what the forecast is calibrated to at the data sheet's maximum layer. */
    acceptedPeakC?: number;
    /** Price of one kit of A+B together, in the shop's currency. */
    pricePerKit: number;
    /** Mass of A+B in one kit. */
    kitSizeG: number;
    shelfLifeMonths: number;
}
export type PigmentKind = 'powder' | 'paste' | 'liquid';
export type PigmentPrice = {
    pricePerG: number;
} | {
    pricePerPack: number;
    packSizeG: number;
};
export interface Pigment {
    name: string;
    kind: PigmentKind;
    /**
     * Its density, so its volume counts in the pour (liquid colourants are near 1 g/mL, mica powders
     * near 2.8). Absent on plans saved before it was asked for: taken as the resin's own.
     */
    densityGPerMl?: number;
    /** Percentages of part A + part B by mass. */
    recommendedPct: number;
    maxPct: number;
    price: PigmentPrice;
}
/**
 * The data sheet's activation energy, or one derived from "the rate doubles per 10 °C" at the
 * product's reference temperature (common practice, Q10 ≈ 2) when the data sheet gives none.
 */
export declare function activationEnergyOf(product: Pick<ResinSystem, 'activationEnergyKJPerMol' | 'referenceTempC'>): number;
export declare function readyToMachineHOf(product: Pick<ResinSystem, 'readyToMachineH' | 'fullCureH'>): number;
export declare function resinPricePerG(product: Pick<ResinSystem, 'pricePerKit' | 'kitSizeG'>): number;
export declare function pigmentPricePerG(pigment: Pick<Pigment, 'price'>): number;
/** Every problem of a shelf entry at once, so a form can mark all bad fields in one pass. */
export declare function validateResinSystem(product: ResinSystem): Result<ResinSystem>;
export declare function validatePigment(pigment: Pigment): Result<Pigment>;
