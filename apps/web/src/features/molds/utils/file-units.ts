import { convertLength } from '@gelpoint/core';
import type { MoldFileUnits } from '../types';

const millimetresPerCentimetre = 10;
const millimetresPerMetre = 1000;
const micronsPerMillimetre = 1000;
const inchesPerFoot = 12;

/** How many millimetres one unit of the mould file stands for. */
export function mmPerFileUnit(units: MoldFileUnits): number {
  if (units === 'mm') return 1;
  if (units === 'cm') return millimetresPerCentimetre;
  if (units === 'm') return millimetresPerMetre;
  if (units === 'um') return 1 / micronsPerMillimetre;
  if (units === 'ft') return inchesPerFoot * convertLength(1, 'in', 'mm');
  return convertLength(1, 'in', 'mm');
}

export const fileUnitWords: Record<MoldFileUnits, { label: string; plural: string }> = {
  um: { label: 'Microns (µm)', plural: 'microns' },
  mm: { label: 'Millimetres (mm)', plural: 'millimetres' },
  cm: { label: 'Centimetres (cm)', plural: 'centimetres' },
  m: { label: 'Metres (m)', plural: 'metres' },
  in: { label: 'Inches (in)', plural: 'inches' },
  ft: { label: 'Feet (ft)', plural: 'feet' },
};
