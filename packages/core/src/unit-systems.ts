import type { LengthUnit, MassUnit, TemperatureUnit, VolumeUnit } from './units';

export type UnitSystem = 'metric' | 'us';

/** One kind of number in a shop's unit system: the symbol people read, and core's unit to convert with. */
interface ShownUnit<U> {
  symbol: string;
  unit: U;
}

export interface UnitSystemUnits {
  length: ShownUnit<LengthUnit>;
  /** Areas as typed and shown beside lengths: the length unit squared. */
  area: { symbol: string };
  temperature: ShownUnit<TemperatureUnit>;
  /** What a scale reads. */
  mass: ShownUnit<MassUnit>;
  volume: ShownUnit<VolumeUnit>;
}

/** The one map from a shop's unit system to the units its people type and read. */
export const unitSystemUnits = {
  metric: {
    length: { symbol: 'mm', unit: 'mm' },
    area: { symbol: 'mm²' },
    temperature: { symbol: '°C', unit: 'C' },
    mass: { symbol: 'g', unit: 'g' },
    volume: { symbol: 'mL', unit: 'mL' },
  },
  us: {
    length: { symbol: 'in', unit: 'in' },
    area: { symbol: 'in²' },
    temperature: { symbol: '°F', unit: 'F' },
    mass: { symbol: 'oz', unit: 'oz' },
    volume: { symbol: 'fl oz', unit: 'floz' },
  },
} as const satisfies Record<UnitSystem, UnitSystemUnits>;
