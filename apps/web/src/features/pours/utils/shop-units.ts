import { convertMass, convertTemperature, type ScaleResolutionG, type UnitSystem } from '@gelpoint/core';

/** The unit the shop's scale reads and the unit its thermometer reads, as the forms label them. */
export interface ShopInputUnits {
  mass: 'g' | 'oz';
  temperature: '°C' | '°F';
}

export function inputUnitsOf(unitSystem: UnitSystem): ShopInputUnits {
  return unitSystem === 'us' ? { mass: 'oz', temperature: '°F' } : { mass: 'g', temperature: '°C' };
}

/** The API knows two scale steps; anything else it sends is read as the finer one. */
export function scaleStepOf(scaleResolutionG: number): ScaleResolutionG {
  return scaleResolutionG === 1 ? 1 : 0.1;
}

/** What was read off the scale, in grams for the API. */
export function massToGrams(value: number, unitSystem: UnitSystem): number {
  return unitSystem === 'us' ? convertMass(value, 'oz', 'g') : value;
}

/** What was read off the thermometer, in °C for the API and for core. */
export function temperatureToC(value: number, unitSystem: UnitSystem): number {
  return unitSystem === 'us' ? convertTemperature(value, 'F', 'C') : value;
}

export function temperatureFromC(tempC: number, unitSystem: UnitSystem): number {
  return unitSystem === 'us' ? convertTemperature(tempC, 'C', 'F') : tempC;
}

/**
 * A number as a person types it on a tablet: a comma works as the decimal mark, spaces are ignored. Null for an
 * empty field or anything that is not a plain number.
 */
export function readDecimal(text: string): number | null {
  const cleaned = text.trim().replace(/\s+/g, '').replace(',', '.');
  if (cleaned === '' || !/^[-+]?(\d+\.?\d*|\.\d+)$/.test(cleaned)) return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : null;
}
