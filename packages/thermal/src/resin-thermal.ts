import { dgebaAmineKinetics, type CureKinetics } from './kinetics';
import { fail, ok, type Result, type ThermalIssue } from './result';

/** What the forecast needs to know about one resin system, in the units a data sheet or a DSC paper uses. */
export interface ResinThermal {
  /** Total heat of reaction of the mixed system (DSC), J/g. */
  reactionHeatJPerG: number;
  activationEnergyKJPerMol: number;
  /** Isothermal gel time of a thin film at refTempC (the data sheet's gel time), minutes. */
  gelTimeMin: number;
  refTempC: number;
  /** Mixed A + B. */
  densityGPerMl: number;
  heatCapacityJPerGK: number;
  conductivityWPerMK: number;
  /** The hottest the shop lets a layer get; calibration and layer proposals need it. */
  acceptedPeakC?: number;
  /** Shape of the cure law; dgebaAmineKinetics when absent. */
  kinetics?: CureKinetics;
  /** Factor on the heat of reaction fitted by calibrateToDataSheet; 1 when absent. */
  heatScale?: number;
}

/**
 * Published DGEBA/amine values, each named:
 * - heat of reaction 486 J/g: DGEBA (DER 331) with an aliphatic polyamine hardener of 60 mol %
 *   triethylenetetramine, by DSC ("Characterization of diglycidyl ether of bisphenol A / aliphatic
 *   polyamines systems", Polímeros, SciELO);
 * - activation energy 53 kJ/mol: inside the 44–57 kJ/mol of Barral et al. (1995), and what "pot life
 *   halves per 10 K" implies near 25 °C (52.95 kJ/mol; that rule is common practice);
 * - density 1.1 g/mL: about 2:1 by volume of a 1.16 g/mL resin and a 0.97 g/mL hardener (from memory
 *   of typical data sheets);
 * - heat capacity 1.5 J/(g·K) and conductivity 0.2 W/(m·K): inside the 1.0–1.8 J/(g·K) and
 *   0.15–0.33 W/(m·K) used across published cure models (the values from memory); unfilled polymers
 *   commonly conduct 0.1–0.2 W/(m·K) (Windberger et al., Proceedings 69(1):18, 2021).
 * The gel time, its temperature and the accepted peak come from the product and the shop.
 */
export const dgebaAmineDefaults = {
  reactionHeatJPerG: 486,
  activationEnergyKJPerMol: 53,
  densityGPerMl: 1.1,
  heatCapacityJPerGK: 1.5,
  conductivityWPerMK: 0.2,
  kinetics: dgebaAmineKinetics,
} as const satisfies Partial<ResinThermal>;

type Range = { field: keyof ResinThermal & string; label: string; unit: string; min: number; max: number; minOpen?: boolean };

const ranges: Range[] = [
  { field: 'reactionHeatJPerG', label: 'The heat of reaction', unit: 'J/g', min: 0, max: 1500 },
  { field: 'activationEnergyKJPerMol', label: 'The activation energy', unit: 'kJ/mol', min: 10, max: 200 },
  { field: 'gelTimeMin', label: 'The gel time', unit: 'min', min: 0, max: 60 * 24 * 30, minOpen: true },
  { field: 'refTempC', label: "The gel time's temperature", unit: '°C', min: -10, max: 80 },
  { field: 'densityGPerMl', label: 'The mixed density', unit: 'g/mL', min: 0.5, max: 3 },
  { field: 'heatCapacityJPerGK', label: 'The heat capacity', unit: 'J/(g·K)', min: 0.5, max: 4 },
  { field: 'conductivityWPerMK', label: 'The thermal conductivity', unit: 'W/(m·K)', min: 0.05, max: 5 },
];

function rangeIssue(value: unknown, r: Range): ThermalIssue | null {
  const n = typeof value === 'number' ? value : NaN;
  const low = r.minOpen ? n <= r.min : n < r.min;
  if (!Number.isFinite(n) || low || n > r.max) {
    const from = r.minOpen ? `above ${r.min}` : `from ${r.min}`;
    return { field: r.field, message: `${r.label} must be a number ${from} up to ${r.max} ${r.unit}, got ${String(value)}.` };
  }
  return null;
}

function kineticsIssues(kin: CureKinetics, issues: ThermalIssue[]): void {
  const bad = (what: string, value: number, range: string) =>
    issues.push({ field: 'kinetics', message: `The cure law's ${what} must be ${range}, got ${String(value)}.` });
  if (!(kin.m >= 0 && kin.m <= 3)) bad('order m', kin.m, 'between 0 and 3');
  if (!(kin.n >= 0 && kin.n <= 4)) bad('order n', kin.n, 'between 0 and 4');
  if (!(kin.k1OverK2 > 0 && kin.k1OverK2 <= 10)) bad('ratio k1/k2', kin.k1OverK2, 'above 0 and at most 10');
  if (!(kin.gelConversion > 0 && kin.gelConversion < 1)) bad('gel conversion', kin.gelConversion, 'between 0 and 1');
}

/** Every problem at once, each in a sentence, so a form can mark all its wrong fields. */
export function checkResinThermal(resin: ResinThermal): Result<ResinThermal> {
  const issues: ThermalIssue[] = [];
  for (const r of ranges) {
    const issue = rangeIssue(resin[r.field], r);
    if (issue) issues.push(issue);
  }
  if (resin.acceptedPeakC !== undefined && !(Number.isFinite(resin.acceptedPeakC) && resin.acceptedPeakC > -10 && resin.acceptedPeakC <= 300)) {
    issues.push({ field: 'acceptedPeakC', message: `The accepted peak temperature must be a number of °C up to 300, got ${String(resin.acceptedPeakC)}.` });
  }
  if (resin.heatScale !== undefined && !(Number.isFinite(resin.heatScale) && resin.heatScale > 0 && resin.heatScale <= 10)) {
    issues.push({ field: 'heatScale', message: `The calibrated heat factor must be above 0 and at most 10, got ${String(resin.heatScale)}.` });
  }
  kineticsIssues(resin.kinetics ?? dgebaAmineKinetics, issues);
  if (issues.length > 0) return fail('resin_thermal_invalid', issues.map((i) => i.message).join(' '), issues);
  return ok(resin);
}
