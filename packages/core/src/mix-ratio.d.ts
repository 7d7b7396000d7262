import { type Result } from './result';
export type RatioBasis = 'weight' | 'volume';
/** Parts of A to parts of B, as the data sheet states them (e.g. 100:45 by weight). */
export interface MixRatio {
    a: number;
    b: number;
    basis: RatioBasis;
}
/** Reads "2:1", "100:45", "2.5:1"; both parts must be above zero. */
export declare function parseRatioParts(text: string): Result<{
    a: number;
    b: number;
}>;
export declare function checkRatio(ratio: {
    a: number;
    b: number;
}): Result<{
    a: number;
    b: number;
}>;
