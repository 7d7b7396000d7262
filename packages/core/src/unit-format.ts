import { convertLength, convertMass, convertTemperature, convertVolume } from './units';
import { unitSystemUnits, type UnitSystem } from './unit-systems';

export type { UnitSystem } from './unit-systems';
/** What the shop's scale reads to; weighed masses are rounded to it. */
export type ScaleResolutionG = 0.1 | 1;

export interface DisplayQuantity {
  value: number;
  unit: string;
  text: string;
}

function show(value: number, decimals: number, unit: string): DisplayQuantity {
  const factor = 10 ** decimals;
  const rounded = Math.round(value * factor) / factor;
  return { value: rounded, unit, text: `${rounded.toFixed(decimals)} ${unit}` };
}

/** Rounds a mass to what the scale can show; half a step rounds up, as a scale display does. */
export function roundToScale(massG: number, scaleResolutionG: ScaleResolutionG): number {
  const steps = Math.round(massG / scaleResolutionG + 1e-9);
  return scaleResolutionG === 1 ? steps : steps / 10;
}

// Switch to the larger unit once the smaller one would need four digits or more.
const litreFromMl = 1000;
const gallonFromFlOz = 128;
const kilogramFromG = 1000;
const poundFromOz = 16;

export function formatVolume(volumeMl: number, unitSystem: UnitSystem): DisplayQuantity {
  if (unitSystem === 'metric') {
    return Math.abs(volumeMl) >= litreFromMl ? show(volumeMl / 1000, 2, 'L') : show(volumeMl, 1, 'mL');
  }
  const flOz = convertVolume(volumeMl, 'mL', 'floz');
  return Math.abs(flOz) >= gallonFromFlOz ? show(convertVolume(volumeMl, 'mL', 'gal'), 3, 'gal') : show(flOz, 2, 'fl oz');
}

/** A stock or total mass: g/kg or oz/lb. */
export function formatMass(massG: number, unitSystem: UnitSystem): DisplayQuantity {
  if (unitSystem === 'metric') {
    return Math.abs(massG) >= kilogramFromG ? show(massG / 1000, 3, 'kg') : show(massG, 1, 'g');
  }
  const oz = convertMass(massG, 'g', 'oz');
  return Math.abs(oz) >= poundFromOz ? show(convertMass(massG, 'g', 'lb'), 3, 'lb') : show(oz, 2, 'oz');
}

/**
 * A mass to put on the scale: always in the scale's own unit (g, or oz in a US shop) and never
 * finer than the scale reads, so the run sheet shows exactly what the display will show.
 */
export function formatWeighedMass(massG: number, unitSystem: UnitSystem, scaleResolutionG: ScaleResolutionG): DisplayQuantity {
  const grams = roundToScale(massG, scaleResolutionG);
  const { unit, symbol } = unitSystemUnits[unitSystem].mass;
  if (unitSystem === 'metric') return show(grams, scaleResolutionG === 1 ? 0 : 1, symbol);
  // 0.1 g is about 0.0035 oz and 1 g about 0.035 oz: one more decimal than that step would hide it.
  return show(convertMass(grams, 'g', unit), scaleResolutionG === 1 ? 2 : 3, symbol);
}

export function formatLength(lengthMm: number, unitSystem: UnitSystem): DisplayQuantity {
  const { unit, symbol } = unitSystemUnits[unitSystem].length;
  return show(convertLength(lengthMm, 'mm', unit), unitSystem === 'metric' ? 1 : 3, symbol);
}

export function formatTemperature(tempC: number, unitSystem: UnitSystem): DisplayQuantity {
  const { unit, symbol } = unitSystemUnits[unitSystem].temperature;
  return show(convertTemperature(tempC, 'C', unit), 1, symbol);
}
