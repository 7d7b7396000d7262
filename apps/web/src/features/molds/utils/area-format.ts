import { convertLength, type DisplayQuantity, type UnitSystem } from '@gelpoint/core';

// Core formats lengths, volumes and masses but not areas; an area converts by the square of the length factor.
const mm2PerCm2 = 10 ** 2;
const mm2PerM2 = 1000 ** 2;
const inchesPerFoot = 12;

function squareInchesPerMm2(): number {
  return convertLength(1, 'mm', 'in') ** 2;
}

function show(value: number, decimals: number, unit: string): DisplayQuantity {
  const factor = 10 ** decimals;
  const rounded = Math.round(value * factor) / factor;
  return { value: rounded, unit, text: `${rounded.toFixed(decimals)} ${unit}` };
}

/** A surface such as the wetted area: cm² up to a square metre, then m²; in² up to a square foot, then ft². */
export function formatArea(areaMm2: number, unitSystem: UnitSystem): DisplayQuantity {
  if (unitSystem === 'metric') {
    return Math.abs(areaMm2) >= mm2PerM2 ? show(areaMm2 / mm2PerM2, 3, 'm²') : show(areaMm2 / mm2PerCm2, 1, 'cm²');
  }
  const squareInches = areaMm2 * squareInchesPerMm2();
  const squareInchesPerFoot = inchesPerFoot ** 2;
  return Math.abs(squareInches) >= squareInchesPerFoot ? show(squareInches / squareInchesPerFoot, 3, 'ft²') : show(squareInches, 2, 'in²');
}

/** The area unit a form asks for: cm² in a metric shop, in² in a US one. */
export function shopAreaUnit(unitSystem: UnitSystem): 'cm²' | 'in²' {
  return unitSystem === 'metric' ? 'cm²' : 'in²';
}

export function shopAreaToMm2(area: number, unitSystem: UnitSystem): number {
  return unitSystem === 'metric' ? area * mm2PerCm2 : area / squareInchesPerMm2();
}
