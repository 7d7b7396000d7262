import { activationEnergyForDoublingPer10K } from './arrhenius';
import type { MixRatio } from './mix-ratio';
import { fail, ok, type CoreIssue, type Result } from './result';

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
  recoatWindow: { earliestH: number; latestH: number };
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

export type PigmentPrice = { pricePerG: number } | { pricePerPack: number; packSizeG: number };

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
export function activationEnergyOf(product: Pick<ResinSystem, 'activationEnergyKJPerMol' | 'referenceTempC'>): number {
  return product.activationEnergyKJPerMol ?? activationEnergyForDoublingPer10K(product.referenceTempC);
}

export function readyToMachineHOf(product: Pick<ResinSystem, 'readyToMachineH' | 'fullCureH'>): number {
  return product.readyToMachineH ?? product.fullCureH;
}

export function resinPricePerG(product: Pick<ResinSystem, 'pricePerKit' | 'kitSizeG'>): number {
  return product.pricePerKit / product.kitSizeG;
}

export function pigmentPricePerG(pigment: Pick<Pigment, 'price'>): number {
  return 'pricePerG' in pigment.price ? pigment.price.pricePerG : pigment.price.pricePerPack / pigment.price.packSizeG;
}

function positiveFields<T extends object>(entry: T, fields: (keyof T & string)[], issues: CoreIssue[]): void {
  for (const field of fields) {
    const value = entry[field] as unknown;
    if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
      issues.push({ field, message: `${field} must be a number above zero, got ${String(value)}.` });
    }
  }
}

function nonNegativeFields<T extends object>(entry: T, fields: (keyof T & string)[], issues: CoreIssue[]): void {
  for (const field of fields) {
    const value = entry[field] as unknown;
    if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
      issues.push({ field, message: `${field} must be zero or more, got ${String(value)}.` });
    }
  }
}

function finish<T>(entry: T, what: string, issues: CoreIssue[]): Result<T> {
  if (issues.length === 0) return ok(entry);
  return fail(
    `${what}_invalid`,
    `This ${what.replace('_', ' ')} cannot be saved: ${issues.map((i) => i.message).join(' ')} Correct these from the data sheet.`,
    issues,
  );
}

/** Every problem of a shelf entry at once, so a form can mark all bad fields in one pass. */
export function validateResinSystem(product: ResinSystem): Result<ResinSystem> {
  const issues: CoreIssue[] = [];
  if (product.name.trim() === '') issues.push({ field: 'name', message: 'name must not be empty.' });
  positiveFields(
    product,
    [
      'densityAGPerMl',
      'densityBGPerMl',
      'potLifeMin',
      'gelTimeH',
      'tackFreeH',
      'demoldH',
      'fullCureH',
      'maxLayerMm',
      'maxBatchG',
      'kitSizeG',
      'shelfLifeMonths',
    ],
    issues,
  );
  nonNegativeFields(product, ['pricePerKit'], issues);
  if (!(product.mixRatio.a > 0 && product.mixRatio.b > 0)) {
    issues.push({ field: 'mixRatio', message: `mixRatio must have both parts above zero, got ${product.mixRatio.a}:${product.mixRatio.b}.` });
  }
  const { earliestH, latestH } = product.recoatWindow;
  if (!(earliestH >= 0 && latestH > 0 && earliestH <= latestH)) {
    issues.push({ field: 'recoatWindow', message: `recoatWindow must open at or before it closes, got ${earliestH} h to ${latestH} h.` });
  }
  if (!(product.minWorkTempC < product.maxWorkTempC)) {
    issues.push({ field: 'minWorkTempC', message: `minWorkTempC (${product.minWorkTempC} °C) must be below maxWorkTempC (${product.maxWorkTempC} °C).` });
  }
  if (!Number.isFinite(product.referenceTempC)) issues.push({ field: 'referenceTempC', message: 'referenceTempC must be a temperature in °C.' });
  // A cure reaches these in order (gel, tack-free, demold, machinable, full cure); a sheet typed out of order is refused.
  const order: [keyof ResinSystem, number | undefined][] = [
    ['gelTimeH', product.gelTimeH],
    ['tackFreeH', product.tackFreeH],
    ['demoldH', product.demoldH],
    ['readyToMachineH', product.readyToMachineH],
    ['fullCureH', product.fullCureH],
  ];
  const given = order.filter((entry): entry is [keyof ResinSystem, number] => typeof entry[1] === 'number');
  for (let i = 0; i + 1 < given.length; i++) {
    const [earlierField, earlier] = given[i]!;
    const [laterField, later] = given[i + 1]!;
    if (earlier > later) issues.push({ field: laterField, message: `${laterField} (${later} h) must not come before ${earlierField} (${earlier} h).` });
  }
  if (product.potLifeMin > product.gelTimeH * 60) {
    issues.push({ field: 'potLifeMin', message: `potLifeMin (${product.potLifeMin} min) must not be longer than gelTimeH (${product.gelTimeH} h).` });
  }
  if (product.readyToMachineH !== undefined && !(product.readyToMachineH > 0)) {
    issues.push({ field: 'readyToMachineH', message: `readyToMachineH must be above zero when given, got ${product.readyToMachineH}.` });
  }
  if (product.activationEnergyKJPerMol !== undefined && !(product.activationEnergyKJPerMol > 0)) {
    issues.push({
      field: 'activationEnergyKJPerMol',
      message: `activationEnergyKJPerMol must be above zero when given, got ${product.activationEnergyKJPerMol}.`,
    });
  }
  // Shore D runs from 0 to 100 (ASTM D2240).
  if (product.hardnessShoreD !== undefined && !(product.hardnessShoreD > 0 && product.hardnessShoreD <= 100)) {
    issues.push({ field: 'hardnessShoreD', message: `hardnessShoreD must be between 0 and 100 when given, got ${product.hardnessShoreD}.` });
  }
  exothermSettingIssues(product, issues);
  return finish(product, 'resin_system', issues);
}

