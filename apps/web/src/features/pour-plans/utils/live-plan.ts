import type { PigmentView, QuickShape, ResinSystemView } from '@gelpoint/contracts';
import {
  areaDepthCavity,
  buildPourPlan,
  channelCavity,
  cylinderCavity,
  fail,
  ok,
  planCavityFromMold,
  rectangleCavity,
  type MoldFillFacts,
  type Pigment,
  type PlanCavity,
  type PourPlan,
  type ResinSystem,
  type Result,
} from '@gelpoint/core';
import type { SavedPlanInput } from './planner-values';

/** A shelf entry in the terms core computes with: "not given" is absent, not null. */
export function coreResinSystemOf(view: ResinSystemView): ResinSystem {
  return {
    name: view.name,
    use: view.use,
    mixRatio: view.mixRatio,
    densityAGPerMl: view.densityAGPerMl,
    densityBGPerMl: view.densityBGPerMl,
    potLifeMin: view.potLifeMin,
    gelTimeH: view.gelTimeH,
    recoatWindow: view.recoatWindow,
    tackFreeH: view.tackFreeH,
    demoldH: view.demoldH,
    fullCureH: view.fullCureH,
    ...(view.readyToMachineH === null ? {} : { readyToMachineH: view.readyToMachineH }),
    referenceTempC: view.referenceTempC,
    minWorkTempC: view.minWorkTempC,
    maxWorkTempC: view.maxWorkTempC,
    maxLayerMm: view.maxLayerMm,
    maxBatchG: view.maxBatchG,
    ...(view.activationEnergyKJPerMol === null ? {} : { activationEnergyKJPerMol: view.activationEnergyKJPerMol }),
    ...(view.hardnessShoreD === null ? {} : { hardnessShoreD: view.hardnessShoreD }),
    ...(view.reactionHeatJPerG === null ? {} : { reactionHeatJPerG: view.reactionHeatJPerG }),
    ...(view.thinFilmGelMin === null ? {} : { thinFilmGelMin: view.thinFilmGelMin }),
    ...(view.heatCapacityJPerGK === null ? {} : { heatCapacityJPerGK: view.heatCapacityJPerGK }),
    ...(view.conductivityWPerMK === null ? {} : { conductivityWPerMK: view.conductivityWPerMK }),
    ...(view.acceptedPeakC === null ? {} : { acceptedPeakC: view.acceptedPeakC }),
    pricePerKit: view.pricePerKit,
    kitSizeG: view.kitSizeG,
    shelfLifeMonths: view.shelfLifeMonths,
  };
}

export function corePigmentOf(view: PigmentView): Pigment {
  return {
    name: view.name,
    kind: view.kind,
    densityGPerMl: view.densityGPerMl,
    recommendedPct: view.recommendedPct,
    maxPct: view.maxPct,
    price: { pricePerPack: view.pricePerPack, packSizeG: view.packSizeG },
  };
}

/**
 * A quick shape's cavity, levels from its floor; its curve starts at the deepest point, so no separate depth.
 * Core's shape functions check every field they are handed as a dimension, so only the dimensions go in.
 */
export function shapeCavity(shape: QuickShape): Result<PlanCavity> {
  const shaped = (() => {
    switch (shape.kind) {
      case 'rectangle':
        return rectangleCavity({ lengthMm: shape.lengthMm, widthMm: shape.widthMm, depthMm: shape.depthMm });
      case 'channel':
        return channelCavity({ lengthMm: shape.lengthMm, widthMm: shape.widthMm, depthMm: shape.depthMm });
      case 'cylinder':
        return cylinderCavity({ diameterMm: shape.diameterMm, depthMm: shape.depthMm });
      case 'area_depth': {
        const { kind: _kind, ...dimensions } = shape;
        return areaDepthCavity(dimensions);
      }
    }
  })();
  if (!shaped.ok) return shaped;
  return ok({ curve: shaped.value.curve, wettedAreaMm2: shaped.value.wettedAreaMm2 });
}

