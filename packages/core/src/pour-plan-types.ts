import type { Caution } from './cautions';
import type { TimesAtTemperature } from './cure-model';
import type { WoodBlank, WoodCost } from './cost';
import type { LayerSlice } from './layers';
import type { MixResult } from './mix';
import type { PlanDepthMap, PlanForecast } from './plan-exotherm';
import type { Pigment, ResinSystem } from './shelf';
import type { ScaleResolutionG } from './unit-format';
import type { VolumeCurve } from './volume-curve';

/** Resin (A+B) left in each cup after pouring, by mass or by volume. */
export type CupWaste = { massG: number } | { volumeMl: number };

export interface PourPlanInput {
  cavity: {
    /** Volume below each level, levels from the cavity floor. */
    curve: VolumeCurve;
    /** Wood surface the resin touches: what the seal coat covers. */
    wettedAreaMm2: number;
    /** Resin depth at the deepest point when filled to fillLevelMm (depth map); leave out when the curve starts at that point. */
    maxDepthMm?: number;
    /** A mould's resin depths at the fill level: the forecast then finds the hottest spot; without it every column is alike. */
    depthMap?: PlanDepthMap;
  };
  fillLevelMm: number;
  deepPour: { product: ResinSystem; pigment?: { pigment: Pigment; pct: number } };
  sealCoat?: { product: ResinSystem; filmThicknessMm: number; coats: number; absorptionFactor: number };
  /** Extra resin on every layer, as a percentage of that layer's fill volume. */
  overPourPct: number;
  cupWaste: CupWaste;
  scaleResolutionG: ScaleResolutionG;
  /** Weighed A:B may differ from the product's ratio by this much (the shop's setting; 3 % when absent). */
  offRatioTolerancePct?: number;
  shopTempC: number;
  /** With humidity and the surface temperature the plan also checks the dew point. */
  shopAir?: { rhPct: number; surfaceTempC: number };
  wood?: WoodBlank;
}

export interface PartTotals {
  partA: { grams: number; ml: number };
  partB: { grams: number; ml: number };
  pigment: { grams: number };
  totalGrams: number;
}

export interface CostTotals {
  resin: number;
  pigment: number;
  total: number;
}

export interface PlannedBatch extends MixResult {
  /** 0-based, run-sheet order across the plan: seal coats first, then layers from the floor up. */
  index: number;
  pour: { kind: 'seal_coat'; coat: number } | { kind: 'layer'; layer: number };
  cost: CostTotals;
  /** How far the shown grams of A and B are from the product's ratio, in percent (+: A-rich). */
  ratioErrorPct: number;
  /** This cup's pot life at the shop's temperature, its own heat counted (absent on plans saved before it was). */
  cupPotLifeMin?: number;
  /** 'cup_heating' when the cup's heat makes it shorter than the data sheet's pot life at that temperature. */
  cupPotLifeLimitedBy?: 'cup_heating' | 'data_sheet';
}

export interface LayerPlan extends Omit<LayerSlice, 'fillVolumeMm3'> {
  fillVolumeMl: number;
  overPourMl: number;
  pourVolumeMl: number;
  batches: PlannedBatch[];
  totals: PartTotals;
  cost: CostTotals;
}

export interface SealCoatPlan {
  productName: string;
  wettedAreaMm2: number;
  filmThicknessMm: number;
  absorptionFactor: number;
  volumeMl: number;
  coats: { index: number; volumeMl: number; batches: PlannedBatch[]; totals: PartTotals; cost: CostTotals }[];
  totals: PartTotals;
  cost: CostTotals;
}

export interface PourPlan {
  /** Every margin the plan adds, by name, so none is hidden inside a total. */
  margins: {
    overPour: { label: string; pct: number; volumeMl: number };
    cupWaste: { label: string; perBatch: CupWaste; batches: number; resinG: number };
  };
  /** The steps everything shown is rounded to. */
  resolution: {
    grams: ScaleResolutionG;
    ml: number;
    cost: number;
    /** The shop's tolerance the cups' ratio errors were judged against. */ offRatioTolerancePct: number;
  };
  fill: { fillLevelMm: number; fillVolumeMl: number; pourVolumeMl: number; layerCount: number; layerThicknessMm: number; deepestResinMm: number };
  sealCoat: SealCoatPlan | null;
  layers: LayerPlan[];
  deepPour: { productName: string; pigmentName: string | null; pigmentPct: number; totals: PartTotals; cost: CostTotals };
  cost: { sealCoat: number; deepPour: number; wood: (WoodCost & { shownCost: number }) | null; piece: number };
  /** The data sheet's times at the shop temperature. */
  shopTimes: { deepPour: TimesAtTemperature; sealCoat: TimesAtTemperature | null };
  /** The exotherm forecast of the deep pour's layers at the shop's temperature (an estimate; see its calibratedTo). */
  forecast: PlanForecast;
  /** appliesTo.kind 'product': index 0 is the deep-pour product, 1 the seal-coat product. */
  cautions: Caution[];
}