// The ranges the forecast accepts (packages/thermal checkResinThermal); a shelf entry outside them could never be forecast.
const exothermRanges: {
  field: 'reactionHeatJPerG' | 'thinFilmGelMin' | 'heatCapacityJPerGK' | 'conductivityWPerMK';
  min: number;
  max: number;
  unit: string;
}[] = [
  { field: 'reactionHeatJPerG', min: 0, max: 1500, unit: 'J/g' },
  { field: 'thinFilmGelMin', min: 0, max: 43_200, unit: 'min' },
  { field: 'heatCapacityJPerGK', min: 0.5, max: 4, unit: 'J/(g·K)' },
  { field: 'conductivityWPerMK', min: 0.05, max: 5, unit: 'W/(m·K)' },
];

function exothermSettingIssues(product: ResinSystem, issues: CoreIssue[]): void {
  for (const { field, min, max, unit } of exothermRanges) {
    const v = product[field];
    if (v !== undefined && !(Number.isFinite(v) && v > min && v <= max)) {
      issues.push({ field, message: `${field} must be above ${min} and at most ${max} ${unit} when given, got ${String(v)}.` });
    }
  }
  const peak = product.acceptedPeakC;
  if (peak !== undefined && !(Number.isFinite(peak) && peak > product.referenceTempC && peak <= 300)) {
    issues.push({
      field: 'acceptedPeakC',
      message: `acceptedPeakC must be above the reference temperature (${product.referenceTempC} °C) and at most 300 °C when given, got ${String(peak)}.`,
    });
  }
}

export function validatePigment(pigment: Pigment): Result<Pigment> {
  const issues: CoreIssue[] = [];
  if (pigment.name.trim() === '') issues.push({ field: 'name', message: 'name must not be empty.' });
  if (!(pigment.maxPct > 0 && pigment.maxPct <= 100)) {
    issues.push({ field: 'maxPct', message: `maxPct must be above 0 and at most 100, got ${pigment.maxPct}.` });
  }
  if (!(pigment.recommendedPct >= 0 && pigment.recommendedPct <= pigment.maxPct)) {
    issues.push({ field: 'recommendedPct', message: `recommendedPct must be between 0 and maxPct (${pigment.maxPct}), got ${pigment.recommendedPct}.` });
  }
  if (pigment.densityGPerMl !== undefined && !(pigment.densityGPerMl > 0 && pigment.densityGPerMl <= 25)) {
    issues.push({ field: 'densityGPerMl', message: `densityGPerMl must be above 0 and at most 25 g/mL, got ${pigment.densityGPerMl}.` });
  }
  if ('pricePerG' in pigment.price) {
    nonNegativeFields(pigment.price, ['pricePerG'], issues);
  } else {
    nonNegativeFields(pigment.price, ['pricePerPack'], issues);
    positiveFields(pigment.price, ['packSizeG'], issues);
  }
  return finish(pigment, 'pigment', issues);
}
