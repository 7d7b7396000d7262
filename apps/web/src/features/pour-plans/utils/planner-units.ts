import { convertLength, convertMass, convertTemperature, convertVolume, unitSystemUnits, type UnitSystem } from '@gelpoint/core';
import { get, set } from 'react-hook-form';
import type { PlannerValues } from './planner-values';

/**
 * The planner form speaks the shop's units; the contract, the API and core speak mm, mm², °C, g and mL.
 * The form keeps the contract's paths (so the contract's messages land under their fields) but, in a US shop, the
 * numbers under those paths are inches, square inches, °F, ounces and fluid ounces. These functions convert at the
 * form's two edges: when it is filled from a plan, and when a plan is computed or saved from it.
 *
 * The seal coat's film thickness stays in mm everywhere: core has no thousandths-of-an-inch unit to show it in.
 */
export type PlannerQuantity = 'length' | 'area' | 'temperature' | 'mass' | 'volume';

export interface PlannerUnits {
  unitSystem: UnitSystem;
  /** The plan (in mm and °C) the form was filled from: a value the maker left as shown goes back exactly as it was. */
  origin?: PlannerValues;
}

export const metricPlannerUnits: PlannerUnits = { unitSystem: 'metric' };

export interface ShownUnitNames {
  length: string;
  area: string;
  temperature: string;
  mass: string;
  volume: string;
}

/** The unit each kind of planner number is typed in, for labels and messages. */
export function shownUnitNames(unitSystem: UnitSystem): ShownUnitNames {
  const u = unitSystemUnits[unitSystem];
  return { length: u.length.symbol, area: u.area.symbol, temperature: u.temperature.symbol, mass: u.mass.symbol, volume: u.volume.symbol };
}

const mmPerInch = convertLength(1, 'in', 'mm');
const mm2PerIn2 = mmPerInch * mmPerInch;

// Inches to thousandths and °F to tenths, as core's formatLength and formatTemperature show results; square inches
// to hundredths (about 6.5 mm²) and cup waste to hundredths of an ounce (under 0.3 g, under 0.3 mL): finer than
// anyone measures a cavity or a scraped cup.
const shownDecimals: Record<PlannerQuantity, number> = { length: 3, temperature: 1, area: 2, mass: 2, volume: 2 };
// A converted number keeps twelve significant digits: more than anything is measured to, fewer than the float noise
// of a conversion reaches, so 1.1 in goes back as 27.94 mm and not 27.940000000000005 mm.
const baseDigits = 12;

function rounded(value: number, decimals: number, how: (x: number) => number = Math.round): number {
  const factor = 10 ** decimals;
  // The inner rounding drops the float noise of a conversion, so −30 °C stays exactly −22 °F before a floor or ceiling.
  return how(Math.round(value * factor * 1e6) / 1e6) / factor;
}

function toShown(value: number, quantity: PlannerQuantity): number {
  switch (quantity) {
    case 'length':
      return convertLength(value, 'mm', 'in');
    case 'temperature':
      return convertTemperature(value, 'C', 'F');
    case 'area':
      return value / mm2PerIn2;
    case 'mass':
      return convertMass(value, 'g', 'oz');
    case 'volume':
      return convertVolume(value, 'mL', 'floz');
  }
}

function toBase(value: number, quantity: PlannerQuantity): number {
  switch (quantity) {
    case 'length':
      return convertLength(value, 'in', 'mm');
    case 'temperature':
      return convertTemperature(value, 'F', 'C');
    case 'area':
      return value * mm2PerIn2;
    case 'mass':
      return convertMass(value, 'oz', 'g');
    case 'volume':
      return convertVolume(value, 'floz', 'mL');
  }
}

/** A base value (mm, mm², °C, g, mL) in the unit the form shows it in, rounded as shown. */
export function shownQuantity(value: number, quantity: PlannerQuantity, unitSystem: UnitSystem): number {
  if (unitSystem === 'metric' || !Number.isFinite(value)) return value;
  return rounded(toShown(value, quantity), shownDecimals[quantity]);
}

