import type { MoldFileUnits, MoldUnits } from '../types';
import { mmPerFileUnit } from './file-units';
import type { Vec3 } from './mould-file-reading';

/**
 * Sizes a wooden mould plausibly has, largest side: from a small inlay pocket to a long river
 * table (common practice; a guess to question the units, never a limit).
 */
export const plausibleMouldSpanMm = { smallest: 60, largest: 3000 } as const;

export interface UnitsReading {
  units: MoldFileUnits;
  sizeMm: Vec3;
  largestMm: number;
  plausible: boolean;
}

export function readAs(sizeInFileUnits: Vec3, units: MoldFileUnits): UnitsReading {
  const scale = mmPerFileUnit(units);
  const sizeMm: Vec3 = [sizeInFileUnits[0] * scale, sizeInFileUnits[1] * scale, sizeInFileUnits[2] * scale];
  const largestMm = Math.max(...sizeMm);
  return { units, sizeMm, largestMm, plausible: largestMm >= plausibleMouldSpanMm.smallest && largestMm <= plausibleMouldSpanMm.largest };
}

export interface UnitsGuess {
  chosen: UnitsReading;
  /** Why the chosen reading looks wrong, when it does. */
  doubt: 'too_small' | 'too_large' | null;
  /** Other units a maker may choose under which the mould would have a plausible size, likeliest first. */
  alternatives: (UnitsReading & { units: MoldUnits })[];
}

// Inches before centimetres: CAD exports of workshop moulds in US shops are the common other case.
const preference: readonly MoldUnits[] = ['mm', 'in', 'cm'];

export function guessUnits(sizeInFileUnits: Vec3, chosen: MoldFileUnits): UnitsGuess {
  const reading = readAs(sizeInFileUnits, chosen);
  if (reading.plausible) return { chosen: reading, doubt: null, alternatives: [] };
  const alternatives = preference
    .filter((units) => units !== chosen)
    .map((units) => ({ ...readAs(sizeInFileUnits, units), units }))
    .filter((other) => other.plausible);
  return { chosen: reading, doubt: reading.largestMm < plausibleMouldSpanMm.smallest ? 'too_small' : 'too_large', alternatives };
}
