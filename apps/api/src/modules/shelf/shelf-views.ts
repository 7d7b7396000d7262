import { activationEnergyOf, exothermSettingsOf, lotExpired } from '@gelpoint/core';
import { toCoreResinSystem, type Lot, type Pigment, type ResinSystem } from '@gelpoint/db';
import type { LotView, PigmentView, ResinSystemInput, ResinSystemView } from '@gelpoint/contracts';

export interface ShopInstant {
  atMs: number;
  zone: string;
}

export function resinSystemView(r: ResinSystem): ResinSystemView {
  return {
    id: r.id,
    name: r.name,
    maker: r.maker,
    use: r.use,
    mixRatio: { a: r.ratioA, b: r.ratioB, basis: r.ratioBasis },
    densityAGPerMl: r.densityAGPerMl,
    densityBGPerMl: r.densityBGPerMl,
    potLifeMin: r.potLifeMin,
    gelTimeH: r.gelTimeH,
    tackFreeH: r.tackFreeH,
    recoatWindow: { earliestH: r.recoatEarliestH, latestH: r.recoatLatestH },
    demoldH: r.demoldH,
    fullCureH: r.fullCureH,
    readyToMachineH: r.readyToMachineH,
    referenceTempC: r.referenceTempC,
    minWorkTempC: r.minWorkTempC,
    maxWorkTempC: r.maxWorkTempC,
    maxLayerMm: r.maxLayerMm,
    maxBatchG: r.maxBatchG,
    activationEnergyKJPerMol: r.activationEnergyKJPerMol,
    hardnessShoreD: r.hardnessShoreD,
    reactionHeatJPerG: r.reactionHeatJPerG,
    thinFilmGelMin: r.thinFilmGelMin,
    heatCapacityJPerGK: r.heatCapacityJPerGK,
    conductivityWPerMK: r.conductivityWPerMK,
    acceptedPeakC: r.acceptedPeakC,
    exothermSettings: exothermSettingsOf(toCoreResinSystem(r)).settings,
    effectiveActivationEnergyKJPerMol: activationEnergyOf(toCoreResinSystem(r)),
    pricePerKit: r.pricePerKit,
    kitSizeG: r.kitSizeG,
    shelfLifeMonths: r.shelfLifeMonths,
    archived: r.archivedAt !== null,
    updatedAt: r.updatedAt.toISOString(),
  };
}

/** Row columns from the validated form; the entity keeps the data sheet's values flat. */
export function resinSystemColumns(input: Required<Omit<ResinSystemInput, 'maker'>> & { maker: string }) {
  return {
    name: input.name,
    maker: input.maker,
    use: input.use,
    ratioA: input.mixRatio.a,
    ratioB: input.mixRatio.b,
    ratioBasis: input.mixRatio.basis,
    densityAGPerMl: input.densityAGPerMl,
    densityBGPerMl: input.densityBGPerMl,
    potLifeMin: input.potLifeMin,
    gelTimeH: input.gelTimeH,
    tackFreeH: input.tackFreeH,
    recoatEarliestH: input.recoatWindow.earliestH,
    recoatLatestH: input.recoatWindow.latestH,
    demoldH: input.demoldH,
    fullCureH: input.fullCureH,
    readyToMachineH: input.readyToMachineH,
    referenceTempC: input.referenceTempC,
    minWorkTempC: input.minWorkTempC,
    maxWorkTempC: input.maxWorkTempC,
    maxLayerMm: input.maxLayerMm,
    maxBatchG: input.maxBatchG,
    activationEnergyKJPerMol: input.activationEnergyKJPerMol,
    hardnessShoreD: input.hardnessShoreD,
    reactionHeatJPerG: input.reactionHeatJPerG,
    thinFilmGelMin: input.thinFilmGelMin,
    heatCapacityJPerGK: input.heatCapacityJPerGK,
    conductivityWPerMK: input.conductivityWPerMK,
    acceptedPeakC: input.acceptedPeakC,
    pricePerKit: input.pricePerKit,
    kitSizeG: input.kitSizeG,
    shelfLifeMonths: input.shelfLifeMonths,
  };
}

export function pigmentView(p: Pigment): PigmentView {
  return {
    id: p.id,
    name: p.name,
    kind: p.kind,
    densityGPerMl: p.densityGPerMl,
    recommendedPct: p.recommendedPct,
    maxPct: p.maxPct,
    pricePerPack: p.pricePerPack,
    packSizeG: p.packSizeG,
    archived: p.archivedAt !== null,
    updatedAt: p.updatedAt.toISOString(),
  };
}

/** The lot as the shop sees it at an instant of the caller's clock, in the shop's own zone. */
export function lotView(l: Lot & { productName: string }, at: ShopInstant): LotView {
  return {
    id: l.id,
    part: l.part,
    resinSystemId: l.resinSystemId,
    pigmentId: l.pigmentId,
    productName: l.productName,
    lotNumber: l.lotNumber,
    quantityG: l.quantityG,
    remainingG: l.remainingG,
    receivedOn: l.receivedOn,
    expiresOn: l.expiresOn,
    notes: l.notes,
    expired: lotExpired(l.expiresOn, at.atMs, at.zone),
    low: l.remainingG < l.quantityG * 0.1,
  };
}
