import { type Calibration } from '@gelpoint/thermal';
import { type ExothermSettingField, type ExothermSettings } from './exotherm-settings';
import type { LayerSlice } from './layers';
import { type Result } from './result';
import type { ResinSystem } from './shelf';
/** A cavity report's resin depths at the plan's fill level, in the mould's own frame (mm). */
export interface PlanDepthMap {
    originMm: [number, number];
    cellMm: [number, number];
    nx: number;
    ny: number;
    /** Row-major (index j·nx + i); 0 where no resin stands. */
    depthsMm: ArrayLike<number>;
}
export interface ForecastCurvePoint {
    /** Minutes after mixing. */
    timeMin: number;
    tempC: number;
}
export interface PlanLayerForecast {
    index: number;
    thicknessMm: number;
    peakC: number;
    /** Minutes from mixing this layer's resin to its peak. */
    timeToPeakMin: number;
    /** Below the resin surface, at the hottest spot. */
    peakDepthMm: number;
    /** The hottest column of a mould, in the mould's frame; absent for a quick shape (every column alike). */
    hottest?: {
        xMm: number;
        yMm: number;
    };
    overLimit: boolean;
    /** The layer reached its adiabatic ceiling: the real resin would smoke before the peak shown. */
    runaway: boolean;
    /** Temperature against time at the hottest spot, at most curvePoints points. */
    curve: ForecastCurvePoint[];
}
/**
 * The forecast peak over a mould, kept small: a column's peak depends only on its resin depth (the
 * depth classes of the whole-mould forecast), so a step table of depth bands paints any cell of the
 * plan's depth map. Bands are sorted by depth; a column belongs to the first band whose upToMm is at
 * or above its depth.
 */
export interface PlanPeakMap {
    bands: {
        upToMm: number;
        peakC: number;
    }[];
    /** The hottest column of the whole pour, in the mould's frame (mm). */
    hottest: {
        xMm: number;
        yMm: number;
        layerIndex: number;
        peakC: number;
        timeToPeakMin: number;
    };
}
/** 2 added the mould's peak map; 1 (stored before it) reads the same without one. */
export declare const planForecastVersion = 2;
/** Versions a stored plan may carry; a new forecast is always planForecastVersion. */
export type PlanForecastVersion = 1 | typeof planForecastVersion;
export type PlanForecast = {
    version: PlanForecastVersion;
    available: true;
    /** The rate law and the numerical scheme, in words. */
    model: string;
    /** The data-sheet point the model reproduces, in words. */
    calibratedTo: string;
    calibration: {
        maxLayerMm: number;
        tempC: number;
        heatScale: number;
    };
    limitC: number;
    shopTempC: number;
    /** The thickest single layer on bare wood at the shop's temperature, never above the data sheet's. */
    maxLayerMm: number;
    limitedBy: 'data_sheet' | 'forecast';
    /** Shelf settings that were empty and took their default. */
    defaultsUsed: ExothermSettingField[];
    layers: PlanLayerForecast[];
    /** A mould's peak map; absent for a quick shape and in forecasts stored before version 2. */
    peakMap?: PlanPeakMap;
} | {
    version: PlanForecastVersion;
    available: false;
    code: string;
    reason: string;
};
/**
 * The product's forecast settings, calibrated to its data sheet. The same product is calibrated once
 * (the live planner asks again on every keystroke); the answer depends only on the key's values.
 */
export declare function calibratedProduct(product: ResinSystem): Result<{
    settings: ExothermSettings;
    calibration: Calibration;
}>;
/** The thickest single layer whose forecast peak stays under the accepted peak at the shop's temperature, never above the data sheet's. */
export declare function forecastMaxLayer(product: ResinSystem, shopTempC: number): Result<{
    maxLayerMm: number;
    limitedBy: 'data_sheet' | 'forecast';
    limitC: number;
}>;
interface LayerInput {
    slices: readonly LayerSlice[];
    fillLevelMm: number;
    shopTempC: number;
    depthMap?: PlanDepthMap | undefined;
}
export interface PlanLayersForecast {
    layers: PlanLayerForecast[];
    peakMap?: PlanPeakMap;
}
/**
 * The step table of a mould's peak map: columns sorted by depth, runs of equal peak merged, each band
 * ending half-way to the next band's shallowest column so a client's float depths fall on the right side.
 */
export declare function peakBandsOf(depthsMm: Float32Array, peakMap: Float32Array): PlanPeakMap['bands'];
/** The painted peak of a column of this resin depth; null where no resin stands or beyond the table. */
export declare function peakAtDepth(bands: PlanPeakMap['bands'], depthMm: number): number | null;
/** Each planned layer's forecast: a quick shape's uniform depth, or a mould's depth map by depth classes (with its peak map). */
export declare function forecastPlanLayers(product: ResinSystem, input: LayerInput): Result<PlanLayersForecast>;
/** The forecast part of a plan: its layers, what it was calibrated to, and what it assumed. */
export declare function planForecastOf(product: ResinSystem, shopTempC: number, maxLayer: {
    maxLayerMm: number;
    limitedBy: 'data_sheet' | 'forecast';
}, forecast: PlanLayersForecast): PlanForecast;
export declare function unavailable(code: string, reason: string): PlanForecast;
export interface CupPotLifeAnswer {
    potLifeMin: number;
    limitedBy: 'cup_heating' | 'data_sheet';
}
/**
 * How long a cup of this mass stays workable at the shop's temperature: the cup's own heat shortens the
 * data sheet's pot life (packages/thermal cupPotLife), never lengthens it. When the forecast cannot run
 * (its settings do not calibrate), the data sheet's pot life moved to the shop's temperature stands.
 */
export declare function cupPotLifeOf(product: ResinSystem, resinMassG: number, shopTempC: number): CupPotLifeAnswer;
export {};
