import { type RatioBasis } from './mix-ratio';
import { type Result } from './result';
/**
 * What to mix toward. A volume target is the whole cup's volume, pigment included (the pigment takes
 * room in the mould too). A mass target is the resin alone (part A + part B); pigment goes on top of
 * it, because a pigment's loading is stated as a percentage of part A + part B by mass.
 */
export type MixTarget = {
    volumeMl: number;
} | {
    massG: number;
};
export interface MixInput {
    target: MixTarget;
    ratio: string | {
        a: number;
        b: number;
    };
    basis: RatioBasis;
    densityAGPerMl: number;
    densityBGPerMl: number;
    /** Pigment as a percentage of part A + part B by mass. */
    pigmentPct?: number;
    /**
     * The pigment's density, to count its volume in a volume target. Absent: the pigment is taken to
     * be as dense as the mixed resin, so it adds its own share of volume.
     */
    pigmentDensityGPerMl?: number;
    /** The pigment's maximum loading; above it the mix is refused. */
    pigmentMaxPct?: number;
}
export interface MixPart {
    grams: number;
    ml: number;
}
export interface MixResult {
    partA: MixPart;
    partB: MixPart;
    pigment: {
        grams: number;
    };
    /** A + B + pigment. */
    totalGrams: number;
    /** A+B mass over A+B volume (volumes add; pigment left out). */
    mixedDensityGPerMl: number;
    /** The pigment's own volume (mass over its density), part of a volume target. */
    pigmentMl: number;
}
export declare function checkPigmentPct(pigmentPct: number, pigmentMaxPct?: number): Result<number>;
/** Grams and millilitres of A, B and pigment for one target; densities convert, volumes add. */
export declare function mixBatch(input: MixInput): Result<MixResult>;
/** Mixed density of A+B for a ratio, without a target: what converts a cavity's mL into grams. */
export declare function mixedDensity(ratio: {
    a: number;
    b: number;
    basis: RatioBasis;
}, densityAGPerMl: number, densityBGPerMl: number): number;
/** Part A over part B by mass: the ratio a scale checks, whatever basis the data sheet states. */
export declare function massRatioAToB(ratio: {
    a: number;
    b: number;
    basis: RatioBasis;
}, densityAGPerMl: number, densityBGPerMl: number): number;
/**
 * The resin (A+B) mass that, with its pigment, fills a volume: V = m/ρ(A+B) + share·m/ρ(pigment).
 * Without a pigment density the pigment is taken to be as dense as the resin.
 */
export declare function resinMassForVolume(volumeMl: number, mixedDensityGPerMl: number, pigmentPct: number, pigmentDensityGPerMl?: number): number;
