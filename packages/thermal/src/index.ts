export * from './result';
export { gasConstantJPerMolK, stefanBoltzmannWPerM2K4 } from './physics';
export type { AmbientPoint, AmbientSchedule } from './ambient';
export {
  autocatalyticShape,
  conversionAfterReducedTime,
  dgebaAmineKinetics,
  isothermalTimeToS,
  rateLawFromGelTime,
  reducedTimeTo,
  type CureKinetics,
  type RateLaw,
} from './kinetics';
export { checkResinThermal, dgebaAmineDefaults, type ResinThermal } from './resin-thermal';
export { sugarMaple12Pct, woodConductivityWPerMK, woodHeatCapacityJPerGK, type WoodBase } from './wood';
export { radiationWPerM2K, resinEmissivity, sphereConvectionWPerM2K, upwardPlateConvectionWPerM2K } from './surface';
export type { Numerics, PourConditions } from './layer-model';
export { forecastLayer, maxLayerDepth, type ForecastPoint, type LayerForecast, type MaxLayer } from './layer-forecast';
export {
  calibrateToDataSheet,
  proposeLayers,
  type Calibration,
  type DataSheetLimit,
  type LayerProposal,
  type PourSetting,
  type ProposedLayer,
} from './calibration';
export { forecastMould, type DepthGrid, type MouldForecast, type MouldLayerForecast, type MouldOptions, type PlannedLayer } from './mould-forecast';
export { peakAtDepth, peakBandsOf, type PeakBand } from './peak-bands';
export { cupPotLife, type CupInput, type CupPotLife } from './cup-pot-life';
export { exothermCaution, forecastSingleLayer, type SingleLayerForecast, type SingleLayerInput } from './single-layer';
