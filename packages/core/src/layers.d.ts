import { type Result } from './result';
import { type VolumeCurve } from './volume-curve';
export interface LayerSlice {
    /** 0-based, from the floor up. */
    index: number;
    fromLevelMm: number;
    toLevelMm: number;
    thicknessMm: number;
    /** Resin this layer holds between its levels (the first layer also takes anything below the curve's start). */
    fillVolumeMm3: number;
    /** The deepest resin this layer puts down at any one spot, which is what drives its exotherm. */
    deepestResinMm: number;
}
export interface LayerSplitInput {
    curve: VolumeCurve;
    fillLevelMm: number;
    maxLayerMm: number;
    /** Resin depth at the cavity's deepest point when filled to fillLevelMm; absent when the curve starts at that point. */
    maxDepthMm?: number;
}
/** The fewest equal layers, floor to fill level, none thicker than the product allows. */
export declare function splitIntoLayers(input: LayerSplitInput): Result<LayerSlice[]>;