export interface LivePlanSources {
  resinSystems: readonly ResinSystemView[];
  pigments: readonly PigmentView[];
  scaleResolutionG: number;
  /** The shop's off-ratio tolerance (its default when not given). */
  offRatioTolerancePct?: number;
  /** The mould report's curve (levels from the cavity floor) with its fill at the chosen level; only for plans cast in a mould. */
  moldFacts?: MoldFillFacts | null;
  /** The top of the mould above its cavity floor with the chosen dam, when its report is known. */
  moldRimMm?: number;
}

export interface LivePlan {
  plan: PourPlan;
  /** The cavity the plan was computed on, levels from its floor, for drawing the layers against. */
  cavity: PlanCavity;
}

/**
 * The plan the server will save for these inputs, worked out in the browser with the same core functions and the
 * same shelf values, so the maker sees the numbers while typing.
 */
export function livePourPlan(input: SavedPlanInput, sources: LivePlanSources): Result<LivePlan> {
  const deep = sources.resinSystems.find((r) => r.id === input.deepPour.resinSystemId);
  if (!deep) return fail('product_missing', 'Choose the product for the deep pour from the shelf.');
  const pigment = input.deepPour.pigmentId ? sources.pigments.find((p) => p.id === input.deepPour.pigmentId) : undefined;
  if (input.deepPour.pigmentId && !pigment) return fail('pigment_missing', 'The chosen pigment is not on the shelf; choose another or none.');
  const seal = input.sealCoat ? sources.resinSystems.find((r) => r.id === input.sealCoat?.resinSystemId) : undefined;
  if (input.sealCoat && !seal) return fail('product_missing', 'Choose the product for the seal coat from the shelf.');

  let cavity: PlanCavity;
  let fillLevelMm = input.fillLevelMm;
  if (input.cavity.source === 'shape') {
    const shaped = shapeCavity(input.cavity.shape);
    if (!shaped.ok) return shaped;
    cavity = shaped.value;
  } else {
    if (sources.moldRimMm !== undefined && input.fillLevelMm > sources.moldRimMm + 1e-9) {
      return fail(
        'fill_above_report',
        `The fill level is above the top of the mould, ${Math.round(sources.moldRimMm * 1000) / 1000} mm above its cavity floor; choose a level inside the mould.`,
      );
    }
    if (!(input.fillLevelMm > 0))
      return fail('fill_below_floor', 'The fill level is the height of the resin surface above the cavity floor; give one above zero.');
    if (!sources.moldFacts) return fail('mold_fill_pending', 'Waiting for the mould’s cavity report at this level.');
    const fromMold = planCavityFromMold(sources.moldFacts, input.fillLevelMm);
    if (!fromMold.ok) return fromMold;
    ({ cavity, fillLevelMm } = fromMold.value);
  }

  const planned = buildPourPlan({
    cavity,
    fillLevelMm,
    deepPour: { product: coreResinSystemOf(deep), ...(pigment ? { pigment: { pigment: corePigmentOf(pigment), pct: input.deepPour.pigmentPct } } : {}) },
    ...(seal && input.sealCoat
      ? {
          sealCoat: {
            product: coreResinSystemOf(seal),
            filmThicknessMm: input.sealCoat.filmThicknessMm,
            coats: input.sealCoat.coats,
            absorptionFactor: input.sealCoat.absorptionFactor,
          },
        }
      : {}),
    overPourPct: input.overPourPct,
    cupWaste: input.cupWaste,
    scaleResolutionG: sources.scaleResolutionG === 1 ? 1 : 0.1,
    ...(sources.offRatioTolerancePct === undefined ? {} : { offRatioTolerancePct: sources.offRatioTolerancePct }),
    shopTempC: input.shopTempC,
    ...(input.shopAir ? { shopAir: input.shopAir } : {}),
    ...(input.wood ? { wood: input.wood } : {}),
  });
  if (!planned.ok) return planned;
  return ok({ plan: planned.value, cavity });
}
