import { create, unitDependencies, type FactoryFunctionMap } from 'mathjs';
import { fail, ok, type Result } from './result';

// A private mathjs instance holding only units keeps the browser bundle small and leaves the
// global instance untouched for anyone else on the page. (The typings mark every dependency map
// as possibly undefined; this one is always exported.)
const math = create({ unitDependencies } as FactoryFunctionMap);

export type VolumeUnit = 'mL' | 'L' | 'cm3' | 'in3' | 'floz' | 'gal';
export type MassUnit = 'g' | 'kg' | 'oz' | 'lb';
export type LengthUnit = 'mm' | 'in';
export type TemperatureUnit = 'C' | 'F';

// mathjs's `gal` and `floz` are the US liquid measures, which is what US resin kits are sold in.
const volumeNames: Record<VolumeUnit, string> = { mL: 'mL', L: 'L', cm3: 'cm^3', in3: 'in^3', floz: 'floz', gal: 'gal' };
const massNames: Record<MassUnit, string> = { g: 'g', kg: 'kg', oz: 'oz', lb: 'lb' };
const lengthNames: Record<LengthUnit, string> = { mm: 'mm', in: 'in' };
const temperatureNames: Record<TemperatureUnit, string> = { C: 'degC', F: 'degF' };

function convert(value: number, from: string, to: string): number {
  return math.unit(value, from).toNumber(to);
}

export function convertVolume(value: number, from: VolumeUnit, to: VolumeUnit): number {
  return convert(value, volumeNames[from], volumeNames[to]);
}

export function convertMass(value: number, from: MassUnit, to: MassUnit): number {
  return convert(value, massNames[from], massNames[to]);
}

export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  return convert(value, lengthNames[from], lengthNames[to]);
}

export function convertTemperature(value: number, from: TemperatureUnit, to: TemperatureUnit): number {
  return convert(value, temperatureNames[from], temperatureNames[to]);
}

export const mm3PerMl = 1000;

export function mm3ToMl(volumeMm3: number): number {
  return volumeMm3 / mm3PerMl;
}

export function mlToMm3(volumeMl: number): number {
  return volumeMl * mm3PerMl;
}

export type Dimension = 'volume' | 'mass' | 'length' | 'temperature';

const baseUnitOf: Record<Dimension, string> = { volume: 'mL', mass: 'g', length: 'mm', temperature: 'degC' };

// Spellings people type into a form, mapped onto the unit tables above.
const typedSpellings: Record<Dimension, Record<string, string>> = {
  volume: {
    ml: 'mL',
    l: 'L',
    cm3: 'cm^3',
    'cm^3': 'cm^3',
    cc: 'cm^3',
    in3: 'in^3',
    'in^3': 'in^3',
    floz: 'floz',
    'fl oz': 'floz',
    'fl.oz': 'floz',
    gal: 'gal',
    gallon: 'gal',
    gallons: 'gal',
  },
  mass: { g: 'g', kg: 'kg', oz: 'oz', lb: 'lb', lbs: 'lb' },
  length: { mm: 'mm', in: 'in', '"': 'in' },
  temperature: { c: 'degC', '°c': 'degC', f: 'degF', '°f': 'degF' },
};

/**
 * Reads "1.5 kg", "2 gal", "68 °F" into the base unit of its dimension (mL, g, mm, °C), for data
 * sheets that state sizes in whatever unit the maker bought them in.
 */
export function readQuantity(text: string, dimension: Dimension): Result<number> {
  const match = /^\s*(-?\d+(?:\.\d+)?|-?\.\d+)\s*(.+?)\s*$/.exec(text);
  const accepted = Object.keys(typedSpellings[dimension]).join(', ');
  if (!match) {
    return fail('quantity_unreadable', `"${text}" is not a number followed by a unit; write it like "1.5 kg" (units: ${accepted}).`);
  }
  const unitName = typedSpellings[dimension][match[2]!.toLowerCase()];
  if (!unitName) {
    return fail('unit_unknown', `"${match[2]}" is not a ${dimension} unit Gelpoint knows; use one of: ${accepted}.`);
  }
  return ok(convert(Number(match[1]), unitName, baseUnitOf[dimension]));
}