/** A number typed in the shown unit, in the base unit the contract takes. */
export function baseQuantity(value: number, quantity: PlannerQuantity, unitSystem: UnitSystem): number {
  if (unitSystem === 'metric' || !Number.isFinite(value)) return value;
  return Number(toBase(value, quantity).toPrecision(baseDigits));
}

/**
 * A contract limit in the shown unit, rounded inwards: every number up to a shown maximum (or down to a shown
 * minimum) passes the contract once converted back.
 */
export function shownLimit(value: number, quantity: PlannerQuantity, unitSystem: UnitSystem, side: 'max' | 'min'): number {
  if (unitSystem === 'metric') return value;
  return rounded(toShown(value, quantity), shownDecimals[quantity], side === 'max' ? Math.floor : Math.ceil);
}

// Every number of the form that has a unit, by its path; the cup waste is a mass or a volume as its unit says.
const fieldQuantities: Record<string, PlannerQuantity | 'cup'> = {
  'cavity.shape.lengthMm': 'length',
  'cavity.shape.widthMm': 'length',
  'cavity.shape.depthMm': 'length',
  'cavity.shape.diameterMm': 'length',
  'cavity.shape.areaMm2': 'area',
  'cavity.shape.averageDepthMm': 'length',
  'cavity.shape.maxDepthMm': 'length',
  'cavity.shape.perimeterMm': 'length',
  fillLevelMm: 'length',
  'cupWaste.amount': 'cup',
  shopTempC: 'temperature',
  'shopAir.surfaceTempC': 'temperature',
  'wood.lengthMm': 'length',
  'wood.widthMm': 'length',
  'wood.thicknessMm': 'length',
};

/** What a form field holds (null for numbers without a unit: percentages, coats, factors, prices, film thickness). */
export function quantityOfField(field: string, values: Pick<PlannerValues, 'cupWaste'>): PlannerQuantity | null {
  const quantity = fieldQuantities[field];
  if (quantity === 'cup') return values.cupWaste.unit === 'g' ? 'mass' : 'volume';
  return quantity ?? null;
}

// The form hands over what is in its boxes: an untouched empty box is undefined, an optional one null; only numbers
// are converted.
function each(values: PlannerValues, convert: (value: number, quantity: PlannerQuantity, field: string) => number): PlannerValues {
  const converted = structuredClone(values);
  for (const field of Object.keys(fieldQuantities)) {
    const value: unknown = get(values, field);
    const quantity = quantityOfField(field, values);
    if (typeof value === 'number' && quantity) set(converted, field, convert(value, quantity, field));
  }
  return converted;
}

/** A plan's values (mm, mm², °C, g, mL) as the form shows them in the shop's units. */
export function shownPlannerValues(values: PlannerValues, unitSystem: UnitSystem): PlannerValues {
  if (unitSystem === 'metric') return values;
  return each(values, (value, quantity) => shownQuantity(value, quantity, unitSystem));
}

/**
 * The form's values back in mm, mm², °C, g and mL. A value still as it was shown from the origin plan returns the
 * origin's own number, so opening and saving a plan never moves it by a rounding step.
 */
export function basePlannerValues(values: PlannerValues, units: PlannerUnits): PlannerValues {
  const { unitSystem, origin } = units;
  if (unitSystem === 'metric') return values;
  const originShown = origin ? shownPlannerValues(origin, unitSystem) : undefined;
  return each(values, (value, quantity, field) => {
    // The same amount means something else once the cup waste is weighed instead of measured.
    const sameMeaning = field !== 'cupWaste.amount' || origin?.cupWaste.unit === values.cupWaste.unit;
    const before: unknown = origin ? get(origin, field) : undefined;
    if (sameMeaning && typeof before === 'number' && get(originShown, field) === value) return before;
    return baseQuantity(value, quantity, unitSystem);
  });
}
