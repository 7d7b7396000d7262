import type { Pigment as CorePigment, ResinSystem as CoreResinSystem } from '@gelpoint/core';
import type { Pigment, ResinSystem } from './entities';

/** A shelf row in the shape packages/core computes with; also what a pour plan snapshots. */
export function toCoreResinSystem(r: ResinSystem): CoreResinSystem {
  return {
    name: r.name,
    use: r.use,
    mixRatio: { a: r.ratioA, b: r.ratioB, basis: r.ratioBasis },
    densityAGPerMl: r.densityAGPerMl,
    densityBGPerMl: r.densityBGPerMl,
    potLifeMin: r.potLifeMin,
    gelTimeH: r.gelTimeH,
    recoatWindow: { earliestH: r.recoatEarliestH, latestH: r.recoatLatestH },
    tackFreeH: r.tackFreeH,
    demoldH: r.demoldH,
    fullCureH: r.fullCureH,
    ...(r.readyToMachineH !== null ? { readyToMachineH: r.readyToMachineH } : {}),
    referenceTempC: r.referenceTempC,
    minWorkTempC: r.minWorkTempC,
    maxWorkTempC: r.maxWorkTempC,
    maxLayerMm: r.maxLayerMm,
    maxBatchG: r.maxBatchG,
    ...(r.activationEnergyKJPerMol !== null ? { activationEnergyKJPerMol: r.activationEnergyKJPerMol } : {}),
    ...(r.hardnessShoreD !== null ? { hardnessShoreD: r.hardnessShoreD } : {}),
    ...(r.reactionHeatJPerG !== null ? { reactionHeatJPerG: r.reactionHeatJPerG } : {}),
    ...(r.thinFilmGelMin !== null ? { thinFilmGelMin: r.thinFilmGelMin } : {}),
    ...(r.heatCapacityJPerGK !== null ? { heatCapacityJPerGK: r.heatCapacityJPerGK } : {}),
    ...(r.conductivityWPerMK !== null ? { conductivityWPerMK: r.conductivityWPerMK } : {}),
    ...(r.acceptedPeakC !== null ? { acceptedPeakC: r.acceptedPeakC } : {}),
    pricePerKit: r.pricePerKit,
    kitSizeG: r.kitSizeG,
    shelfLifeMonths: r.shelfLifeMonths,
  };
}

export function toCorePigment(p: Pigment): CorePigment {
  return {
    name: p.name,
    kind: p.kind,
    densityGPerMl: p.densityGPerMl,
    recommendedPct: p.recommendedPct,
    maxPct: p.maxPct,
    price: { pricePerPack: p.pricePerPack, packSizeG: p.packSizeG },
  };
}
