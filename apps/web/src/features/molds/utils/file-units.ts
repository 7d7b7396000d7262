import { convertLength } from '@gelpoint/core';
import type { MoldUnits } from '../types';

const millimetresPerCentimetre = 10;

/** How many millimetres one unit of the STL file stands for. */
export function mmPerFileUnit(units: MoldUnits): number {
  if (units === 'mm') return 1;
  if (units === 'cm') return millimetresPerCentimetre;
  return convertLength(1, 'in', 'mm');
}

export const fileUnitWords: Record<MoldUnits, { label: string; plural: string }> = {
  mm: { label: 'Millimetres (mm)', plural: 'millimetres' },
  cm: { label: 'Centimetres (cm)', plural: 'centimetres' },
  in: { label: 'Inches (in)', plural: 'inches' },
};
