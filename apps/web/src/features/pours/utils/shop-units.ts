import { convertMass, convertTemperature, unitSystemUnits, type ScaleResolutionG, type UnitSystem } from '@gelpoint/core';

/** The unit the shop's scale reads and the unit its thermometer reads, as the forms label them. */
export interface ShopInputUnits {
  mass: string;
  temperature: string;
}

export function inputUnitsOf(unitSystem: UnitSystem): ShopInputUnits {
  const u = unitSystemUnits[unitSystem];
  return { mass: u.mass.symbol, temperature: u.temperature.symbol };
}

/** The API knows two scale steps; anything else it sends is read as the finer one. */
export function scaleStepOf(scaleResolutionG: number): ScaleResolutionG {
  return scaleResolutionG === 1 ? 1 : 0.1;
}

/** What was read off the scale, in grams for the API. */
export function massToGrams(value: number, unitSystem: UnitSystem): number {
  return convertMass(value, unitSystemUnits[unitSystem].mass.unit, 'g');
}

/** What was read off the thermometer, in °C for the API and for core. */
export function temperatureToC(value: number, unitSystem: UnitSystem): number {
  return convertTemperature(value, unitSystemUnits[unitSystem].temperature.unit, 'C');
}

export function temperatureFromC(tempC: number, unitSystem: UnitSystem): number {
  return convertTemperature(tempC, 'C', unitSystemUnits[unitSystem].temperature.unit);
}
